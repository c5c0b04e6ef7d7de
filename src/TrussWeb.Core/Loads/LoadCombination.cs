namespace TrussWeb.Core.Loads;

/// <summary>
/// A linear combination of load cases: each case gets the factor given for its id, or else the factor
/// for its kind, or else 0. Plain data: every factor is visible and editable.
/// </summary>
/// <param name="Name">Display name, e.g. "1.2D + 1.3W(W1) + 0.5Q".</param>
/// <param name="LimitState">ULS (design forces) or SLS (deflections).</param>
/// <param name="KindFactors">Factor per kind of action.</param>
/// <param name="CaseFactors">Factor per case id; wins over the kind factor (used for one wind case per combination).</param>
public sealed record LoadCombination(
    string Name,
    LimitState LimitState,
    IReadOnlyDictionary<LoadKind, double> KindFactors,
    IReadOnlyDictionary<string, double>? CaseFactors = null)
{
    /// <summary>The factor this combination applies to <paramref name="loadCase"/>.</summary>
    public double FactorFor(LoadCase loadCase)
    {
        ArgumentNullException.ThrowIfNull(loadCase);
        if (CaseFactors is not null && CaseFactors.TryGetValue(loadCase.Id, out var f))
        {
            return f;
        }

        return KindFactors.TryGetValue(loadCase.Kind, out var k) ? k : 0;
    }
}
