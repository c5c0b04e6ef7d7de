using System.Text.RegularExpressions;

namespace TrussWeb.E2E.Support;

/// <summary>A demo sign-in printed by the app at start in demo mode.</summary>
public sealed record DemoUser(string Role, string Email, string Password);

/// <summary>
/// The built web app started in demo mode (<c>--demo</c>) over a throwaway SQLite file, on a free loopback
/// port. The demo sign-ins are read from its console output, as a person starting it would read them.
/// </summary>
public sealed partial class DemoApp : IAsyncLifetime
{
    private readonly string folder = Path.Combine(Path.GetTempPath(), "trussweb-e2e-" + Guid.NewGuid().ToString("N")[..8]);
    private AppProcess? app;

    public Uri BaseAddress => app?.BaseAddress ?? throw new InvalidOperationException("The app has not started");

    public string DatabaseFile => Path.Combine(folder, "e2e.db");

    public string Output => app?.Output ?? "";

    public IReadOnlyDictionary<string, DemoUser> Users { get; private set; } = new Dictionary<string, DemoUser>();

    public DemoUser Designer => User("Designer");

    public DemoUser Checker => User("Checker");

    public DemoUser Lead => Users.Values.First(u => u.Role.StartsWith("Lead", StringComparison.OrdinalIgnoreCase) || u.Role.Contains("lead", StringComparison.OrdinalIgnoreCase));

    public string Url(string relative) => new Uri(BaseAddress, relative.TrimStart('/')).ToString();

    public async Task InitializeAsync()
    {
        Directory.CreateDirectory(folder);
        app = AppProcess.Start(Repo.WebDll, new Dictionary<string, string>
        {
            ["TrussWeb__Database__ConnectionString"] = $"Data Source={DatabaseFile}",
            ["TrussWeb__SeedData"] = Repo.SeedData,
        }, "--demo");
        using var http = new HttpClient { Timeout = TimeSpan.FromSeconds(10) };
        await app.WaitReadyAsync(http);
        Users = ParseSignIns(app.Output);
        if (!Users.ContainsKey("Designer") || !Users.ContainsKey("Checker"))
        {
            throw new InvalidOperationException("The demo sign-ins were not printed:\n" + app.Output);
        }
    }

    public async Task DisposeAsync()
    {
        if (app is not null)
        {
            await app.DisposeAsync();
        }

        try
        {
            Directory.Delete(folder, recursive: true);
        }
        catch (IOException)
        {
            // a file still held open; the temp folder is cleaned by the system
        }
    }

    private DemoUser User(string role) =>
        Users.TryGetValue(role, out var user) ? user : throw new InvalidOperationException($"No demo sign-in for {role}:\n{Output}");

    /// <summary>Lines like <c>  Designer      designer@demo.trussweb.local      password: ...</c>.</summary>
    public static IReadOnlyDictionary<string, DemoUser> ParseSignIns(string output)
    {
        var users = new Dictionary<string, DemoUser>(StringComparer.OrdinalIgnoreCase);
        foreach (Match m in SignInLine().Matches(output))
        {
            var role = m.Groups["role"].Value;
            users[role] = new DemoUser(role, m.Groups["email"].Value, m.Groups["password"].Value);
        }

        return users;
    }

    [GeneratedRegex(@"^\s+(?<role>[\w ]+?)\s+(?<email>\S+@\S+)\s+password:\s+(?<password>\S+)\s*$", RegexOptions.Multiline)]
    private static partial Regex SignInLine();
}
