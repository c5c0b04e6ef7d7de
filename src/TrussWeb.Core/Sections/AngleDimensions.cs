using TrussWeb.Core.Validation;
using static TrussWeb.Core.Sections.DimensionRules;

namespace TrussWeb.Core.Sections;

/// <summary>
/// Dimensions of a hot-rolled angle as EN 10056-1 lists them (mm). Equal angles have
/// <see cref="LongLeg"/> = <see cref="ShortLeg"/>.
/// </summary>
/// <param name="LongLeg">Long leg d, mm (catalogue column "d"); d ≥ b.</param>
/// <param name="ShortLeg">Short leg b, mm (column "b").</param>
/// <param name="Thickness">Leg thickness t, mm (column "t"); 0 &lt; t &lt; b.</param>
/// <param name="RootRadius">Root (fillet) radius r1 between the inner faces of the legs, mm (column "r1"); ≥ 0.</param>
/// <param name="ToeRadius">Toe radius r2 at the inner edge of each toe, mm (column "r2"); 0 ≤ r2 ≤ t.</param>
public sealed record AngleDimensions(double LongLeg, double ShortLeg, double Thickness, double RootRadius, double ToeRadius)
    : ISectionDimensions
{
    public SectionFamily Family => SectionFamily.Angle;

    /// <summary>True when both legs are the same length.</summary>
    public bool IsEqualLeg => LongLeg == ShortLeg;

    /// <summary>
    /// Rules: every dimension finite; d, b, t &gt; 0; r1, r2 ≥ 0; d ≥ b; t &lt; b; the root fillet and the
    /// toe rounding fit on the short leg (t + r1 + r2 ≤ b, so they do not overlap); r2 ≤ t (the toe
    /// rounding lies within the thickness).
    /// </summary>
    public IReadOnlyList<ValidationIssue> Validate()
    {
        var issues = new List<ValidationIssue>();
        var d = Positive(issues, nameof(LongLeg), "long leg d", LongLeg);
        var b = Positive(issues, nameof(ShortLeg), "short leg b", ShortLeg);
        var t = Positive(issues, nameof(Thickness), "thickness t", Thickness);
        var r1 = NonNegative(issues, nameof(RootRadius), "root radius r1", RootRadius);
        var r2 = NonNegative(issues, nameof(ToeRadius), "toe radius r2", ToeRadius);

        if (d && b && ShortLeg > LongLeg)
        {
            issues.Add(new ValidationIssue(nameof(ShortLeg),
                $"short leg b = {Num(ShortLeg)} mm must not exceed the long leg d = {Num(LongLeg)} mm (enter the longer leg as d)"));
        }

        if (b && t && Thickness >= ShortLeg)
        {
            issues.Add(new ValidationIssue(nameof(Thickness),
                $"thickness t = {Num(Thickness)} mm must be less than the short leg b = {Num(ShortLeg)} mm"));
        }
        else if (b && t && r1 && r2 && Thickness + RootRadius + ToeRadius > ShortLeg)
        {
            issues.Add(new ValidationIssue(nameof(RootRadius),
                $"root radius r1 = {Num(RootRadius)} mm and toe radius r2 = {Num(ToeRadius)} mm do not fit on the short leg: " +
                $"t + r1 + r2 = {Num(Thickness + RootRadius + ToeRadius)} mm must not exceed b = {Num(ShortLeg)} mm"));
        }

        if (t && r2 && ToeRadius > Thickness)
        {
            issues.Add(new ValidationIssue(nameof(ToeRadius),
                $"toe radius r2 = {Num(ToeRadius)} mm must not exceed the thickness t = {Num(Thickness)} mm"));
        }

        return issues;
    }

    /// <summary>True when <see cref="Validate"/> finds nothing (for forms that pre-check input).</summary>
    public bool IsValid() => Validate().Count == 0;

    /// <inheritdoc />
    public SectionProperties Compute(string? designation = null) => Angle.Compute(this, designation);

    /// <summary>"L{d}x{b}x{t}" with invariant numbers, e.g. "L100x75x8".</summary>
    public string DefaultDesignation() => $"L{Num(LongLeg)}x{Num(ShortLeg)}x{Num(Thickness)}";
}
