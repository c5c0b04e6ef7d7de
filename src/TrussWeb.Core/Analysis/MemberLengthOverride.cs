namespace TrussWeb.Core.Analysis;

/// <summary>
/// A user's override of a member's buckling lengths (mm) and effective length factors; null keeps
/// the computed value. Applied by <see cref="DesignLengthBuilder"/> and stated as "user override".
/// </summary>
public sealed record MemberLengthOverride
{
    public double? Lx { get; init; }

    public double? Ly { get; init; }

    public double? Lz { get; init; }

    public double? Kx { get; init; }

    public double? Ky { get; init; }

    public double? Kz { get; init; }

    /// <summary>Effective length about the principal axis u-u (single angles), mm.</summary>
    public double? KLu { get; init; }

    /// <summary>Effective length about the principal axis v-v (single angles), mm.</summary>
    public double? KLv { get; init; }

    /// <summary>Why the engineer overrides (shown in the record).</summary>
    public string? Reason { get; init; }
}
