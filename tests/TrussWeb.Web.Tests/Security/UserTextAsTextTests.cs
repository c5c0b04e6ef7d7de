using Microsoft.Extensions.DependencyInjection;
using TrussWeb.Data;
using TrussWeb.Services.Contracts;
using TrussWeb.Web.Components.Pages.Projects;
using TrussWeb.Web.Tests.Fakes;
using TrussWeb.Web.Tests.Support;

namespace TrussWeb.Web.Tests.Security;

/// <summary>HTML typed into names and comments is shown as text: the literal characters appear and no element is created.</summary>
public sealed class UserTextAsTextTests : TrussWebTestContext
{
    private const string ImageAttack = "<img src=x onerror=alert(1)>";
    private const string ScriptAttack = "<script>document.title='owned'</script><b>bold</b>";

    private readonly FakeProjectService _projects = new();

    public UserTextAsTextTests()
    {
        Services.AddSingleton<IProjectService>(_projects);
        Services.AddSingleton<ICatalogueService, FakeCatalogueService>();
    }

    [Fact]
    public void A_project_named_with_markup_is_listed_as_literal_text()
    {
        var trussId = Guid.NewGuid();
        _projects.Summaries.Add(new ProjectSummary(Guid.NewGuid(), ImageAttack, ScriptAttack, "J-1", ScriptAttack, "A", "SANS 10162-1", Roles.Designer, DateTime.UtcNow,
            [new TrussStatusRollup(trussId, ScriptAttack, 3, 3, 0, 0, 0, new Dictionary<string, int> { ["Draft"] = 3 })]));
        Services.AddSingleton<ICallerContext>(new FakeCaller("u1", "D", Roles.Designer));

        var cut = Render<ProjectsPage>();

        var table = cut.WaitForElement("[data-testid=projects-table]");
        Assert.Contains(ImageAttack, table.TextContent);
        Assert.Contains(ScriptAttack, table.TextContent);
        Assert.Empty(table.QuerySelectorAll("img"));
        Assert.Empty(table.QuerySelectorAll("script"));
        Assert.Empty(table.QuerySelectorAll("b"));
        Assert.DoesNotContain("onerror=alert(1)>", cut.Markup.Replace("&lt;img src=x onerror=alert(1)&gt;", "", StringComparison.Ordinal), StringComparison.Ordinal);
    }

    [Fact]
    public void A_project_page_shows_markup_in_its_name_and_truss_names_as_text()
    {
        var id = Guid.NewGuid();
        _projects.Project = new ProjectDetail(id, 1, ImageAttack, ScriptAttack, "J-2", "Town", "A", "SANS 10162-1", "S355JR", Roles.ProjectLead,
            DateTime.UtcNow, DateTime.UtcNow, [new TrussStatusRollup(Guid.NewGuid(), ImageAttack, 3, 3, 0, 0, 0, new Dictionary<string, int> { ["Draft"] = 3 })]);
        Services.AddSingleton<ICallerContext>(new FakeCaller("u1", "Lead", Roles.ProjectLead));

        var cut = Render<ProjectPage>(p => p.Add(x => x.ProjectId, id));

        cut.WaitForAssertion(() => Assert.Contains("&lt;img src=x onerror=alert(1)&gt;", cut.Markup, StringComparison.Ordinal));
        Assert.Empty(cut.FindAll("img"));
        Assert.Empty(cut.FindAll("script"));
    }

    [Fact]
    public void No_component_renders_raw_markup()
    {
        // MarkupString is the one way a Razor component writes unescaped HTML; none may take user text.
        var components = Path.Combine(RepoRoot(), "src", "TrussWeb.Web", "Components");
        var raw = Directory.EnumerateFiles(components, "*.*", SearchOption.AllDirectories)
            .Where(f => f.EndsWith(".razor", StringComparison.Ordinal) || f.EndsWith(".cs", StringComparison.Ordinal))
            .Where(f => File.ReadAllText(f).Contains("MarkupString", StringComparison.Ordinal))
            .Select(f => Path.GetRelativePath(components, f))
            .ToList();
        Assert.True(raw.Count == 0, "components using MarkupString: " + string.Join(", ", raw));
    }

    private static string RepoRoot()
    {
        for (var dir = new DirectoryInfo(AppContext.BaseDirectory); dir is not null; dir = dir.Parent)
        {
            if (File.Exists(Path.Combine(dir.FullName, "TrussWeb.sln")))
            {
                return dir.FullName;
            }
        }

        throw new InvalidOperationException("TrussWeb.sln not found");
    }
}
