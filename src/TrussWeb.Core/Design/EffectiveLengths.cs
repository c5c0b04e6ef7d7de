namespace TrussWeb.Core.Design;

/// <summary>
/// Buckling lengths of a member, mm, with where each came from (shown in the record).
/// Lx: in-plane (buckling about x-x, normal to the truss plane); Ly: out-of-plane (about y-y);
/// Lz: torsional. Lu/Lv: principal-axis lengths for single angles, when the user gives them;
/// otherwise single angles use max(KxLx, KyLy) about both principal axes (conservative, common practice).
/// </summary>
public sealed record EffectiveLengths
{
    public required double Lx { get; init; }

    public required double Ly { get; init; }

    public required double Lz { get; init; }

    public double Kx { get; init; } = 1.0;

    public double Ky { get; init; } = 1.0;

    public double Kz { get; init; } = 1.0;

    /// <summary>User-given effective length about the major principal axis u-u (K included), mm; null when not given.</summary>
    public double? KLu { get; init; }

    /// <summary>User-given effective length about the minor principal axis v-v (K included), mm; null when not given.</summary>
    public double? KLv { get; init; }

    public string LxSource { get; init; } = "node to node";

    public string LySource { get; init; } = "node to node";

    public string LzSource { get; init; } = "equal to the out-of-plane length";

    public static EffectiveLengths Uniform(double length) => new() { Lx = length, Ly = length, Lz = length };
}
