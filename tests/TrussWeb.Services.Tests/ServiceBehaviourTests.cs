using Microsoft.AspNetCore.Identity;
using Microsoft.EntityFrameworkCore;
using Microsoft.Extensions.DependencyInjection;
using Microsoft.Extensions.Time.Testing;
using TrussWeb.Core.Model;
using TrussWeb.Data;
using TrussWeb.Data.Entities;
using TrussWeb.Services.Contracts;
using TrussWeb.Services.Hosting;
using TrussWeb.Services.Tests.Support;

namespace TrussWeb.Services.Tests;

/// <summary>
/// The use-case behaviours every provider must show. Each test gets a fresh database, migrated and
/// seeded by the real start-up routine, with invented users: a project lead, a designer, a checker,
/// an administrator and a designer who is not a member.
/// </summary>
public abstract partial class ServiceBehaviourTests : IAsyncLifetime
{
    protected static readonly DateTimeOffset Start = new(2026, 5, 4, 7, 15, 0, TimeSpan.Zero);

    private readonly List<TestDatabase> databases = [];
    private readonly List<ServiceProvider> providers = [];
    private readonly List<AsyncServiceScope> scopes = [];

    protected FakeTimeProvider Clock { get; } = new(Start);

    protected CallerHolder Callers { get; } = new();

    protected TestDatabase Database { get; private set; } = null!;

    protected ServiceProvider Services { get; private set; } = null!;

    protected StringWriter StartupOutput { get; } = new();

    protected FixedCaller Lead { get; private set; } = null!;

    protected FixedCaller Designer { get; private set; } = null!;

    protected FixedCaller Checker { get; private set; } = null!;

    protected FixedCaller Admin { get; private set; } = null!;

    protected FixedCaller Outsider { get; private set; } = null!;

    protected abstract Task<TestDatabase> CreateEmptyDatabaseAsync();

    protected static string SeedFolder => Path.Combine(AppContext.BaseDirectory, "seed-data");

    public async Task InitializeAsync()
    {
        Database = await CreateEmptyDatabaseAsync();
        databases.Add(Database);
        Services = NewServices();
        await TrussWebStartup.InitialiseAsync(Services, Options(demo: false));
        Admin = await UserAsync("ada.admin@example.test", "Ada Admin", Roles.Administrator);
        Lead = await UserAsync("lerato.lead@example.test", "Lerato Lead", Roles.ProjectLead);
        Designer = await UserAsync("dineo.designer@example.test", "Dineo Designer", Roles.Designer);
        Checker = await UserAsync("chris.checker@example.test", "Chris Checker", Roles.Checker);
        Outsider = await UserAsync("olu.outsider@example.test", "Olu Outsider", Roles.Designer);
    }

    public async Task DisposeAsync()
    {
        foreach (var scope in scopes)
        {
            await scope.DisposeAsync();
        }

        foreach (var provider in providers)
        {
            await provider.DisposeAsync();
        }

        foreach (var database in databases)
        {
            await database.DisposeAsync();
        }

        foreach (var folder in exportFolders.Where(Directory.Exists))
        {
            Directory.Delete(folder, recursive: true);
        }
    }

    protected TrussWebStartupOptions Options(bool demo, string? adminPassword = "first-admin-pass-1") => new()
    {
        Demo = demo,
        SeedDataPath = SeedFolder,
        AdminPassword = adminPassword,
        Output = StartupOutput,
    };

    protected ServiceProvider NewServices()
    {
        var provider = Database.BuildServices(Clock, Callers);
        providers.Add(provider);
        return provider;
    }

    /// <summary>The services from a new DI scope, acting as <paramref name="caller"/>.</summary>
    protected ServiceSet As(FixedCaller caller, ServiceProvider? provider = null)
    {
        Callers.Current = caller;
        var scope = (provider ?? Services).CreateAsyncScope();
        scopes.Add(scope);
        var sp = scope.ServiceProvider;
        return new ServiceSet(sp.GetRequiredService<IProjectService>(), sp.GetRequiredService<ITrussService>(), sp.GetRequiredService<IDesignService>(),
            sp.GetRequiredService<ICatalogueService>(), sp.GetRequiredService<IUserAdminService>(), sp.GetRequiredService<IReviewService>());
    }

    protected async Task<TrussWebDbContext> ContextAsync(ServiceProvider? provider = null)
    {
        var scope = (provider ?? Services).CreateAsyncScope();
        scopes.Add(scope);
        return await scope.ServiceProvider.GetRequiredService<IDbContextFactory<TrussWebDbContext>>().CreateDbContextAsync();
    }

    private async Task<FixedCaller> UserAsync(string email, string name, string role)
    {
        await using var scope = Services.CreateAsyncScope();
        var users = scope.ServiceProvider.GetRequiredService<UserManager<AppUser>>();
        var user = new AppUser { UserName = email, Email = email, DisplayName = name };
        var result = await users.CreateAsync(user, "test-password-1");
        Assert.True(result.Succeeded, string.Join("; ", result.Errors.Select(e => e.Description)));
        Assert.True((await users.AddToRoleAsync(user, role)).Succeeded);
        return new FixedCaller(user.Id, name, role);
    }

    protected static T Ok<T>(ServiceResult<T> result)
    {
        Assert.True(result.IsOk, $"{result.Kind}: {result.Message} {string.Join("; ", result.Errors)}");
        return result.Value!;
    }

    /// <summary>Lead creates a project with the designer and checker as members and a generated 12 m Howe truss; the truss is designed on creation.</summary>
    protected async Task<(ProjectDetail Project, TrussDetail Truss)> ProjectWithTrussAsync()
    {
        var lead = As(Lead);
        var project = Ok(await lead.Projects.CreateAsync(new ProjectInput("Tamboti Storage Hall", "Umsinsi Traders (invented)", "T-118", "Doringbaai (invented)", "A", "SANS 10162-1", "S355JR")));
        Ok(await lead.Projects.AddMemberAsync(project.Id, new AddProjectMemberInput("dineo.designer@example.test", Roles.Designer)));
        Ok(await lead.Projects.AddMemberAsync(project.Id, new AddProjectMemberInput(Checker.UserId!, Roles.Checker)));
        var designer = As(Designer);
        var truss = Ok(await designer.Trusses.CreateFromGeneratorAsync(project.Id, new TrussGeneratorInput("RT1", TrussType.PitchedHowe, 12000, 15, null, 0, 6, 4500, 2)));
        truss = Ok(await designer.Trusses.SaveActionsAsync(truss.Id, new ActionsInput(0.12, 0.08, 0.5, [new WindCaseRow("W1", "Uplift", -0.8, -0.5)], truss.Actions.Version)));
        truss = Ok(await designer.Trusses.ResetCombinationsAsync(truss.Id, TrussWeb.Core.Loads.CombinationStandard.Sans10160,
            truss.Combinations.Select(c => new RowRef(c.Id, c.Version)).ToList()));
        return (project, truss);
    }

    protected static IReadOnlyDictionary<string, string> Fingerprints(TrussDesignView design) =>
        design.Members.ToDictionary(m => m.Mark, m => m.Fingerprint);
}
