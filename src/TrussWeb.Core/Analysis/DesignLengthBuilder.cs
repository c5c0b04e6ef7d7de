using System.Globalization;
using TrussWeb.Core.Design;
using TrussWeb.Core.Model;
using TrussWeb.Core.Validation;

namespace TrussWeb.Core.Analysis;

/// <summary>
/// Buckling lengths of every member (ENGINEERING.md "Design members and effective lengths"):
/// in-plane Lx node to node (K = 1); chords out of plane: Ly = length of the chain of chord members of
/// the same role joined end to end between lateral restraint points (the force used in design stays each
/// member's own, the length is the chain's); webs node to node both ways; Lz = Ly. A chain continues
/// through an unrestrained node where exactly one other member of the same chord meets it; if that
/// joint is a change of direction the source says so (conservative: the kink is not taken as a
/// restraint). A chain that ends at a node which is not a restraint point is flagged "check bracing".
/// Per-member overrides replace K and L and are stated "user override".
/// </summary>
public static class DesignLengthBuilder
{
    /// <summary>Members meeting at less than this angle are collinear, rad (about 0.06°, common practice for setting-out round-off).</summary>
    public const double CollinearToleranceRad = 1e-3;

    /// <summary>Lengths of every member by member id.</summary>
    public static IReadOnlyDictionary<string, EffectiveLengths> Build(TrussModel model, IReadOnlyDictionary<string, MemberLengthOverride>? overrides = null)
    {
        ArgumentNullException.ThrowIfNull(model);
        var tableIssues = TrussModelValidator.Validate(model).Where(i => i.Field != "Stability" && i.Field != "Supports").ToList();
        Guard.ThrowIfAny(tableIssues);
        overrides ??= new Dictionary<string, MemberLengthOverride>();
        foreach (var id in overrides.Keys)
        {
            if (!model.Members.Any(m => m.Id == id))
            {
                throw new InputValidationException("LengthOverrides", $"length override for unknown member '{id}'");
            }
        }

        var nodes = model.NodeMap();
        var restrained = new HashSet<string>(model.LateralRestraints, StringComparer.Ordinal);
        var atNode = new Dictionary<string, List<Member>>(StringComparer.Ordinal);
        foreach (var m in model.Members)
        {
            (atNode.TryGetValue(m.StartNode, out var a) ? a : atNode[m.StartNode] = []).Add(m);
            (atNode.TryGetValue(m.EndNode, out var b) ? b : atNode[m.EndNode] = []).Add(m);
        }

        var result = new Dictionary<string, EffectiveLengths>(StringComparer.Ordinal);
        foreach (var m in model.Members)
        {
            var length = Length(nodes, m);
            var role = model.RoleOf(m);
            var lx = length;
            var lxSource = $"node to node {m.StartNode}–{m.EndNode}: {Mm(length)} mm";
            double ly;
            string lySource;
            if (role is MemberRole.TopChord or MemberRole.BottomChord)
            {
                (ly, lySource) = Chain(model, nodes, restrained, atNode, m, role);
            }
            else
            {
                ly = length;
                lySource = lxSource;
            }

            var lengths = new EffectiveLengths
            {
                Lx = lx,
                Ly = ly,
                Lz = ly,
                LxSource = lxSource,
                LySource = lySource,
                LzSource = "equal to the out-of-plane length",
            };
            result[m.Id] = overrides.TryGetValue(m.Id, out var o) ? Apply(lengths, o) : lengths;
        }

        return result;
    }

    private static string Mm(double v) => v.ToString("#,0", CultureInfo.InvariantCulture).Replace(',', ' ');

    private static string K(double v) => v.ToString("0.###", CultureInfo.InvariantCulture);

    private static double Length(Dictionary<string, Node> nodes, Member m)
    {
        var a = nodes[m.StartNode];
        var b = nodes[m.EndNode];
        return Math.Sqrt(((b.X - a.X) * (b.X - a.X)) + ((b.Y - a.Y) * (b.Y - a.Y)));
    }

    private static (double Length, string Source) Chain(TrussModel model, Dictionary<string, Node> nodes, HashSet<string> restrained,
        Dictionary<string, List<Member>> atNode, Member start, MemberRole role)
    {
        var chain = new LinkedList<Member>();
        chain.AddFirst(start);
        var kinks = new List<string>();
        var forward = Walk(model, nodes, restrained, atNode, start, start.EndNode, role, chain, kinks, atEnd: true);
        var backward = Walk(model, nodes, restrained, atNode, start, start.StartNode, role, chain, kinks, atEnd: false);
        var total = chain.Sum(c => Length(nodes, c));
        var marks = chain.Count == 1 ? chain.First!.Value.Id : $"{chain.First!.Value.Id}–{chain.Last!.Value.Id}";
        string ends;
        if (backward.Restrained && forward.Restrained)
        {
            ends = $"between restraints at {backward.Node} and {forward.Node}";
        }
        else
        {
            string Describe((string Node, bool Restrained, string Why) end) => end.Restrained ? $"restraint at {end.Node}" : $"{end.Why} at {end.Node}";
            ends = $"from {Describe(backward)} to {Describe(forward)} (not a lateral restraint: check bracing)";
        }

        var source = $"chain {marks} {ends}: {Mm(total)} mm";
        if (kinks.Count > 0)
        {
            source += $"; runs through a change of direction at {string.Join(", ", kinks)} (not taken as a restraint)";
        }

        return (total, source);
    }

