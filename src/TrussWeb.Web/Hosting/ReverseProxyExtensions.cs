using System.Net;
using Microsoft.AspNetCore.HttpOverrides;

namespace TrussWeb.Web.Hosting;

/// <summary>
/// Honours <c>X-Forwarded-For</c> and <c>X-Forwarded-Proto</c> from a reverse proxy when
/// <see cref="EnabledKey"/> is true, trusting only <see cref="KnownProxiesKey"/> (addresses) and
/// <see cref="KnownNetworksKey"/> (CIDR ranges); with neither, only loopback proxies are trusted.
/// </summary>
public static class ReverseProxyExtensions
{
    public const string EnabledKey = "TrussWeb:ReverseProxy:Enabled";
    public const string KnownProxiesKey = "TrussWeb:ReverseProxy:KnownProxies";
    public const string KnownNetworksKey = "TrussWeb:ReverseProxy:KnownNetworks";

    public static bool IsEnabled(IConfiguration configuration) =>
        string.Equals(configuration[EnabledKey]?.Trim(), "true", StringComparison.OrdinalIgnoreCase);

    /// <summary>Configures <see cref="ForwardedHeadersOptions"/> from configuration; invalid addresses fail at start naming the key.</summary>
    public static IServiceCollection AddTrussWebReverseProxy(this IServiceCollection services, IConfiguration configuration)
    {
        ArgumentNullException.ThrowIfNull(services);
        ArgumentNullException.ThrowIfNull(configuration);
        if (!IsEnabled(configuration))
        {
            return services;
        }

        var proxies = Values(configuration, KnownProxiesKey)
            .Select(text => IPAddress.TryParse(text, out var address)
                ? address
                : throw new InvalidOperationException($"Configuration '{KnownProxiesKey}': '{text}' is not an IP address."))
            .ToList();
        var networks = Values(configuration, KnownNetworksKey)
            .Select(text => System.Net.IPNetwork.TryParse(text, out var network)
                ? network
                : throw new InvalidOperationException($"Configuration '{KnownNetworksKey}': '{text}' is not a network such as 10.0.0.0/8."))
            .ToList();
        services.Configure<ForwardedHeadersOptions>(options =>
        {
            options.ForwardedHeaders = ForwardedHeaders.XForwardedFor | ForwardedHeaders.XForwardedProto;
            if (proxies.Count > 0 || networks.Count > 0)
            {
                options.KnownProxies.Clear();
                options.KnownIPNetworks.Clear();
                proxies.ForEach(options.KnownProxies.Add);
                networks.ForEach(options.KnownIPNetworks.Add);
            }
        });
        return services;
    }

    /// <summary>A list setting: array entries (<c>Key:0</c>, <c>Key:1</c>…) or one comma- or semicolon-separated value.</summary>
    internal static IEnumerable<string> Values(IConfiguration configuration, string key)
    {
        var section = configuration.GetSection(key);
        var items = section.GetChildren().Select(c => c.Value).Append(section.Value);
        return items
            .Where(v => !string.IsNullOrWhiteSpace(v))
            .SelectMany(v => v!.Split([',', ';'], StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries))
            .ToList();
    }
}
