using Microsoft.EntityFrameworkCore;
using TrussWeb.Core.Model;
using TrussWeb.Data;
using TrussWeb.Services.Contracts;

namespace TrussWeb.Services.Tests;

public abstract partial class ServiceBehaviourTests
{
    [Fact]
    public async Task The_second_of_two_conflicting_saves_gets_a_conflict_naming_the_other_user_and_keeping_its_values()
    {
        var (_, truss) = await ProjectWithTrussAsync();
        var loadedByDesigner = Ok(await As(Designer).Trusses.GetAsync(truss.Id));
        var loadedByLead = Ok(await As(Lead).Trusses.GetAsync(truss.Id));
        var a = loadedByLead.Actions;
        Ok(await As(Lead).Trusses.SaveActionsAsync(truss.Id, new ActionsInput(a.CoveringKPa, a.PurlinsAndServicesKPa, 0.6, a.WindCases, a.Version)));

        var d = loadedByDesigner.Actions;
        var result = await As(Designer).Trusses.SaveActionsAsync(truss.Id, new ActionsInput(d.CoveringKPa, d.PurlinsAndServicesKPa, 0.9, d.WindCases, d.Version));

        Assert.Equal(ResultKind.Conflict, result.Kind);
        var conflict = Assert.Single(result.Conflicts);
        Assert.Equal("TrussActions", conflict.EntityType);
        Assert.Equal("Lerato Lead", conflict.ChangedByName);
        Assert.Contains("Lerato Lead", conflict.Message, StringComparison.Ordinal);
        Assert.Equal("0.9", conflict.YourValues["ImposedKPa"]);
        Assert.Equal("0.6", conflict.StoredValues!["ImposedKPa"]);
        Assert.Contains("ImposedKPa", conflict.ConflictingFields);
        Assert.Equal(0.6, Ok(await As(Designer).Trusses.GetAsync(truss.Id)).Actions.ImposedKPa);
    }

    [Fact]
    public async Task A_designer_of_another_project_is_refused_as_not_found()
    {
        var (project, truss) = await ProjectWithTrussAsync();
        var outsider = As(Outsider);

        Assert.Equal(ResultKind.NotFound, (await outsider.Projects.GetAsync(project.Id)).Kind);
        Assert.Equal(ResultKind.NotFound, (await outsider.Trusses.GetAsync(truss.Id)).Kind);
        var a = truss.Actions;
        Assert.Equal(ResultKind.NotFound, (await outsider.Trusses.SaveActionsAsync(truss.Id, new ActionsInput(9, 9, 9, [], a.Version))).Kind);
        Assert.Equal(ResultKind.NotFound, (await outsider.Design.DesignTrussAsync(truss.Id)).Kind);
        Assert.Empty(Ok(await outsider.Projects.ListMyProjectsAsync()));
        Assert.Equal(a.ImposedKPa, Ok(await As(Designer).Trusses.GetAsync(truss.Id)).Actions.ImposedKPa);
    }

    [Fact]
    public async Task A_checker_may_read_but_not_edit()
    {
        var (project, truss) = await ProjectWithTrussAsync();
        var checker = As(Checker);

        Ok(await checker.Trusses.GetAsync(truss.Id));
        Ok(await checker.Design.GetTrussDesignAsync(truss.Id));
        var a = truss.Actions;
        var save = await checker.Trusses.SaveActionsAsync(truss.Id, new ActionsInput(a.CoveringKPa, a.PurlinsAndServicesKPa, 2, a.WindCases, a.Version));
        Assert.Equal(ResultKind.Forbidden, save.Kind);
        Assert.Equal(ResultKind.Forbidden, (await checker.Design.ProposeSizingAsync(truss.Id)).Kind);
        Assert.Equal(ResultKind.Forbidden, (await checker.Projects.CreateAsync(new ProjectInput("X", null, null, null, "A", "SANS 10162-1", null))).Kind);
        Assert.Equal(ResultKind.Forbidden, (await checker.Users.ListUsersAsync()).Kind);
        Assert.False(Ok(await checker.Trusses.GetAsync(truss.Id)).CanEdit);
        Assert.Equal(a.ImposedKPa, Ok(await checker.Trusses.GetAsync(truss.Id)).Actions.ImposedKPa);
        Assert.Equal(ResultKind.Forbidden, (await As(Designer).Projects.UpdateSettingsAsync(project.Id,
            new ProjectInput("Renamed", null, null, null, "B", "SANS 10162-1", "S355JR"), project.Version)).Kind);
    }

