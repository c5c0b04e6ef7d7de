using TrussWeb.Core.Analysis;
using TrussWeb.Core.Model;
using TrussWeb.Core.Records;
using TrussWeb.Core.TrussDesign;

namespace TrussWeb.Web.Components.Truss;

/// <summary>
/// What <see cref="TrussElevation"/> draws, prepared without JavaScript: one segment per member with
/// its colour and label, the nodes, and the title of the view. Forces and utilizations are read from
/// Core's results (nothing is recomputed); coordinates are converted from mm to m for the plot.
/// </summary>
public sealed class TrussElevationData
{
    /// <summary>Colour of tension members.</summary>
    public const string TensionColour = "#1f5fa8";

    /// <summary>Colour of compression members.</summary>
    public const string CompressionColour = "#c0392b";

    /// <summary>Colour of members without force, or of members with no result.</summary>
    public const string NeutralColour = "#9e9e9e";

    /// <summary>Colour of chords in geometry mode.</summary>
    public const string ChordColour = "#37474f";

    /// <summary>Colour of web members in geometry mode.</summary>
    public const string WebColour = "#78909c";

    /// <summary>Utilization at which the colour scale reaches its last colour.</summary>
    public const double ScaleTop = 1.2;

    /// <summary>Forces below this magnitude (N) are drawn as no force: 1 N is far below display precision.</summary>
    public const double ZeroForce = 1.0;

    private const double MillimetresPerMetre = 1000;

    private TrussElevationData(IReadOnlyList<ElevationSegment> segments, IReadOnlyList<ElevationNode> nodes, string title)
    {
        Segments = segments;
        Nodes = nodes;
        Title = title;
    }

    /// <summary>One per member, in model order.</summary>
    public IReadOnlyList<ElevationSegment> Segments { get; }

    public IReadOnlyList<ElevationNode> Nodes { get; }

    /// <summary>What the view shows, e.g. "Axial force: envelope of ULS combinations".</summary>
    public string Title { get; }

    /// <summary>
    /// Prepares the drawing.
    /// </summary>
    /// <param name="model">The truss, mm.</param>
    /// <param name="mode">What to show.</param>
    /// <param name="analysis">Needed for <see cref="ElevationMode.AxialForce"/>.</param>
    /// <param name="combination">Combination name for axial force; null = the envelope over the ULS combinations.</param>
    /// <param name="outcomes">Member outcomes, needed for <see cref="ElevationMode.Utilization"/>.</param>
    public static TrussElevationData Build(TrussModel model, ElevationMode mode, AnalysisResult? analysis = null,
        string? combination = null, IReadOnlyList<MemberOutcome>? outcomes = null)
    {
        ArgumentNullException.ThrowIfNull(model);
        var nodes = model.NodeMap();
        var supported = model.Supports.Select(s => s.Node).ToHashSet(StringComparer.Ordinal);
        LoadResult? combo = null;
        if (mode == ElevationMode.AxialForce)
        {
            if (analysis is null)
            {
                throw new ArgumentNullException(nameof(analysis), "axial force mode needs the analysis result");
            }

            combo = combination is null ? null : analysis.Combination(combination);
        }

        if (mode == ElevationMode.Utilization && outcomes is null)
        {
            throw new ArgumentNullException(nameof(outcomes), "utilization mode needs the member outcomes");
        }

        var byMark = outcomes?.ToDictionary(o => o.Mark, StringComparer.Ordinal);
        var segments = new List<ElevationSegment>(model.Members.Count);
        foreach (var member in model.Members)
        {
            var a = nodes[member.StartNode];
            var b = nodes[member.EndNode];
            var x1 = a.X / MillimetresPerMetre;
            var y1 = a.Y / MillimetresPerMetre;
            var x2 = b.X / MillimetresPerMetre;
            var y2 = b.Y / MillimetresPerMetre;
            var role = model.RoleOf(member);
            var seg = new ElevationSegment(member.Id, member.Group, role, x1, y1, x2, y2, (x1 + x2) / 2, (y1 + y2) / 2,
                role is MemberRole.TopChord or MemberRole.BottomChord ? ChordColour : WebColour,
                member.Id, null, ForceSense.None, null);
            segments.Add(mode switch
            {
                ElevationMode.AxialForce when combo is not null => WithForce(seg, combo.MemberForces[member.Id], combo.Name),
                ElevationMode.AxialForce => WithEnvelope(seg, analysis!.EnvelopeOf(member.Id)),
                ElevationMode.Utilization => WithUtilization(seg, byMark!.GetValueOrDefault(member.Id)),
                _ => seg,
            });
        }

        var title = mode switch
        {
            ElevationMode.AxialForce when combo is not null => $"Axial force, {combo.Name}",
            ElevationMode.AxialForce => "Axial force, envelope of the ULS combinations (larger magnitude)",
            ElevationMode.Utilization => "Design utilization",
            _ => "Geometry and member marks",
        };
        var drawnNodes = model.Nodes.Select(n => new ElevationNode(n.Id, n.X / MillimetresPerMetre, n.Y / MillimetresPerMetre, supported.Contains(n.Id))).ToList();
        return new TrussElevationData(segments, drawnNodes, title);
    }

