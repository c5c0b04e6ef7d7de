using System.Globalization;

namespace TrussWeb.Core.Loads;

/// <summary>
/// Preset load combinations per standard (ENGINEERING.md "Truss model and loads", REFERENCES.md §7).
/// Factors are from memory where marked: they are plain data, shown and editable. A form with wind is
/// repeated once per wind case (the other wind cases get 0). Loads of kind Other take the imposed-load
/// factor (treated as a variable action; edit the combination to change it).
/// D = permanent, Q (Lr) = imposed roof, W = wind.
/// </summary>
public static class CombinationPresets
{
    /// <summary>SANS 10160-1 ULS permanent alone, γG (from memory).</summary>
    public const double SansPermanentAlone = 1.35;

    /// <summary>SANS 10160-1 ULS permanent with variable actions, γG (from memory).</summary>
    public const double SansPermanent = 1.2;

    /// <summary>SANS 10160-1 ULS favourable permanent with wind uplift (from memory).</summary>
    public const double SansPermanentFavourable = 0.9;

    /// <summary>SANS 10160-1 ULS imposed, γQ (from memory).</summary>
    public const double SansImposed = 1.6;

    /// <summary>SANS 10160-1 ULS wind, γW (from memory).</summary>
    public const double SansWind = 1.3;

    /// <summary>
    /// SANS 10160-1 companion imposed load with wind, ψ (ENGINEERING.md gives 0.5, from memory;
    /// REFERENCES.md §7 notes ψ = 0 for inaccessible roofs: edit to 0 where that applies).
    /// </summary>
    public const double SansImposedWithWind = 0.5;

    /// <summary>ASCE 7 LRFD 1.4D (IBC 1605.2, REFERENCES.md §7).</summary>
    public const double AscePermanentAlone = 1.4;

    /// <summary>ASCE 7 LRFD 1.2D.</summary>
    public const double AscePermanent = 1.2;

    /// <summary>ASCE 7 LRFD 0.9D with wind.</summary>
    public const double AscePermanentFavourable = 0.9;

    /// <summary>ASCE 7 LRFD 1.6Lr.</summary>
    public const double AsceRoofLive = 1.6;

    /// <summary>ASCE 7 LRFD 0.5W companion with 1.6Lr and 0.5Lr companion with 1.0W.</summary>
    public const double AsceCompanion = 0.5;

    /// <summary>ASCE 7 LRFD 1.0W (strength-level wind).</summary>
    public const double AsceWind = 1.0;

    /// <summary>EN 1990 γG,sup (REFERENCES.md §7, Table 3.1).</summary>
    public const double EnPermanentUnfavourable = 1.35;

    /// <summary>EN 1990 γG,inf.</summary>
    public const double EnPermanentFavourable = 1.0;

    /// <summary>EN 1990 γQ.</summary>
    public const double EnVariable = 1.5;

    /// <summary>SLS characteristic factor.</summary>
    public const double Characteristic = 1.0;

    /// <summary>All ULS and SLS presets of a standard for the given cases.</summary>
    public static IReadOnlyList<LoadCombination> For(CombinationStandard standard, IReadOnlyList<LoadCase> cases)
    {
        ArgumentNullException.ThrowIfNull(cases);
        var winds = cases.Where(c => c.Kind == LoadKind.Wind).Select(c => c.Id).ToList();
        var list = new List<LoadCombination>();
        switch (standard)
        {
            case CombinationStandard.Sans10160:
                list.Add(Gravity(LimitState.Uls, SansPermanentAlone, 0));
                list.Add(Gravity(LimitState.Uls, SansPermanent, SansImposed));
                list.AddRange(Wind(LimitState.Uls, winds, SansPermanent, SansWind, SansImposedWithWind));
                list.AddRange(Wind(LimitState.Uls, winds, SansPermanentFavourable, SansWind, 0));
                break;
            case CombinationStandard.Asce7Lrfd:
                list.Add(Gravity(LimitState.Uls, AscePermanentAlone, 0));
                if (winds.Count == 0)
                {
                    list.Add(Gravity(LimitState.Uls, AscePermanent, AsceRoofLive));
                }

                list.AddRange(Wind(LimitState.Uls, winds, AscePermanent, AsceCompanion, AsceRoofLive));
                list.AddRange(Wind(LimitState.Uls, winds, AscePermanent, AsceWind, AsceCompanion));
                list.AddRange(Wind(LimitState.Uls, winds, AscePermanentFavourable, AsceWind, 0));
                break;
            case CombinationStandard.En1990:
                list.Add(Gravity(LimitState.Uls, EnPermanentUnfavourable, EnVariable));
                list.AddRange(Wind(LimitState.Uls, winds, EnPermanentUnfavourable, EnVariable, 0));
                list.AddRange(Wind(LimitState.Uls, winds, EnPermanentFavourable, EnVariable, 0));
                break;
            default:
                throw new ArgumentOutOfRangeException(nameof(standard), standard, "no presets for this standard");
        }

        list.Add(Gravity(LimitState.Sls, Characteristic, Characteristic));
        list.AddRange(Wind(LimitState.Sls, winds, Characteristic, Characteristic, 0));
        return list;
    }

    private static string N(double f) => f.ToString("0.0##", CultureInfo.InvariantCulture);

    private static LoadCombination Gravity(LimitState state, double d, double q)
    {
        var name = q == 0 ? $"{N(d)}D" : $"{N(d)}D + {N(q)}Q";
        return new LoadCombination(Prefix(state) + name, state, Kinds(d, q));
    }

    private static IEnumerable<LoadCombination> Wind(LimitState state, IReadOnlyList<string> winds, double d, double w, double q)
    {
        foreach (var id in winds)
        {
            var name = $"{N(d)}D + {N(w)}W({id})" + (q == 0 ? string.Empty : $" + {N(q)}Q");
            yield return new LoadCombination(Prefix(state) + name, state, Kinds(d, q), new Dictionary<string, double> { [id] = w });
        }
    }

    private static string Prefix(LimitState state) => state == LimitState.Sls ? "SLS " : string.Empty;

    private static Dictionary<LoadKind, double> Kinds(double d, double q) => new()
    {
        [LoadKind.Permanent] = d,
        [LoadKind.Imposed] = q,
        [LoadKind.Other] = q,
        [LoadKind.Wind] = 0,
    };
}
