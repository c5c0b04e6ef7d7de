namespace TrussWeb.Web.Components.Truss;

/// <summary>
/// One member as drawn: its end and midpoint coordinates (m, x along the span, y up), colour and label.
/// <see cref="Value"/> is the number behind the label (kN for forces, the utilization for utilization),
/// as Core computed it; <see cref="Combination"/> names where a force came from.
/// </summary>
public sealed record ElevationSegment(
    string Mark,
    string Group,
    TrussWeb.Core.Model.MemberRole Role,
    double X1,
    double Y1,
    double X2,
    double Y2,
    double MidX,
    double MidY,
    string Colour,
    string Label,
    double? Value,
    ForceSense Sense,
    string? Combination);
