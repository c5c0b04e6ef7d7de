using Microsoft.Extensions.DependencyInjection;
using TrussWeb.Data;
using TrussWeb.Services.Contracts;
using TrussWeb.Web.Components.Pages.Projects;
using TrussWeb.Web.Tests.Fakes;
using TrussWeb.Web.Tests.Support;

namespace TrussWeb.Web.Tests.Projects;

public class ProjectPageTests : TrussWebTestContext
{
    private static readonly Guid Id = Guid.NewGuid();
    private readonly FakeProjectService _projects = new();

    public ProjectPageTests()
    {
        _projects.Project = new ProjectDetail(Id, 7, "Warehouse roof", "Client Ltd", "J-101", "Town", "A", "SANS 10162-1", "S355JR",
            Roles.ProjectLead, DateTime.UtcNow, DateTime.UtcNow, []);
        Services.AddSingleton<IProjectService>(_projects);
        Services.AddSingleton<ICatalogueService, FakeCatalogueService>();
        var exports = new FakeExportService();
        Services.AddSingleton<IExportService>(exports);
        Services.AddSingleton<IExportEvents>(exports);
        Services.AddSingleton<ICallerContext>(new FakeCaller("u1", "Lead Person", Roles.ProjectLead));
    }

    private static AngleSharp.Dom.IElement FieldBox(IRenderedComponent<ProjectPage> cut, string testId) =>
        cut.Find($"[data-testid={testId}]").Closest(".mud-input-control")!;

    [Fact]
    public async Task Invalid_result_puts_each_message_next_to_its_field()
    {
        _projects.OnUpdate = (_, _) => ServiceResult<ProjectDetail>.Invalid([
            new FieldError(nameof(ProjectInput.Name), "give the project a name"),
            new FieldError(nameof(ProjectInput.Revision), "give a revision, e.g. A")]);
        var cut = Render<ProjectPage>(p => p.Add(x => x.ProjectId, Id));

        await cut.Find("[data-testid=save-settings]").ClickAsync(new());

        cut.WaitForAssertion(() =>
        {
            Assert.Contains("give the project a name", FieldBox(cut, "project-name").TextContent);
            Assert.Contains("give a revision, e.g. A", FieldBox(cut, "project-revision").TextContent);
            Assert.DoesNotContain("give the project a name", FieldBox(cut, "project-revision").TextContent);
            Assert.DoesNotContain("give", FieldBox(cut, "project-client").TextContent);
        });
    }

    [Fact]
    public async Task Conflict_names_the_other_user_and_keeps_the_typed_values()
    {
        _projects.OnUpdate = (_, _) => ServiceResult<ProjectDetail>.Conflict([
            new ConflictDetail("Project", Id.ToString(), "Warehouse roof", "u2", "Other Engineer", new DateTime(2026, 12, 1, 21, 5, 0, DateTimeKind.Utc), false,
                ["Client"], new Dictionary<string, string?> { ["Client"] = "My typed client" }, new Dictionary<string, string?> { ["Client"] = "Their client" }, "Changed by Other Engineer.")]);
        var cut = Render<ProjectPage>(p => p.Add(x => x.ProjectId, Id));
        cut.Find("input[data-testid=project-client]").Change("My typed client");

        await cut.Find("[data-testid=save-settings]").ClickAsync(new());

        cut.WaitForAssertion(() =>
        {
            Assert.Equal("Other Engineer", cut.Find("[data-testid=conflict-user]").TextContent.Trim());
            Assert.Contains("Client is now 'Their client'", cut.Find("[data-testid=conflict-panel]").TextContent);
            Assert.Equal("My typed client", cut.Find("input[data-testid=project-client]").GetAttribute("value"));
        });
        Assert.Equal("My typed client", _projects.LastUpdate!.Client);
        Assert.Equal(7, _projects.LastUpdateVersion);
    }

    [Fact]
    public async Task Reload_after_a_conflict_takes_the_stored_values()
    {
        _projects.OnUpdate = (_, _) => ServiceResult<ProjectDetail>.Conflict([
            new ConflictDetail("Project", Id.ToString(), null, "u2", "Other Engineer", null, false, ["Client"], new Dictionary<string, string?>(), null, "Changed.")]);
        var cut = Render<ProjectPage>(p => p.Add(x => x.ProjectId, Id));
        cut.Find("input[data-testid=project-client]").Change("My typed client");
        await cut.Find("[data-testid=save-settings]").ClickAsync(new());
        _projects.Project = _projects.Project! with { Client = "Their client", Version = 8 };

        await cut.WaitForElement("[data-testid=conflict-reload]").ClickAsync(new());

        cut.WaitForAssertion(() =>
        {
            Assert.Empty(cut.FindAll("[data-testid=conflict-panel]"));
            Assert.Equal("Their client", cut.Find("input[data-testid=project-client]").GetAttribute("value"));
        });
    }

    [Fact]
    public void Unknown_or_hidden_project_shows_the_not_found_panel()
    {
        var cut = Render<ProjectPage>(p => p.Add(x => x.ProjectId, Guid.NewGuid()));

        cut.WaitForAssertion(() => Assert.NotNull(cut.Find("[data-testid=notfound-panel]")));
        Assert.Empty(cut.FindAll("[data-testid=save-settings]"));
    }

    [Fact]
    public void Designer_sees_settings_read_only_without_a_save_button()
    {
        _projects.Project = _projects.Project! with { MyRole = Roles.Designer };
        Services.AddSingleton<ICallerContext>(new FakeCaller("u3", "Designer Person", Roles.Designer));

        var cut = Render<ProjectPage>(p => p.Add(x => x.ProjectId, Id));

        cut.WaitForAssertion(() => Assert.NotNull(cut.Find("[data-testid=project-title]")));
        Assert.Empty(cut.FindAll("[data-testid=save-settings]"));
        Assert.True(cut.Find("input[data-testid=project-name]").HasAttribute("disabled"));
    }
}
