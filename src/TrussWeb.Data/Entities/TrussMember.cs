namespace TrussWeb.Data.Entities;

/// <summary>
/// A truss member between two nodes. Nullable design inputs mean "use the default" (the group's
/// section, K = 1, the geometric length). Lengths in mm.
/// </summary>
public class TrussMember : TrackedEntity
{
    public Guid TrussId { get; set; }

    public Truss? Truss { get; set; }

    /// <summary>Mark unique within the truss, e.g. "T1".</summary>
    public string Mark { get; set; } = string.Empty;

    public Guid StartNodeId { get; set; }

    public TrussNode? StartNode { get; set; }

    public Guid EndNodeId { get; set; }

    public TrussNode? EndNode { get; set; }

    public Guid GroupId { get; set; }

    public MemberGroup? Group { get; set; }

    /// <summary>Section for this member only; null uses the group's section.</summary>
    public string? SectionDesignationOverride { get; set; }

    public double? Kx { get; set; }

    public double? Ky { get; set; }

    public double? Kz { get; set; }

    /// <summary>Unbraced length for buckling about x-x (in-plane); null uses the computed length.</summary>
    public double? LengthXMm { get; set; }

    /// <summary>Unbraced length for buckling about y-y (out of plane); null uses the computed length.</summary>
    public double? LengthYMm { get; set; }

    /// <summary>Unbraced length for torsional buckling; null uses the computed length.</summary>
    public double? LengthZMm { get; set; }

    /// <summary>Effective length about the u-u principal axis of a single angle.</summary>
    public double? KLuMm { get; set; }

    /// <summary>Effective length about the v-v principal axis of a single angle.</summary>
    public double? KLvMm { get; set; }

    /// <summary>Number of intermediate connectors of a built-up member.</summary>
    public int? ConnectorCount { get; set; }

    /// <summary>Spacing of intermediate connectors of a built-up member.</summary>
    public double? ConnectorSpacingMm { get; set; }

    /// <summary>Use the modified slenderness ratio of built-up members.</summary>
    public bool UseModifiedSlenderness { get; set; }

    /// <summary>End connection details as JSON text (bolts, welds, eccentricity); null when not given.</summary>
    public string? ConnectionDetailsJson { get; set; }

    /// <summary>Further option flags as JSON text (owned by Services); null when none.</summary>
    public string? OptionsJson { get; set; }

    /// <summary>
    /// Review state, the name of a <c>MemberReviewState</c> of Services (NotSubmitted, AwaitingCheck, Approved,
    /// Returned, ApprovalStale); "Draft" is the initial value and reads as NotSubmitted. Owned by ReviewService.
    /// </summary>
    public string ReviewState { get; set; } = "Draft";

    public string? SubmittedBy { get; set; }

    public DateTime? SubmittedUtc { get; set; }

    public string? CheckerId { get; set; }

    public DateTime? ReviewedUtc { get; set; }

    public string? ReviewComment { get; set; }

    /// <summary>Fingerprint of the snapshot that was approved; the approval is stale when it no longer matches.</summary>
    public string? ApprovedFingerprint { get; set; }

    /// <summary>
    /// Designer of record: the user who last submitted the member, or whose save last changed its
    /// fingerprint. That user may not approve or return it (four eyes).
    /// </summary>
    public string? DesignerOfRecordId { get; set; }

    /// <summary>Copy of the approved snapshot's <c>InputsJson</c>, kept so changes since approval never need a recalculation.</summary>
    public string? ApprovedInputsJson { get; set; }

    /// <summary>Copy of the approved snapshot's <c>ResultJson</c>.</summary>
    public string? ApprovedResultJson { get; set; }
}
