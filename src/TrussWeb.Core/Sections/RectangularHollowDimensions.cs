using TrussWeb.Core.Validation;
using static TrussWeb.Core.Sections.DimensionRules;

namespace TrussWeb.Core.Sections;

/// <summary>
/// Dimensions of a cold-formed square or rectangular hollow section (EN 10219-2), mm. The depth h
/// lies in the truss plane (along y), so Ix, about x-x normal to the truss plane, uses h as the depth.
/// </summary>
/// <param name="Depth">Outside depth h, mm (catalogue column "h").</param>
/// <param name="Width">Outside width b, mm (column "b").</param>
/// <param name="Thickness">Wall thickness t, mm (column "t").</param>
/// <param name="OuterRadius">Outside corner radius ro, mm; null: the EN 10219 default
/// (<see cref="DefaultOuterRadius"/>). The inside radius is ro - t.</param>
public sealed record RectangularHollowDimensions(double Depth, double Width, double Thickness, double? OuterRadius = null)
    : ISectionDimensions
{
    /// <summary>Outer corner radius factor for t ≤ 6 mm: ro = 2t (EN 10219-2 cold-formed, from memory).</summary>
    public const double RadiusFactorUpTo6Mm = 2.0;

    /// <summary>Outer corner radius factor for 6 &lt; t ≤ 10 mm: ro = 2.5t (EN 10219-2, from memory).</summary>
    public const double RadiusFactorUpTo10Mm = 2.5;

    /// <summary>Outer corner radius factor for t &gt; 10 mm: ro = 3t (EN 10219-2, from memory).</summary>
    public const double RadiusFactorAbove10Mm = 3.0;

    /// <summary>Thickness limits of the radius bands, mm.</summary>
    public const double RadiusBand1Mm = 6.0;

    /// <inheritdoc cref="RadiusBand1Mm"/>
    public const double RadiusBand2Mm = 10.0;

    /// <summary>Flat width deduction factor for classification: w = b - 4t (CSA S16 cl. 11.3 / SANS 10162-1, HSS walls).</summary>
    public const double ClassificationDeductionFactor = 4.0;

    public SectionFamily Family => SectionFamily.RectangularHollow;

    /// <summary>The corner radius used: <see cref="OuterRadius"/> if given, else the EN 10219 default for t.</summary>
    public double EffectiveOuterRadius => OuterRadius ?? DefaultOuterRadius(Thickness);

    /// <summary>True when h = b.</summary>
    public bool IsSquare => Depth == Width;

    /// <summary>
    /// EN 10219-2 cold-formed outside corner radius (from memory; the standard gives these as
    /// nominal values for calculation): 2t for t ≤ 6 mm, 2.5t for 6 &lt; t ≤ 10 mm, 3t above.
    /// </summary>
    public static double DefaultOuterRadius(double thickness) =>
        thickness <= RadiusBand1Mm ? RadiusFactorUpTo6Mm * thickness
        : thickness <= RadiusBand2Mm ? RadiusFactorUpTo10Mm * thickness
        : RadiusFactorAbove10Mm * thickness;

    /// <summary>
    /// Rules: h, b, t finite and &gt; 0; a given outer radius finite and ≥ t (inner radius ro - t ≥ 0);
    /// the corners fit: 2 ro &lt; the smaller side (a flat remains); the classification width
    /// (smaller side) - 4t is positive.
    /// </summary>
    public IReadOnlyList<ValidationIssue> Validate()
    {
        var issues = new List<ValidationIssue>();
        var h = Positive(issues, nameof(Depth), "depth h", Depth);
        var b = Positive(issues, nameof(Width), "width b", Width);
        var t = Positive(issues, nameof(Thickness), "thickness t", Thickness);
        var r = true;
        if (OuterRadius is { } given)
        {
            r = Positive(issues, nameof(OuterRadius), "outer corner radius ro", given);
            if (r && t && given < Thickness)
            {
                issues.Add(new ValidationIssue(nameof(OuterRadius),
                    $"outer corner radius ro = {Num(given)} mm must not be less than the thickness t = {Num(Thickness)} mm (inner radius ro - t would be negative)"));
                r = false;
            }
        }

        if (!(h && b && t && r))
        {
            return issues;
        }

        var (side, sideField, sideLabel) = Width <= Depth ? (Width, nameof(Width), "width b") : (Depth, nameof(Depth), "depth h");
        var ro = EffectiveOuterRadius;
        if (ClassificationDeductionFactor * Thickness >= side)
        {
            issues.Add(new ValidationIssue(nameof(Thickness),
                $"thickness t = {Num(Thickness)} mm is too large for the {sideLabel} = {Num(side)} mm: 4t = {Num(ClassificationDeductionFactor * Thickness)} mm must be less than {Num(side)} mm"));
        }
        else if (2 * ro >= side)
        {
            var origin = OuterRadius is null ? $" (EN 10219 default for t = {Num(Thickness)} mm)" : "";
            issues.Add(new ValidationIssue(OuterRadius is null ? sideField : nameof(OuterRadius),
                $"the corners do not fit: 2 ro = {Num(2 * ro)} mm{origin} must be less than the {sideLabel} = {Num(side)} mm"));
        }

        return issues;
    }

    /// <summary>True when <see cref="Validate"/> finds nothing (for forms that pre-check input).</summary>
    public bool IsValid() => Validate().Count == 0;

    /// <inheritdoc />
    public SectionProperties Compute(string? designation = null) => RectangularHollow.Compute(this, designation);

    /// <summary>"SHS {h}x{b}x{t}" when square, else "RHS {h}x{b}x{t}".</summary>
    public string DefaultDesignation() => $"{(IsSquare ? "SHS" : "RHS")} {Num(Depth)}x{Num(Width)}x{Num(Thickness)}";
}
