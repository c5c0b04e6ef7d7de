using Microsoft.EntityFrameworkCore;
using TrussWeb.Data;
using TrussWeb.Services.Contracts;

namespace TrussWeb.Services.Tests;

public abstract partial class ServiceBehaviourTests
{
    [Fact]
    public async Task Generating_a_truss_designs_it_and_stores_a_fingerprinted_snapshot_per_member_and_one_for_the_truss()
    {
        var (project, truss) = await ProjectWithTrussAsync();

        var design = Ok(await As(Designer).Design.DesignTrussAsync(truss.Id));

        Assert.Equal(truss.Members.Count, design.Members.Count);
        Assert.NotEqual("NotDesigned", design.Status);
        Assert.True(design.MassKg > 0);
        Assert.All(design.Members, m => Assert.Matches("^[0-9a-f]{64}$", m.Fingerprint));
        Assert.Matches("^[0-9a-f]{64}$", design.Fingerprint!);
        await using var db = await ContextAsync();
        var snapshots = await db.DesignSnapshots.Where(s => s.TrussId == truss.Id).ToListAsync();
        Assert.Equal(truss.Members.Count + 1, snapshots.Count);
        Assert.Single(snapshots, s => s.MemberId is null);
        Assert.All(snapshots, s => Assert.Equal("SANS 10162-1", s.StandardCode));
        Assert.Equal(design.Members.Select(m => m.Fingerprint).Order(), snapshots.Where(s => s.MemberId != null).Select(s => s.Fingerprint).Order());

        var list = Ok(await As(Lead).Projects.ListMyProjectsAsync());
        var rollup = Assert.Single(Assert.Single(list).Trusses);
        Assert.Equal(truss.Members.Count, rollup.Passing + rollup.Failing + rollup.OutOfScope);
        Assert.Equal(0, rollup.NotDesigned);
        Assert.Equal(truss.Members.Count, rollup.ReviewStates["NotSubmitted"]);
        Assert.Equal(project.Id, list[0].Id);
    }

    [Fact]
    public async Task Truss_spacing_beyond_the_outer_length_limit_is_refused_naming_the_limit_and_nothing_is_saved()
    {
        var (_, truss) = await ProjectWithTrussAsync();
        var result = await As(Designer).Trusses.SaveSettingsAsync(truss.Id,
            new TrussSettingsInput(truss.Name, 1e308, null, truss.DeflectionLimitRatio, truss.ConnectionAllowanceFraction, truss.Notes, truss.Version));
        Assert.Equal(ResultKind.Invalid, result.Kind);
        // Source: TrussWeb.Core.Validation.PlausibleRange.MaxLengthMm (500 m), the outer limit of spans and spacings.
        Assert.Contains(result.Errors, e => e.Field == nameof(TrussSettingsInput.SpacingMm) && e.Message.Contains("at most 500000 mm", StringComparison.Ordinal));
        Assert.Equal(truss.SpacingMm, Ok(await As(Designer).Trusses.GetAsync(truss.Id)).SpacingMm);
    }

    [Fact]
    public async Task A_member_design_is_read_from_its_snapshot_with_the_calculation_record()
    {
        var (_, truss) = await ProjectWithTrussAsync();
        var member = truss.Members.First(m => m.Mark == "TC1");

        var detail = Ok(await As(Checker).Design.GetMemberDesignAsync(truss.Id, member.Id));

        Assert.Equal("TC1", detail.Row.Mark);
        Assert.NotEmpty(detail.Checks);
        Assert.NotEmpty(detail.Steps);
        Assert.Contains(detail.Notes, n => n.Contains("SANS 10162-1", StringComparison.Ordinal));
        Assert.True(detail.Row.Forces.MaxTensionN > 0 || detail.Row.Forces.MaxCompressionN > 0);
        Assert.Equal(member.Fingerprint, detail.Row.Fingerprint);
        Assert.Contains("\"mark\":\"TC1\"", detail.InputsJson, StringComparison.Ordinal);
    }

