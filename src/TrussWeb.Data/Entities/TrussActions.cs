namespace TrussWeb.Data.Entities;

/// <summary>Area actions on one truss (1:1). Pressures in kPa on plan or slope as Core defines them.</summary>
public class TrussActions : TrackedEntity
{
    public Guid TrussId { get; set; }

    public Truss? Truss { get; set; }

    public double CoveringKPa { get; set; }

    public double PurlinsAndServicesKPa { get; set; }

    public double ImposedKPa { get; set; }

    /// <summary>
    /// Wind cases as JSON text: a list of objects <c>{"name": "...", "leftSlopeKPa": n, "rightSlopeKPa": n}</c>
    /// (positive = towards the roof surface). "[]" when none.
    /// </summary>
    public string WindCasesJson { get; set; } = "[]";
}
