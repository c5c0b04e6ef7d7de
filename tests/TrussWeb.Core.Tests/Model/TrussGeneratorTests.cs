using TrussWeb.Core.Model;
using TrussWeb.Core.Tests.Support;
using TrussWeb.Core.Validation;

namespace TrussWeb.Core.Tests.Model;

public class TrussGeneratorTests
{
    private static TrussParameters P(TrussType type, int panels, double heel, double? pitch = null, double? apex = 3000) => new()
    {
        Type = type,
        Span = 12_000,
        PanelCount = panels,
        HeelDepth = heel,
        PitchDegrees = pitch,
        ApexHeight = pitch is null ? apex : null,
        TrussSpacing = 6_000,
    };

    [Theory]
    // Expected counts from the layouts in TrussGenerator (nodes j, members m); each is statically
    // determinate, m = 2j − 3 (Maxwell's counting rule for plane trusses, common practice).
    [InlineData(TrussType.PitchedPratt, 6, 0, 12, 21)]
    [InlineData(TrussType.PitchedPratt, 6, 600, 14, 25)]
    [InlineData(TrussType.PitchedHowe, 8, 0, 16, 29)]
    [InlineData(TrussType.PitchedHowe, 8, 500, 18, 33)]
    [InlineData(TrussType.Fink, 4, 0, 7, 11)]
    [InlineData(TrussType.Fink, 6, 0, 11, 19)]
    [InlineData(TrussType.Fink, 4, 400, 9, 15)]
    [InlineData(TrussType.ParallelPratt, 6, 1000, 14, 25)]
    [InlineData(TrussType.ParallelHowe, 7, 1000, 16, 29)]
    [InlineData(TrussType.ParallelWarren, 6, 1000, 13, 23)]
    [InlineData(TrussType.MonoPitch, 5, 0, 11, 19)]
    [InlineData(TrussType.MonoPitch, 5, 300, 12, 21)]
    public void Each_type_is_valid_stable_and_has_expected_counts(TrussType type, int panels, double heel, int nodes, int members)
    {
        var model = TrussGenerator.Generate(P(type, panels, heel, apex: type is TrussType.ParallelPratt or TrussType.ParallelHowe or TrussType.ParallelWarren ? null : 3000));
        Assert.Empty(TrussModelValidator.Validate(model));
        Assert.Equal(nodes, model.Nodes.Count);
        Assert.Equal(members, model.Members.Count);
        Assert.Equal(2 * nodes - 3, members);
    }

    [Theory]
    [InlineData(TrussType.PitchedPratt)]
    [InlineData(TrussType.PitchedHowe)]
    [InlineData(TrussType.Fink)]
    public void Pitched_types_reach_the_apex_height_at_mid_span(TrussType type)
    {
        var model = TrussGenerator.Generate(P(type, 4, 0, pitch: 25));

        // Apex height = (span/2)·tan 25° = 6000 · 0.466308 = 2797.85 mm (trigonometry).
        var apex = model.Nodes.MaxBy(n => n.Y)!;
        AssertClose.Relative(2797.846, apex.Y, 1e-6, "apex");
        AssertClose.Relative(6000, apex.X, 1e-12, "apex x");
        AssertClose.Relative(12_000, model.Nodes.Max(n => n.X) - model.Nodes.Min(n => n.X), 1e-12, "span");
    }

    [Fact]
    public void Mono_pitch_high_end_is_heel_plus_span_tan_pitch()
    {
        var model = TrussGenerator.Generate(P(TrussType.MonoPitch, 6, 300, pitch: 10));

        // 300 + 12 000 · tan 10° = 300 + 2115.93 = 2415.93 mm (trigonometry).
        AssertClose.Relative(2415.93, model.FindNode("U6")!.Y, 1e-5, "high end");
        Assert.Equal(300, model.FindNode("U0")!.Y);
    }

    [Fact]
    public void Pitched_Pratt_reproduces_the_reference_layout()
    {
        // REFERENCES.md §6 layout: 12 m, six panels, rise 3 m, heel 0: diagonals L1–U2 and L2–U3.
        var model = TrussGenerator.Generate(P(TrussType.PitchedPratt, 6, 0));
        Assert.Contains(model.Members, m => m.StartNode == "L1" && m.EndNode == "U2");
        Assert.Contains(model.Members, m => m.StartNode == "L2" && m.EndNode == "U3");
        Assert.Equal(["TC1", "TC2", "TC3", "TC4", "TC5", "TC6"], model.Members.Where(m => m.Group == "TopChord").Select(m => m.Id));
    }

    [Fact]
    public void Supports_purlins_and_restraints_follow_the_defaults()
    {
        var model = TrussGenerator.Generate(P(TrussType.ParallelPratt, 6, 1000, apex: null) with { BottomRestraintEvery = 3 });
        Assert.Equal([new Core.Model.Support("L0", SupportKind.Pin), new Core.Model.Support("L6", SupportKind.RollerX)], model.Supports);
        Assert.Equal(["U0", "U1", "U2", "U3", "U4", "U5", "U6"], model.PurlinNodes);

        // Every top-chord node, the supports and every 3rd bottom node (L0, L3, L6).
        Assert.Equal(["U0", "U1", "U2", "U3", "U4", "U5", "U6", "L0", "L6", "L3"], model.LateralRestraints);
    }

    [Fact]
    public void Bad_parameters_name_their_fields()
    {
        var bad = P(TrussType.PitchedHowe, 5, -10) with { Span = 0 };
        var ex = Assert.Throws<InputValidationException>(() => TrussGenerator.Generate(bad));
        Assert.Contains(ex.Issues, i => i.Field == "Span" && i.Message == "must be greater than 0 mm (got 0 mm)");
        Assert.Contains(ex.Issues, i => i.Field == "HeelDepth" && i.Message == "must not be negative (got -10 mm)");
        Assert.Contains(ex.Issues, i => i.Field == "PanelCount" && i.Message == "a symmetric pitched truss needs an even number of panels (got 5)");
    }

    [Fact]
    public void Pitch_and_apex_height_together_are_rejected()
    {
        var issues = (P(TrussType.Fink, 4, 0, pitch: 20) with { ApexHeight = 2000 }).Validate();
        Assert.Contains(issues, i => i.Field == "PitchDegrees" && i.Message == "give either the pitch or the apex height, not both or neither");
    }

    [Fact]
    public void Generated_model_is_edited_like_a_table_model()
    {
        var model = TrussGenerator.Generate(P(TrussType.PitchedHowe, 6, 0));
        var edited = model with { Nodes = model.Nodes.Select(n => n.Id == "U3" ? n with { Y = 3500 } : n).ToList() };
        Assert.Empty(TrussModelValidator.Validate(edited));
        Assert.Equal(3500, edited.FindNode("U3")!.Y);
        Assert.Equal(3000, model.FindNode("U3")!.Y);
    }
}
