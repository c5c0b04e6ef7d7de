using System.Diagnostics;
using System.Net;
using System.Net.Sockets;
using System.Text;
using System.Text.Json;

namespace TrussWeb.Testing;

/// <summary>
/// The web app run as a child process (<c>dotnet TrussWeb.Web.dll --urls http://127.0.0.1:&lt;port&gt;</c>) with
/// the given environment; its output is captured; disposing kills it. Waits are bounded polls.
/// </summary>
public sealed class AppProcess : IAsyncDisposable
{
    public static readonly TimeSpan StartTimeout = TimeSpan.FromSeconds(90);

    private readonly Process process;
    private readonly StringBuilder output = new();

    private AppProcess(Process process, int port)
    {
        this.process = process;
        Port = port;
        BaseAddress = new Uri($"http://127.0.0.1:{port}/");
        process.OutputDataReceived += (_, e) => Append(e.Data);
        process.ErrorDataReceived += (_, e) => Append(e.Data);
        process.BeginOutputReadLine();
        process.BeginErrorReadLine();
    }

    public int Port { get; }

    public Uri BaseAddress { get; }

    public string Output
    {
        get
        {
            lock (output)
            {
                return output.ToString();
            }
        }
    }

    public bool HasExited => process.HasExited;

    public int ExitCode => process.ExitCode;

    /// <summary>Starts the app. Inherited TrussWeb__*/ASPNETCORE_* variables are removed so only <paramref name="environment"/> counts.</summary>
    public static AppProcess Start(string dll, IReadOnlyDictionary<string, string> environment, params string[] extraArguments)
    {
        var port = FreePort();
        var info = new ProcessStartInfo("dotnet")
        {
            WorkingDirectory = Path.GetDirectoryName(dll)!,
            RedirectStandardOutput = true,
            RedirectStandardError = true,
            UseShellExecute = false,
        };
        info.ArgumentList.Add(dll);
        info.ArgumentList.Add("--urls");
        info.ArgumentList.Add($"http://127.0.0.1:{port}");
        foreach (var argument in extraArguments)
        {
            info.ArgumentList.Add(argument);
        }

        Configure(info, environment);
        var process = Process.Start(info) ?? throw new InvalidOperationException("dotnet did not start");
        return new AppProcess(process, port);
    }

    /// <summary>
    /// Runs an administrator verb (<c>dotnet TrussWeb.Web.dll create-user ...</c>: the verb must be the first
    /// argument, so no <c>--urls</c>) with the given environment and waits (bounded) for it to end.
    /// </summary>
    public static async Task<(int Code, string Output)> RunVerbAsync(string dll, IReadOnlyDictionary<string, string> environment, params string[] arguments)
    {
        var info = new ProcessStartInfo("dotnet")
        {
            WorkingDirectory = Path.GetDirectoryName(dll)!,
            RedirectStandardOutput = true,
            RedirectStandardError = true,
            UseShellExecute = false,
        };
        info.ArgumentList.Add(dll);
        foreach (var argument in arguments)
        {
            info.ArgumentList.Add(argument);
        }

        Configure(info, environment);
        using var process = Process.Start(info) ?? throw new InvalidOperationException("dotnet did not start");
        var stdout = process.StandardOutput.ReadToEndAsync();
        var stderr = process.StandardError.ReadToEndAsync();
        using var timeout = new CancellationTokenSource(StartTimeout);
        try
        {
            await process.WaitForExitAsync(timeout.Token);
        }
        catch (OperationCanceledException)
        {
            process.Kill(entireProcessTree: true);
            throw new TimeoutException($"dotnet {string.Join(' ', arguments.Take(2))} did not finish within {StartTimeout.TotalSeconds} s");
        }

        return (process.ExitCode, await stdout + await stderr);
    }

    /// <summary>Polls /health/ready until 200 (returns its JSON), failing when the process exits or the time is up.</summary>
    public async Task<JsonElement> WaitReadyAsync(HttpClient client)
    {
        var deadline = DateTime.UtcNow + StartTimeout;
        while (DateTime.UtcNow < deadline)
        {
            if (process.HasExited)
            {
                throw new InvalidOperationException($"The app exited with code {process.ExitCode} before it was ready:\n{Output}");
            }

            try
            {
                using var response = await client.GetAsync(new Uri(BaseAddress, "health/ready"));
                if (response.StatusCode == HttpStatusCode.OK)
                {
                    return JsonDocument.Parse(await response.Content.ReadAsStringAsync()).RootElement.Clone();
                }
            }
            catch (HttpRequestException)
            {
                // not listening yet
            }

            await Task.Delay(250);
        }

        throw new TimeoutException($"The app was not ready on {BaseAddress} within {StartTimeout.TotalSeconds} s:\n{Output}");
    }

    /// <summary>Waits (bounded) for the process to end by itself; returns its exit code.</summary>
    public async Task<int> WaitExitAsync()
    {
        using var timeout = new CancellationTokenSource(StartTimeout);
        await process.WaitForExitAsync(timeout.Token);
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

    /// <summary>Inherited TrussWeb__*/ASPNETCORE_*/Logging__* variables are removed so only <paramref name="environment"/> counts.</summary>
    private static void Configure(ProcessStartInfo info, IReadOnlyDictionary<string, string> environment)
    {
        foreach (var key in info.Environment.Keys.Where(k => k.StartsWith("TrussWeb__", StringComparison.OrdinalIgnoreCase)
                     || k.StartsWith("ASPNETCORE_", StringComparison.OrdinalIgnoreCase) || k.StartsWith("Logging__", StringComparison.OrdinalIgnoreCase)).ToList())
        {
            info.Environment.Remove(key);
        }

        info.Environment["ASPNETCORE_ENVIRONMENT"] = "Production";
        info.Environment["DOTNET_CLI_TELEMETRY_OPTOUT"] = "1";
        foreach (var (key, value) in environment)
        {
            info.Environment[key] = value;
        }
    }

    private static int FreePort()
    {
        using var listener = new TcpListener(IPAddress.Loopback, 0);
        listener.Start();
        return ((IPEndPoint)listener.LocalEndpoint).Port;
    }

    private void Append(string? line)
    {
        if (line is null)
        {
            return;
        }

        lock (output)
        {
            output.AppendLine(line);
        }
    }
}
