using TrussWeb.Core.Design;
using TrussWeb.Core.Materials;
using TrussWeb.Core.Records;
using TrussWeb.Core.Sections;
using TrussWeb.Core.Sizing;
using TrussWeb.Core.Validation;

namespace TrussWeb.Core.Tests.Sizing;

/// <summary>
/// The sizer's search logic, with a stand-in standard whose resistance is simply 0.9·A·Fy (squash
/// load): these tests are about ordering, determinism and the "next lighter fails" proof, not about
/// any clause. The real standard is exercised in the truss design tests.
/// </summary>
public class GroupSizerTests
{
    private static readonly SteelGrade Grade = new("S355JR", "EN 10025-2",
        [new ThicknessBand(16, 355), new ThicknessBand(40, 345)], 470, 200_000, 77_000);

    private static readonly SizingConstraints Angles = new() { Families = new HashSet<SectionFamily> { SectionFamily.Angle } };

    [Fact]
    public void Chooses_the_lightest_candidate_that_passes_every_member()
    {
        var candidates = new[] { Candidate("A", 300), Candidate("B", 500), Candidate("C", 800), Candidate("D", 1200) };
        // 0.9 · 500 mm² · 355 MPa = 159 750 N passes 150 kN; 0.9 · 300 · 355 = 95 850 N fails.
        var members = new[] { Demand("M1", 150_000), Demand("M2", 60_000) };

        var result = GroupSizer.Size("chords", members, candidates, Angles, Grade, new SquashStandard());

        Assert.Equal("B", result.Chosen!.Designation);
        Assert.Equal("A", result.NextLighter!.Designation);
        Assert.Contains("M1", result.NextLighterFailure);
        Assert.Equal(2, result.Results.Count);
        Assert.All(result.Results, r => Assert.NotNull(r.Record));
    }

    [Fact]
    public void Candidate_order_in_the_catalogue_does_not_change_the_choice()
    {
        var a = new[] { Candidate("A", 300), Candidate("B", 500), Candidate("B2", 500), Candidate("C", 800) };
        var members = new[] { Demand("M1", 150_000) };

        var forward = GroupSizer.Size("g", members, a, Angles, Grade, new SquashStandard());
        var backward = GroupSizer.Size("g", members, a.Reverse().ToArray(), Angles, Grade, new SquashStandard());

        Assert.Equal(forward.Chosen!.Designation, backward.Chosen!.Designation);
        Assert.Equal("B", forward.Chosen.Designation);
    }

    [Fact]
    public void Reports_failure_with_the_governing_check_when_nothing_passes()
    {
        var candidates = new[] { Candidate("A", 300), Candidate("B", 500) };

        var result = GroupSizer.Size("g", [Demand("M1", 1_000_000)], candidates, Angles, Grade, new SquashStandard());

        Assert.Null(result.Chosen);
        Assert.Contains("no admissible section passes", result.FailureReason);
        Assert.Contains("squash", result.FailureReason);
    }

    [Fact]
    public void Respects_family_and_size_limits()
    {
        var candidates = new[] { Candidate("thin", 900, thickness: 5), Candidate("thick", 1000, thickness: 8) };
        var limits = Angles with { MinThickness = 6 };

        var result = GroupSizer.Size("g", [Demand("M1", 10_000)], candidates, limits, Grade, new SquashStandard());

        Assert.Equal("thick", result.Chosen!.Designation);
        Assert.Null(result.NextLighter);
    }

    [Fact]
    public void Rejects_contradictory_limits_naming_the_field()
    {
        var limits = Angles with { MinDimension = 100, MaxDimension = 50 };

        var ex = Assert.Throws<InputValidationException>(() =>
            GroupSizer.Size("g", [Demand("M1", 1)], [Candidate("A", 300)], limits, Grade, new SquashStandard()));

        Assert.Contains(ex.Issues, i => i.Field == nameof(SizingConstraints.MaxDimension));
    }

    private static GroupMemberDemand Demand(string mark, double compression) =>
        new(mark, EffectiveLengths.Uniform(2000), new MemberForces(0, compression));

    private static SizingCandidate Candidate(string name, double area, double thickness = 8) => new(new SectionProperties
    {
        Designation = name,
        Family = SectionFamily.Angle,
        Symmetry = SymmetryKind.Asymmetric,
        Area = area,
        MassPerMetre = area * Material.Density * 1e-6,
        CentroidX = 0, CentroidY = 0, Ix = 1, Iy = 1, Ixy = 0, Iu = 1, Iv = 1, Alpha = 0, J = 1, Cw = 0,
        X0 = 0, Y0 = 0, U0 = 0, V0 = 0, Sx = 1, Sy = 1,
        Elements = [],
        GoverningThickness = thickness,
    }, 60, 60, thickness);

    /// <summary>Stand-in standard: resistance 0.9·A·Fy in compression; nothing else.</summary>
    private sealed class SquashStandard : IDesignStandard
    {
        public string Code => "test";

        public string Edition => "test";

        public string Version => "0";

        public IReadOnlyList<ValidationIssue> Validate(DesignMember member) => [];

        public MemberDesignResult CheckMember(DesignMember member, MemberForces forces, bool withRecord = true)
        {
            var resistance = 0.9 * member.Section.Area * member.Material.Fy;
            var u = forces.Compression / resistance;
            var status = u <= 1 ? CheckStatus.Pass : CheckStatus.Fail;
            var record = withRecord ? new CalcRecord("squash").Add("Cr", "squash", "0.9AFy", "", resistance, "N", "test") : null;
            var check = new CheckResult("squash", forces.Compression, resistance, u, status, "N", "test", record);
            return new MemberDesignResult(member.Mark, member.Section.Designation, Code, Version, [check], u, "squash", status, record);
        }
    }
}
