using TrussWeb.Core.Loads;
using TrussWeb.Core.Model;
using TrussWeb.Core.Tests.Support;
using TrussWeb.Core.Validation;

namespace TrussWeb.Core.Tests.Loads;

public class LoadBuilderTests
{
    // Pitched Pratt 12 m, six panels, apex 3 m, heel 0, trusses at 6 m (REFERENCES.md §6 geometry).
    private const double Spacing = 6000;
    private static readonly double SlopeLength = Math.Sqrt((6000.0 * 6000) + (3000.0 * 3000)); // 6 708.204 mm per slope (Pythagoras)
    private static readonly double Sin = 3000 / SlopeLength; // sin θ = 0.4472
    private static readonly double Cos = 6000 / SlopeLength; // cos θ = 0.8944

    private static TrussModel Pratt() => TrussGenerator.Generate(new TrussParameters
    {
        Type = TrussType.PitchedPratt, Span = 12_000, ApexHeight = 3000, PanelCount = 6, TrussSpacing = Spacing,
    });

    [Fact]
    public void Permanent_total_is_pressure_times_slope_area()
    {
        var result = LoadBuilder.Build(Pratt(), new AreaActions { RoofCoveringKPa = 0.3, PurlinsAndServicesKPa = 0.1 });
        var d = result.Cases.Single(c => c.Id == "D");

        // (0.3 + 0.1) kPa · 1e-3 N/mm² per kPa · 6 000 mm · 2 · 6 708.2 mm (slope area) = 32 199.4 N down.
        AssertClose.Relative(-0.4e-3 * Spacing * 2 * SlopeLength, d.TotalFy, 1e-9, "ΣFy");
        AssertClose.Relative(0, d.TotalFx, 1e-9, "ΣFx", absTol: 1e-9);
        Assert.Equal(LoadKind.Permanent, d.Kind);
        Assert.Empty(result.Warnings);
    }

    [Fact]
    public void Imposed_total_is_pressure_times_plan_area()
    {
        var q = LoadBuilder.Build(Pratt(), new AreaActions { ImposedKPaOnPlan = 0.5 }).Cases.Single(c => c.Id == "Q");

        // 0.5 kPa · 6 m · 12 m plan = 36 kN (arithmetic).
        AssertClose.Relative(-36_000, q.TotalFy, 1e-9, "ΣFy");
    }

    [Fact]
    public void Purlin_node_gets_its_tributary_strip()
    {
        var d = LoadBuilder.Build(Pratt(), new AreaActions { RoofCoveringKPa = 1.0 }).Cases.Single(c => c.Id == "D");

        // Purlins at every top-chord node, 2 236.07 mm apart along the slope: U1 takes one full spacing,
        // L0 half of one: 1e-3 · 6000 · 2236.07 = 13 416.4 N and 6 708.2 N (tributary width, common practice).
        var spacing = SlopeLength / 3;
        AssertClose.Relative(-1e-3 * Spacing * spacing, d.Loads.Single(l => l.Node == "U1").Fy, 1e-9, "U1");
        AssertClose.Relative(-1e-3 * Spacing * spacing / 2, d.Loads.Single(l => l.Node == "L0").Fy, 1e-9, "L0");
    }

    [Fact]
    public void Wind_acts_normal_to_each_slope_with_its_own_pressure()
    {
        var actions = new AreaActions { WindCases = [new WindCase("W1", "Wind 0°", -0.8, -0.4)] };
        var w = LoadBuilder.Build(Pratt(), actions).Cases.Single(c => c.Id == "W1");
        Assert.Equal(LoadKind.Wind, w.Kind);

        // Resultant of suction p on a slope of length s: |p|·B·s along the outward normal; left normal (−sin, cos),
        // right normal (sin, cos) (geometry). ΣFx = (−0.8 + 0.4)e-3·B·s·sin... signs: left pulls up-left, right up-right.
        var left = 0.8e-3 * Spacing * SlopeLength;
        var right = 0.4e-3 * Spacing * SlopeLength;
        AssertClose.Relative((-left * Sin) + (right * Sin), w.TotalFx, 1e-9, "ΣFx");
        AssertClose.Relative((left + right) * Cos, w.TotalFy, 1e-9, "ΣFy");

        // Nodes wholly on the left slope carry forces normal to it: F·(cos, sin) = 0, and upwards.
        foreach (var id in new[] { "L0", "U1", "U2" })
        {
            var l = w.Loads.Single(x => x.Node == id);
            AssertClose.Relative(0, ((l.Fx * Cos) + (l.Fy * Sin)) / Math.Abs(l.Fy), 1e-12, id, absTol: 1e-12);
            Assert.True(l.Fy > 0, $"{id} uplift");
        }
    }

