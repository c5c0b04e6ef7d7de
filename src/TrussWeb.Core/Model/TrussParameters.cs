using System.Globalization;
using TrussWeb.Core.Validation;

namespace TrussWeb.Core.Model;

/// <summary>
/// Input of <see cref="TrussGenerator"/>. Lengths in mm, pitch in degrees.
/// Pitched and mono-pitch trusses take either <see cref="PitchDegrees"/> or <see cref="ApexHeight"/>
/// (height of the apex, or of the high end of a mono-pitch, above the bottom chord). Parallel-chord
/// trusses take their depth from <see cref="HeelDepth"/>.
/// </summary>
public sealed record TrussParameters
{
    /// <summary>Largest roof pitch accepted, degrees (common practice: steeper roofs are not trusses of this kind).</summary>
    public const double MaxPitchDegrees = 75;

    /// <summary>Largest panel count a generator accepts (10 000 nodes and more are beyond any roof truss).</summary>
    public const int MaxPanels = 5_000;

    public required TrussType Type { get; init; }

    /// <summary>Span between the heel (support) nodes, mm.</summary>
    public required double Span { get; init; }

    /// <summary>Roof pitch, degrees; null when <see cref="ApexHeight"/> is given.</summary>
    public double? PitchDegrees { get; init; }

    /// <summary>Apex (or high-end) height above the bottom chord, mm; null when the pitch is given.</summary>
    public double? ApexHeight { get; init; }

    /// <summary>Depth at the heel, mm; 0 allowed for pitched trusses (top and bottom chord meet), the chord depth of a parallel-chord truss.</summary>
    public double HeelDepth { get; init; }

    /// <summary>Number of top-chord panels (bottom-chord panels for parallel chords). Even for duo-pitch trusses.</summary>
    public required int PanelCount { get; init; }

    /// <summary>Centre-to-centre spacing of trusses, mm.</summary>
    public required double TrussSpacing { get; init; }

    /// <summary>Restrain every N-th bottom-chord node out of plane (counted from the left heel); null: supports only.</summary>
    public int? BottomRestraintEvery { get; init; }

    /// <summary>Further bottom-chord nodes restrained out of plane (brace or tie points), by id.</summary>
    public IReadOnlyList<string> BottomRestraintNodes { get; init; } = [];

    public bool IsPitched => Type is TrussType.PitchedHowe or TrussType.PitchedPratt or TrussType.Fink;

    public bool IsParallelChord => Type is TrussType.ParallelPratt or TrussType.ParallelHowe or TrussType.ParallelWarren;

    /// <summary>Height of the apex (or high end) above the bottom chord, mm (from the pitch when given).</summary>
    public double RiseToApex()
    {
        if (IsParallelChord)
        {
            return HeelDepth;
        }

        if (ApexHeight is { } h)
        {
            return h;
        }

        var run = Type == TrussType.MonoPitch ? Span : Span / 2;
        return HeelDepth + (run * Math.Tan((PitchDegrees ?? 0) * Math.PI / 180));
    }

    /// <summary>Every problem with the parameters, by field name.</summary>
    public IReadOnlyList<ValidationIssue> Validate()
    {
        var issues = new List<ValidationIssue>();
        Guard.InRange(issues, nameof(Span), Span, PlausibleRange.MinLengthMm, PlausibleRange.MaxLengthMm, "mm");
        Guard.InRange(issues, nameof(TrussSpacing), TrussSpacing, PlausibleRange.MinLengthMm, PlausibleRange.MaxLengthMm, "mm");
        Guard.InRange(issues, nameof(HeelDepth), HeelDepth, 0, PlausibleRange.MaxLengthMm, "mm");
        if (ApexHeight is { } apex)
        {
            Guard.InRange(issues, nameof(ApexHeight), apex, 0, PlausibleRange.MaxLengthMm, "mm");
        }

        if (HeelDepth > 0 && HeelDepth < TrussModelValidator.CoincidenceToleranceMm)
        {
            issues.Add(new ValidationIssue(nameof(HeelDepth), $"must be 0 (no heel) or at least {TrussModelValidator.CoincidenceToleranceMm} mm (got {HeelDepth.ToString("G6", CultureInfo.InvariantCulture)} mm)"));
        }

        if (PanelCount > MaxPanels)
        {
            issues.Add(new ValidationIssue(nameof(PanelCount), $"at most {MaxPanels} panels (got {PanelCount})"));
        }
        var minPanels = Type == TrussType.Fink ? 4 : IsParallelChord || Type == TrussType.MonoPitch ? 1 : 2;
        if (PanelCount < minPanels)
        {
            issues.Add(new ValidationIssue(nameof(PanelCount), $"a {Type} truss needs at least {minPanels} panels (got {PanelCount})"));
        }
        else if ((IsPitched) && PanelCount % 2 != 0)
        {
            issues.Add(new ValidationIssue(nameof(PanelCount), $"a symmetric pitched truss needs an even number of panels (got {PanelCount})"));
        }

        if (IsParallelChord)
        {
            if (!(HeelDepth > 0))
            {
                issues.Add(new ValidationIssue(nameof(HeelDepth), $"the depth of a parallel-chord truss must be greater than 0 mm (got {HeelDepth.ToString(CultureInfo.InvariantCulture)} mm)"));
            }
        }
        else
        {
            if (PitchDegrees is null == ApexHeight is null)
            {
                issues.Add(new ValidationIssue(nameof(PitchDegrees), "give either the pitch or the apex height, not both or neither"));
            }
            else if (PitchDegrees is { } p && !(p > 0 && p <= MaxPitchDegrees))
            {
                issues.Add(new ValidationIssue(nameof(PitchDegrees), $"pitch must be greater than 0° and at most {MaxPitchDegrees}° (got {p.ToString(CultureInfo.InvariantCulture)}°)"));
            }
            else if (ApexHeight is { } h && !(h > HeelDepth))
            {
                issues.Add(new ValidationIssue(nameof(ApexHeight), $"apex height must be greater than the heel depth {HeelDepth.ToString(CultureInfo.InvariantCulture)} mm (got {h.ToString(CultureInfo.InvariantCulture)} mm)"));
            }
        }

        if (BottomRestraintEvery is { } every && every < 1)
        {
            issues.Add(new ValidationIssue(nameof(BottomRestraintEvery), $"must be at least 1 (got {every})"));
        }

        return issues;
    }
}
