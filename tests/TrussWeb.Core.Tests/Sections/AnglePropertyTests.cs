using FsCheck;
using FsCheck.Fluent;
using TrussWeb.Core.Sections;

namespace TrussWeb.Core.Tests.Sections;

/// <summary>
/// Properties that must hold for every valid angle (FsCheck, thousands of random dimensions):
/// A &gt; 0, Iu ≥ Ix, Iy ≥ Iv &gt; 0, r0 &gt; 0, 0 &lt; H &lt; 1, all finite.
/// </summary>
public class AnglePropertyTests
{
    private const int Cases = 5000;

    /// <summary>Random valid angles: legs 20-300 mm, t between 3 % and 30 % of b, radii that fit.</summary>
    private static Arbitrary<AngleDimensions> ValidAngles()
    {
        var gen =
            from b in Gen.Choose(2000, 30000).Select(i => i / 100.0)
            from extra in Gen.Choose(0, 20000).Select(i => i / 100.0)
            from tFraction in Gen.Choose(300, 3000).Select(i => i / 10000.0)
            from r1Fraction in Gen.Choose(0, 999).Select(i => i / 1000.0) // below 1: t + r1 + r2 = b exactly may round above b
            from r2Fraction in Gen.Choose(0, 1000).Select(i => i / 1000.0)
            let t = b * tFraction
            let r2 = t * r2Fraction
            let r1 = (b - t - r2) * r1Fraction
            select new AngleDimensions(b + extra, b, t, r1, r2);
        return gen.ToArbitrary();
    }

    [Fact]
    public void Every_valid_random_angle_has_consistent_properties()
    {
        var property = Prop.ForAll(ValidAngles(), dims =>
        {
            var p = Angle.Compute(dims);
            var slack = 1e-9 * p.Iu;
            double[] all = [p.Area, p.CentroidX, p.CentroidY, p.Ix, p.Iy, p.Ixy, p.Iu, p.Iv, p.Alpha, p.J, p.Cw, p.X0, p.Y0, p.U0, p.V0, p.Sx, p.Sy, p.R0, p.H, p.MassPerMetre];
            return all.All(double.IsFinite)
                && p.Area > 0
                && p.Iu >= p.Ix - slack
                && p.Iy >= p.Iv - slack
                && p.Iv > 0
                && p.R0 > 0
                && p.H > 0 && p.H < 1
                && dims.Validate().Count == 0;
        });

        Check.One(Config.QuickThrowOnFailure.WithMaxTest(Cases), property);
    }
}
