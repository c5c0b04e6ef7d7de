using System.Diagnostics;
using System.Text.RegularExpressions;
using TrussWeb.Deploy.Tests.Support;
using YamlDotNet.RepresentationModel;

namespace TrussWeb.Deploy.Tests;

/// <summary>The container, compose, proxy and script files are well-formed and name only files that exist (no container engine runs here).</summary>
public sealed partial class DeploymentFilesTests
{
    private static YamlMappingNode Compose()
    {
        var stream = new YamlStream();
        using var reader = new StreamReader(Repo.PathOf("docker-compose.yml"));
        stream.Load(reader);
        return (YamlMappingNode)stream.Documents.Single().RootNode;
    }

    private static YamlMappingNode Map(YamlNode node, string key) =>
        ((YamlMappingNode)node).Children.TryGetValue(new YamlScalarNode(key), out var child)
            ? Assert.IsType<YamlMappingNode>(child)
            : throw new Xunit.Sdk.XunitException($"no '{key}' in the compose file");

    private static string? Scalar(YamlNode node, string key) =>
        ((YamlMappingNode)node).Children.TryGetValue(new YamlScalarNode(key), out var child) ? (child as YamlScalarNode)?.Value : null;

    [Fact]
    public void Compose_file_has_the_app_and_PostgreSQL_15_with_health_checks_restart_policies_and_named_volumes()
    {
        var root = Compose();
        var services = Map(root, "services");
        var app = Map(services, "app");
        var db = Map(services, "db");
        Assert.StartsWith("postgres:15", Scalar(db, "image"), StringComparison.Ordinal);

        foreach (var service in new[] { app, db })
        {
            Assert.Equal("unless-stopped", Scalar(service, "restart"));
            var test = Map(service, "healthcheck").Children[new YamlScalarNode("test")];
            Assert.NotEmpty(test.ToString());
        }

        Assert.Contains("/health/ready", Map(app, "healthcheck").Children[new YamlScalarNode("test")].ToString(), StringComparison.Ordinal);
        Assert.Equal("service_healthy", Scalar(Map(Map(app, "depends_on"), "db"), "condition"));

        var declared = Map(root, "volumes").Children.Keys.Select(k => ((YamlScalarNode)k).Value!).ToHashSet();
        foreach (var service in new[] { app, db })
        {
            var mounts = (YamlSequenceNode)service.Children[new YamlScalarNode("volumes")];
            foreach (var mount in mounts.Children.Cast<YamlScalarNode>())
            {
                Assert.Contains(mount.Value!.Split(':')[0], declared);
            }
        }

        var appEnvironment = Map(app, "environment");
        Assert.Equal("Postgres", Scalar(appEnvironment, "TrussWeb__Database__Provider"));
        Assert.Contains("${TRUSSWEB_DB_PASSWORD:?", Scalar(appEnvironment, "TrussWeb__Database__ConnectionString"), StringComparison.Ordinal);
        Assert.Contains("${TRUSSWEB_DB_PASSWORD:?", Scalar(Map(db, "environment"), "POSTGRES_PASSWORD"), StringComparison.Ordinal);
    }

    [Fact]
    public void Compose_build_context_and_Dockerfile_exist()
    {
        var build = Map(Map(Map(Compose(), "services"), "app"), "build");
        var context = Path.GetFullPath(Path.Combine(Repo.Root, Scalar(build, "context")!));
        Assert.True(Directory.Exists(context), context);
        Assert.True(File.Exists(Path.Combine(context, Scalar(build, "dockerfile")!)), "the compose file names a Dockerfile that exists");
    }

