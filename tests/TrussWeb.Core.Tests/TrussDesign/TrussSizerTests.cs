using TrussWeb.Core.Records;
using TrussWeb.Core.Sections;
using TrussWeb.Core.Sizing;
using TrussWeb.Core.TrussDesign;
using static TrussWeb.Core.Tests.TrussDesign.TrussDesignFixture;

namespace TrussWeb.Core.Tests.TrussDesign;

public class TrussSizerTests
{
    [Fact]
    public void Sizing_settles_and_every_member_passes()
    {
        var result = TrussSizer.Size(Input(Pratt24(), size: true), Shapes);

        Assert.True(result.Converged, "self-weight iteration should settle within six rounds");
        Assert.InRange(result.Rounds.Count, 1, TrussSizer.MaxRounds);
        Assert.Empty(result.Unsized);
        Assert.Equal(CheckStatus.Pass, result.Design.Status);
        Assert.All(result.Design.Members, m => Assert.True(m.Design.Utilization <= 1, $"{m.Mark}: {m.Design.Utilization}"));
    }

    [Fact]
    public void Sizing_is_deterministic()
    {
        var a = TrussSizer.Size(Input(Pratt24(), size: true), Shapes);
        var b = TrussSizer.Size(Input(Pratt24(), size: true), Shapes);

        Assert.Equal(
            a.FinalInput.Groups.ToDictionary(p => p.Key, p => p.Value.Section!.Designation),
            b.FinalInput.Groups.ToDictionary(p => p.Key, p => p.Value.Section!.Designation));
        Assert.Equal(a.Design.Mass, b.Design.Mass);
    }

    [Fact]
    public void The_next_lighter_admissible_candidate_fails_for_every_sized_group()
    {
        var input = Input(Pratt24(), size: true);
        var result = TrussSizer.Size(input, Shapes);

        foreach (var (name, settings) in result.FinalInput.Groups)
        {
            var constraints = input.Groups[name].Constraints!;
            var chosen = settings.Section!;
            var lighter = CandidateBuilder.FromCatalogue(Shapes, constraints.Families, settings.DoubleAngleGap, settings.Orientation)
                .Where(constraints.Admits)
                .Where(c => c.MassPerMetre < chosen.MassPerMetre
                    || (c.MassPerMetre == chosen.MassPerMetre && string.CompareOrdinal(c.Section.Designation, chosen.Designation) < 0))
                .OrderByDescending(c => c.MassPerMetre)
                .FirstOrDefault();
            if (lighter is null)
            {
                continue; // the lightest admissible section was chosen: nothing lighter to fail
            }

            var groups = result.FinalInput.Groups.ToDictionary(p => p.Key, p => p.Value);
            groups[name] = settings with { Section = lighter.Section };
            var trial = TrussDesigner.Design(result.FinalInput with { Groups = groups }, withRecords: false);

            Assert.Contains(trial.Members, m => m.Group == name && m.Design.Status == CheckStatus.Fail);
        }
    }

    [Fact]
    public void A_group_that_no_section_can_carry_is_reported_with_its_governing_check_not_hidden()
    {
        var input = Input(Pratt24(), size: true, Actions() with { ImposedKPaOnPlan = 6 });
        var groups = input.Groups.ToDictionary(p => p.Key, p => p.Value);
        groups["TopChord"] = groups["TopChord"] with
        {
            Constraints = groups["TopChord"].Constraints! with { MaxDimension = 50 },
        };

        var result = TrussSizer.Size(input with { Groups = groups }, Shapes);

        var top = Assert.Single(result.Unsized);
        Assert.Equal("TopChord", top.Group);
        Assert.Contains("no admissible section passes", top.FailureReason);
        Assert.Equal(CheckStatus.Fail, result.Design.Status);
    }

    [Fact]
    public void Double_angle_groups_keep_one_gap()
    {
        var result = TrussSizer.Size(Input(Pratt24(), size: true), Shapes);

        var chord = result.FinalInput.Groups["TopChord"].Section!;
        Assert.Equal(SectionFamily.DoubleAngle, chord.Family);
        Assert.Equal(10, chord.Gap);
    }
}
