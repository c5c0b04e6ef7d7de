namespace TrussWeb.Core.Loads;

/// <summary>Kind of action of a load case; combination factors are given per kind (or per case).</summary>
public enum LoadKind
{
    /// <summary>Permanent actions D / G: covering, purlins, services, self-weight.</summary>
    Permanent,

    /// <summary>Imposed roof load Q / Lr.</summary>
    Imposed,

    /// <summary>Wind W: one case per wind direction.</summary>
    Wind,

    /// <summary>Anything else the user enters; presets give it the imposed-load factor.</summary>
    Other,
}