    [Fact]
    public async Task The_administrator_sees_the_installed_schema_and_versions_and_nobody_else_does()
    {
        await ProjectWithTrussAsync();

        var info = Ok(await As(Admin).Users.GetSystemInfoAsync());

        Assert.Equal(0, info.PendingMigrations);
        Assert.False(string.IsNullOrEmpty(info.SchemaVersion));
        Assert.Contains(Database.Provider == TrussWeb.Data.DatabaseProvider.Postgres ? "Npgsql" : "Sqlite", info.DatabaseProvider);
        Assert.Equal("SANS 10162-1", info.StandardCode);
        Assert.Equal(ResultKind.Forbidden, (await As(Designer).Users.GetSystemInfoAsync()).Kind);
    }

    [Fact]
    public async Task An_administrator_may_edit_any_project_and_manage_users()
    {
        var (_, truss) = await ProjectWithTrussAsync();
        var admin = As(Admin);
        var a = truss.Actions;

        var saved = Ok(await admin.Trusses.SaveActionsAsync(truss.Id, new ActionsInput(a.CoveringKPa, a.PurlinsAndServicesKPa, 0.7, a.WindCases, a.Version)));
        Assert.Equal(0.7, saved.Actions.ImposedKPa);
        Assert.Single(Ok(await admin.Projects.ListMyProjectsAsync()));

        var user = Ok(await admin.Users.CreateUserAsync(new CreateUserInput("nomsa.new@example.test", "Nomsa New", "new-user-pass-9", [Roles.Designer])));
        Assert.Equal([Roles.Designer], user.Roles);
        user = Ok(await admin.Users.SetRolesAsync(user.Id, [Roles.Checker, Roles.ProjectLead]));
        Assert.Equal([Roles.Checker, Roles.ProjectLead], user.Roles);
        Assert.True(Ok(await admin.Users.SetLockedAsync(user.Id, true)).IsLockedOut);
        Assert.False(Ok(await admin.Users.SetLockedAsync(user.Id, false)).IsLockedOut);
        var weak = await admin.Users.ResetPasswordAsync(user.Id, "short1");
        Assert.Equal(ResultKind.Invalid, weak.Kind);
        Assert.Contains(weak.Errors, e => e.Field == "NewPassword" && e.Message.Contains("10", StringComparison.Ordinal));
        var noDigit = await admin.Users.CreateUserAsync(new CreateUserInput("x@example.test", "X", "no-digits-here", []));
        Assert.Equal(ResultKind.Invalid, noDigit.Kind);
        Assert.Contains(noDigit.Errors, e => e.Field == "Password");
    }

    [Fact]
    public async Task Bad_input_returns_field_named_errors_and_leaves_saved_data_untouched()
    {
        var (project, truss) = await ProjectWithTrussAsync();
        var designer = As(Designer);
        var before = Ok(await designer.Design.GetTrussDesignAsync(truss.Id));

        var badTruss = await designer.Trusses.CreateFromGeneratorAsync(project.Id, new TrussGeneratorInput("RT2", TrussType.PitchedHowe, -5, 15, null, 0, 5, 4500, null));
        Assert.Equal(ResultKind.Invalid, badTruss.Kind);
        Assert.Contains(badTruss.Errors, e => e.Field == nameof(TrussGeneratorInput.SpanMm) && e.Message.Contains("greater than 0", StringComparison.Ordinal));
        Assert.Contains(badTruss.Errors, e => e.Field == nameof(TrussGeneratorInput.PanelCount) && e.Message.Contains("even", StringComparison.Ordinal));

        var a = truss.Actions;
        var badActions = await designer.Trusses.SaveActionsAsync(truss.Id, new ActionsInput(a.CoveringKPa, a.PurlinsAndServicesKPa, -1, a.WindCases, a.Version));
        Assert.Equal(ResultKind.Invalid, badActions.Kind);
        Assert.Contains(badActions.Errors, e => e.Field == nameof(ActionsInput.ImposedKPa));

        var node = truss.Nodes[0];
        var badNodes = await designer.Trusses.SaveNodesAsync(truss.Id, new NodeTableInput([new NodeRow(node.Id, node.Version, node.Label, double.NaN, node.YMm, node.IsPurlinPoint)], []));
        Assert.Equal(ResultKind.Invalid, badNodes.Kind);
        Assert.Contains(badNodes.Errors, e => e.Field == "Rows[0].XMm");

        var used = await designer.Trusses.SaveNodesAsync(truss.Id, new NodeTableInput([], [new RowRef(node.Id, node.Version)]));
        Assert.Equal(ResultKind.Invalid, used.Kind);
        Assert.Contains(used.Errors, e => e.Field == "Deleted[0]" && e.Message.Contains("used by members", StringComparison.Ordinal));

        var g = truss.Groups.First();
        var badGroup = await designer.Trusses.SaveGroupsAsync(truss.Id, new GroupTableInput(
            [new GroupRow(g.Id, g.Version, g.Name, g.Role, g.GradeName, "L999x999x99", g.Limits, g.DoubleAngleGapMm, g.Orientation)], []));
        Assert.Equal(ResultKind.Invalid, badGroup.Kind);
        Assert.Contains(badGroup.Errors, e => e.Field == $"Groups[{g.Name}].SectionDesignation");

        var member = truss.Members[0];
        var badK = await designer.Design.UpdateMemberDesignAsync(truss.Id, member.Id, new MemberDesignInput(member.Overrides with { Kx = -1 }, member.Version));
        Assert.Equal(ResultKind.Invalid, badK.Kind);
        Assert.Contains(badK.Errors, e => e.Field == nameof(MemberOverrides.Kx));

        var badProject = await As(Lead).Projects.UpdateSettingsAsync(project.Id, new ProjectInput("", null, null, null, "A", "NO-SUCH-CODE", "Unobtainium"), project.Version);
        Assert.Equal(ResultKind.Invalid, badProject.Kind);
        Assert.Equal([nameof(ProjectInput.Name), nameof(ProjectInput.StandardCode), nameof(ProjectInput.DefaultGradeName)], badProject.Errors.Select(e => e.Field));

        var after = Ok(await designer.Trusses.GetAsync(truss.Id));
        Assert.Equal(truss.Nodes.Select(n => (n.Id, n.XMm, n.Version)), after.Nodes.Select(n => (n.Id, n.XMm, n.Version)));
        Assert.Equal(a.ImposedKPa, after.Actions.ImposedKPa);
        Assert.Equal(truss.Groups.Select(x => x.SectionDesignation), after.Groups.Select(x => x.SectionDesignation));
        Assert.Equal(before.Fingerprint, Ok(await designer.Design.GetTrussDesignAsync(truss.Id)).Fingerprint);
        await using var db = await ContextAsync();
        Assert.Equal(1, await db.Trusses.CountAsync());
        Assert.Equal(project.Name, (await db.Projects.SingleAsync()).Name);
    }

