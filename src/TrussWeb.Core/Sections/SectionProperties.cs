namespace TrussWeb.Core.Sections;

/// <summary>
/// Cross-section properties computed from dimensions (never typed in). Internal units: mm, mm², mm⁴,
/// mm⁶, kg/m.
/// <para>Axes (the same for every family, so design lengths map without special cases):</para>
/// <list type="bullet">
/// <item>x-x and y-y are centroidal geometric axes. For members in a truss, x-x is normal to the truss
/// plane (buckling about x-x is in-plane, length Lx) and y-y lies in the truss plane (buckling about
/// y-y is out of plane, length Ly). A double angle's and a tee's axis of symmetry is y-y. For a single
/// angle, the long leg d runs along y and the short leg b along x, with the heel at the reference
/// corner: x-x is parallel to the short leg and Ix is the larger geometric second moment (as in the
/// AISC shapes database). CentroidX is then the distance from the back of the long leg, CentroidY from
/// the back of the short leg. The design of single angles uses the principal axes.</item>
/// <item>u-u (major) and v-v (minor) are principal axes; <see cref="Alpha"/> is the angle from x-x to
/// u-u (rad, counter-clockwise). For sections that are symmetric about x-x or y-y the principal axes
/// are x and y themselves and, by convention here, u ≡ x and v ≡ y (even where Iy &gt; Ix), Alpha = 0.</item>
/// <item>Shear centre coordinates from the centroid: (X0, Y0) along x and y; (U0, V0) along u and v.
/// R0 is the polar radius of gyration about the shear centre: r0² = x0² + y0² + rx² + ry².</item>
/// </list>
/// </summary>
public sealed record SectionProperties
{
    /// <summary>Designation, e.g. "L100x75x8", "2L100x75x8 LLBB s=10", "CHS 114.3x3.6".</summary>
    public required string Designation { get; init; }

    public required SectionFamily Family { get; init; }

    public required SymmetryKind Symmetry { get; init; }

    /// <summary>Gross area A, mm².</summary>
    public required double Area { get; init; }

    /// <summary>Mass per metre at 7 850 kg/m³, kg/m.</summary>
    public required double MassPerMetre { get; init; }

    /// <summary>Centroid from the reference corner (heel/back of legs, or section corner), along x, mm (ex).</summary>
    public required double CentroidX { get; init; }

    /// <summary>Centroid from the reference corner along y, mm (ey).</summary>
    public required double CentroidY { get; init; }

    /// <summary>Second moment of area about x-x, mm⁴.</summary>
    public required double Ix { get; init; }

    /// <summary>Second moment of area about y-y, mm⁴.</summary>
    public required double Iy { get; init; }

    /// <summary>Product of area about x-x, y-y, mm⁴ (0 for symmetric sections).</summary>
    public required double Ixy { get; init; }

    /// <summary>Major principal second moment of area, mm⁴.</summary>
    public required double Iu { get; init; }

    /// <summary>Minor principal second moment of area, mm⁴.</summary>
    public required double Iv { get; init; }

    /// <summary>Angle from x-x to u-u, rad.</summary>
    public required double Alpha { get; init; }

    /// <summary>St Venant torsion constant J, mm⁴.</summary>
    public required double J { get; init; }

    /// <summary>Warping constant Cw, mm⁶.</summary>
    public required double Cw { get; init; }

    /// <summary>Shear centre from centroid along x, mm.</summary>
    public required double X0 { get; init; }

    /// <summary>Shear centre from centroid along y, mm.</summary>
    public required double Y0 { get; init; }

    /// <summary>Shear centre from centroid along u, mm.</summary>
    public required double U0 { get; init; }

    /// <summary>Shear centre from centroid along v, mm.</summary>
    public required double V0 { get; init; }

    /// <summary>Elastic section modulus about x-x (smaller of the two extreme fibres), mm³.</summary>
    public required double Sx { get; init; }

    /// <summary>Elastic section modulus about y-y (smaller of the two extreme fibres), mm³.</summary>
    public required double Sy { get; init; }

    /// <summary>The plate elements for classification.</summary>
    public required IReadOnlyList<PlateElement> Elements { get; init; }

    /// <summary>Thickness that selects the yield strength band (largest element thickness), mm.</summary>
    public required double GoverningThickness { get; init; }

    /// <summary>For a built-up section (double angle): the properties of one component; otherwise null.</summary>
    public SectionProperties? Component { get; init; }

    /// <summary>For a double angle: the gap between the backs (gusset thickness), mm; otherwise 0.</summary>
    public double Gap { get; init; }

    /// <summary>Short free-text statement of how properties were computed (fillets, J formula), shown in records.</summary>
    public string Method { get; init; } = "";

    public double Rx => Math.Sqrt(Ix / Area);

    public double Ry => Math.Sqrt(Iy / Area);

    public double Ru => Math.Sqrt(Iu / Area);

    public double Rv => Math.Sqrt(Iv / Area);

    /// <summary>Polar radius of gyration about the shear centre, r0 = √(x0² + y0² + rx² + ry²), mm.</summary>
    public double R0 => Math.Sqrt(X0 * X0 + Y0 * Y0 + (Ix + Iy) / Area);

    /// <summary>Smallest radius of gyration of the section, mm (rv for a single angle).</summary>
    public double RMin => Math.Sqrt(Math.Min(Iv, Math.Min(Ix, Iy)) / Area);

    /// <summary>Flexural-torsional constant H (Ω in CSA S16) = 1 - (x0² + y0²)/r0².</summary>
    public double H => 1 - (X0 * X0 + Y0 * Y0) / (R0 * R0);
}
