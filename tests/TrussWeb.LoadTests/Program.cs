using System.Diagnostics;
using System.Globalization;
using System.Net.Http.Headers;
using System.Text;

// A bounded load run of POST /api/v1/calculations/member-check: a fixed number of requests from a fixed
// number of concurrent clients, with a hard time limit. Prints requests per second and latency
// percentiles; exits 1 when any request fails or the time limit is reached.
// Usage: TrussWeb.LoadTests --url http://127.0.0.1:5099 --token tw_... [--requests 20000] [--clients 50] [--limit-seconds 240] [--warmup 500]
var options = Args(args);
var baseUrl = options.GetValueOrDefault("--url") ?? throw new ArgumentException("--url is required");
var token = options.GetValueOrDefault("--token") ?? throw new ArgumentException("--token is required");
var total = int.Parse(options.GetValueOrDefault("--requests") ?? "20000", CultureInfo.InvariantCulture);
var clients = int.Parse(options.GetValueOrDefault("--clients") ?? "50", CultureInfo.InvariantCulture);
var limit = TimeSpan.FromSeconds(double.Parse(options.GetValueOrDefault("--limit-seconds") ?? "240", CultureInfo.InvariantCulture));
var warmup = int.Parse(options.GetValueOrDefault("--warmup") ?? "500", CultureInfo.InvariantCulture);

// A double-angle web member: catalogue section, grade by name, one connector, compression (the API's example).
const string Body = """
    {"mark":"W3","section":{"designation":"L70x70x6","doubleAngle":{"gapMm":10,"arrangement":"EqualLegs"}},
     "material":{"grade":"S355JR"},"lengths":{"lxMm":2400,"lyMm":2400,"kx":1,"ky":1},
     "connectors":{"intermediateCount":1},"forces":{"tensionN":0,"compressionN":85000}}
    """;
var payload = Encoding.UTF8.GetBytes(Body);

using var handler = new SocketsHttpHandler { MaxConnectionsPerServer = clients, PooledConnectionLifetime = TimeSpan.FromMinutes(10) };
using var http = new HttpClient(handler) { BaseAddress = new Uri(baseUrl), Timeout = TimeSpan.FromSeconds(30) };
http.DefaultRequestHeaders.Authorization = new AuthenticationHeaderValue("Bearer", token);

async Task<(bool Ok, double Ms)> OneAsync(CancellationToken ct)
{
    using var content = new ByteArrayContent(payload);
    content.Headers.ContentType = new MediaTypeHeaderValue("application/json");
    var start = Stopwatch.GetTimestamp();
    using var response = await http.PostAsync("/api/v1/calculations/member-check", content, ct);
    var bytes = await response.Content.ReadAsByteArrayAsync(ct);
    var ms = Stopwatch.GetElapsedTime(start).TotalMilliseconds;
    return (response.IsSuccessStatusCode && bytes.Length > 1000, ms);
}

using var cts = new CancellationTokenSource(limit);
var first = await OneAsync(cts.Token);
if (!first.Ok)
{
    Console.Error.WriteLine("The first request failed; is the token valid and the app running?");
    return 1;
}

for (var i = 0; i < warmup; i += clients)
{
    await Task.WhenAll(Enumerable.Range(0, clients).Select(_ => OneAsync(cts.Token)));
}

var latencies = new double[total];
var failures = 0;
var next = -1;
var clock = Stopwatch.StartNew();
try
{
    await Task.WhenAll(Enumerable.Range(0, clients).Select(async _ =>
    {
        int i;
        while ((i = Interlocked.Increment(ref next)) < total)
        {
            var (ok, ms) = await OneAsync(cts.Token);
            latencies[i] = ms;
            if (!ok)
            {
                Interlocked.Increment(ref failures);
            }
        }
    }));
}
catch (OperationCanceledException)
{
    Console.Error.WriteLine($"Time limit of {limit.TotalSeconds} s reached after {Math.Min(next, total)} requests.");
    return 1;
}

clock.Stop();
Array.Sort(latencies);
double P(double q) => latencies[Math.Clamp((int)Math.Ceiling(q * total) - 1, 0, total - 1)];
var inv = CultureInfo.InvariantCulture;
Console.WriteLine(string.Create(inv, $"member checks: {total} requests, {clients} concurrent clients, {failures} failed, {clock.Elapsed.TotalSeconds:F1} s"));
Console.WriteLine(string.Create(inv, $"throughput: {total / clock.Elapsed.TotalSeconds:F0} checks/s"));
Console.WriteLine(string.Create(inv, $"latency ms: p50 {P(0.50):F1}  p95 {P(0.95):F1}  p99 {P(0.99):F1}  max {latencies[^1]:F1}"));
return failures == 0 ? 0 : 1;

static Dictionary<string, string> Args(string[] args)
{
    var d = new Dictionary<string, string>(StringComparer.Ordinal);
    for (var i = 0; i + 1 < args.Length; i += 2)
    {
        d[args[i]] = args[i + 1];
    }

    return d;
}
