namespace TrussWeb.Core.Loads;

/// <summary>
/// Net wind pressure normal to each roof slope for one wind direction, kPa. Positive pushes onto the
/// roof; negative is uplift (suction away from the roof). The left slope is the one rising from the
/// left heel (the only slope of a mono-pitch); a flat top chord counts as left up to mid-span.
/// </summary>
public sealed record WindCase(string Id, string Name, double LeftSlopePressureKPa, double RightSlopePressureKPa);
