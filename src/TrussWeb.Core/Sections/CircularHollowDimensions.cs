using TrussWeb.Core.Validation;
using static TrussWeb.Core.Sections.DimensionRules;

namespace TrussWeb.Core.Sections;

/// <summary>Dimensions of a circular hollow section (EN 10219-2 / EN 10210-2), mm.</summary>
/// <param name="Diameter">Outside diameter D, mm (catalogue column "D").</param>
/// <param name="Thickness">Wall thickness t, mm (column "t"); 0 &lt; t &lt; D/2.</param>
public sealed record CircularHollowDimensions(double Diameter, double Thickness) : ISectionDimensions
{
    public SectionFamily Family => SectionFamily.CircularHollow;

    /// <summary>Rules: D and t finite and &gt; 0; t &lt; D/2 (a tube, not a bar).</summary>
    public IReadOnlyList<ValidationIssue> Validate()
    {
        var issues = new List<ValidationIssue>();
        var d = Positive(issues, nameof(Diameter), "diameter D", Diameter);
        var t = Positive(issues, nameof(Thickness), "thickness t", Thickness);
        if (d && t && Thickness >= Diameter / 2)
        {
            issues.Add(new ValidationIssue(nameof(Thickness),
                $"thickness t = {Num(Thickness)} mm must be less than half the diameter, D/2 = {Num(Diameter / 2)} mm"));
        }

        return issues;
    }

    /// <summary>True when <see cref="Validate"/> finds nothing (for forms that pre-check input).</summary>
    public bool IsValid() => Validate().Count == 0;

    /// <inheritdoc />
    public SectionProperties Compute(string? designation = null) => CircularHollow.Compute(this, designation);

    /// <summary>"CHS {D}x{t}", e.g. "CHS 114.3x3.6".</summary>
    public string DefaultDesignation() => $"CHS {Num(Diameter)}x{Num(Thickness)}";
}
