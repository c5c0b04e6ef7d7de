namespace TrussWeb.Web.Hosting;

/// <summary>
/// The deployment concerns of the web host in two calls: <see cref="AddTrussWebDeployment"/> on the
/// builder (telemetry, reverse proxy) and <see cref="UseTrussWebDeployment"/> first on the app
/// (forwarded headers, health endpoints). Console logging is configured by the standard
/// <c>Logging:Console</c> section (<c>Logging:Console:FormatterName=json</c> for JSON lines).
/// </summary>
public static class DeploymentExtensions
{
    public static WebApplicationBuilder AddTrussWebDeployment(this WebApplicationBuilder builder)
    {
        ArgumentNullException.ThrowIfNull(builder);
        builder.Services.AddTrussWebTelemetry(builder.Configuration);
        builder.Services.AddTrussWebReverseProxy(builder.Configuration);
        return builder;
    }

    /// <summary>Call before the other middleware: forwarded headers must be applied before anything reads the scheme or the client address.</summary>
    public static WebApplication UseTrussWebDeployment(this WebApplication app)
    {
        ArgumentNullException.ThrowIfNull(app);
        if (ReverseProxyExtensions.IsEnabled(app.Configuration))
        {
            app.UseForwardedHeaders();
        }

        app.MapTrussWebHealth();
        return app;
    }
}
