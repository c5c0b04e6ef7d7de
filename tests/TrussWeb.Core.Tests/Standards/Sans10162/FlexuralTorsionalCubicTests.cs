using TrussWeb.Core.Standards.Sans10162;
using TrussWeb.Core.Tests.Support;

namespace TrussWeb.Core.Tests.Standards.Sans10162;

public class FlexuralTorsionalCubicTests
{
    // Inputs of the identity tests are arbitrary stresses (MPa) and offsets (mm); the expected value is
    // the identity's other side, computed independently in the test, not a published figure.
    [Theory]
    [InlineData(100, 200, 300)]
    [InlineData(300, 200, 100)]
    [InlineData(250, 250, 250)]
    [InlineData(1e-3, 1e5, 7)]
    public void Zero_shear_centre_offsets_return_the_least_stress(double fe1, double fe2, double fez)
    {
        // Identity (doubly symmetric): the cubic factors into (Fe − Fe1)(Fe − Fe2)(Fe − Fez).
        AssertClose.Relative(Math.Min(fe1, Math.Min(fe2, fez)), FlexuralTorsionalCubic.SmallestRoot(fe1, fe2, fez, 0, 0, 40), 1e-12, "Fe");
    }

    [Theory]
    [InlineData(300, 150, 400, 20, 50)]
    [InlineData(75, 118, 683, 12.2, 48.64)] // the stresses and offsets of Example AC40 (Carleton CIVE 3205 notes, CSA S16-14), r0 = √2366 mm
    [InlineData(1e4, 10, 20, 30, 31)]
    public void Zero_x0_returns_the_singly_symmetric_formula(double fe1, double fe2, double fez, double y0, double r0)
    {
        // Identity: x0 = 0 leaves min(Fe1, Feyz) with Feyz the singly symmetric formula (cl. 13.3.2 (b)).
        var h = 1 - y0 * y0 / (r0 * r0);
        var sum = fe2 + fez;
        var feyz = sum / (2 * h) * (1 - Math.Sqrt(1 - 4 * fe2 * fez * h / (sum * sum)));
        AssertClose.Relative(Math.Min(fe1, feyz), FlexuralTorsionalCubic.SmallestRoot(fe1, fe2, fez, 0, y0, r0), 1e-9, "Fe");
    }

    [Fact]
    public void Zero_y0_couples_axis_one_with_torsion()
    {
        // Identity: y0 = 0 leaves (Fe − Fe2)[(Fe − Fe1)(Fe − Fez) − Fe²(x0/r0)²]; the bracket's root has the same form.
        const double fe1 = 120, fe2 = 500, fez = 150, x0 = 25, r0 = 45;
        var h = 1 - x0 * x0 / (r0 * r0);
        var sum = fe1 + fez;
        var expected = sum / (2 * h) * (1 - Math.Sqrt(1 - 4 * fe1 * fez * h / (sum * sum)));
        AssertClose.Relative(expected, FlexuralTorsionalCubic.SmallestRoot(fe1, fe2, fez, x0, 0, r0), 1e-9, "Fe");
    }

    [Fact]
    public void Random_valid_asymmetric_inputs_give_a_positive_bounded_root_with_small_residual()
    {
        // Property test, seeded (2026-12-01): stresses log-uniform over 1e-2..1e5 MPa, shear-centre offsets up to
        // 3× the radii, about 1 case in 10 with an offset exactly zero. Checked: finite, > 0, ≤ min(Fe1, Fe2, Fez),
        // relative residual < 1e-9 (solver's own measure) and the direct 3×3 determinant ≈ 0 against its scale.
        var rng = new Random(20261201);
        var closedForm = 0;
        const int cases = 20_000;
        for (var i = 0; i < cases; i++)
        {
            var fe1 = LogUniform(rng, 1e-2, 1e5);
            var fe2 = LogUniform(rng, 1e-2, 1e5);
            var fez = LogUniform(rng, 1e-2, 1e5);
            var r1 = LogUniform(rng, 1, 200);
            var r2 = LogUniform(rng, 1, 200);
            var x0 = rng.Next(10) == 0 ? 0 : (rng.NextDouble() * 2 - 1) * 3 * r1;
            var y0 = rng.Next(10) == 0 ? 0 : (rng.NextDouble() * 2 - 1) * 3 * r2;
            var r0 = Math.Sqrt(x0 * x0 + y0 * y0 + r1 * r1 + r2 * r2);

            var fe = FlexuralTorsionalCubic.SmallestRoot(fe1, fe2, fez, x0, y0, r0, out var usedClosed);
            closedForm += usedClosed ? 1 : 0;
            var min = Math.Min(fe1, Math.Min(fe2, fez));
            var where = $"case {i}: Fe1 {fe1}, Fe2 {fe2}, Fez {fez}, x0 {x0}, y0 {y0}, r0 {r0} → {fe}";
            Assert.True(double.IsFinite(fe), where);
            Assert.True(fe > 0, where);
            Assert.True(fe <= min * (1 + 1e-12), where);
            Assert.True(FlexuralTorsionalCubic.RelativeResidual(fe, fe1, fe2, fez, x0, y0, r0) < 1e-9, where);

            // Independent: determinant of the buckling matrix, scaled by the product of its diagonal magnitudes at F = Fe.
            var det = BucklingMatrix.Determinant(fe, fe1, fe2, fez, x0, y0, r0);
            var scale = (Math.Abs(fe2) + fe) * (Math.Abs(fe1) + fe) * r0 * r0 * (fez + fe);
            Assert.True(Math.Abs(det) / scale < 1e-8, where + $", det/scale {Math.Abs(det) / scale}");
        }

        // Most cases should be settled by the closed form; the fallback is for cancellation cases.
        Assert.True(closedForm > cases / 2, $"closed form used in {closedForm} of {cases} cases");
    }

    [Fact]
    public void Root_is_the_lowest_eigenvalue_of_the_buckling_pencil_for_random_angles()
    {
        // Independent route (MathNet EVD of M⁻¹K), seeded: realistic angle proportions.
        var rng = new Random(7);
        for (var i = 0; i < 500; i++)
        {
            var fe1 = LogUniform(rng, 50, 5000);
            var fe2 = LogUniform(rng, 10, 500);
            var fez = LogUniform(rng, 50, 3000);
            var x0 = -LogUniform(rng, 5, 60);
            var y0 = -LogUniform(rng, 5, 60);
            var r0 = Math.Sqrt(x0 * x0 + y0 * y0 + LogUniform(rng, 200, 5000));
            var fe = FlexuralTorsionalCubic.SmallestRoot(fe1, fe2, fez, x0, y0, r0);
            AssertClose.Relative(BucklingMatrix.LowestEigenvalue(fe1, fe2, fez, x0, y0, r0), fe, 1e-8, $"case {i}");
        }
    }

    [Theory]
    [InlineData(0, 100, 100, 0, 0, 10)]
    [InlineData(100, -1, 100, 0, 0, 10)]
    [InlineData(100, 100, double.NaN, 0, 0, 10)]
    [InlineData(100, 100, 100, 10, 0, 10)]
    [InlineData(100, 100, 100, 0, double.PositiveInfinity, 10)]
    public void Invalid_inputs_throw_instead_of_returning_nan(double fe1, double fe2, double fez, double x0, double y0, double r0)
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => FlexuralTorsionalCubic.SmallestRoot(fe1, fe2, fez, x0, y0, r0));
    }

    private static double LogUniform(Random rng, double lo, double hi) => Math.Exp(Math.Log(lo) + rng.NextDouble() * (Math.Log(hi) - Math.Log(lo)));
}
