using TrussWeb.Core.Model;
using TrussWeb.Core.Tests.Support;

namespace TrussWeb.Core.Tests.Model;

public class TrussModelValidatorTests
{
    /// <summary>A stable triangle: the base for each broken variant below.</summary>
    private static TrussBuilder Triangle() => new TrussBuilder()
        .Node("A", 0, 0).Node("B", 4000, 0).Node("T", 2000, 1000)
        .Member("BC1", "A", "B", "BottomChord").Member("TC1", "A", "T", "TopChord").Member("TC2", "T", "B", "TopChord");

    private static void AssertIssue(TrussModel model, string field, string message)
    {
        var issues = TrussModelValidator.Validate(model);
        Assert.Contains(issues, i => i.Field == field && i.Message == message);
    }

    [Fact]
    public void Stable_triangle_has_no_issues()
    {
        Assert.Empty(TrussModelValidator.Validate(Triangle().Pin("A").Roller("B").Build()));
    }

    [Fact]
    public void Duplicate_node_id_is_reported() =>
        AssertIssue(Triangle().Node("A", 100, 500).Pin("A").Roller("B").Build(), "Nodes", "node id 'A' is used by 2 nodes; node ids must be unique");

    [Fact]
    public void Coincident_nodes_within_1_mm_are_reported()
    {
        // Tolerance 1 mm (TrussModelValidator.CoincidenceToleranceMm, common practice): 0.6 mm apart coincide.
        var model = Triangle().Node("T2", 2000.6, 1000).Member("X", "T2", "A").Pin("A").Roller("B").Build();
        AssertIssue(model, "Nodes", "nodes T and T2 coincide (0.6 mm apart; nodes closer than 1 mm are the same point)");
    }

    [Fact]
    public void Nodes_1_mm_apart_do_not_coincide()
    {
        var model = Triangle().Node("T2", 2001.0, 1000).Member("X", "T2", "A").Pin("A").Roller("B").Build();
        Assert.DoesNotContain(TrussModelValidator.Validate(model), i => i.Message.Contains("coincide", StringComparison.Ordinal));
    }

    [Fact]
    public void Zero_length_member_is_reported() =>
        AssertIssue(Triangle().Member("Z", "T", "T").Pin("A").Roller("B").Build(), "Members", "member Z has zero length: both ends are node T");

    [Fact]
    public void Duplicate_member_either_way_round_is_reported() =>
        AssertIssue(Triangle().Member("BC2", "B", "A", "BottomChord").Pin("A").Roller("B").Build(), "Members", "members BC1 and BC2 both join nodes A and B; remove one");

    [Fact]
    public void Unknown_node_reference_is_reported() =>
        AssertIssue(Triangle().Member("D9", "T", "Q").Pin("A").Roller("B").Build(), "Members", "member D9 refers to unknown node 'Q'");

    [Fact]
    public void Node_without_member_is_reported() =>
        AssertIssue(Triangle().Node("LOOSE", 9000, 0).Pin("A").Roller("B").Build(), "Nodes", "node LOOSE is not connected to any member");

    [Fact]
    public void No_supports_is_reported() =>
        AssertIssue(Triangle().Build(), "Supports", "the truss has no supports; add a pin and a roller");

    [Fact]
    public void Only_rollers_free_in_x_is_an_unstable_support_set() =>
        AssertIssue(Triangle().Roller("A").Roller("B").Build(), "Supports",
            "unstable supports: nothing restrains the truss in x (every support is a roller free in x); make one support a pin");

    [Fact]
    public void Only_rollers_free_in_y_is_an_unstable_support_set() =>
        AssertIssue(Triangle().Roller("A", SupportKind.RollerY).Roller("B", SupportKind.RollerY).Build(), "Supports",
            "unstable supports: nothing restrains the truss in y (every support is a roller free in y); make one support a pin");

    [Fact]
    public void A_single_pin_lets_the_truss_rotate() =>
        AssertIssue(Triangle().Pin("A").Build(), "Supports",
            "unstable supports: the support reactions all pass through one point or are parallel, so the truss can rotate or slide as a whole; add a support or make a roller a pin");

    [Fact]
    public void Mechanism_names_the_node_and_direction_with_no_stiffness()
    {
        // Bottom chord split at M with no web to it: M has no vertical stiffness (two collinear bars).
        var model = new TrussBuilder().Node("A", 0, 0).Node("M", 2000, 0).Node("B", 4000, 0).Node("T", 2000, 1000)
            .Member("BC1", "A", "M", "BottomChord").Member("BC2", "M", "B", "BottomChord").Member("TC1", "A", "T", "TopChord").Member("TC2", "T", "B", "TopChord")
            .Pin("A").Roller("B").Build(span: 4000);
        var issues = TrussModelValidator.Validate(model);
        var only = Assert.Single(issues);
        Assert.Equal("Stability", only.Field);
        Assert.Equal("mechanism: node M has no stiffness in the y direction; add a member or a support there", only.Message);
    }

    [Fact]
    public void Hanging_node_on_a_horizontal_bar_has_no_y_stiffness()
    {
        var model = Triangle().Node("E", 6000, 0).Member("X", "B", "E").Pin("A").Roller("B").Build();
        AssertIssue(model, "Stability", "mechanism: node E has no stiffness in the y direction; add a member or a support there");
    }

    [Fact]
    public void Square_panel_without_diagonal_is_a_mechanism_at_one_of_its_free_nodes()
    {
        var model = new TrussBuilder().Node("A", 0, 0).Node("B", 2000, 0).Node("C", 2000, 2000).Node("D", 0, 2000)
            .Member("AB", "A", "B").Member("BC", "B", "C").Member("CD", "C", "D").Member("DA", "D", "A")
            .Pin("A").Roller("B").Build(span: 2000);
        var issue = Assert.Single(TrussModelValidator.Validate(model));

        // Sway: one zero pivot, in x, at C or D (which one depends on the elimination order).
        Assert.Matches("^mechanism: node [CD] has no stiffness in the x direction; add a member or a support there$", issue.Message);
    }

    [Fact]
    public void Unknown_lateral_restraint_node_is_reported() =>
        AssertIssue(Triangle().Pin("A").Roller("B").Restrain("N7").Build(), "LateralRestraints", "lateral restraint at unknown node 'N7'");
}
