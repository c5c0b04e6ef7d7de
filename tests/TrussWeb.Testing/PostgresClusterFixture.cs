using System.Diagnostics;
using Xunit;

namespace TrussWeb.Testing;

/// <summary>
/// The PostgreSQL server for the Postgres tests: the one named by <c>TRUSSWEB_TEST_PG</c>, or else a
/// throwaway cluster started with scripts/pg-test-cluster.sh and stopped when the tests end. A cluster
/// that cannot start fails the tests (it never skips them).
/// </summary>
public sealed class PostgresClusterFixture : IAsyncLifetime
{
    public const string EnvironmentVariable = "TRUSSWEB_TEST_PG";

    private static readonly TimeSpan ScriptTimeout = TimeSpan.FromMinutes(2);

    private string? clusterFolder;

    /// <summary>Connection string of a superuser on the server's maintenance database.</summary>
    public string AdminConnectionString { get; private set; } = string.Empty;

    public async Task InitializeAsync()
    {
        var configured = Environment.GetEnvironmentVariable(EnvironmentVariable);
        if (!string.IsNullOrWhiteSpace(configured))
        {
            AdminConnectionString = configured;
            return;
        }

        var output = await RunScriptAsync("start");
        foreach (var line in output.Split('\n', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries))
        {
            if (TryReadExport(line, EnvironmentVariable, out var connectionString))
            {
                AdminConnectionString = connectionString;
            }
            else if (TryReadExport(line, "TRUSSWEB_TEST_PG_DIR", out var folder))
            {
                clusterFolder = folder;
            }
        }

        if (AdminConnectionString.Length == 0 || clusterFolder is null)
        {
            throw new InvalidOperationException($"pg-test-cluster.sh start printed no connection string:\n{output}");
        }
    }

    public async Task DisposeAsync()
    {
        if (clusterFolder is not null)
        {
            await RunScriptAsync("stop", clusterFolder);
        }
    }

    private static bool TryReadExport(string line, string name, out string value)
    {
        var prefix = $"export {name}='";
        if (line.StartsWith(prefix, StringComparison.Ordinal) && line.EndsWith('\''))
        {
            value = line[prefix.Length..^1];
            return true;
        }

        value = string.Empty;
        return false;
    }

    private static async Task<string> RunScriptAsync(params string[] arguments)
    {
        var script = Path.Combine(AppContext.BaseDirectory, "scripts", "pg-test-cluster.sh");
        var info = new ProcessStartInfo("bash") { RedirectStandardOutput = true, RedirectStandardError = true, UseShellExecute = false };
        info.ArgumentList.Add(script);
        foreach (var argument in arguments)
        {
            info.ArgumentList.Add(argument);
        }

        using var process = Process.Start(info) ?? throw new InvalidOperationException("Could not start bash for pg-test-cluster.sh.");
        var stdout = process.StandardOutput.ReadToEndAsync();
        var stderr = process.StandardError.ReadToEndAsync();
        using var timeout = new CancellationTokenSource(ScriptTimeout);
        await process.WaitForExitAsync(timeout.Token);
        if (process.ExitCode != 0)
        {
            throw new InvalidOperationException(
                $"pg-test-cluster.sh {string.Join(' ', arguments)} failed with exit code {process.ExitCode}:\n{await stderr}");
        }

        return await stdout;
    }
}