    [Fact]
    public void Dockerfile_builds_with_the_sdk_runs_on_the_runtime_as_a_non_root_user_with_fonts_health_check_and_data_volume()
    {
        var lines = DockerfileInstructions();
        var from = lines.Where(l => l.StartsWith("FROM ", StringComparison.Ordinal)).ToList();
        Assert.Equal(2, from.Count);
        Assert.StartsWith("FROM mcr.microsoft.com/dotnet/sdk:10.0", from[0], StringComparison.Ordinal);
        Assert.StartsWith("FROM mcr.microsoft.com/dotnet/aspnet:10.0", from[1], StringComparison.Ordinal);

        var runtime = lines.SkipWhile(l => l != from[1]).ToList();
        var user = runtime.Last(l => l.StartsWith("USER ", StringComparison.Ordinal));
        Assert.NotEqual("root", user[5..].Trim());
        Assert.NotEqual("0", user[5..].Trim());
        Assert.Contains(runtime, l => l.StartsWith("RUN ", StringComparison.Ordinal) && l.Contains("fonts-dejavu-core", StringComparison.Ordinal)
            && l.Contains("fonts-dejavu-extra", StringComparison.Ordinal));
        Assert.Contains(runtime, l => l.StartsWith("HEALTHCHECK ", StringComparison.Ordinal) && l.Contains("/health/live", StringComparison.Ordinal));
        Assert.Contains(runtime, l => l.StartsWith("VOLUME ", StringComparison.Ordinal) && l.Contains("/data", StringComparison.Ordinal));
        var env = string.Join('\n', runtime.Where(l => l.StartsWith("ENV ", StringComparison.Ordinal)));
        Assert.Contains("TrussWeb__Database__ConnectionString=\"Data Source=/data/trussweb.db\"", env, StringComparison.Ordinal);
        Assert.Contains("ASPNETCORE_URLS=http://0.0.0.0:8080", env, StringComparison.Ordinal);
        Assert.Contains(runtime, l => l.StartsWith("COPY ", StringComparison.Ordinal) && l.Contains("seed-data", StringComparison.Ordinal));
        Assert.Contains(runtime, l => l.StartsWith("ENTRYPOINT ", StringComparison.Ordinal) && l.Contains("TrussWeb.Web.dll", StringComparison.Ordinal));
    }

    [Fact]
    public void Every_file_the_Dockerfile_copies_from_the_build_context_exists_and_is_not_docker_ignored()
    {
        var ignored = File.ReadAllLines(Repo.PathOf(".dockerignore"))
            .Select(l => l.Trim())
            .Where(l => l.Length > 0 && !l.StartsWith('#') && !l.StartsWith('!') && !l.Contains('*'))
            .Select(l => l.TrimEnd('/'))
            .ToList();
        var copies = DockerfileInstructions().Where(l => l.StartsWith("COPY ", StringComparison.Ordinal) && !l.Contains("--from=", StringComparison.Ordinal)).ToList();
        Assert.NotEmpty(copies);
        foreach (var copy in copies)
        {
            var parts = copy.Split(' ', StringSplitOptions.RemoveEmptyEntries)[1..];
            foreach (var source in parts[..^1])
            {
                var path = Repo.PathOf(source.TrimEnd('/'));
                Assert.True(File.Exists(path) || Directory.Exists(path), $"the Dockerfile copies '{source}', which is not in the repository");
                Assert.DoesNotContain(ignored, i => source.TrimEnd('/') == i || source.StartsWith(i + "/", StringComparison.Ordinal));
            }
        }
    }

    [Fact]
    public void Deploy_shell_scripts_pass_bash_syntax_check_use_strict_mode_and_print_usage()
    {
        var scripts = Directory.GetFiles(Repo.PathOf("deploy"), "*.sh", SearchOption.AllDirectories).Order(StringComparer.Ordinal).ToList();
        Assert.Contains(scripts, s => s.EndsWith("backup-sqlite.sh", StringComparison.Ordinal));
        Assert.Contains(scripts, s => s.EndsWith("restore-postgres.sh", StringComparison.Ordinal));
        foreach (var script in scripts)
        {
            var (code, output) = Bash("-n", script);
            Assert.True(code == 0, $"bash -n {script}: {output}");
            if (Path.GetFileName(script) == "common.sh")
            {
                continue;
            }

            Assert.Contains("set -euo pipefail", File.ReadAllText(script), StringComparison.Ordinal);
            var (helpCode, help) = Bash(script, "-h");
            Assert.True(helpCode == 0, $"{script} -h exited {helpCode}: {help}");
            Assert.StartsWith("usage: ", help.TrimStart(), StringComparison.Ordinal);
            var (wrongCode, _) = Bash(script, "-Z");
            Assert.Equal(2, wrongCode);
        }
    }

