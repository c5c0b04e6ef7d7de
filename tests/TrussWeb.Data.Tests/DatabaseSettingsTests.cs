using Microsoft.EntityFrameworkCore;
using Microsoft.Extensions.Configuration;
using Microsoft.Extensions.DependencyInjection;

namespace TrussWeb.Data.Tests;

/// <summary>Provider selection and start-up validation of the database configuration.</summary>
public sealed class DatabaseSettingsTests
{
    private static readonly string Root = Path.Combine(Path.GetTempPath(), "trussweb-settings-tests");

    [Fact]
    public void Postgres_without_a_connection_string_fails_naming_the_key()
    {
        var error = Assert.Throws<InvalidOperationException>(
            () => new ServiceCollection().AddTrussWebData(Configuration(("TrussWeb:Database:Provider", "Postgres")), Root));
        Assert.Contains("TrussWeb:Database:ConnectionString", error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void An_unknown_provider_fails_naming_the_key()
    {
        var error = Assert.Throws<InvalidOperationException>(
            () => DatabaseSettings.FromConfiguration(Configuration(("TrussWeb:Database:Provider", "Oracle")), Root));
        Assert.Contains("TrussWeb:Database:Provider", error.Message, StringComparison.Ordinal);
        Assert.Contains("Oracle", error.Message, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("1")]
    [InlineData("7")]
    public void A_numeric_provider_value_is_not_taken_as_an_enum_index(string value)
    {
        Assert.Throws<InvalidOperationException>(
            () => DatabaseSettings.FromConfiguration(Configuration(("TrussWeb:Database:Provider", value)), Root));
    }

    [Fact]
    public void Settings_text_never_shows_the_connection_string()
    {
        var settings = DatabaseSettings.FromConfiguration(
            Configuration(("TrussWeb:Database:Provider", "Postgres"), ("TrussWeb:Database:ConnectionString", "Host=db;Password=example-only")),
            Root);
        Assert.Equal("Host=db;Password=example-only", settings.ConnectionString);
        Assert.DoesNotContain("example-only", settings.ToString(), StringComparison.Ordinal);
        Assert.Contains("Postgres", settings.ToString(), StringComparison.Ordinal);
    }

    [Fact]
    public void Sqlite_is_the_default_and_a_relative_file_resolves_against_the_content_root()
    {
        var settings = DatabaseSettings.FromConfiguration(Configuration(), Root);
        Assert.Equal(DatabaseProvider.Sqlite, settings.Provider);
        Assert.Equal($"Data Source={Path.Combine(Root, "data", "trussweb.db")}", settings.ConnectionString);
    }

    [Fact]
    public void The_provider_name_is_case_insensitive_and_selects_the_postgres_context()
    {
        var configuration = Configuration(
            ("TrussWeb:Database:Provider", "postgres"),
            ("TrussWeb:Database:ConnectionString", "Host=127.0.0.1;Database=unused"));
        using var services = new ServiceCollection().AddTrussWebData(configuration, Root).BuildServiceProvider();
        using var scope = services.CreateScope();
        using var context = scope.ServiceProvider.GetRequiredService<IDbContextFactory<TrussWebDbContext>>().CreateDbContext();
        Assert.IsType<PostgresTrussWebDbContext>(context);
        Assert.True(context.Database.IsNpgsql());
    }

    [Fact]
    public void The_sqlite_provider_selects_the_sqlite_context()
    {
        var configuration = Configuration(("TrussWeb:Database:ConnectionString", "Data Source=:memory:"));
        using var services = new ServiceCollection().AddTrussWebData(configuration, Root).BuildServiceProvider();
        using var scope = services.CreateScope();
        using var context = scope.ServiceProvider.GetRequiredService<IDbContextFactory<TrussWebDbContext>>().CreateDbContext();
        Assert.IsType<SqliteTrussWebDbContext>(context);
        Assert.True(context.Database.IsSqlite());
        Assert.IsType<SqliteTrussWebDbContext>(scope.ServiceProvider.GetRequiredService<TrussWebDbContext>());
    }

    private static IConfiguration Configuration(params (string Key, string Value)[] values) =>
        new ConfigurationBuilder()
            .AddInMemoryCollection(values.Select(v => new KeyValuePair<string, string?>(v.Key, v.Value)))
            .Build();
}
