namespace TrussWeb.Reports.Model;

/// <summary>
/// What every page and every exported file states about the issue: project, people, revision, the time
/// it was produced (injected by the caller, never read from the clock here), versions and the approval
/// summary that decides the not-for-construction banner.
/// </summary>
public sealed record ReportHeader
{
    public required string ProjectName { get; init; }

    public required string ProjectNumber { get; init; }

    public string Client { get; init; } = "";

    public string Location { get; init; } = "";

    public required string Revision { get; init; }

    public required string Designer { get; init; }

    public string Checker { get; init; } = "";

    /// <summary>When the document was produced, UTC (from the caller's TimeProvider).</summary>
    public required DateTimeOffset ProducedAtUtc { get; init; }

    /// <summary>Who produced the document (the signed-in user who asked for it); "" when not stated.</summary>
    public string ProducedBy { get; init; } = "";

    /// <summary>Statements the caller wants on the cover and in the file header, e.g. members left out because they have no stored result.</summary>
    public IReadOnlyList<string> Notes { get; init; } = [];

    public required string AppVersion { get; init; }

    /// <summary>Design standard and edition, e.g. <c>Sans10162Standard.EditionText</c>.</summary>
    public required string StandardEdition { get; init; }

    /// <summary>Number of members in the issue.</summary>
    public required int TotalMembers { get; init; }

    /// <summary>Number of those members a checker has approved (for the current design).</summary>
    public required int ApprovedCount { get; init; }

    /// <summary>True when the project lead marks the issue final.</summary>
    public bool IsFinal { get; init; }

    /// <summary>Members not approved.</summary>
    public int NotApprovedCount => Math.Max(0, TotalMembers - ApprovedCount);

    /// <summary>True when every member is approved and the issue is final: only then no banner is shown.</summary>
    public bool IsForConstruction => NotApprovedCount == 0 && IsFinal;

    /// <summary>The banner text on every page, or null when the issue is for construction.</summary>
    public string? BannerText => NotApprovedCount > 0
        ? $"NOT FOR CONSTRUCTION: {NotApprovedCount} of {TotalMembers} members not approved"
        : !IsFinal ? "NOT FOR CONSTRUCTION: preliminary issue, not marked final" : null;

    /// <summary>One line for the approval status.</summary>
    public string ApprovalStatusText => NotApprovedCount > 0
        ? $"{ApprovedCount} of {TotalMembers} members approved; {(IsFinal ? "marked final" : "preliminary")}"
        : $"All {TotalMembers} members approved; {(IsFinal ? "final issue" : "preliminary")}";

    /// <summary>Produced-at time as printed (invariant, UTC).</summary>
    public string ProducedAtText => ProducedAtUtc.UtcDateTime.ToString("yyyy-MM-dd HH:mm 'UTC'", System.Globalization.CultureInfo.InvariantCulture);

    /// <summary>Produced-at date as printed.</summary>
    public string ProducedDateText => ProducedAtUtc.UtcDateTime.ToString("yyyy-MM-dd", System.Globalization.CultureInfo.InvariantCulture);
}
