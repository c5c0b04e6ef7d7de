using TrussWeb.Core.Design;
using TrussWeb.Core.Materials;
using TrussWeb.Core.Sections;
using TrussWeb.Core.Standards.Sans10162;
using Xunit.Abstractions;

namespace TrussWeb.Core.Tests.Integration;

/// <summary>
/// The member checks run over sections computed by the section calculators (not hand-entered
/// properties): the whole shipped angle catalogue and thousands of random valid angles.
/// </summary>
public class CatalogueAngleCompressionTests(ITestOutputHelper output)
{
    private static readonly Material Steel = new("S355JR", 355, 470, Material.SansE, Material.SansG);

    private static CatalogueLoadResult Catalogue() =>
        SectionCatalogue.Load(Path.Combine(AppContext.BaseDirectory, "seed-data", "sections"));

    [Fact]
    public void Warping_constant_changes_Fez_of_every_catalogue_angle_by_less_than_one_percent_at_ordinary_lengths()
    {
        // Common practice: Cw of hot-rolled angles is small and is usually taken as zero (AISC Design
        // Guide 9 gives the (t³/36)(b'³ + d'³) form used here). The share of Cw in Fez is
        // π²E·Cw / (G·J·(KL)²); for an equal angle that is about 2.1 (d'/KL)², under 1 % once KL is
        // more than about 15 times the leg. "Ordinary lengths" are therefore taken as KL ≥ 15·d (the
        // longer leg): 1.5 m for a 100 mm leg, 3 m for a 200 mm leg. Shorter, stockier members can see
        // several per cent (printed below); omitting Cw only lowers Fez, so it stays conservative.
        var angles = Catalogue().OfFamily(SectionFamily.Angle).ToList();
        Assert.True(angles.Count >= 40);
        var worst = 0.0;
        var worstName = "";
        foreach (var entry in angles)
        {
            var s = entry.Properties;
            var leg = ((AngleDimensions)entry.Dimensions).LongLeg;
            foreach (var factor in new[] { 15.0, 20, 30, 60 })
            {
                var effect = CwShareOfFez(s, factor * leg);
                Assert.True(effect >= 0, $"{s.Designation}: Cw must not lower Fez");
                if (effect > worst)
                {
                    worst = effect;
                    worstName = $"{s.Designation} at KL = {factor}·d = {factor * leg} mm";
                }
            }
        }

        output.WriteLine($"Largest share of Cw in Fez for KL >= 15 d over {angles.Count} catalogue angles: {worst:P3} ({worstName})");
        foreach (var kl in new[] { 1000.0, 1500, 2000, 3000, 4000, 6000 })
        {
            var (share, name) = angles.Select(e => (CwShareOfFez(e.Properties, kl), e.Designation)).MaxBy(p => p.Item1);
            output.WriteLine($"KL = {kl,5} mm: largest share {share:P2} ({name})");
        }

        Assert.True(worst < 0.01, $"Cw changes Fez by {worst:P3} for {worstName}");
    }

    private static double CwShareOfFez(SectionProperties s, double kl)
    {
        var withCw = Compression.TorsionalBucklingStress(Steel.E, Steel.G, s.Cw, s.J, s.Area, s.R0, kl);
        var noCw = Compression.TorsionalBucklingStress(Steel.E, Steel.G, 0, s.J, s.Area, s.R0, kl);
        return (withCw - noCw) / noCw;
    }

    [Fact]
    public void Flexural_torsional_buckling_governs_over_minor_axis_flexure_for_unequal_catalogue_angles_between_connectors()
    {
        // Common practice: an unequal angle between connectors (equal lengths on all axes) buckles
        // flexural-torsionally at a lower stress than by flexure about v-v alone.
        var unequal = Catalogue().OfFamily(SectionFamily.Angle)
            .Where(e => e.Dimensions is AngleDimensions a && a.LongLeg > a.ShortLeg).ToList();
        Assert.NotEmpty(unequal);
        foreach (var entry in unequal)
        {
            var s = entry.Properties;
            var spacing = 100 * s.Rv; // a/rv = 100, a typical component slenderness
            var r = Compression.Resistance(s, Steel, EffectiveLengths.Uniform(spacing), 1.34, s.Area, null, null);
            Assert.True(r.Fe < r.Fe2, $"{s.Designation}: Fe {r.Fe:F2} MPa should be below Fev {r.Fe2:F2} MPa");
        }
    }

    [Fact]
    public void Cubic_root_over_random_computed_angles_is_positive_bounded_and_accurate()
    {
        // Property: for any valid angle and length, 0 < Fe <= min(Feu, Fev, Fez) and the cubic's relative residual < 1e-9.
        var random = new Random(20261201);
        for (var i = 0; i < 5000; i++)
        {
            var d = 30 + random.NextDouble() * 220;
            var b = 20 + random.NextDouble() * (d - 20);
            var t = 3 + random.NextDouble() * Math.Min(27, b / 4 - 3);
            var r1 = random.NextDouble() * Math.Min(20, (b - t) / 3);
            var r2 = random.NextDouble() * Math.Min(r1 / 2, t / 2);
            var dims = new AngleDimensions(d, b, t, r1, r2);
            if (dims.Validate().Count > 0)
            {
                continue;
            }

            var s = Angle.Compute(dims);
            var length = 200 + random.NextDouble() * 8000;
            var r = Compression.Resistance(s, Steel, EffectiveLengths.Uniform(length), 1.34, s.Area, null, null);
            var bound = Math.Min(r.Fe1, Math.Min(r.Fe2, r.Fez));
            Assert.True(r.Fe > 0 && r.Fe <= bound * (1 + 1e-12), $"case {i}: Fe {r.Fe} outside (0, {bound}]");
            var residual = FlexuralTorsionalCubic.RelativeResidual(r.Fe, r.Fe1, r.Fe2, r.Fez, s.U0, s.V0, s.R0);
            Assert.True(residual < 1e-9, $"case {i}: residual {residual:E2}");
            Assert.True(double.IsFinite(r.Cr) && r.Cr > 0);
        }
    }
}
