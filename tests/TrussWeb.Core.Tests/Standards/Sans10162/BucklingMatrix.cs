using MathNet.Numerics.LinearAlgebra;

namespace TrussWeb.Core.Tests.Standards.Sans10162;

/// <summary>
/// Independent route to the elastic buckling stress for tests: the 3×3 pencil (K − F·M)·{u, v, r0·φ} = 0
/// with K = diag(Fe2, Fe1, Fez)·… in the form
/// <code>
/// | Fe2 − F      0          F y0      |
/// | 0            Fe1 − F    −F x0     |  = 0   (rows: displacement along 1, along 2, twist·r0²)
/// | F y0         −F x0      r0²(Fez − F) |
/// </code>
/// whose determinant divided by −r0² is the cubic of SANS 10162-1 cl. 13.3.2. The lowest eigenvalue
/// of M⁻¹K (MathNet EVD) is compared with the closed-form solver.
/// </summary>
internal static class BucklingMatrix
{
    public static double LowestEigenvalue(double fe1, double fe2, double fez, double x0, double y0, double r0)
    {
        var k = Matrix<double>.Build.DenseOfArray(new[,]
        {
            { fe2, 0, 0 },
            { 0, fe1, 0 },
            { 0, 0, r0 * r0 * fez },
        });
        var m = Matrix<double>.Build.DenseOfArray(new[,]
        {
            { 1, 0, -y0 },
            { 0, 1, x0 },
            { -y0, x0, r0 * r0 },
        });
        var evd = (m.Inverse() * k).Evd();
        return evd.EigenValues.Select(c => c.Real).Min();
    }

    /// <summary>Determinant of K − F·M (direct cofactor expansion), N²/mm⁴-like units.</summary>
    public static double Determinant(double f, double fe1, double fe2, double fez, double x0, double y0, double r0)
    {
        var a = fe2 - f;
        var e = fe1 - f;
        var i = r0 * r0 * (fez - f);
        var c = f * y0;
        var fh = -f * x0;
        // | a 0 c ; 0 e fh ; c fh i |
        return a * (e * i - fh * fh) - 0 + c * (0 * fh - e * c);
    }
}
