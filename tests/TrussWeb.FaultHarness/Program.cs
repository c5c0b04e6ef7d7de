using System.Globalization;
using Microsoft.Extensions.Configuration;
using TrussWeb.FaultHarness;

// dotnet TrussWeb.FaultHarness.dll [--mode stream|load] ...  (database from TrussWeb__Database__* as for the app)
//   stream: --from 0 --count 1000 --pause-ms 0    prints "ack i memberId kx version" after each save returned Ok
//   load:   --users 20 --saves 10 --seconds 300   prints the latency of save-and-recalculate (p50, p95, max)
var configuration = new ConfigurationBuilder().AddCommandLine(args).Build();
var mode = configuration["mode"] ?? "stream";
await using var host = await StorageHost.StartAsync(args);
if (mode == "stream")
{
    return await SaveStream.RunAsync(host, configuration.GetValue("from", 0), configuration.GetValue("count", 1000), configuration.GetValue("pause-ms", 0),
        Console.Out, CancellationToken.None);
}

if (mode == "load")
{
    var users = configuration.GetValue("users", 20);
    var saves = configuration.GetValue("saves", 10);
    var started = DateTime.UtcNow;
    var outcomes = await LoadRun.RunAsync(host, users, saves, TimeSpan.FromSeconds(configuration.GetValue("seconds", 300)));
    var wall = (DateTime.UtcNow - started).TotalSeconds;
    var times = outcomes.SelectMany(o => o.SaveMilliseconds).ToList();
    string F(double v) => v.ToString("0", CultureInfo.InvariantCulture);
    Console.WriteLine(FormattableString.Invariant($"users {users}, saves per user {saves}, ok saves {times.Count}, conflicts retried {outcomes.Sum(o => o.Conflicts)}, wall {wall:0.0} s"));
    Console.WriteLine($"save-and-recalculate ms: p50 {F(LoadRun.Percentile(times, 0.50))}, p95 {F(LoadRun.Percentile(times, 0.95))}, max {F(times.Max())}");
    return 0;
}

Console.Error.WriteLine($"unknown mode '{mode}' (stream or load)");
return 1;
