namespace TrussWeb.Web.Api;

/// <summary>Settings of the HTTP API (section <c>TrussWeb:Api</c>).</summary>
public sealed class ApiOptions
{
    public const string SectionName = "TrussWeb:Api";

    /// <summary>Requests one token (or, without a token, one client address) may make per window.</summary>
    public int RequestsPerWindow { get; set; } = 600;

    /// <summary>Length of the rate-limit window, seconds.</summary>
    public int WindowSeconds { get; set; } = 60;

    /// <summary>Largest request body, bytes (256 KB).</summary>
    public int MaxBodyBytes { get; set; } = 256 * 1024;
}
