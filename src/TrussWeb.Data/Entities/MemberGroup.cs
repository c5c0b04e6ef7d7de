namespace TrussWeb.Data.Entities;

/// <summary>Members sized together (e.g. top chord): grade, chosen section and what the sizer may pick.</summary>
public class MemberGroup : TrackedEntity
{
    public Guid TrussId { get; set; }

    public Truss? Truss { get; set; }

    public string Name { get; set; } = string.Empty;

    /// <summary>Role of the group in the truss, e.g. "TopChord", "BottomChord", "Web".</summary>
    public string Role { get; set; } = string.Empty;

    /// <summary>Allowed section families and size limits as JSON text (owned by the sizer); "{}" when none.</summary>
    public string AllowedSectionsJson { get; set; } = "{}";

    /// <summary>Steel grade name (matches <see cref="SteelGradeEntry.Name"/>).</summary>
    public string? GradeName { get; set; }

    /// <summary>Chosen section designation, null until chosen or sized.</summary>
    public string? SectionDesignation { get; set; }

    /// <summary>Gap between the angles of a double-angle section, in mm.</summary>
    public double? DoubleAngleGapMm { get; set; }

    /// <summary>Back-to-back orientation of a double angle (e.g. "LongLegsBackToBack").</summary>
    public string? BackToBackOrientation { get; set; }

    public List<TrussMember> Members { get; set; } = [];
}
