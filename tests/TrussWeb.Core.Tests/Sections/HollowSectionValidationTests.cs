using TrussWeb.Core.Sections;
using TrussWeb.Core.Validation;

namespace TrussWeb.Core.Tests.Sections;

/// <summary>Every rule of the hollow-section Validate methods, with the message the user sees.</summary>
public class HollowSectionValidationTests
{
    [Fact]
    public void Circular_hollow_section_with_zero_diameter_is_reported()
    {
        var issue = Assert.Single(new CircularHollowDimensions(0, 3).Validate());

        Assert.Equal(new ValidationIssue("Diameter", "diameter D = 0 mm must be greater than 0 mm"), issue);
    }

    [Fact]
    public void Circular_hollow_section_thicker_than_its_radius_is_reported()
    {
        var issue = Assert.Single(new CircularHollowDimensions(40, 20).Validate());

        Assert.Equal(new ValidationIssue("Thickness", "thickness t = 20 mm must be less than half the diameter, D/2 = 20 mm"), issue);
        Assert.Throws<InputValidationException>(() => CircularHollow.Compute(40, 20));
        Assert.False(CircularHollow.TryCompute(new CircularHollowDimensions(40, 20), out _, out _));
    }

    [Fact]
    public void Rectangular_hollow_section_with_negative_thickness_is_reported()
    {
        var issue = Assert.Single(new RectangularHollowDimensions(100, 50, -5).Validate());

        Assert.Equal(new ValidationIssue("Thickness", "thickness t = -5 mm must be greater than 0 mm"), issue);
    }

    [Fact]
    public void Rectangular_hollow_section_too_thick_for_its_side_is_reported()
    {
        var issue = Assert.Single(new RectangularHollowDimensions(100, 40, 10, OuterRadius: 10).Validate());

        Assert.Equal(new ValidationIssue("Thickness", "thickness t = 10 mm is too large for the width b = 40 mm: 4t = 40 mm must be less than 40 mm"), issue);
    }

    [Fact]
    public void Default_corners_that_do_not_fit_are_reported_on_the_smaller_side()
    {
        // t = 8: default ro = 2.5t = 20 mm, 2ro = 40 mm = b.
        var issue = Assert.Single(new RectangularHollowDimensions(100, 40, 8).Validate());

        Assert.Equal(new ValidationIssue("Width", "the corners do not fit: 2 ro = 40 mm (EN 10219 default for t = 8 mm) must be less than the width b = 40 mm"), issue);
    }

    [Fact]
    public void Given_corner_radius_that_does_not_fit_is_reported_on_the_radius()
    {
        var issue = Assert.Single(new RectangularHollowDimensions(60, 100, 5, OuterRadius: 30).Validate());

        Assert.Equal(new ValidationIssue("OuterRadius", "the corners do not fit: 2 ro = 60 mm must be less than the depth h = 60 mm"), issue);
    }

    [Fact]
    public void Corner_radius_smaller_than_the_thickness_is_reported()
    {
        var issue = Assert.Single(new RectangularHollowDimensions(100, 50, 5, OuterRadius: 4).Validate());

        Assert.Equal(new ValidationIssue("OuterRadius", "outer corner radius ro = 4 mm must not be less than the thickness t = 5 mm (inner radius ro - t would be negative)"), issue);
        Assert.Throws<InputValidationException>(() => RectangularHollow.Compute(100, 50, 5, 4));
    }

    [Fact]
    public void Valid_hollow_sections_have_no_issues()
    {
        Assert.Empty(new CircularHollowDimensions(114.3, 3.6).Validate());
        Assert.True(new CircularHollowDimensions(114.3, 3.6).IsValid());
        Assert.False(new CircularHollowDimensions(114.3, 60).IsValid());
        Assert.False(new RectangularHollowDimensions(100, 40, 8).IsValid());
        Assert.Empty(new RectangularHollowDimensions(200, 100, 8).Validate());
        Assert.True(RectangularHollow.TryCompute(new RectangularHollowDimensions(200, 100, 8), out var p, out var issues));
        Assert.NotNull(p);
        Assert.Empty(issues);
    }
}
