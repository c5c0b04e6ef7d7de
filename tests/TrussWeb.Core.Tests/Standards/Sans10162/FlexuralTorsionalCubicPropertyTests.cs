using FsCheck;
using FsCheck.Xunit;
using TrussWeb.Core.Standards.Sans10162;

namespace TrussWeb.Core.Tests.Standards.Sans10162;

public class FlexuralTorsionalCubicPropertyTests
{
    /// <summary>
    /// FsCheck property over 5 000 generated cases: integer draws mapped to stresses log-uniform over
    /// 1e-2..1e5 MPa, radii 1..200 mm and shear-centre offsets up to 3× the radii (so r0² &gt; x0² + y0²
    /// by construction). The root is finite, positive, at most min(Fe1, Fe2, Fez), and its relative residual
    /// is below 1e-9.
    /// </summary>
    [Property(MaxTest = 5000)]
    public bool Root_is_positive_bounded_and_a_root(int s1, int s2, int s3, int s4, int s5, int s6, int s7)
    {
        var fe1 = LogMap(s1, 1e-2, 1e5);
        var fe2 = LogMap(s2, 1e-2, 1e5);
        var fez = LogMap(s3, 1e-2, 1e5);
        var r1 = LogMap(s4, 1, 200);
        var r2 = LogMap(s5, 1, 200);
        var x0 = Signed(s6) * 3 * r1;
        var y0 = Signed(s7) * 3 * r2;
        var r0 = Math.Sqrt(x0 * x0 + y0 * y0 + r1 * r1 + r2 * r2);
        var fe = FlexuralTorsionalCubic.SmallestRoot(fe1, fe2, fez, x0, y0, r0);
        return double.IsFinite(fe)
            && fe > 0
            && fe <= Math.Min(fe1, Math.Min(fe2, fez)) * (1 + 1e-12)
            && FlexuralTorsionalCubic.RelativeResidual(fe, fe1, fe2, fez, x0, y0, r0) < 1e-9;
    }

    // Maps any int to (0, 1) by hashing its bits, so small generated integers still spread over the range.
    private static double Unit(int s)
    {
        var h = (uint)s * 2654435761u;
        return (h + 0.5) / 4294967296.0;
    }

    private static double LogMap(int s, double lo, double hi) => Math.Exp(Math.Log(lo) + Unit(s) * (Math.Log(hi) - Math.Log(lo)));

    private static double Signed(int s) => s % 7 == 0 ? 0 : 2 * Unit(s ^ 0x5bd1e995) - 1;
}
