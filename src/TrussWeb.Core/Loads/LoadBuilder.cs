using System.Globalization;
using TrussWeb.Core.Model;
using TrussWeb.Core.Validation;

namespace TrussWeb.Core.Loads;

/// <summary>
/// Turns <see cref="AreaActions"/> into nodal load cases.
/// Roof loads: the top chord (members of role TopChord, one chain from the left end) is the roof line.
/// Each purlin takes the strip of roof from half-way to the previous purlin to half-way to the next
/// (the first and last strips run to the ends of the chord), times the truss spacing, so the totals are
/// exactly pressure × area. Permanent loads act on the slope area, imposed loads on the plan area, and
/// wind normal to each slope (resolved into x and y, left and right slopes with their own pressure).
/// Self-weight: mass per metre × length × g × connection allowance, half to each end node.
/// Cases built: "D" (covering, purlins, services), "SW" (self-weight), "Q" (imposed), one per wind case,
/// then any point-load cases given.
/// </summary>
public static class LoadBuilder
{
    /// <summary>Gravity, m/s² (standard gravity 9.80665 taken as 9.81, common practice).</summary>
    public const double GravityMPerS2 = 9.81;

    /// <summary>kPa to N/mm².</summary>
    public const double NPerMm2PerKPa = 1e-3;

    /// <summary>A purlin within this distance of a node (along the chord) is at that node, mm (same as the node coincidence tolerance).</summary>
    public const double OnNodeToleranceMm = TrussModelValidator.CoincidenceToleranceMm;

    /// <summary>Builds the cases; throws <see cref="InputValidationException"/> on bad input (negative pressures, no top chord chain).</summary>
    public static LoadBuildResult Build(TrussModel model, AreaActions actions)
    {
        ArgumentNullException.ThrowIfNull(model);
        ArgumentNullException.ThrowIfNull(actions);
        var issues = new List<ValidationIssue>();
        Guard.NonNegative(issues, nameof(AreaActions.RoofCoveringKPa), actions.RoofCoveringKPa, "kPa");
        Guard.NonNegative(issues, nameof(AreaActions.PurlinsAndServicesKPa), actions.PurlinsAndServicesKPa, "kPa");
        Guard.NonNegative(issues, nameof(AreaActions.ImposedKPaOnPlan), actions.ImposedKPaOnPlan, "kPa");
        Guard.Positive(issues, nameof(AreaActions.ConnectionAllowance), actions.ConnectionAllowance, string.Empty);
        Guard.Positive(issues, nameof(TrussModel.TrussSpacing), model.TrussSpacing, "mm");
        var windIds = new HashSet<string>(StringComparer.Ordinal);
        foreach (var w in actions.WindCases)
        {
            if (!windIds.Add(w.Id))
            {
                issues.Add(new ValidationIssue(nameof(AreaActions.WindCases), $"wind case id '{w.Id}' is used twice"));
            }

            if (!double.IsFinite(w.LeftSlopePressureKPa) || !double.IsFinite(w.RightSlopePressureKPa))
            {
                issues.Add(new ValidationIssue(nameof(AreaActions.WindCases), $"wind case {w.Id} has a pressure that is not a finite number"));
            }
        }

        Guard.ThrowIfAny(issues);

        var warnings = new List<ValidationIssue>();
        var cases = new List<LoadCase>();
        var needRoof = actions.RoofCoveringKPa + actions.PurlinsAndServicesKPa + actions.ImposedKPaOnPlan > 0 || actions.WindCases.Count > 0;
        if (needRoof)
        {
            var chain = TopChordChain(model);
            var purlins = PurlinPositions(model, actions, chain, warnings);
            var strips = Strips(chain, purlins);
            var b = model.TrussSpacing * NPerMm2PerKPa;

            var permanent = actions.RoofCoveringKPa + actions.PurlinsAndServicesKPa;
            if (permanent > 0)
            {
                cases.Add(RoofCase("D", "Roof covering, purlins and services", LoadKind.Permanent, chain, purlins, strips,
                    (seg, len) => (0, -permanent * b * len)));
            }

            if (actions.ImposedKPaOnPlan > 0)
            {
                cases.Add(RoofCase("Q", "Imposed roof load (on plan)", LoadKind.Imposed, chain, purlins, strips,
                    (seg, len) => (0, -actions.ImposedKPaOnPlan * b * len * Math.Abs(seg.Cos))));
            }

            foreach (var w in actions.WindCases)
            {
                cases.Add(RoofCase(w.Id, w.Name, LoadKind.Wind, chain, purlins, strips, (seg, len) =>
                {
                    // Force = −p·n per unit area, n the upward normal (−sin, cos) of a left-to-right segment:
                    // positive pressure pushes onto the roof, negative (uplift) pulls away from it.
                    var p = seg.IsLeft ? w.LeftSlopePressureKPa : w.RightSlopePressureKPa;
                    return (p * b * len * seg.Sin, -p * b * len * seg.Cos);
                }));
            }
        }

        var sw = SelfWeight(model, actions, warnings);
        if (sw is not null)
        {
            cases.Insert(Math.Min(1, cases.Count), sw);
        }

        cases.AddRange(actions.PointLoadCases);
        return new LoadBuildResult(cases, warnings);
    }