    [Fact]
    public void Positive_wind_pressure_pushes_onto_the_windward_slope()
    {
        var w = LoadBuilder.Build(Pratt(), new AreaActions { WindCases = [new WindCase("W2", "pressure", 0.5, 0)] }).Cases.Single();
        var u1 = w.Loads.Single(l => l.Node == "U1");
        Assert.True(u1.Fx > 0 && u1.Fy < 0, "pressure on the left slope acts to the right and down");
    }

    [Fact]
    public void Purlin_off_a_node_gives_a_warning_and_keeps_the_total()
    {
        // 3 000 mm along the chord lies between U1 (2 236 mm) and U2 (4 472 mm).
        double[] positions = [0, 3000, SlopeLength, SlopeLength * 4 / 3, 2 * SlopeLength];
        var result = LoadBuilder.Build(Pratt(), new AreaActions { RoofCoveringKPa = 1.0, PurlinPositionsAlongTopChord = positions });
        var warning = Assert.Single(result.Warnings);
        Assert.Equal("purlin at 3 000 mm along the top chord is not at a node (between U1 and U2): its load is shared between them by the lever rule; chord bending is not checked", warning.Message);
        var d = result.Cases.Single();
        AssertClose.Relative(-1e-3 * Spacing * 2 * SlopeLength, d.TotalFy, 1e-9, "ΣFy");

        // Its strip runs from 1 500 to (3 000 + 6 708.2)/2 = 4 854.1 mm; U2 takes the lever-rule share
        // (3 000 − 2 236.07)/2 236.07 = 0.3416 of it (statics).
        var strip = ((3000 + SlopeLength) / 2) - 1500;
        var share = (3000 - (SlopeLength / 3)) / (SlopeLength / 3);
        AssertClose.Relative(-1e-3 * Spacing * strip * share, d.Loads.Single(l => l.Node == "U2").Fy, 1e-9, "U2");
    }

    [Fact]
    public void Self_weight_is_mass_times_length_times_g_times_allowance_half_to_each_end()
    {
        var model = Pratt();
        var result = LoadBuilder.Build(model, new AreaActions
        {
            MassPerMetreByGroup = new Dictionary<string, double> { ["TopChord"] = 12, ["BottomChord"] = 8, ["Diagonals"] = 5, ["Verticals"] = 5 },
        });
        var sw = result.Cases.Single(c => c.Id == "SW");

        // W = Σ m·L·g·1.10 (g = 9.81 m/s², 1.10 connection allowance, common practice).
        var expected = model.Members.Sum(m => (m.Group switch { "TopChord" => 12.0, "BottomChord" => 8.0, _ => 5.0 }) * model.LengthOf(m) / 1000) * 9.81 * 1.10;
        AssertClose.Relative(-expected, sw.TotalFy, 1e-9, "ΣFy");

        // L0 carries half of TC1 and BC1: (12·2236.07 + 8·2000)/2 /1000 · 9.81 · 1.10.
        var l0 = ((12 * SlopeLength / 3) + (8 * 2000)) / 2 / 1000 * 9.81 * 1.10;
        AssertClose.Relative(-l0, sw.Loads.Single(l => l.Node == "L0").Fy, 1e-9, "L0");
    }

    [Fact]
    public void Missing_mass_is_a_warning()
    {
        var result = LoadBuilder.Build(Pratt(), new AreaActions { MassPerMetreByGroup = new Dictionary<string, double> { ["TopChord"] = 12 } });
        Assert.Contains(result.Warnings, w => w.Message == "no mass per metre for member BC1 (group BottomChord): its self-weight is left out");
    }

    [Fact]
    public void Negative_covering_load_is_rejected_by_field()
    {
        var ex = Assert.Throws<InputValidationException>(() => LoadBuilder.Build(Pratt(), new AreaActions { RoofCoveringKPa = -0.1 }));
        Assert.Contains(ex.Issues, i => i.Field == "RoofCoveringKPa");
    }

    [Fact]
    public void Flat_top_chord_splits_left_and_right_at_mid_span()
    {
        var flat = TrussGenerator.Generate(new TrussParameters { Type = TrussType.ParallelPratt, Span = 12_000, HeelDepth = 1000, PanelCount = 4, TrussSpacing = 5000 });
        var w = LoadBuilder.Build(flat, new AreaActions { WindCases = [new WindCase("W", "w", -1.0, 0)] }).Cases.Single();

        // Left half only: 1 kPa · 5 m · 6 m = 30 kN upwards (arithmetic).
        AssertClose.Relative(30_000, w.TotalFy, 1e-9, "ΣFy");
        Assert.DoesNotContain(w.Loads, l => l.Node == "U4" && l.Fy != 0);
    }
}