    [Fact]
    public async Task Sizing_proposal_accepted_applies_the_sections_and_redesigns()
    {
        var (_, truss) = await ProjectWithTrussAsync();
        var designer = As(Designer);

        var progress = new RecordingProgress();
        var proposal = Ok(await designer.Design.ProposeSizingAsync(truss.Id, progress));
        Assert.NotEmpty(proposal.Rounds);
        Assert.Contains(progress.Reports, r => r.Round == 1 && r.Message.Contains("TopChord", StringComparison.Ordinal));
        Assert.True(proposal.MassAfterKg > 0);
        Assert.Empty(proposal.Unsized);
        var accepted = Ok(await designer.Design.AcceptSizingAsync(proposal));

        var after = Ok(await designer.Trusses.GetAsync(truss.Id));
        foreach (var p in proposal.Groups)
        {
            Assert.Equal(p.ProposedSection, after.Groups.Single(g => g.Id == p.GroupId).SectionDesignation);
        }

        Assert.Equal(proposal.MassAfterKg, accepted.MassKg, 6);
        Assert.All(accepted.Members, m => Assert.True(m.Utilization <= 1.0 + 1e-9, $"{m.Mark} {m.Utilization}"));
        await using var db = await ContextAsync();
        Assert.True(await db.AuditEntries.AnyAsync(a => a.Action == "SizingAccepted" && a.EntityId == truss.Id.ToString() && a.Fingerprint != null));
    }

    [Fact]
    public async Task Sizing_proposal_discarded_changes_nothing()
    {
        var (_, truss) = await ProjectWithTrussAsync();
        var designer = As(Designer);
        var before = Ok(await designer.Design.GetTrussDesignAsync(truss.Id));

        var proposal = Ok(await designer.Design.ProposeSizingAsync(truss.Id));
        Assert.Contains(proposal.Groups, g => g.ProposedSection != g.CurrentSection);
        Ok(await designer.Design.DiscardSizingAsync(proposal));

        var after = Ok(await designer.Trusses.GetAsync(truss.Id));
        Assert.Equal(truss.Groups.Select(g => (g.Name, g.SectionDesignation, g.Version)), after.Groups.Select(g => (g.Name, g.SectionDesignation, g.Version)));
        Assert.Equal(before.Fingerprint, Ok(await designer.Design.GetTrussDesignAsync(truss.Id)).Fingerprint);
        await using var db = await ContextAsync();
        Assert.True(await db.AuditEntries.AnyAsync(a => a.Action == "SizingDiscarded"));
    }

    [Fact]
    public async Task Accepting_a_proposal_after_someone_changed_a_group_is_a_conflict()
    {
        var (_, truss) = await ProjectWithTrussAsync();
        var proposal = Ok(await As(Designer).Design.ProposeSizingAsync(truss.Id));
        var changed = proposal.Groups.First(g => g.ProposedSection != g.CurrentSection);
        var group = truss.Groups.Single(g => g.Id == changed.GroupId);
        Ok(await As(Lead).Trusses.SaveGroupsAsync(truss.Id, new GroupTableInput(
            [new GroupRow(group.Id, group.Version, group.Name, group.Role, group.GradeName, group.SectionDesignation, group.Limits, 12, group.Orientation)], [])));

        var result = await As(Designer).Design.AcceptSizingAsync(proposal);

        Assert.Equal(ResultKind.Conflict, result.Kind);
        Assert.Contains("Lerato Lead", result.Message, StringComparison.Ordinal);
    }

    [Fact]
    public async Task Editing_a_member_section_changes_its_utilization_and_fingerprint()
    {
        var (_, truss) = await ProjectWithTrussAsync();
        var member = truss.Members.First(m => m.Mark == "TC1");
        var before = Ok(await As(Designer).Design.GetMemberDesignAsync(truss.Id, member.Id));

        var after = Ok(await As(Designer).Design.UpdateMemberDesignAsync(truss.Id, member.Id,
            new MemberDesignInput(before.Overrides with { SectionOverride = "2L100x100x10 s=10" }, before.MemberVersion)));

        Assert.Equal("2L100x100x10 s=10", after.Row.Section);
        Assert.True(after.Row.Utilization < before.Row.Utilization, $"{after.Row.Utilization} vs {before.Row.Utilization}");
        Assert.NotEqual(before.Row.Fingerprint, after.Row.Fingerprint);
        Assert.Equal(before.MemberVersion + 1, after.MemberVersion);
    }

