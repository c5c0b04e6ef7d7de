namespace TrussWeb.Core.Sections;

/// <summary>Section families TrussWeb designs.</summary>
public enum SectionFamily
{
    /// <summary>Hot-rolled single angle, equal or unequal legs.</summary>
    Angle,

    /// <summary>Two equal angles back to back with a gap (gusset thickness).</summary>
    DoubleAngle,

    /// <summary>Circular hollow section.</summary>
    CircularHollow,

    /// <summary>Square or rectangular hollow section.</summary>
    RectangularHollow,

    /// <summary>Tee (cut or rolled); later.</summary>
    Tee,
}
