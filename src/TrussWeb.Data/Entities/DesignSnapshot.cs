namespace TrussWeb.Data.Entities;

/// <summary>
/// A stored design result: the normalised inputs, the calculation record and results, and the
/// fingerprint and versions that produced them. Reports and approvals read snapshots and never
/// recalculate. A snapshot with a null <see cref="MemberId"/> covers the whole truss.
/// </summary>
public class DesignSnapshot : TrackedEntity
{
    /// <summary>Length of a hex SHA-256 fingerprint.</summary>
    public const int FingerprintLength = 64;

    public Guid TrussId { get; set; }

    public Truss? Truss { get; set; }

    public Guid? MemberId { get; set; }

    public TrussMember? Member { get; set; }

    /// <summary>Lower-case hex SHA-256 of the normalised inputs and the standard version (64 characters).</summary>
    public string Fingerprint { get; set; } = string.Empty;

    /// <summary>Version of TrussWeb.Core that calculated the result.</summary>
    public string CoreVersion { get; set; } = string.Empty;

    public string StandardCode { get; set; } = string.Empty;

    public string StandardVersion { get; set; } = string.Empty;

    /// <summary>Normalised inputs as JSON text.</summary>
    public string InputsJson { get; set; } = "{}";

    /// <summary>The calculation record and results as JSON text.</summary>
    public string ResultJson { get; set; } = "{}";

    /// <summary>Governing utilization (demand / resistance); null when not applicable.</summary>
    public double? Utilization { get; set; }

    /// <summary>Outcome, e.g. "Pass", "Fail", "OutOfScope".</summary>
    public string Status { get; set; } = string.Empty;
}
