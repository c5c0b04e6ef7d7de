using System.Diagnostics.CodeAnalysis;
using TrussWeb.Core.Validation;
using static TrussWeb.Core.Sections.DimensionRules;

namespace TrussWeb.Core.Sections;

/// <summary>
/// Two identical angles back to back, mirrored about y-y, with a gap s (the gusset thickness) between
/// the backs. y-y is the axis of symmetry and lies in the truss plane; x-x is normal to it.
/// <para>Let the "back legs" be the legs parallel to y-y (long legs for LLBB, short legs for SLBB) and
/// the "outstanding legs" the others. For one angle: A1; e1 = its centroid distance from the back of its
/// back leg; f1 = its centroid distance from the back of its outstanding leg; I∥ its second moment about
/// its own centroidal axis parallel to the outstanding leg, I⊥ about the axis parallel to the back leg.
/// Then A = 2 A1; Ix = 2 I∥; Iy = 2 [I⊥ + A1 (e1 + s/2)²] (parallel axes); Ixy = 0.</para>
/// <para>For LLBB I∥ = Ix1, I⊥ = Iy1, e1 = CentroidX1, f1 = CentroidY1; for SLBB the single angle is
/// turned so I∥ = Iy1, I⊥ = Ix1, e1 = CentroidY1, f1 = CentroidX1.</para>
/// <para>Shear centre: on y-y at the midline of the outstanding legs, X0 = 0, Y0 = t/2 - f1 (negative:
/// towards the outstanding legs). Principal axes are x and y by the convention of
/// <see cref="SectionProperties"/>: Iu = Ix, Iv = Iy, Alpha = 0, U0 = X0, V0 = Y0.</para>
/// <para>J = 2 J1. Cw is taken as 0: the warping constant of back-to-back angles is small (of the order
/// of 2 Cw1) and omitting it lowers Fez slightly, i.e. errs on the safe side (common practice).</para>
/// <para>Reference corner for the centroid: CentroidX from the outer toe of one outstanding leg (the
/// pair is 2 Lo + s wide, so CentroidX = Lo + s/2), CentroidY from the back of the outstanding legs.</para>
/// </summary>
public static class DoubleAngle
{
    /// <summary>Statement of the method, copied into <see cref="SectionProperties.Method"/> after the component's.</summary>
    public const string MethodText =
        "Two angles mirrored about y-y with gap s: A = 2A1, Ix = 2I1 (axis parallel to the outstanding legs), " +
        "Iy = 2[I1' + A1(e1 + s/2)²]; J = 2J1; Cw taken as 0 (small, conservative); " +
        "shear centre on y-y at the midline of the outstanding legs.";

    /// <summary>Computes the pair's properties.</summary>
    /// <param name="component">Dimensions of one angle, mm.</param>
    /// <param name="gap">Gap between the backs (gusset thickness) s, mm, ≥ 0.</param>
    /// <param name="orientation">Which legs are back to back.</param>
    /// <param name="designation">Shown name; default e.g. "2L100x75x8 LLBB s=10".</param>
    /// <exception cref="InputValidationException">The component or the gap breaks a rule.</exception>
    public static SectionProperties Compute(AngleDimensions component, double gap, BackToBack orientation, string? designation = null)
    {
        ArgumentNullException.ThrowIfNull(component);
        Guard.ThrowIfAny(Validate(component, gap, orientation));
        return ComputeValid(component, gap, orientation, designation);
    }

    /// <summary>Non-throwing form of <see cref="Compute"/>.</summary>
    public static bool TryCompute(AngleDimensions component, double gap, BackToBack orientation,
        [NotNullWhen(true)] out SectionProperties? properties, out IReadOnlyList<ValidationIssue> issues, string? designation = null)
    {
        ArgumentNullException.ThrowIfNull(component);
        issues = Validate(component, gap, orientation);
        properties = issues.Count == 0 ? ComputeValid(component, gap, orientation, designation) : null;
        return properties is not null;
    }

    /// <summary>The component's rules, plus: gap finite and ≥ 0; <see cref="BackToBack.EqualLegs"/> needs d = b.</summary>
    public static IReadOnlyList<ValidationIssue> Validate(AngleDimensions component, double gap, BackToBack orientation)
    {
        ArgumentNullException.ThrowIfNull(component);
        var issues = new List<ValidationIssue>(component.Validate());
        NonNegative(issues, nameof(gap), "gap s", gap);
        if (!Enum.IsDefined(orientation))
        {
            issues.Add(new ValidationIssue(nameof(orientation), $"unknown back-to-back arrangement {(int)orientation}"));
        }
        else if (orientation == BackToBack.EqualLegs && !component.IsEqualLeg)
        {
            issues.Add(new ValidationIssue(nameof(orientation),
                $"equal legs back to back needs d = b (got d = {Num(component.LongLeg)} mm, b = {Num(component.ShortLeg)} mm): choose LLBB or SLBB"));
        }

        return issues;
    }

    /// <summary>"2L{d}x{b}x{t} LLBB s={gap}" (SLBB for short legs; no tag for equal legs).</summary>
    public static string DefaultDesignation(AngleDimensions component, double gap, BackToBack orientation)
    {
        ArgumentNullException.ThrowIfNull(component);
        var tag = orientation switch
        {
            BackToBack.LongLegsBackToBack => " LLBB",
            BackToBack.ShortLegsBackToBack => " SLBB",
            _ => "",
        };
        return $"2{component.DefaultDesignation()}{tag} s={Num(gap)}";
    }

    private static SectionProperties ComputeValid(AngleDimensions dim, double gap, BackToBack orientation, string? designation)
    {
        var one = Angle.ComputeValidated(dim);
        var t = dim.Thickness;
        var shortBack = orientation == BackToBack.ShortLegsBackToBack;

        var backLeg = shortBack ? dim.ShortLeg : dim.LongLeg;
        var outstand = shortBack ? dim.LongLeg : dim.ShortLeg;
        var e1 = shortBack ? one.CentroidY : one.CentroidX;
        var f1 = shortBack ? one.CentroidX : one.CentroidY;
        var iParallel = shortBack ? one.Iy : one.Ix;
        var iNormal = shortBack ? one.Ix : one.Iy;

        var a1 = one.Area;
        var lever = e1 + gap / 2;
        var ix = 2 * iParallel;
        var iy = 2 * (iNormal + a1 * lever * lever);
        var y0 = t / 2 - f1;
        var halfWidth = outstand + gap / 2;

        var elements = one.Elements.Select(e => e with { Count = 2 * e.Count }).ToArray();

        return new SectionProperties
        {
            Designation = designation ?? DefaultDesignation(dim, gap, orientation),
            Family = SectionFamily.DoubleAngle,
            Symmetry = SymmetryKind.Singly,
            Area = 2 * a1,
            MassPerMetre = 2 * one.MassPerMetre,
            CentroidX = halfWidth,
            CentroidY = f1,
            Ix = ix,
            Iy = iy,
            Ixy = 0,
            Iu = ix,
            Iv = iy,
            Alpha = 0,
            J = 2 * one.J,
            Cw = 0,
            X0 = 0,
            Y0 = y0,
            U0 = 0,
            V0 = y0,
            Sx = ix / Math.Max(f1, backLeg - f1),
            Sy = iy / halfWidth,
            Elements = elements,
            GoverningThickness = t,
            Component = one,
            Gap = gap,
            Method = one.Method + " " + MethodText,
        };
    }
}
