namespace TrussWeb.Data.Entities;

/// <summary>A design project: client, job reference, design standard and material defaults.</summary>
public class Project : TrackedEntity
{
    public string Name { get; set; } = string.Empty;

    public string? Client { get; set; }

    /// <summary>The office's job reference or number.</summary>
    public string? Reference { get; set; }

    public string? Location { get; set; }

    /// <summary>Drawing/report revision, e.g. "A" or "P2".</summary>
    public string Revision { get; set; } = string.Empty;

    /// <summary>Design standard code, e.g. "SANS 10162-1".</summary>
    public string StandardCode { get; set; } = string.Empty;

    /// <summary>Name of the default steel grade (matches <see cref="SteelGradeEntry.Name"/>).</summary>
    public string? DefaultGradeName { get; set; }

    /// <summary>Display unit setting owned by the UI (e.g. "SI-kN-m"); values are always stored in N and mm.</summary>
    public string Units { get; set; } = string.Empty;

    public List<ProjectMembership> Memberships { get; set; } = [];

    public List<Truss> Trusses { get; set; } = [];
}
