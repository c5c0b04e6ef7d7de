namespace TrussWeb.Data.Entities;

/// <summary>A load combination: factors per load case, as JSON text <c>{"caseName": factor, ...}</c>.</summary>
public class LoadCombination : TrackedEntity
{
    public Guid TrussId { get; set; }

    public Truss? Truss { get; set; }

    public string Name { get; set; } = string.Empty;

    public LimitState LimitState { get; set; }

    public string FactorsJson { get; set; } = "{}";

    public int SortOrder { get; set; }
}
