using System.Security.Cryptography;
using System.Text;
using Microsoft.AspNetCore.Components;

namespace TrussWeb.Web.Hosting;

/// <summary>
/// Security headers on every response (pages, static files, health): a content security policy the pages work
/// under (Blazor Server's script and web socket from the same origin, MudBlazor's and Plotly's inline styles,
/// the import map allowed by its SHA-256 hash), no MIME sniffing, no framing, a strict referrer policy, no
/// device features, and HSTS only on requests that arrived over HTTPS (directly or through the proxy).
/// </summary>
public static class SecurityHeaders
{
    public const string ContentSecurityPolicy = "Content-Security-Policy";

    /// <summary>The policy without the import-map hash (added per response when the page has an import map).</summary>
    public const string BasePolicy =
        "default-src 'self'; " +
        "script-src 'self'{0}; " +
        "style-src 'self' 'unsafe-inline'; " +
        "img-src 'self' data: blob:; " +
        "font-src 'self' data:; " +
        "connect-src 'self'; " +
        "object-src 'none'; " +
        "base-uri 'self'; " +
        "form-action 'self'; " +
        "frame-ancestors 'none'";

    public static readonly IReadOnlyDictionary<string, string> Fixed = new Dictionary<string, string>(StringComparer.OrdinalIgnoreCase)
    {
        ["X-Content-Type-Options"] = "nosniff",
        ["X-Frame-Options"] = "DENY",
        ["Referrer-Policy"] = "strict-origin-when-cross-origin",
        ["Permissions-Policy"] = "camera=(), microphone=(), geolocation=(), payment=(), usb=()",
        ["Cross-Origin-Opener-Policy"] = "same-origin",
    };

    public const string StrictTransportSecurity = "max-age=31536000";

    public static WebApplication UseTrussWebSecurityHeaders(this WebApplication app)
    {
        ArgumentNullException.ThrowIfNull(app);
        app.Use((context, next) =>
        {
            context.Response.OnStarting(() =>
            {
                var headers = context.Response.Headers;
                foreach (var (name, value) in Fixed)
                {
                    headers[name] = value;
                }

                headers[ContentSecurityPolicy] = Policy(context.GetEndpoint()?.Metadata.GetMetadata<ImportMapDefinition>());
                if (context.Request.IsHttps)
                {
                    headers["Strict-Transport-Security"] = StrictTransportSecurity;
                }

                return Task.CompletedTask;
            });
            return next(context);
        });
        return app;
    }

    /// <summary>The policy for a response whose page renders <paramref name="importMap"/> (the &lt;ImportMap /&gt; inline script), or none.</summary>
    public static string Policy(ImportMapDefinition? importMap) =>
        string.Format(System.Globalization.CultureInfo.InvariantCulture, BasePolicy, importMap is null ? "" : $" 'sha256-{Hash(importMap.ToString())}'");

    private static string Hash(string script) => Convert.ToBase64String(SHA256.HashData(Encoding.UTF8.GetBytes(script)));
}