    [Fact]
    public async Task An_unchanged_save_or_a_second_design_run_keeps_every_fingerprint()
    {
        var (_, truss) = await ProjectWithTrussAsync();
        var designer = As(Designer);
        var first = Ok(await designer.Design.DesignTrussAsync(truss.Id));

        var a = truss.Actions;
        Ok(await designer.Trusses.SaveActionsAsync(truss.Id, new ActionsInput(a.CoveringKPa, a.PurlinsAndServicesKPa, a.ImposedKPa, a.WindCases, a.Version)));
        var second = Ok(await designer.Design.DesignTrussAsync(truss.Id));

        Assert.Equal(Fingerprints(first), Fingerprints(second));
        Assert.Equal(first.Fingerprint, second.Fingerprint);
        Assert.Equal(a.Version, Ok(await designer.Trusses.GetAsync(truss.Id)).Actions.Version);
    }

    [Theory]
    [InlineData("section")]
    [InlineData("lengths")]
    [InlineData("K")]
    [InlineData("loads")]
    [InlineData("combinations")]
    [InlineData("geometry")]
    [InlineData("material")]
    [InlineData("connectors")]
    public async Task Each_kind_of_input_change_gives_the_affected_member_a_new_fingerprint(string kind)
    {
        var (project, truss) = await ProjectWithTrussAsync();
        var designer = As(Designer);
        var before = Ok(await designer.Design.GetTrussDesignAsync(truss.Id));
        await ChangeInputAsync(kind, project, truss, before);

        var after = Ok(await designer.Design.GetTrussDesignAsync(truss.Id));

        Assert.NotEqual(Fingerprints(before)["TC1"], Fingerprints(after)["TC1"]);
        Assert.NotEqual(before.Fingerprint, after.Fingerprint);
        if (kind is "lengths" or "K" or "connectors")
        {
            // A member-only change leaves members it does not touch alone.
            Assert.Equal(Fingerprints(before)["BC1"], Fingerprints(after)["BC1"]);
        }
    }

    /// <summary>
    /// Makes one kind of input change that alters TC1's design (section, lengths, K, loads, combinations,
    /// geometry, material, connectors), as the designer (the project lead for the default grade).
    /// </summary>
    protected async Task ChangeInputAsync(string kind, ProjectDetail project, TrussDetail truss, TrussDesignView before)
    {
        var designer = As(Designer);
        var tc1 = truss.Members.First(m => m.Mark == "TC1");
        var o = tc1.Overrides;
        switch (kind)
        {
            case "section":
                var chord = truss.Groups.Single(g => g.Name == "TopChord");
                Ok(await designer.Trusses.SaveGroupsAsync(truss.Id, new GroupTableInput(
                    [new GroupRow(chord.Id, chord.Version, chord.Name, chord.Role, chord.GradeName, "2L60x60x6 s=10", chord.Limits, chord.DoubleAngleGapMm, chord.Orientation)], [])));
                break;
            case "lengths":
                Ok(await designer.Design.UpdateMemberDesignAsync(truss.Id, tc1.Id, new MemberDesignInput(o with { LengthYMm = 900 }, tc1.Version)));
                break;
            case "K":
                Ok(await designer.Design.UpdateMemberDesignAsync(truss.Id, tc1.Id, new MemberDesignInput(o with { Kx = 0.9 }, tc1.Version)));
                break;
            case "loads":
                var a = truss.Actions;
                Ok(await designer.Trusses.SaveActionsAsync(truss.Id, new ActionsInput(a.CoveringKPa, a.PurlinsAndServicesKPa, a.ImposedKPa + 0.1, a.WindCases, a.Version)));
                break;
            case "combinations":
                // The combination that gives TC1 its largest force: its envelope (and so its fingerprint) must move.
                var forces = before.Members.Single(m => m.Mark == "TC1").Forces;
                var governing = forces.MaxCompressionN >= forces.MaxTensionN ? forces.CompressionCombination : forces.TensionCombination;
                var c = truss.Combinations.First(x => x.Name == governing);
                var all = truss.Combinations.Select(x => new CombinationRow(x.Id, x.Version, x.Name, x.LimitState, x.SortOrder,
                    x.Id == c.Id ? x.Factors.Select(f => f.Key == "kind:Permanent" ? f with { Factor = f.Factor + 0.3 } : f).ToList() : x.Factors)).ToList();
                Ok(await designer.Trusses.SaveCombinationsAsync(truss.Id, new CombinationTableInput(all, [])));
                break;
            case "geometry":
                var apex = truss.Nodes.OrderByDescending(n => n.YMm).First();
                Ok(await designer.Trusses.SaveNodesAsync(truss.Id, new NodeTableInput(
                    [new NodeRow(apex.Id, apex.Version, apex.Label, apex.XMm, apex.YMm + 150, apex.IsPurlinPoint)], [])));
                break;
            case "material":
                Ok(await As(Lead).Projects.UpdateSettingsAsync(project.Id, new ProjectInput(project.Name, project.Client, project.Reference, project.Location,
                    project.Revision, project.StandardCode, "S275JR"), project.Version));
                break;
            case "connectors":
                Ok(await designer.Design.UpdateMemberDesignAsync(truss.Id, tc1.Id, new MemberDesignInput(o with { ConnectorCount = 3 }, tc1.Version)));
                break;
        }
    }