    /// <summary>The label of a signed axial force (N, tension positive): "T 12.3 kN", "C 4.56 kN" or "0 kN".</summary>
    public static string ForceLabel(double axial) =>
        Math.Abs(axial) < ZeroForce ? "0 kN" : $"{(axial > 0 ? "T" : "C")} {Display.Sig(Math.Abs(axial) / 1000)} kN";

    /// <summary>Colour on the utilization scale: green at 0, amber at 0.8, red at 1.0 and above (plot colour mapping).</summary>
    public static string UtilizationColour(double u)
    {
        if (!double.IsFinite(u))
        {
            return "rgb(150,20,20)";
        }

        (double At, int R, int G, int B)[] stops = [(0, 46, 139, 87), (0.8, 217, 162, 27), (1.0, 192, 57, 43), (ScaleTop, 120, 20, 20)];
        var v = Math.Clamp(u, 0, ScaleTop);
        for (var i = 1; i < stops.Length; i++)
        {
            if (v <= stops[i].At)
            {
                var (a, b) = (stops[i - 1], stops[i]);
                var f = (v - a.At) / (b.At - a.At);
                return $"rgb({Lerp(a.R, b.R, f)},{Lerp(a.G, b.G, f)},{Lerp(a.B, b.B, f)})";
            }
        }

        return $"rgb({stops[^1].R},{stops[^1].G},{stops[^1].B})";
    }

    private static int Lerp(int a, int b, double f) => (int)Math.Round(a + (b - a) * f);

    private static ElevationSegment WithForce(ElevationSegment s, double axial, string combination)
    {
        var sense = Math.Abs(axial) < ZeroForce ? ForceSense.None : axial > 0 ? ForceSense.Tension : ForceSense.Compression;
        return s with
        {
            Colour = ColourOf(sense),
            Label = $"{s.Mark} {ForceLabel(axial)}",
            Value = axial / 1000,
            Sense = sense,
            Combination = combination,
        };
    }

    private static ElevationSegment WithEnvelope(ElevationSegment s, Envelope e)
    {
        // The envelope holds magnitudes: show the larger one with its sense and combination.
        var tension = e.MaxTension >= e.MaxCompression;
        var axial = tension ? e.MaxTension : -e.MaxCompression;
        return WithForce(s, axial, (tension ? e.TensionCombination : e.CompressionCombination) ?? "") with
        {
            Combination = tension ? e.TensionCombination : e.CompressionCombination,
        };
    }

    private static ElevationSegment WithUtilization(ElevationSegment s, MemberOutcome? o) => o is null
        ? s with { Colour = NeutralColour, Label = $"{s.Mark} no result" }
        : s with
        {
            Colour = UtilizationColour(o.Design.Utilization),
            Label = $"{s.Mark} {Display.Sig(o.Design.Utilization)}",
            Value = o.Design.Utilization,
            Combination = o.GoverningCombination,
        };

    private static string ColourOf(ForceSense sense) => sense switch
    {
        ForceSense.Tension => TensionColour,
        ForceSense.Compression => CompressionColour,
        _ => NeutralColour,
    };
}
