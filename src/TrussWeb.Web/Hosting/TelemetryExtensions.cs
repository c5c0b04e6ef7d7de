using OpenTelemetry.Metrics;
using OpenTelemetry.Resources;
using OpenTelemetry.Trace;

namespace TrussWeb.Web.Hosting;

/// <summary>
/// OpenTelemetry traces and metrics (ASP.NET Core, HttpClient, .NET runtime) exported over OTLP, only when
/// <see cref="OtlpEndpointKey"/> is set. Without it nothing is registered and nothing leaves the process.
/// </summary>
public static class TelemetryExtensions
{
    /// <summary>OTLP collector address, e.g. <c>http://otel-collector:4317</c> (gRPC). Empty: telemetry off.</summary>
    public const string OtlpEndpointKey = "TrussWeb:Telemetry:OtlpEndpoint";

    /// <summary>Service name reported with the signals (default <c>TrussWeb</c>).</summary>
    public const string ServiceNameKey = "TrussWeb:Telemetry:ServiceName";

    /// <summary>True when telemetry was registered (an endpoint is configured).</summary>
    public static bool AddTrussWebTelemetry(this IServiceCollection services, IConfiguration configuration)
    {
        ArgumentNullException.ThrowIfNull(services);
        ArgumentNullException.ThrowIfNull(configuration);
        var endpointText = configuration[OtlpEndpointKey];
        if (string.IsNullOrWhiteSpace(endpointText))
        {
            return false;
        }

        if (!Uri.TryCreate(endpointText.Trim(), UriKind.Absolute, out var endpoint) || endpoint.Scheme is not ("http" or "https"))
        {
            throw new InvalidOperationException($"Configuration '{OtlpEndpointKey}' is '{endpointText}'; expected an absolute URL such as http://collector:4317.");
        }

        var serviceName = string.IsNullOrWhiteSpace(configuration[ServiceNameKey]) ? "TrussWeb" : configuration[ServiceNameKey]!;
        services.AddOpenTelemetry()
            .ConfigureResource(resource => resource.AddService(serviceName, serviceVersion: AppVersion.Informational))
            .WithTracing(tracing => tracing
                .AddAspNetCoreInstrumentation()
                .AddHttpClientInstrumentation()
                .AddOtlpExporter(otlp => otlp.Endpoint = endpoint))
            .WithMetrics(metrics => metrics
                .AddAspNetCoreInstrumentation()
                .AddHttpClientInstrumentation()
                .AddRuntimeInstrumentation()
                .AddOtlpExporter(otlp => otlp.Endpoint = endpoint));
        return true;
    }
}
