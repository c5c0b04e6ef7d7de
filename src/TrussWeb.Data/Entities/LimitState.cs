namespace TrussWeb.Data.Entities;

/// <summary>Limit state of a load combination; stored as its name.</summary>
public enum LimitState
{
    /// <summary>Ultimate limit state (strength).</summary>
    Uls,

    /// <summary>Serviceability limit state (deflection).</summary>
    Sls,
}
