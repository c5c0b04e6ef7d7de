using System.Reflection;
using System.Security.Cryptography;
using System.Text;
using TrussWeb.Core.TrussDesign;
using TrussWeb.Services.Common;

namespace TrussWeb.Services.Design;

/// <summary>
/// Fingerprint of a stored design: lower-case hex SHA-256 of a canonical text made of the normalised
/// inputs document (section designation and dimensions, grade with fy/fu/E/G, lengths and K,
/// connectors, options, forces envelope with combinations, standard code and module version, Core
/// version) and the results (utilization, governing check and combination, status, every check's
/// demand and resistance). The text is the invariant-culture JSON of those records with properties in
/// declaration order and dictionaries sorted, so equal inputs give equal fingerprints on any machine.
/// </summary>
internal static class DesignFingerprint
{
    /// <summary>Version of TrussWeb.Core that calculates (assembly version).</summary>
    public static string CoreVersion { get; } = typeof(TrussDesigner).Assembly.GetName().Version?.ToString() ?? "0";

    public static string Compute(MemberInputsDoc inputs, MemberResultDoc results) =>
        Hash(Json.Write(inputs) + "\n" + Json.Write(results with { Steps = [], Notes = [] }));

    public static string Compute(TrussInputsDoc inputs, TrussResultDoc results) =>
        Hash(Json.Write(inputs) + "\n" + Json.Write(results));

    public static string Hash(string canonical) =>
        Convert.ToHexStringLower(SHA256.HashData(Encoding.UTF8.GetBytes(canonical)));

    internal static string InformationalVersion() =>
        typeof(TrussDesigner).Assembly.GetCustomAttribute<AssemblyInformationalVersionAttribute>()?.InformationalVersion ?? CoreVersion;
}
