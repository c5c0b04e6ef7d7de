using System.Diagnostics;
using System.Text.RegularExpressions;
using TrussWeb.Services.Hosting;

namespace TrussWeb.Reliability.Tests.Security;

/// <summary>
/// No secrets in the repository: every tracked file (git ls-files) is scanned for private keys, well-known
/// token shapes, connection strings carrying a real password outside test code, and the demo passwords
/// outside the demo seeder and the documentation. The scanner is itself tested on planted samples.
/// </summary>
public sealed partial class RepositorySecretsTests
{
    /// <summary>Files allowed to name the demo passwords: the seeder that creates them and the docs that tell demo users.</summary>
    private static readonly string[] DemoPasswordPlaces = ["src/TrussWeb.Services/Hosting/DemoSeeder.cs", "README.md", "DEVELOPERS.md", "docs/"];

    private static readonly string[] BinaryExtensions = [".png", ".jpg", ".jpeg", ".gif", ".pdf", ".ttf", ".otf", ".woff", ".woff2", ".ico", ".xlsx", ".db", ".zip", ".gz"];

    [Fact]
    public void No_tracked_file_holds_a_private_key_a_token_a_real_connection_password_or_a_demo_password_out_of_place()
    {
        var files = TrackedFiles();
        Assert.True(files.Count > 100, $"git ls-files listed {files.Count} files");
        var findings = new List<string>();
        foreach (var file in files)
        {
            var full = Path.Combine(Repo.Root, file);
            if (BinaryExtensions.Contains(Path.GetExtension(file).ToLowerInvariant()) || !File.Exists(full))
            {
                continue;
            }

            var text = File.ReadAllText(full);
            if (text.Contains('\0', StringComparison.Ordinal))
            {
                continue;
            }

            findings.AddRange(Scan(file, text));
        }

        Assert.True(findings.Count == 0, string.Join("\n", findings));
    }

    [Theory]
    [InlineData("src/a.cs", "-----BEGIN RSA " + "PRIVATE KEY-----\nMIIE...", "private key")]
    [InlineData("deploy/x.env", "ConnectionString=Host=db;Username=u;Pass" + "word=hunter2-real;", "connection string password")]
    [InlineData("src/app.json", "\"Server=x;Pw" + "d=s3cret\"", "connection string password")]
    [InlineData("scripts/x.sh", "token=gh" + "p_abcdefghijklmnopqrstuvwxyz0123456789", "token")]
    public void The_scanner_finds_planted_secrets(string path, string text, string kind)
    {
        var findings = Scan(path, text);
        Assert.Contains(findings, f => f.Contains(kind, StringComparison.Ordinal));
    }

    [Theory]
    [InlineData("docs/DEPLOY.md", "Host=db;Username=trussweb;Pass" + "word=<password>")]
    [InlineData("docker-compose.yml", "Pass" + "word=${TRUSSWEB_DB_PASSWORD:?set it}")]
    [InlineData("tests/TrussWeb.Data.Tests/X.cs", "Host=h;Pass" + "word=only-in-tests")]
    public void Placeholders_and_test_code_are_not_findings(string path, string text) => Assert.Empty(Scan(path, text));

    [Fact]
    public void A_demo_password_outside_the_seeder_and_the_docs_is_a_finding()
    {
        var password = DemoSeeder.Users[0].Password;
        Assert.NotEmpty(Scan("src/TrussWeb.Web/Program.cs", $"var p = \"{password}\";"));
        Assert.Empty(Scan("src/TrussWeb.Services/Hosting/DemoSeeder.cs", $"\"{password}\""));
    }

    public static IReadOnlyList<string> Scan(string path, string text)
    {
        var findings = new List<string>();
        if (PrivateKey().IsMatch(text))
        {
            findings.Add($"{path}: private key");
        }

        if (Token().Match(text) is { Success: true } t)
        {
            findings.Add($"{path}: token ({t.Value[..6]}...)");
        }

        if (!path.StartsWith("tests/", StringComparison.Ordinal))
        {
            foreach (Match m in ConnectionPassword().Matches(text))
            {
                var value = m.Groups["v"].Value;
                if (!(value.StartsWith('<') || value.StartsWith('$') || value.StartsWith('{')))
                {
                    findings.Add($"{path}: connection string password ({m.Groups["k"].Value}=...)");
                }
            }
        }

        if (!DemoPasswordPlaces.Any(p => p.EndsWith('/') ? path.StartsWith(p, StringComparison.Ordinal) : path == p))
        {
            foreach (var (_, _, _, password) in DemoSeeder.Users)
            {
                if (text.Contains(password, StringComparison.Ordinal))
                {
                    findings.Add($"{path}: demo password outside the demo seeder and docs");
                }
            }
        }

        return findings;
    }

    private static List<string> TrackedFiles()
    {
        var info = new ProcessStartInfo("git") { WorkingDirectory = Repo.Root, RedirectStandardOutput = true, RedirectStandardError = true, UseShellExecute = false };
        info.ArgumentList.Add("ls-files");
        using var git = Process.Start(info) ?? throw new InvalidOperationException("git did not start");
        var output = git.StandardOutput.ReadToEnd();
        git.WaitForExit(30_000);
        Assert.True(git.ExitCode == 0, git.StandardError.ReadToEnd());
        return output.Split('\n', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries).ToList();
    }

    [GeneratedRegex(@"-----BEGIN ([A-Z]+ )?PRIVATE KEY-----")]
    private static partial Regex PrivateKey();

    [GeneratedRegex(@"\b(gh[pousr]_[A-Za-z0-9]{36}|AKIA[0-9A-Z]{16}|xox[abp]-[A-Za-z0-9-]{10,}|sk_live_[A-Za-z0-9]{16,})")]
    private static partial Regex Token();

    [GeneratedRegex(@"(?i)(?<![\w])(?<k>password|pwd)=(?<v>[^;""'\s]+)")]
    private static partial Regex ConnectionPassword();
}
