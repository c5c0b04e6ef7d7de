namespace TrussWeb.Core.Loads;

/// <summary>
/// Roof actions per unit area and the truss self-weight inputs that <see cref="LoadBuilder"/> turns into
/// nodal load cases. Pressures in kPa (= 1e-3 N/mm²), masses in kg/m, lengths in mm. Plain data: every
/// value is visible and editable.
/// </summary>
public sealed record AreaActions
{
    /// <summary>Connection allowance on member self-weight for gussets and bolts (common practice 1.10).</summary>
    public const double DefaultConnectionAllowance = 1.10;

    /// <summary>Roof covering, kPa on the slope area.</summary>
    public double RoofCoveringKPa { get; init; }

    /// <summary>Purlins and services, kPa on the slope area.</summary>
    public double PurlinsAndServicesKPa { get; init; }

    /// <summary>Imposed roof load, kPa on plan (SANS 10160-2 inaccessible roof 0.5 kPa, from memory, low confidence).</summary>
    public double ImposedKPaOnPlan { get; init; }

    /// <summary>One entry per wind direction.</summary>
    public IReadOnlyList<WindCase> WindCases { get; init; } = [];

    /// <summary>Mass per metre of each member group's section, kg/m (self-weight case; empty: none).</summary>
    public IReadOnlyDictionary<string, double> MassPerMetreByGroup { get; init; } = new Dictionary<string, double>();

    /// <summary>Mass per metre of individual members, kg/m; wins over the group value.</summary>
    public IReadOnlyDictionary<string, double> MassPerMetreByMember { get; init; } = new Dictionary<string, double>();

    /// <summary>Factor on member self-weight for connections (default 1.10, common practice).</summary>
    public double ConnectionAllowance { get; init; } = DefaultConnectionAllowance;

    /// <summary>
    /// Purlin positions measured along the top chord from its left end, mm. Null: purlins at
    /// <see cref="Model.TrussModel.PurlinNodes"/>. A position that is not at a node is a warning and its
    /// load is shared between the two adjacent nodes by the lever rule.
    /// </summary>
    public IReadOnlyList<double>? PurlinPositionsAlongTopChord { get; init; }

    /// <summary>Further point loads, as their own cases.</summary>
    public IReadOnlyList<LoadCase> PointLoadCases { get; init; } = [];
}