    [Fact]
    public async Task A_restart_over_the_same_database_keeps_projects_trusses_and_designs()
    {
        var (project, truss) = await ProjectWithTrussAsync();
        var design = Ok(await As(Designer).Design.DesignTrussAsync(truss.Id));

        var restarted = NewServices();
        await TrussWebStartup_again(restarted);
        var again = As(Designer, restarted);

        var detail = Ok(await again.Trusses.GetAsync(truss.Id));
        Assert.Equal(truss.Nodes.Count, detail.Nodes.Count);
        Assert.Equal(truss.Combinations.Select(c => c.Name), detail.Combinations.Select(c => c.Name));
        var stored = Ok(await again.Design.GetTrussDesignAsync(truss.Id));
        Assert.Equal(Fingerprints(design), Fingerprints(stored));
        Assert.Equal(project.Name, Ok(await again.Projects.GetAsync(project.Id)).Name);
    }

    private Task TrussWebStartup_again(Microsoft.Extensions.DependencyInjection.ServiceProvider provider) =>
        TrussWeb.Services.Hosting.TrussWebStartup.InitialiseAsync(provider, Options(demo: false));

    [Fact]
    public async Task Every_input_change_and_design_run_is_audited_with_user_old_and_new_value()
    {
        var (_, truss) = await ProjectWithTrussAsync();
        var a = truss.Actions;

        Ok(await As(Designer).Trusses.SaveActionsAsync(truss.Id, new ActionsInput(a.CoveringKPa, a.PurlinsAndServicesKPa, 0.75, a.WindCases, a.Version)));
        Ok(await As(Designer).Design.DesignTrussAsync(truss.Id));

        await using var db = await ContextAsync();
        var change = await db.AuditEntries.SingleAsync(e => e.EntityType == "TrussActions" && e.Field == "ImposedKPa" && e.NewValue == "0.75");
        Assert.Equal("0.5", change.OldValue);
        Assert.Equal(Designer.UserId, change.UserId);
        Assert.Equal(Start.UtcDateTime, change.UtcTime);
        Assert.Matches("^[0-9a-f]{64}$", change.Fingerprint!);
        Assert.True(await db.AuditEntries.CountAsync(e => e.Action == "Designed" && e.EntityId == truss.Id.ToString()) >= 1);
        Assert.True(await db.AuditEntries.AnyAsync(e => e.EntityType == "Project" && e.Action == "Created"));
    }

    /// <summary>Keeps every report, synchronously (no timing involved).</summary>
    private sealed class RecordingProgress : IProgress<SizingProgress>
    {
        public List<SizingProgress> Reports { get; } = [];

        public void Report(SizingProgress value)
        {
            lock (Reports)
            {
                Reports.Add(value);
            }
        }
    }
}
