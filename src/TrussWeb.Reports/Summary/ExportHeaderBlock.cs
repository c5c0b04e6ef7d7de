using TrussWeb.Core;
using TrussWeb.Reports.Model;

namespace TrussWeb.Reports.Summary;

/// <summary>The label/value lines at the top of every exported file (project, revision, time, approval status, caution).</summary>
internal static class ExportHeaderBlock
{
    public static IReadOnlyList<(string Label, string Value)> Lines(ReportHeader h, string title) =>
    [
        .. Fixed(h, title),
        .. h.Notes.Select(n => ("Note", n)),
    ];

    private static IReadOnlyList<(string Label, string Value)> Fixed(ReportHeader h, string title) =>
    [
        ("Document", title),
        ("Project", h.ProjectName),
        ("Project number", h.ProjectNumber),
        ("Client", h.Client),
        ("Location", h.Location),
        ("Revision", h.Revision),
        ("Designer", h.Designer),
        ("Checker", h.Checker),
        ("Produced at (UTC)", h.ProducedAtText),
        ("Produced by", h.ProducedBy),
        ("Approval status", h.ApprovalStatusText),
        ("Issue status", h.BannerText ?? "For construction: every member approved, final issue"),
        ("Standard", h.StandardEdition),
        ("TrussWeb version", h.AppVersion),
        ("Caution", Caution.Text),
    ];

    public static readonly string[] MemberColumns =
    [
        "Truss", "Mark", "Group", "Section", "Length (m)", "Max tension (kN)", "Tension combination",
        "Max compression (kN)", "Compression combination", "Utilization (-)", "Governing check", "Status",
        "Intermediate connectors (-)", "Connector spacing (mm)", "Review state", "Mass (kg)",
    ];

    public static readonly string[] SectionColumns = ["Truss", "Section", "Members (-)", "Length (m)", "Mass (kg)"];

    public static readonly string[] TrussColumns = ["Truss", "Members (-)", "Mass (kg)", "Mass with connection allowance (kg)", "Max utilization (-)"];
}
