using System.Globalization;
using TrussWeb.Core.Analysis;
using TrussWeb.Core.Validation;

namespace TrussWeb.Core.Model;

/// <summary>
/// Checks a <see cref="TrussModel"/> before analysis and names each problem and the element it is in.
/// Order: tables (ids, references, geometry), then supports, then stability. The stability check
/// factorises a unit-stiffness matrix and maps each zero pivot back to a node and direction, so a
/// mechanism is reported in words, never as a NaN or a singular-matrix exception. It runs only when
/// the tables and the supports are sound.
/// </summary>
public static class TrussModelValidator
{
    /// <summary>
    /// Nodes closer than this are the same point, mm. 2026-12-01: 1 mm is below any setting-out
    /// dimension of a roof truss and well above coordinate round-off (common practice).
    /// </summary>
    public const double CoincidenceToleranceMm = 1.0;

    /// <summary>Every issue found; empty when the model can be analysed.</summary>
    public static IReadOnlyList<ValidationIssue> Validate(TrussModel model)
    {
        ArgumentNullException.ThrowIfNull(model);
        var issues = new List<ValidationIssue>();
        CheckTables(model, issues);
        if (issues.Count > 0)
        {
            return issues;
        }

        if (!CheckSupports(model, issues))
        {
            return issues;
        }

        CheckStability(model, issues);
        return issues;
    }

    /// <summary>True when <see cref="Validate"/> finds nothing.</summary>
    public static bool IsValid(TrussModel model) => Validate(model).Count == 0;

    /// <summary>Throws <see cref="InputValidationException"/> carrying every issue.</summary>
    public static void ThrowIfInvalid(TrussModel model) => Guard.ThrowIfAny(Validate(model));

    private static string F(double v) => v.ToString("0.###", CultureInfo.InvariantCulture);