    [Fact]
    public async Task A_catalogue_import_with_an_error_imports_nothing_and_names_file_line_and_field()
    {
        var admin = As(Admin);
        await using var db = await ContextAsync();
        var count = await db.SectionCatalogue.CountAsync();

        var bad = await admin.Catalogue.ImportCatalogueAsync("extra-angles.csv", "designation,d,b,t,r1,r2\nL47x47x4,47,47,4,7,3.5\nL47x47x0,47,47,0,7,3.5\n");
        Assert.Equal(ResultKind.Invalid, bad.Kind);
        var error = Assert.Single(bad.Errors);
        Assert.Equal("extra-angles.csv", error.File);
        Assert.Equal(3, error.Line);
        Assert.Equal(count, await db.SectionCatalogue.CountAsync());

        var good = Ok(await admin.Catalogue.ImportCatalogueAsync("extra-angles.csv", "designation,d,b,t,r1,r2\nL47x47x4,47,47,4,7,3.5\n"));
        Assert.Equal(1, good.Added);
        Assert.Equal(count + 1, await db.SectionCatalogue.CountAsync());
        Assert.Equal(ResultKind.Forbidden, (await As(Designer).Catalogue.ImportCatalogueAsync("x.csv", "designation,d,b,t,r1,r2\n")).Kind);

        var listed = Ok(await As(Designer).Catalogue.ListSectionsAsync(new SectionFilter(TrussWeb.Core.Sections.SectionFamily.Angle, "47x47", null, null)));
        var section = Assert.Single(listed);
        var detail = Ok(await As(Designer).Catalogue.GetSectionAsync(section.Designation));
        Assert.Contains(detail.Properties, p => p.Symbol == "A" && p.Value > 0);
    }

    [Fact]
    public async Task Double_angle_listing_is_built_from_the_angle_rows_only()
    {
        var all = Ok(await As(Designer).Catalogue.ListSectionsAsync(new SectionFilter()));
        var angles = all.Count(i => i.Family == TrussWeb.Core.Sections.SectionFamily.Angle);

        var pairs = Ok(await As(Designer).Catalogue.ListSectionsAsync(new SectionFilter(TrussWeb.Core.Sections.SectionFamily.DoubleAngle)));

        Assert.Equal(angles, pairs.Count);
        Assert.All(pairs, p =>
        {
            Assert.Equal(TrussWeb.Core.Sections.SectionFamily.DoubleAngle, p.Family);
            Assert.StartsWith("2L", p.Designation);
        });
    }
}
