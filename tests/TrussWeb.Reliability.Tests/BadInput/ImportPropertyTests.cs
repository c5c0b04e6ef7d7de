using FsCheck;
using FsCheck.Fluent;
using Microsoft.Extensions.DependencyInjection;
using TrussWeb.Core.Sections;
using TrussWeb.Data;
using TrussWeb.FaultHarness;
using TrussWeb.Services.Contracts;

namespace TrussWeb.Reliability.Tests.BadInput;

/// <summary>One demo database (SQLite file) shared by the bad-input properties of a class.</summary>
public sealed class DemoStore : IAsyncLifetime
{
    private readonly SqliteTestDatabase database = new();

    public StorageHost Host { get; private set; } = null!;

    public Guid TrussId { get; private set; }

    public async Task InitializeAsync()
    {
        Host = await StorageHost.StartAsync([], new Dictionary<string, string?>
        {
            [DatabaseSettings.ProviderKey] = database.Provider.ToString(),
            [DatabaseSettings.ConnectionStringKey] = database.ConnectionString,
            ["TrussWeb:SeedData"] = Repo.SeedData,
        });
        TrussId = await Host.DemoTrussIdAsync();
    }

    public async Task DisposeAsync()
    {
        await Host.DisposeAsync();
        await database.DisposeAsync();
    }

    /// <summary>Runs <paramref name="call"/> on a service of a fresh scope acting as the demo user of <paramref name="role"/>.</summary>
    public async Task<T> AsAsync<TService, T>(string role, Func<TService, Task<T>> call)
        where TService : notnull
    {
        await using var scope = Host.ScopeAs(await Host.DemoUserAsync(role));
        return await call(scope.ServiceProvider.GetRequiredService<TService>());
    }
}

/// <summary>
/// Random and hostile CSV text thrown at the section catalogue import, in Core (the loader) and through
/// <see cref="ICatalogueService.ImportCatalogueAsync"/> (validation, one transaction): never an exception,
/// every refusal names its field (and line where there is one), no NaN or infinity stored, nothing already
/// saved lost.
/// </summary>
public sealed class ImportPropertyTests(DemoStore store) : IClassFixture<DemoStore>
{
    private static readonly string[] FileLevelFields = ["header", "file", "fileName"];

    [Fact]
    public void The_catalogue_loader_never_throws_and_names_file_line_and_field()
    {
        Prop.ForAll(Hostile.CsvText().ToArbitrary(), text =>
        {
            var result = SectionCatalogue.LoadFromText("hostile.csv", text);
            Assert.All(result.Errors, e =>
            {
                Assert.Equal("hostile.csv", e.File);
                Assert.False(string.IsNullOrWhiteSpace(e.Field));
                Assert.False(string.IsNullOrWhiteSpace(e.Message));
                Assert.True(FileLevelFields.Contains(e.Field) || e.Line >= 1, $"row error without a line: {e}");
            });
            Assert.All(result.Entries, entry =>
            {
                var p = entry.Properties;
                Assert.True(new[] { p.Area, p.Ix, p.Iy, p.J, p.MassPerMetre }.All(double.IsFinite), $"{entry.Designation}: non-finite property");
            });
        }).Check(Config.QuickThrowOnFailure.WithMaxTest(1500));
    }

    [Fact]
    public async Task The_catalogue_import_service_refuses_with_named_fields_and_keeps_the_catalogue()
    {
        var before = await ListAsync();
        Assert.NotEmpty(before);
        var anchor = before.First(s => s.Designation != "L100x100x10");

        var gen = from text in Hostile.CsvText() from name in Gen.Elements("import.csv", " ", "x.csv") select (name, text);
        Prop.ForAll(gen.ToArbitrary(), input =>
        {
            var result = store.AsAsync<ICatalogueService, ServiceResult<CatalogueImportSummary>>(Roles.Administrator,
                c => c.ImportCatalogueAsync(input.name, input.text)).GetAwaiter().GetResult();
            Assert.True(result.Kind is ResultKind.Ok or ResultKind.Invalid, $"{result.Kind}: {result.Message}");
            if (!result.IsOk)
            {
                Assert.NotEmpty(result.Errors);
                Assert.All(result.Errors, e =>
                {
                    Assert.False(string.IsNullOrWhiteSpace(e.Field));
                    Assert.False(string.IsNullOrWhiteSpace(e.Message));
                    Assert.True(FileLevelFields.Contains(e.Field) || e.Line >= 1, $"row error without a line: {e}");
                });
            }

            var after = ListAsync().GetAwaiter().GetResult();
            Assert.True(after.Count >= before.Count, "sections were lost");
            Assert.Contains(after, s => s.Designation == anchor.Designation && s.MassPerMetreKg == anchor.MassPerMetreKg);
            Assert.All(after, s => Assert.True(double.IsFinite(s.MassPerMetreKg) && Hostile.Finite(s.DepthMm) && Hostile.Finite(s.WidthMm)
                                               && Hostile.Finite(s.ThicknessMm) && Hostile.Finite(s.OutsideDiameterMm), $"{s.Designation}: non-finite value stored"));
        }).Check(Config.QuickThrowOnFailure.WithMaxTest(80));
    }

    private async Task<IReadOnlyList<SectionListItem>> ListAsync()
    {
        var list = await store.AsAsync<ICatalogueService, ServiceResult<IReadOnlyList<SectionListItem>>>(Roles.Designer,
            c => c.ListSectionsAsync(new SectionFilter(IncludeInactive: true)));
        Assert.True(list.IsOk, list.Message);
        return list.Value!;
    }
}