    private static (string Node, bool Restrained, string Why) Walk(TrussModel model, Dictionary<string, Node> nodes, HashSet<string> restrained,
        Dictionary<string, List<Member>> atNode, Member current, string node, MemberRole role, LinkedList<Member> chain, List<string> kinks, bool atEnd)
    {
        var guard = 0;
        while (guard++ <= model.Members.Count)
        {
            if (restrained.Contains(node))
            {
                return (node, true, "restraint");
            }

            var next = atNode[node].Where(m => m != current && model.RoleOf(m) == role && !chain.Contains(m)).ToList();
            if (next.Count == 0)
            {
                return (node, false, "free end");
            }

            if (next.Count > 1)
            {
                return (node, false, "branch");
            }

            var nm = next[0];
            var far = nm.StartNode == node ? nm.EndNode : nm.StartNode;
            var near = current.StartNode == node ? current.EndNode : current.StartNode;
            if (!Collinear(nodes[near], nodes[node], nodes[far]))
            {
                kinks.Add(node);
            }

            if (atEnd)
            {
                chain.AddLast(nm);
            }
            else
            {
                chain.AddFirst(nm);
            }

            current = nm;
            node = far;
        }

        return (node, false, "loop");
    }

    private static bool Collinear(Node a, Node b, Node c)
    {
        var ux = b.X - a.X;
        var uy = b.Y - a.Y;
        var vx = c.X - b.X;
        var vy = c.Y - b.Y;
        var cross = (ux * vy) - (uy * vx);
        var dot = (ux * vx) + (uy * vy);
        return dot > 0 && Math.Abs(Math.Atan2(cross, dot)) < CollinearToleranceRad;
    }

    private static EffectiveLengths Apply(EffectiveLengths computed, MemberLengthOverride o)
    {
        var why = string.IsNullOrWhiteSpace(o.Reason) ? string.Empty : $" ({o.Reason})";
        string Source(string axis, double? l, double? k, string was)
        {
            var parts = new List<string>();
            if (l is { } lv)
            {
                parts.Add($"L{axis} = {Mm(lv)} mm");
            }

            if (k is { } kv)
            {
                parts.Add($"K{axis} = {K(kv)}");
            }

            return parts.Count == 0 ? was : $"user override: {string.Join(", ", parts)}{why}; computed {was}";
        }

        foreach (var (name, value) in new[] { ("Lx", o.Lx), ("Ly", o.Ly), ("Lz", o.Lz), ("Kx", o.Kx), ("Ky", o.Ky), ("Kz", o.Kz), ("KLu", o.KLu), ("KLv", o.KLv) })
        {
            if (value is { } v && !(v > 0 && double.IsFinite(v)))
            {
                throw new InputValidationException(name, $"override must be greater than 0 (got {v.ToString(CultureInfo.InvariantCulture)})");
            }
        }

        return computed with
        {
            Lx = o.Lx ?? computed.Lx,
            Ly = o.Ly ?? computed.Ly,
            Lz = o.Lz ?? (o.Ly ?? computed.Lz),
            Kx = o.Kx ?? computed.Kx,
            Ky = o.Ky ?? computed.Ky,
            Kz = o.Kz ?? computed.Kz,
            KLu = o.KLu ?? computed.KLu,
            KLv = o.KLv ?? computed.KLv,
            LxSource = Source("x", o.Lx, o.Kx, computed.LxSource),
            LySource = Source("y", o.Ly, o.Ky, computed.LySource),
            LzSource = o.Lz is null && o.Kz is null && o.Ly is not null ? "equal to the out-of-plane length (user override)" : Source("z", o.Lz, o.Kz, computed.LzSource),
        } is var applied && (o.KLu is not null || o.KLv is not null)
            ? applied with
            {
                LySource = applied.LySource + $"; user override: principal-axis lengths KLu = {(o.KLu is { } klu ? Mm(klu) + " mm" : "not given")}, KLv = {(o.KLv is { } klv ? Mm(klv) + " mm" : "not given")}{why}",
            }
            : applied;
    }
}
