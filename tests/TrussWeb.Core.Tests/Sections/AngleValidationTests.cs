using TrussWeb.Core.Sections;
using TrussWeb.Core.Validation;

namespace TrussWeb.Core.Tests.Sections;

/// <summary>Every rule of <see cref="AngleDimensions.Validate"/>, with the message the user sees.</summary>
public class AngleValidationTests
{
    // Source: common practice (EN 10056-1 size 100x75x8, r1 10, r2 5) as the valid base.
    private static readonly AngleDimensions Valid = new(100, 75, 8, 10, 5);

    [Fact]
    public void Valid_dimensions_have_no_issues()
    {
        Assert.Empty(Valid.Validate());
        Assert.True(Valid.IsValid());
        Assert.True(Angle.TryCompute(Valid, out var p, out var issues));
        Assert.NotNull(p);
        Assert.Empty(issues);
    }

    [Theory]
    [InlineData(nameof(AngleDimensions.LongLeg), "long leg d = 0 mm must be greater than 0 mm")]
    [InlineData(nameof(AngleDimensions.ShortLeg), "short leg b = 0 mm must be greater than 0 mm")]
    [InlineData(nameof(AngleDimensions.Thickness), "thickness t = 0 mm must be greater than 0 mm")]
    public void Zero_dimension_is_reported_with_its_field(string field, string message)
    {
        var dims = field switch
        {
            nameof(AngleDimensions.LongLeg) => Valid with { LongLeg = 0 },
            nameof(AngleDimensions.ShortLeg) => Valid with { ShortLeg = 0 },
            _ => Valid with { Thickness = 0 },
        };

        var issue = Assert.Single(dims.Validate());

        Assert.Equal(new ValidationIssue(field, message), issue);
    }

    [Fact]
    public void Negative_radii_are_reported()
    {
        var issues = (Valid with { RootRadius = -1, ToeRadius = -2 }).Validate();

        Assert.Equal(
            [
                new ValidationIssue(nameof(AngleDimensions.RootRadius), "root radius r1 = -1 mm must not be negative"),
                new ValidationIssue(nameof(AngleDimensions.ToeRadius), "toe radius r2 = -2 mm must not be negative"),
            ],
            issues);
    }

    [Theory]
    [InlineData(double.NaN, "NaN")]
    [InlineData(double.PositiveInfinity, "Infinity")]
    public void Non_finite_dimension_is_reported(double value, string shown)
    {
        var issue = Assert.Single((Valid with { Thickness = value }).Validate());

        Assert.Equal(nameof(AngleDimensions.Thickness), issue.Field);
        Assert.Equal($"thickness t must be a finite number of mm (got {shown})", issue.Message);
    }

    [Fact]
    public void Short_leg_longer_than_long_leg_is_reported()
    {
        var issue = Assert.Single((Valid with { LongLeg = 60, ShortLeg = 75 }).Validate());

        Assert.Equal(nameof(AngleDimensions.ShortLeg), issue.Field);
        Assert.Equal("short leg b = 75 mm must not exceed the long leg d = 60 mm (enter the longer leg as d)", issue.Message);
    }

    [Fact]
    public void Thickness_not_less_than_short_leg_is_reported()
    {
        var issue = Assert.Single((Valid with { Thickness = 75, RootRadius = 0, ToeRadius = 0 }).Validate());

        Assert.Equal(nameof(AngleDimensions.Thickness), issue.Field);
        Assert.Equal("thickness t = 75 mm must be less than the short leg b = 75 mm", issue.Message);
    }

    [Fact]
    public void Radii_that_do_not_fit_on_the_short_leg_are_reported()
    {
        var issue = Assert.Single((Valid with { ShortLeg = 20, Thickness = 8, RootRadius = 10, ToeRadius = 5 }).Validate());

        Assert.Equal(nameof(AngleDimensions.RootRadius), issue.Field);
        Assert.Equal("root radius r1 = 10 mm and toe radius r2 = 5 mm do not fit on the short leg: t + r1 + r2 = 23 mm must not exceed b = 20 mm", issue.Message);
    }

    [Fact]
    public void Toe_radius_larger_than_thickness_is_reported()
    {
        var issue = Assert.Single((Valid with { ToeRadius = 9 }).Validate());

        Assert.Equal(nameof(AngleDimensions.ToeRadius), issue.Field);
        Assert.Equal("toe radius r2 = 9 mm must not exceed the thickness t = 8 mm", issue.Message);
    }

    [Fact]
    public void Compute_throws_with_every_issue_and_TryCompute_returns_them()
    {
        var bad = Valid with { Thickness = -1, ToeRadius = -1 };

        Assert.False(bad.IsValid());
        var ex = Assert.Throws<InputValidationException>(() => Angle.Compute(bad));
        Assert.Equal(2, ex.Issues.Count);
        Assert.False(Angle.TryCompute(bad, out var p, out var issues));
        Assert.Null(p);
        Assert.Equal(ex.Issues, issues);
    }

    [Fact]
    public void Double_angle_rejects_a_negative_gap_and_equal_legs_for_unequal_angles()
    {
        var issues = DoubleAngle.Validate(Valid, -2, BackToBack.EqualLegs);

        Assert.Equal(
            [
                new ValidationIssue("gap", "gap s = -2 mm must not be negative"),
                new ValidationIssue("orientation", "equal legs back to back needs d = b (got d = 100 mm, b = 75 mm): choose LLBB or SLBB"),
            ],
            issues);
        Assert.Throws<InputValidationException>(() => DoubleAngle.Compute(Valid, -2, BackToBack.LongLegsBackToBack));
    }
}
