namespace TrussWeb.Core.Loads;

/// <summary>Limit state of a combination.</summary>
public enum LimitState
{
    /// <summary>Ultimate limit state (strength): member forces for design.</summary>
    Uls,

    /// <summary>Serviceability limit state: deflections.</summary>
    Sls,
}
