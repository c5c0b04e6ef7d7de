using TrussWeb.Core.Design;
using TrussWeb.Core.Records;
using TrussWeb.Core.Sections;

namespace TrussWeb.Core.Standards.Sans10162;

/// <summary>
/// Classification of elements in axial compression, SANS 10162-1 cl. 11, Table 4 (as CSA S16 Table 1):
/// <list type="bullet">
/// <item>angle legs and flange outstands: b/t ≤ 200/√Fy;</item>
/// <item>tee stems: d/t ≤ 340/√Fy;</item>
/// <item>rectangular hollow section walls: (b − 4t)/t ≤ 670/√Fy;</item>
/// <item>circular hollow sections: D/t ≤ 23 000/Fy.</item>
/// </list>
/// Fy in MPa; widths and thicknesses in mm as held by <see cref="PlateElement"/>.
/// Class 4 (slender) elements: effective area Ae = A − Σ Count·(b − b_lim)·t with b_lim = limit·t, i.e.
/// each slender element's width cut back to the class 3 limit (CSA S16-14 cl. 13.3.5 method; the
/// SANS 10162-1 clause is to be confirmed by the engineer). Class 4 circular hollow sections are out of
/// scope (no effective width rule here).
/// </summary>
public static class Classification
{
    /// <summary>Numerator of the angle-leg / outstand limit 200/√Fy, √MPa. Source: SANS 10162-1 Table 4 (as CSA S16 Table 1).</summary>
    public const double AngleLegLimitSqrtMpa = 200;

    /// <summary>Numerator of the tee-stem limit 340/√Fy, √MPa. Source: SANS 10162-1 Table 4.</summary>
    public const double TeeStemLimitSqrtMpa = 340;

    /// <summary>Numerator of the RHS wall limit 670/√Fy, √MPa. Source: SANS 10162-1 Table 4.</summary>
    public const double HollowWallLimitSqrtMpa = 670;

    /// <summary>Numerator of the CHS limit 23 000/Fy, MPa. Source: SANS 10162-1 Table 4.</summary>
    public const double CircularLimitMpa = 23_000;

    /// <summary>Class 3 limit of the width-to-thickness ratio of an element kind at yield strength <paramref name="fy"/> MPa.</summary>
    public static double Limit(ElementKind kind, double fy)
    {
        if (!(fy > 0) || !double.IsFinite(fy))
        {
            throw new ArgumentOutOfRangeException(nameof(fy), fy, "Fy must be finite and greater than 0");
        }

        return kind switch
        {
            ElementKind.AngleLeg or ElementKind.FlangeOutstand => AngleLegLimitSqrtMpa / Math.Sqrt(fy),
            ElementKind.TeeStem => TeeStemLimitSqrtMpa / Math.Sqrt(fy),
            ElementKind.HollowWall => HollowWallLimitSqrtMpa / Math.Sqrt(fy),
            ElementKind.CircularWall => CircularLimitMpa / fy,
            _ => throw new ArgumentOutOfRangeException(nameof(kind), kind, "unknown element kind"),
        };
    }

    /// <summary>Classifies one element; class 4 elements carry their area reduction.</summary>
    public static ElementClassification ClassifyElement(PlateElement element, double fy)
    {
        ArgumentNullException.ThrowIfNull(element);
        var limit = Limit(element.Kind, fy);
        var ratio = element.Slenderness;
        if (ratio <= limit)
        {
            return new ElementClassification(element, ratio, limit, 3, 0);
        }

        var reduction = element.Kind == ElementKind.CircularWall
            ? 0
            : element.Count * (element.Width - limit * element.Thickness) * element.Thickness;
        return new ElementClassification(element, ratio, limit, 4, reduction);
    }

    /// <summary>Classifies every element of <paramref name="section"/> and gives the effective area, with the record steps.</summary>
    public static SectionClassification Classify(SectionProperties section, double fy, CalcRecord? record)
    {
        ArgumentNullException.ThrowIfNull(section);
        var list = new List<ElementClassification>(section.Elements.Count);
        var worst = 3;
        var reduction = 0.0;
        var inScope = true;
        foreach (var element in section.Elements)
        {
            var c = ClassifyElement(element, fy);
            list.Add(c);
            worst = Math.Max(worst, c.Class);
            reduction += c.AreaReduction;
            if (c.Class == 4 && element.Kind == ElementKind.CircularWall)
            {
                inScope = false;
            }

            record?.Add($"{RatioSymbol(element.Kind)} ({element.Name})",
                $"Width-to-thickness ratio of {element.Name} ({element.Count} ×), class {(c.Class == 3 ? "1 to 3" : "4")}; limit {LimitText(element.Kind)} = {Display.S(c.Limit)}",
                RatioSymbol(element.Kind), $"{Display.S(element.Width)} / {Display.S(element.Thickness)}", c.Ratio, "", Sans10162References.ClassTable4);
        }

        var ae = section.Area - reduction;
        if (worst == 4)
        {
            if (inScope)
            {
                record?.Add("Ae", "Effective area, slender element widths cut back to the class 3 limit", "A − Σ n (b − b_lim) t",
                    $"{Display.S(section.Area)} − {Display.S(reduction)}", ae, "mm²", Sans10162References.Class4EffectiveArea);
                record?.Note("Class 4 section: the compressive resistance uses the effective area Ae (CSA S16-14 cl. 13.3.5 method, widths cut to the class 3 limit); the SANS 10162-1 clause is to be confirmed by the engineer. Fe uses gross properties.");
            }
            else
            {
                record?.Note("Class 4 circular hollow section: no effective area rule is implemented; the compressive resistance is out of scope.");
            }
        }
        else
        {
            record?.Note("All elements class 1 to 3 in axial compression: the gross area is fully effective.");
        }

        return new SectionClassification(list, worst, section.Area, worst == 4 ? ae : section.Area, inScope);
    }

    /// <summary>
    /// The classification as an informative check: demand = the worst ratio over its class 3 limit,
    /// resistance = 1. Its utilization is reported as 0 because the class is not a resistance: a class 4
    /// section is handled by the effective area in the compressive resistance, which then governs. Status
    /// is Pass, or OutOfScope when a class 4 element has no effective area rule.
    /// </summary>
    public static CheckResult Check(SectionClassification classification, CalcRecord? record)
    {
        ArgumentNullException.ThrowIfNull(classification);
        var worst = classification.Elements.Count == 0 ? 0 : classification.Elements.Max(e => e.Ratio / e.Limit);
        var status = classification.Class == 4 && !classification.EffectiveAreaInScope ? CheckStatus.OutOfScope : CheckStatus.Pass;
        record?.Add("class", "Section class in axial compression (3 = class 1 to 3)", "worst element class", classification.Class.ToString(System.Globalization.CultureInfo.InvariantCulture), classification.Class, "", Sans10162References.ClassTable4);
        return new CheckResult("Classification (axial compression)", worst, 1, 0, status, "", Sans10162References.ClassTable4, record);
    }

    private static string RatioSymbol(ElementKind kind) => kind switch
    {
        ElementKind.TeeStem => "d/t",
        ElementKind.HollowWall => "(b−4t)/t",
        ElementKind.CircularWall => "D/t",
        _ => "b/t",
    };

    private static string LimitText(ElementKind kind) => kind switch
    {
        ElementKind.TeeStem => "340/√Fy",
        ElementKind.HollowWall => "670/√Fy",
        ElementKind.CircularWall => "23 000/Fy",
        _ => "200/√Fy",
    };
}