    private static string Mm(double v) => v.ToString("#,0", CultureInfo.InvariantCulture).Replace(',', ' ');

    private static LoadCase? SelfWeight(TrussModel model, AreaActions actions, List<ValidationIssue> warnings)
    {
        if (actions.MassPerMetreByGroup.Count == 0 && actions.MassPerMetreByMember.Count == 0)
        {
            return null;
        }

        var sums = new Dictionary<string, double>(StringComparer.Ordinal);
        var nodes = model.NodeMap();
        foreach (var m in model.Members)
        {
            if (!actions.MassPerMetreByMember.TryGetValue(m.Id, out var mass) && !actions.MassPerMetreByGroup.TryGetValue(m.Group, out mass))
            {
                warnings.Add(new ValidationIssue("MassPerMetre", $"no mass per metre for member {m.Id} (group {m.Group}): its self-weight is left out"));
                continue;
            }

            var a = nodes[m.StartNode];
            var c = nodes[m.EndNode];
            var length = Math.Sqrt(((c.X - a.X) * (c.X - a.X)) + ((c.Y - a.Y) * (c.Y - a.Y)));

            // kg/m × m × m/s² = N.
            var weight = mass * (length / 1000) * GravityMPerS2 * actions.ConnectionAllowance;
            sums[m.StartNode] = sums.GetValueOrDefault(m.StartNode) + (weight / 2);
            sums[m.EndNode] = sums.GetValueOrDefault(m.EndNode) + (weight / 2);
        }

        var loads = model.Nodes.Where(n => sums.ContainsKey(n.Id)).Select(n => new NodalLoad(n.Id, 0, -sums[n.Id])).ToList();
        return new LoadCase("SW", $"Truss self-weight × {actions.ConnectionAllowance.ToString("0.00", CultureInfo.InvariantCulture)} connections", LoadKind.Permanent, loads);
    }

    private sealed record Segment(Node A, Node B, double S0, double Length, double Cos, double Sin, bool IsLeft);

    private sealed record Chain(IReadOnlyList<Node> Nodes, IReadOnlyList<double> Positions, IReadOnlyList<Segment> Segments)
    {
        public double Length => Positions[^1];
    }

    private static Chain TopChordChain(TrussModel model)
    {
        var nodes = model.NodeMap();
        var adjacency = new Dictionary<string, List<string>>(StringComparer.Ordinal);
        var count = 0;
        foreach (var m in model.Members.Where(m => model.RoleOf(m) == MemberRole.TopChord))
        {
            count++;
            (adjacency.TryGetValue(m.StartNode, out var la) ? la : adjacency[m.StartNode] = []).Add(m.EndNode);
            (adjacency.TryGetValue(m.EndNode, out var lb) ? lb : adjacency[m.EndNode] = []).Add(m.StartNode);
        }

        var ends = adjacency.Where(kv => kv.Value.Count == 1).Select(kv => nodes[kv.Key]).OrderBy(n => n.X).ToList();
        if (count == 0 || ends.Count != 2 || adjacency.Values.Any(v => v.Count > 2))
        {
            throw new InputValidationException("TopChord", "the top chord must be one unbranched chain of members so that roof loads can be placed on it");
        }

        var path = new List<Node> { ends[0] };
        var previous = string.Empty;
        var current = ends[0].Id;
        while (path.Count <= count)
        {
            var next = adjacency[current].FirstOrDefault(id => id != previous);
            if (next is null)
            {
                break;
            }

            previous = current;
            current = next;
            path.Add(nodes[current]);
        }

        if (path.Count != count + 1)
        {
            throw new InputValidationException("TopChord", "the top chord must be one unbranched chain of members so that roof loads can be placed on it");
        }

        var midX = (path.Min(n => n.X) + path.Max(n => n.X)) / 2;
        var positions = new List<double> { 0 };
        var segments = new List<Segment>();
        for (var i = 0; i + 1 < path.Count; i++)
        {
            var a = path[i];
            var b = path[i + 1];
            var dx = b.X - a.X;
            var dy = b.Y - a.Y;
            var length = Math.Sqrt((dx * dx) + (dy * dy));

            // Orient each segment left to right so the upward normal is (−sin, cos).
            var sign = dx < 0 ? -1 : 1;
            var cos = sign * dx / length;
            var sin = sign * dy / length;
            var isLeft = Math.Abs(sin) < 1e-12 ? (a.X + b.X) / 2 < midX : sin > 0;
            segments.Add(new Segment(a, b, positions[^1], length, cos, sin, isLeft));
            positions.Add(positions[^1] + length);
        }

        return new Chain(path, positions, segments);
    }