    private static void CheckTables(TrussModel model, List<ValidationIssue> issues)
    {
        if (model.Nodes.Count == 0)
        {
            issues.Add(new ValidationIssue("Nodes", "the truss has no nodes"));
        }

        if (model.Members.Count == 0)
        {
            issues.Add(new ValidationIssue("Members", "the truss has no members"));
        }

        if (!(model.Span > 0) || !double.IsFinite(model.Span))
        {
            issues.Add(new ValidationIssue(nameof(TrussModel.Span), $"span must be greater than 0 mm (got {F(model.Span)} mm)"));
        }

        if (!(model.TrussSpacing > 0) || !double.IsFinite(model.TrussSpacing))
        {
            issues.Add(new ValidationIssue(nameof(TrussModel.TrussSpacing), $"truss spacing must be greater than 0 mm (got {F(model.TrussSpacing)} mm)"));
        }

        var nodes = new Dictionary<string, Node>(StringComparer.Ordinal);
        var counts = new Dictionary<string, int>(StringComparer.Ordinal);
        foreach (var n in model.Nodes)
        {
            if (string.IsNullOrWhiteSpace(n.Id))
            {
                issues.Add(new ValidationIssue("Nodes", $"a node at ({F(n.X)}, {F(n.Y)}) mm has no id"));
                continue;
            }

            if (!double.IsFinite(n.X) || !double.IsFinite(n.Y))
            {
                issues.Add(new ValidationIssue("Nodes", $"node {n.Id} has a coordinate that is not a finite number"));
            }
            else if (Math.Abs(n.X) > PlausibleRange.MaxCoordinateMm || Math.Abs(n.Y) > PlausibleRange.MaxCoordinateMm)
            {
                issues.Add(new ValidationIssue("Nodes", $"node {n.Id} lies more than {PlausibleRange.MaxCoordinateMm:0} mm from the origin (x = {n.X:G6}, y = {n.Y:G6} mm)"));
            }

            counts[n.Id] = counts.GetValueOrDefault(n.Id) + 1;
            nodes.TryAdd(n.Id, n);
        }

        foreach (var (id, count) in counts)
        {
            if (count > 1)
            {
                issues.Add(new ValidationIssue("Nodes", $"node id '{id}' is used by {count} nodes; node ids must be unique"));
            }
        }

        CheckCoincident(model, issues);

        var groups = new HashSet<string>(StringComparer.Ordinal);
        foreach (var g in model.Groups)
        {
            if (!groups.Add(g.Name))
            {
                issues.Add(new ValidationIssue("Groups", $"group name '{g.Name}' is used twice"));
            }
        }

        var memberIds = new HashSet<string>(StringComparer.Ordinal);
        var pairs = new Dictionary<(string, string), string>();
        var connected = new HashSet<string>(StringComparer.Ordinal);
        foreach (var m in model.Members)
        {
            if (!memberIds.Add(m.Id))
            {
                issues.Add(new ValidationIssue("Members", $"member id '{m.Id}' is used twice; member marks must be unique"));
            }

            var known = true;
            foreach (var end in new[] { m.StartNode, m.EndNode })
            {
                if (!nodes.ContainsKey(end))
                {
                    issues.Add(new ValidationIssue("Members", $"member {m.Id} refers to unknown node '{end}'"));
                    known = false;
                }
            }

            if (!groups.Contains(m.Group))
            {
                issues.Add(new ValidationIssue("Members", $"member {m.Id} refers to unknown group '{m.Group}'"));
            }

            connected.Add(m.StartNode);
            connected.Add(m.EndNode);
            if (!known)
            {
                continue;
            }

            if (m.StartNode == m.EndNode)
            {
                issues.Add(new ValidationIssue("Members", $"member {m.Id} has zero length: both ends are node {m.StartNode}"));
                continue;
            }

            var a = nodes[m.StartNode];
            var b = nodes[m.EndNode];
            var length = Math.Sqrt(((b.X - a.X) * (b.X - a.X)) + ((b.Y - a.Y) * (b.Y - a.Y)));
            if (length < CoincidenceToleranceMm)
            {
                issues.Add(new ValidationIssue("Members", $"member {m.Id} has zero length: nodes {m.StartNode} and {m.EndNode} are {F(length)} mm apart (less than {F(CoincidenceToleranceMm)} mm)"));
            }

            var key = string.CompareOrdinal(m.StartNode, m.EndNode) < 0 ? (m.StartNode, m.EndNode) : (m.EndNode, m.StartNode);
            if (pairs.TryGetValue(key, out var other))
            {
                issues.Add(new ValidationIssue("Members", $"members {other} and {m.Id} both join nodes {key.Item1} and {key.Item2}; remove one"));
            }
            else
            {
                pairs[key] = m.Id;
            }
        }

        foreach (var n in model.Nodes)
        {
            if (!string.IsNullOrWhiteSpace(n.Id) && !connected.Contains(n.Id))
            {
                issues.Add(new ValidationIssue("Nodes", $"node {n.Id} is not connected to any member"));
            }
        }

        foreach (var s in model.Supports)
        {
            if (!nodes.ContainsKey(s.Node))
            {
                issues.Add(new ValidationIssue("Supports", $"a support refers to unknown node '{s.Node}'"));
            }
        }

        foreach (var id in model.LateralRestraints)
        {
            if (!nodes.ContainsKey(id))
            {
                issues.Add(new ValidationIssue(nameof(TrussModel.LateralRestraints), $"lateral restraint at unknown node '{id}'"));
            }
        }

        foreach (var id in model.PurlinNodes)
        {
            if (!nodes.ContainsKey(id))
            {
                issues.Add(new ValidationIssue(nameof(TrussModel.PurlinNodes), $"purlin at unknown node '{id}'"));
            }
        }
    }

