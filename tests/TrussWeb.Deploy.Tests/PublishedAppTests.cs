using System.Diagnostics;
using System.Net;
using System.Text.Json;
using Microsoft.Data.Sqlite;
using TrussWeb.Deploy.Tests.Support;

namespace TrussWeb.Deploy.Tests;

/// <summary>The published app (dotnet publish -c Release) outside the repository, with only the settings docs/DEPLOY.md names.</summary>
[Collection(ProcessCollection.Name)]
public sealed class PublishedAppTests : IAsyncLifetime
{
    private readonly string folder = Path.Combine(Path.GetTempPath(), "trussweb-publish-" + Guid.NewGuid().ToString("N"));

    public Task InitializeAsync() => Task.CompletedTask;

    public Task DisposeAsync()
    {
        if (Directory.Exists(folder))
        {
            Directory.Delete(folder, recursive: true);
        }

        return Task.CompletedTask;
    }

    [Fact]
    public async Task Published_app_starts_on_the_documented_settings_and_reports_its_versions()
    {
        var app = Path.Combine(folder, "app");
        var data = Path.Combine(folder, "data");
        await PublishAsync(app);

        var environment = new Dictionary<string, string>
        {
            ["TrussWeb__Database__ConnectionString"] = $"Data Source={Path.Combine(data, "trussweb.db")}",
            ["TrussWeb__SeedData"] = Repo.SeedData,
            ["Logging__Console__FormatterName"] = "json",
        };
        using var http = new HttpClient { Timeout = TimeSpan.FromSeconds(30) };
        await using var process = AppProcess.Start(Path.Combine(app, "TrussWeb.Web.dll"), environment);
        var ready = await process.WaitReadyAsync(http);

        Assert.Equal("ready", ready.GetProperty("status").GetString());
        Assert.StartsWith("0.", ready.GetProperty("version").GetString(), StringComparison.Ordinal);
        Assert.Matches("^[0-9]{14}_[A-Za-z]+$", ready.GetProperty("schema").GetString());
        Assert.True(File.Exists(Path.Combine(data, "trussweb.db")), "the SQLite file is where the connection string says");

        using var live = await http.GetAsync(new Uri(process.BaseAddress, "health/live"));
        Assert.Equal(HttpStatusCode.OK, live.StatusCode);
        var liveJson = JsonDocument.Parse(await live.Content.ReadAsStringAsync()).RootElement;
        Assert.Equal("live", liveJson.GetProperty("status").GetString());
        Assert.Equal(ready.GetProperty("version").GetString(), liveJson.GetProperty("version").GetString());

        // One absolute TrussWeb:SeedData serves the web catalogue (start-up validation) and the seeding of the database.
        Assert.DoesNotContain("No seed-data folder found", process.Output, StringComparison.Ordinal);
        Assert.True(await CountAsync(Path.Combine(data, "trussweb.db"), "SteelGrades") > 0, "grades seeded from TrussWeb:SeedData");
        Assert.True(await CountAsync(Path.Combine(data, "trussweb.db"), "SectionCatalogue") > 0, "sections seeded from TrussWeb:SeedData");

        // Logging:Console:FormatterName=json: the log lines are JSON objects with level, category and message.
        var logLines = process.Output.Split('\n').Select(l => l.Trim()).Where(l => l.StartsWith('{')).ToList();
        Assert.NotEmpty(logLines);
        foreach (var line in logLines)
        {
            var entry = JsonDocument.Parse(line).RootElement;
            Assert.True(entry.TryGetProperty("LogLevel", out _) && entry.TryGetProperty("Category", out _) && entry.TryGetProperty("Message", out _), line);
        }

        var output = process.Output;
        Assert.Contains("created the first administrator", output, StringComparison.Ordinal);
    }

    private static async Task<long> CountAsync(string file, string table)
    {
        await using var connection = new SqliteConnection(new SqliteConnectionStringBuilder { DataSource = file, Mode = SqliteOpenMode.ReadOnly, Pooling = false }.ToString());
        await connection.OpenAsync();
        await using var command = connection.CreateCommand();
        command.CommandText = $"SELECT COUNT(*) FROM \"{table}\"";
        return (long)(await command.ExecuteScalarAsync())!;
    }

    private static async Task PublishAsync(string output)
    {
        var info = new ProcessStartInfo("dotnet") { WorkingDirectory = Repo.Root, RedirectStandardOutput = true, RedirectStandardError = true, UseShellExecute = false };
        foreach (var argument in new[] { "publish", "src/TrussWeb.Web", "-c", "Release", "-o", output, "-nologo", "-v", "quiet" })
        {
            info.ArgumentList.Add(argument);
        }

        info.Environment["DOTNET_CLI_TELEMETRY_OPTOUT"] = "1";
        using var process = Process.Start(info)!;
        var stdout = process.StandardOutput.ReadToEndAsync();
        var stderr = process.StandardError.ReadToEndAsync();
        using var timeout = new CancellationTokenSource(TimeSpan.FromMinutes(3));
        await process.WaitForExitAsync(timeout.Token);
        Assert.True(process.ExitCode == 0, $"dotnet publish failed:\n{await stdout}\n{await stderr}");
    }
}
