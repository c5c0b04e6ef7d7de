using System.Collections.Concurrent;
using System.Diagnostics;
using System.Globalization;
using System.Text;

namespace TrussWeb.Reliability.Tests.Support;

/// <summary>A save the harness attempted (<c>try</c>) or that returned Ok (<c>ack</c>, with the member's new version).</summary>
public sealed record Save(int Seq, Guid MemberId, double Kx, long Version);

/// <summary>
/// tests/TrussWeb.FaultHarness run as a child process (<c>dotnet TrussWeb.FaultHarness.dll</c>) over the given
/// database; its "try"/"ack" lines are collected as they arrive. <see cref="KillHard"/> is SIGKILL on Linux.
/// </summary>
public sealed class HarnessProcess : IAsyncDisposable
{
    private readonly Process process;
    private readonly ConcurrentQueue<Save> acks = new();
    private readonly ConcurrentQueue<Save> tries = new();
    private readonly StringBuilder log = new();

    private HarnessProcess(Process process)
    {
        this.process = process;
        process.OutputDataReceived += (_, e) => Read(e.Data);
        process.ErrorDataReceived += (_, e) => Append(e.Data);
        process.BeginOutputReadLine();
        process.BeginErrorReadLine();
    }

    public static string Dll => Path.Combine(Repo.Root, "tests", "TrussWeb.FaultHarness", "bin", Repo.Configuration, "net10.0", "TrussWeb.FaultHarness.dll");

    public IReadOnlyList<Save> Acks => acks.ToArray();

    public IReadOnlyList<Save> Tries => tries.ToArray();

    public bool Done { get; private set; }

    public string Log
    {
        get
        {
            lock (log)
            {
                return log.ToString();
            }
        }
    }

    public bool HasExited => process.HasExited;

    /// <summary>The app's database settings as environment variables (TrussWeb__Database__*), seed data from the repository.</summary>
    public static Dictionary<string, string> Environment(TestDatabase database) => new()
    {
        ["TrussWeb__Database__Provider"] = database.Provider.ToString(),
        ["TrussWeb__Database__ConnectionString"] = database.ConnectionString,
        ["TrussWeb__SeedData"] = Repo.SeedData,
    };

    public static HarnessProcess Start(IReadOnlyDictionary<string, string> environment, params string[] arguments)
    {
        var info = new ProcessStartInfo("dotnet")
        {
            WorkingDirectory = Path.GetDirectoryName(Dll)!,
            RedirectStandardOutput = true,
            RedirectStandardError = true,
            UseShellExecute = false,
        };
        info.ArgumentList.Add(Dll);
        foreach (var a in arguments)
        {
            info.ArgumentList.Add(a);
        }

        foreach (var key in info.Environment.Keys.Where(k => k.StartsWith("TrussWeb__", StringComparison.OrdinalIgnoreCase)).ToList())
        {
            info.Environment.Remove(key);
        }

        info.Environment["DOTNET_CLI_TELEMETRY_OPTOUT"] = "1";
        foreach (var (k, v) in environment)
        {
            info.Environment[k] = v;
        }

        return new HarnessProcess(Process.Start(info) ?? throw new InvalidOperationException("dotnet did not start"));
    }

    /// <summary>Waits (bounded) until at least <paramref name="count"/> saves were acknowledged.</summary>
    public async Task WaitForAcksAsync(int count, TimeSpan timeout)
    {
        var deadline = DateTime.UtcNow + timeout;
        while (acks.Count < count)
        {
            if (process.HasExited)
            {
                throw new InvalidOperationException($"The harness exited (code {process.ExitCode}) after {acks.Count} acks:\n{Log}");
            }

            if (DateTime.UtcNow > deadline)
            {
                throw new TimeoutException($"Only {acks.Count} of {count} saves acknowledged within {timeout.TotalSeconds} s:\n{Log}");
            }

            await Task.Delay(20);
        }
    }

    /// <summary>SIGKILL: no shutdown code runs, no buffers are flushed, open transactions are cut off.</summary>
    public async Task KillHardAsync()
    {
        process.Kill(entireProcessTree: false);
        using var timeout = new CancellationTokenSource(TimeSpan.FromSeconds(20));
        await process.WaitForExitAsync(timeout.Token);
        process.WaitForExit(); // drains the redirected output
    }

    /// <summary>Waits (bounded) for the harness to finish by itself; returns its exit code.</summary>
    public async Task<int> WaitExitAsync(TimeSpan timeout)
    {
        using var cts = new CancellationTokenSource(timeout);
        await process.WaitForExitAsync(cts.Token);
        process.WaitForExit();
        return process.ExitCode;
    }

    public async ValueTask DisposeAsync()
    {
        if (!process.HasExited)
        {
            process.Kill(entireProcessTree: true);
            using var timeout = new CancellationTokenSource(TimeSpan.FromSeconds(20));
            await process.WaitForExitAsync(timeout.Token);
        }

        process.Dispose();
    }

    private void Read(string? line)
    {
        if (line is null)
        {
            return;
        }

        Append(line);
        var parts = line.Split(' ');
        if (parts is ["ack", var seq, var member, var kx, var version])
        {
            acks.Enqueue(new Save(int.Parse(seq, CultureInfo.InvariantCulture), Guid.Parse(member), double.Parse(kx, CultureInfo.InvariantCulture),
                long.Parse(version, CultureInfo.InvariantCulture)));
        }
        else if (parts is ["try", var s, var m, var k])
        {
            tries.Enqueue(new Save(int.Parse(s, CultureInfo.InvariantCulture), Guid.Parse(m), double.Parse(k, CultureInfo.InvariantCulture), 0));
        }
        else if (line == "done")
        {
            Done = true;
        }
    }

    private void Append(string? line)
    {
        if (line is null)
        {
            return;
        }

        lock (log)
        {
            if (log.Length < 200_000)
            {
                log.AppendLine(line);
            }
        }
    }
}