    private static void CheckCoincident(TrussModel model, List<ValidationIssue> issues)
    {
        // Sweep in x: only nodes within the tolerance in x can coincide (n log n, not n²).
        var sorted = model.Nodes.Where(n => double.IsFinite(n.X) && double.IsFinite(n.Y)).OrderBy(n => n.X).ToArray();
        for (var i = 0; i < sorted.Length; i++)
        {
            for (var j = i + 1; j < sorted.Length && sorted[j].X - sorted[i].X < CoincidenceToleranceMm; j++)
            {
                var a = sorted[i];
                var b = sorted[j];
                if (a.Id == b.Id)
                {
                    continue;
                }

                var d = Math.Sqrt(((b.X - a.X) * (b.X - a.X)) + ((b.Y - a.Y) * (b.Y - a.Y)));
                if (d < CoincidenceToleranceMm)
                {
                    issues.Add(new ValidationIssue("Nodes", $"nodes {a.Id} and {b.Id} coincide ({F(d)} mm apart; nodes closer than {F(CoincidenceToleranceMm)} mm are the same point)"));
                }
            }
        }
    }

    private static bool CheckSupports(TrussModel model, List<ValidationIssue> issues)
    {
        if (model.Supports.Count == 0)
        {
            issues.Add(new ValidationIssue("Supports", "the truss has no supports; add a pin and a roller"));
            return false;
        }

        var nodes = model.NodeMap();
        var seen = new HashSet<string>(StringComparer.Ordinal);
        foreach (var s in model.Supports)
        {
            if (!seen.Add(s.Node))
            {
                issues.Add(new ValidationIssue("Supports", $"node {s.Node} has more than one support; give it one (use Pin for both directions)"));
            }
        }

        if (!model.Supports.Any(s => s.RestrainsX))
        {
            issues.Add(new ValidationIssue("Supports", "unstable supports: nothing restrains the truss in x (every support is a roller free in x); make one support a pin"));
            return false;
        }

        if (!model.Supports.Any(s => s.RestrainsY))
        {
            issues.Add(new ValidationIssue("Supports", "unstable supports: nothing restrains the truss in y (every support is a roller free in y); make one support a pin"));
            return false;
        }

        // Rigid-body motion u = (a − θy, b + θx): the restraint rows [1, 0, −y] (x) and [0, 1, x] (y) must have rank 3.
        var rows = new List<double[]>();
        foreach (var s in model.Supports)
        {
            var n = nodes[s.Node];
            if (s.RestrainsX)
            {
                rows.Add([1, 0, -n.Y]);
            }

            if (s.RestrainsY)
            {
                rows.Add([0, 1, n.X]);
            }
        }

        if (Rank3(rows) < 3)
        {
            issues.Add(new ValidationIssue("Supports", "unstable supports: the support reactions all pass through one point or are parallel, so the truss can rotate or slide as a whole; add a support or make a roller a pin"));
            return false;
        }

        return issues.Count == 0;
    }

    private static int Rank3(List<double[]> rows)
    {
        // Gram–Schmidt on 3-vectors; scale-aware tolerance (coordinates in mm).
        var basis = new List<double[]>();
        foreach (var r in rows)
        {
            var v = (double[])r.Clone();
            var norm0 = Math.Sqrt((v[0] * v[0]) + (v[1] * v[1]) + (v[2] * v[2]));
            foreach (var q in basis)
            {
                var dot = (v[0] * q[0]) + (v[1] * q[1]) + (v[2] * q[2]);
                for (var k = 0; k < 3; k++)
                {
                    v[k] -= dot * q[k];
                }
            }

            var norm = Math.Sqrt((v[0] * v[0]) + (v[1] * v[1]) + (v[2] * v[2]));
            if (norm > 1e-9 * Math.Max(1, norm0))
            {
                basis.Add([v[0] / norm, v[1] / norm, v[2] / norm]);
            }
        }

        return basis.Count;
    }

    private static void CheckStability(TrussModel model, List<ValidationIssue> issues)
    {
        // Unit axial stiffness (k = 1 N/mm for every member): stability depends on geometry only, and equal
        // stiffness keeps the pivot test independent of member lengths.
        var system = StiffnessSystem.Build(model, static (_, _) => 1.0);
        foreach (var (node, direction) in system.Mechanisms())
        {
            issues.Add(new ValidationIssue("Stability", $"mechanism: node {node} has no stiffness in the {direction} direction; add a member or a support there"));
        }
    }
}
