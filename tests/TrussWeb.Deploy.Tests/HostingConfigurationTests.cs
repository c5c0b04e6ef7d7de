using System.Net;
using Microsoft.AspNetCore.Builder;
using Microsoft.AspNetCore.HttpOverrides;
using Microsoft.Extensions.Configuration;
using Microsoft.Extensions.DependencyInjection;
using Microsoft.Extensions.Options;
using OpenTelemetry.Metrics;
using OpenTelemetry.Trace;
using TrussWeb.Web.Hosting;

namespace TrussWeb.Deploy.Tests;

/// <summary>The hosting settings: telemetry only with an endpoint, forwarded headers only from the configured proxies.</summary>
public sealed class HostingConfigurationTests
{
    private static IConfiguration Config(params (string Key, string Value)[] values) =>
        new ConfigurationBuilder().AddInMemoryCollection(values.Select(v => new KeyValuePair<string, string?>(v.Key, v.Value))).Build();

    [Fact]
    public void Telemetry_is_not_registered_without_an_OTLP_endpoint()
    {
        var services = new ServiceCollection();
        Assert.False(services.AddTrussWebTelemetry(Config()));
        using var provider = services.BuildServiceProvider();
        Assert.Null(provider.GetService<TracerProvider>());
        Assert.Null(provider.GetService<MeterProvider>());
    }

    [Fact]
    public void Telemetry_registers_traces_and_metrics_when_an_OTLP_endpoint_is_set()
    {
        var services = new ServiceCollection().AddLogging();
        // A closed loopback port: the exporters are built but nothing is sent off the machine.
        Assert.True(services.AddTrussWebTelemetry(Config((TelemetryExtensions.OtlpEndpointKey, "http://127.0.0.1:9"))));
        using var provider = services.BuildServiceProvider();
        Assert.NotNull(provider.GetService<TracerProvider>());
        Assert.NotNull(provider.GetService<MeterProvider>());
    }

    [Fact]
    public void Telemetry_refuses_an_endpoint_that_is_not_an_absolute_URL_naming_the_key()
    {
        var ex = Assert.Throws<InvalidOperationException>(() => new ServiceCollection().AddTrussWebTelemetry(Config((TelemetryExtensions.OtlpEndpointKey, "collector:4317 x"))));
        Assert.Contains(TelemetryExtensions.OtlpEndpointKey, ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Reverse_proxy_settings_trust_exactly_the_configured_proxies_and_networks()
    {
        var options = ForwardedOptions(
            (ReverseProxyExtensions.EnabledKey, "true"),
            (ReverseProxyExtensions.KnownProxiesKey, "10.0.0.5, 10.0.0.6"),
            (ReverseProxyExtensions.KnownNetworksKey + ":0", "192.168.10.0/24"));
        Assert.Equal(ForwardedHeaders.XForwardedFor | ForwardedHeaders.XForwardedProto, options.ForwardedHeaders);
        Assert.Equal([IPAddress.Parse("10.0.0.5"), IPAddress.Parse("10.0.0.6")], options.KnownProxies);
        Assert.Equal([System.Net.IPNetwork.Parse("192.168.10.0/24")], options.KnownIPNetworks);
    }

    [Fact]
    public void Reverse_proxy_off_by_default_forwards_nothing()
    {
        Assert.Equal(ForwardedHeaders.None, ForwardedOptions().ForwardedHeaders);
    }

    [Fact]
    public void Reverse_proxy_refuses_a_malformed_address_naming_the_key()
    {
        var ex = Assert.Throws<InvalidOperationException>(() => ForwardedOptions((ReverseProxyExtensions.EnabledKey, "true"), (ReverseProxyExtensions.KnownProxiesKey, "10.0.0.300")));
        Assert.Contains(ReverseProxyExtensions.KnownProxiesKey, ex.Message, StringComparison.Ordinal);
    }

    private static ForwardedHeadersOptions ForwardedOptions(params (string Key, string Value)[] values)
    {
        var services = new ServiceCollection().AddOptions();
        services.AddTrussWebReverseProxy(Config(values));
        using var provider = services.BuildServiceProvider();
        return provider.GetRequiredService<IOptions<ForwardedHeadersOptions>>().Value;
    }
}