    private static List<double> PurlinPositions(TrussModel model, AreaActions actions, Chain chain, List<ValidationIssue> warnings)
    {
        var list = new List<double>();
        if (actions.PurlinPositionsAlongTopChord is { } given)
        {
            foreach (var s in given)
            {
                if (!double.IsFinite(s) || s < -OnNodeToleranceMm || s > chain.Length + OnNodeToleranceMm)
                {
                    throw new InputValidationException(nameof(AreaActions.PurlinPositionsAlongTopChord),
                        $"purlin at {s.ToString(CultureInfo.InvariantCulture)} mm lies off the top chord (0 to {Mm(chain.Length)} mm)");
                }

                var clamped = Math.Clamp(s, 0, chain.Length);
                list.Add(clamped);
                var (a, b, _) = Locate(chain, clamped);
                if (b is not null)
                {
                    warnings.Add(new ValidationIssue(nameof(AreaActions.PurlinPositionsAlongTopChord), OffNodeMessage(clamped, a, b)));
                }
            }
        }
        else
        {
            var index = new Dictionary<string, int>(StringComparer.Ordinal);
            for (var i = 0; i < chain.Nodes.Count; i++)
            {
                index[chain.Nodes[i].Id] = i;
            }

            var ids = model.PurlinNodes.Count > 0 ? model.PurlinNodes : chain.Nodes.Select(n => n.Id).ToList();
            foreach (var id in ids)
            {
                if (index.TryGetValue(id, out var i))
                {
                    list.Add(chain.Positions[i]);
                }
                else
                {
                    warnings.Add(new ValidationIssue(nameof(TrussModel.PurlinNodes), $"purlin node {id} is not on the top chord: left out, its roof strip goes to the neighbouring purlins"));
                }
            }
        }

        if (list.Count == 0)
        {
            throw new InputValidationException(nameof(TrussModel.PurlinNodes), "no purlins on the top chord: roof loads cannot be placed");
        }

        list.Sort();
        return list;
    }

    private static List<(double From, double To)> Strips(Chain chain, List<double> purlins)
    {
        var strips = new List<(double, double)>(purlins.Count);
        for (var k = 0; k < purlins.Count; k++)
        {
            var from = k == 0 ? 0 : (purlins[k - 1] + purlins[k]) / 2;
            var to = k == purlins.Count - 1 ? chain.Length : (purlins[k] + purlins[k + 1]) / 2;
            strips.Add((from, to));
        }

        return strips;
    }

    private static LoadCase RoofCase(string id, string name, LoadKind kind, Chain chain, List<double> purlins,
        List<(double From, double To)> strips, Func<Segment, double, (double Fx, double Fy)> perLength)
    {
        var fx = new Dictionary<string, double>(StringComparer.Ordinal);
        var fy = new Dictionary<string, double>(StringComparer.Ordinal);
        void Put(string node, double x, double y)
        {
            fx[node] = fx.GetValueOrDefault(node) + x;
            fy[node] = fy.GetValueOrDefault(node) + y;
        }

        for (var k = 0; k < purlins.Count; k++)
        {
            var (from, to) = strips[k];
            double px = 0, py = 0;
            foreach (var seg in chain.Segments)
            {
                var overlap = Math.Min(to, seg.S0 + seg.Length) - Math.Max(from, seg.S0);
                if (overlap > 0)
                {
                    var (x, y) = perLength(seg, overlap);
                    px += x;
                    py += y;
                }
            }

            var (nodeA, nodeB, share) = Locate(chain, purlins[k]);
            Put(nodeA, px * (1 - share), py * (1 - share));
            if (share > 0)
            {
                Put(nodeB!, px * share, py * share);
            }
        }

        var loads = chain.Nodes.Where(n => fx.ContainsKey(n.Id)).Select(n => new NodalLoad(n.Id, fx[n.Id], fy[n.Id])).ToList();
        return new LoadCase(id, name, kind, loads);
    }

    /// <summary>Node at (or the two nodes around) a chord position, with the share going to the second by the lever rule.</summary>
    private static (string A, string? B, double Share) Locate(Chain chain, double s)
    {
        for (var i = 0; i < chain.Nodes.Count; i++)
        {
            if (Math.Abs(chain.Positions[i] - s) <= OnNodeToleranceMm)
            {
                return (chain.Nodes[i].Id, null, 0);
            }
        }

        for (var i = 0; i + 1 < chain.Nodes.Count; i++)
        {
            if (s > chain.Positions[i] && s < chain.Positions[i + 1])
            {
                var share = (s - chain.Positions[i]) / (chain.Positions[i + 1] - chain.Positions[i]);
                return (chain.Nodes[i].Id, chain.Nodes[i + 1].Id, share);
            }
        }

        return (chain.Nodes[^1].Id, null, 0);
    }

    private static string OffNodeMessage(double s, string a, string b) =>
        $"purlin at {Mm(s)} mm along the top chord is not at a node (between {a} and {b}): its load is shared between them by the lever rule; chord bending is not checked";
}