    [Fact]
    public void Systemd_unit_runs_a_dedicated_user_with_the_env_file_restart_and_hardening()
    {
        var unit = File.ReadAllLines(Repo.PathOf("deploy/systemd/trussweb.service")).Select(l => l.Trim()).ToList();
        foreach (var expected in new[] { "User=trussweb", "EnvironmentFile=/etc/trussweb/trussweb.env", "Restart=on-failure", "NoNewPrivileges=true", "ProtectSystem=strict" })
        {
            Assert.Contains(expected, unit);
        }

        Assert.Contains(unit, l => l.StartsWith("WorkingDirectory=", StringComparison.Ordinal));
        var writable = unit.Single(l => l.StartsWith("ReadWritePaths=", StringComparison.Ordinal));
        var example = File.ReadAllText(Repo.PathOf("deploy/systemd/trussweb.env.example"));
        var dataFile = DataSourcePattern().Match(example).Groups[1].Value;
        Assert.Contains(Path.GetDirectoryName(dataFile)!, writable, StringComparison.Ordinal);
    }

    [Fact]
    public void Nginx_sample_upgrades_websockets_forwards_headers_and_pins_clients_to_an_instance()
    {
        var conf = File.ReadAllText(Repo.PathOf("deploy/nginx/trussweb.conf"));
        foreach (var expected in new[]
                 {
                     "proxy_set_header Upgrade $http_upgrade;", "proxy_set_header Connection $connection_upgrade;",
                     "proxy_set_header X-Forwarded-For", "proxy_set_header X-Forwarded-Proto $scheme;", "ip_hash;", "proxy_read_timeout", "ssl_certificate ",
                 })
        {
            Assert.Contains(expected, conf, StringComparison.Ordinal);
        }

        Assert.Equal(conf.Count(c => c == '{'), conf.Count(c => c == '}'));
    }

    /// <summary>Dockerfile instructions with line continuations joined and comments dropped.</summary>
    private static List<string> DockerfileInstructions()
    {
        var text = File.ReadAllText(Repo.PathOf("deploy/Dockerfile"));
        var lines = text.Split('\n').Where(l => !l.TrimStart().StartsWith('#')).ToList();
        return string.Join('\n', lines).Replace("\\\n", " ", StringComparison.Ordinal)
            .Split('\n', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries)
            .ToList();
    }

    private static (int Code, string Output) Bash(params string[] arguments)
    {
        var info = new ProcessStartInfo("bash") { RedirectStandardOutput = true, RedirectStandardError = true, UseShellExecute = false };
        foreach (var argument in arguments)
        {
            info.ArgumentList.Add(argument);
        }

        using var process = Process.Start(info)!;
        var stdout = process.StandardOutput.ReadToEndAsync();
        var stderr = process.StandardError.ReadToEndAsync();
        if (!process.WaitForExit(TimeSpan.FromSeconds(30)))
        {
            process.Kill();
            throw new TimeoutException($"bash {string.Join(' ', arguments)} did not finish");
        }

        return (process.ExitCode, stdout.Result + stderr.Result);
    }

    [GeneratedRegex(@"^TrussWeb__Database__ConnectionString=Data Source=(\S+)$", RegexOptions.Multiline)]
    private static partial Regex DataSourcePattern();
}
