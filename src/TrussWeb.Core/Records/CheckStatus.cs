namespace TrussWeb.Core.Records;

/// <summary>Outcome of a check or of a member design.</summary>
public enum CheckStatus
{
    /// <summary>Demand within resistance and every limit met.</summary>
    Pass,

    /// <summary>Demand above resistance or a limit exceeded.</summary>
    Fail,

    /// <summary>The check does not apply (e.g. compression check of a member that is never in compression).</summary>
    NotApplicable,

    /// <summary>The input lies outside the scope of the method; no resistance is given.</summary>
    OutOfScope,
}
