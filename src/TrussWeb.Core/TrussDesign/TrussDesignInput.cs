using TrussWeb.Core.Analysis;
using TrussWeb.Core.Design;
using TrussWeb.Core.Loads;
using TrussWeb.Core.Materials;
using TrussWeb.Core.Model;
using TrussWeb.Core.Sections;

namespace TrussWeb.Core.TrussDesign;

/// <summary>Everything needed to design a whole truss: geometry, actions, combinations, sections per group, material and standard.</summary>
public sealed record TrussDesignInput
{
    public required TrussModel Model { get; init; }

    /// <summary>Area actions; the self-weight masses in it are replaced from the sections in use.</summary>
    public required AreaActions Actions { get; init; }

    /// <summary>Load combinations (all factors visible); build them with <see cref="CombinationPresets"/> or by hand.</summary>
    public required IReadOnlyList<LoadCombination> Combinations { get; init; }

    public required SteelGrade Grade { get; init; }

    public required IDesignStandard Standard { get; init; }

    /// <summary>Settings per group name; every group that has members needs an entry.</summary>
    public required IReadOnlyDictionary<string, GroupDesignSettings> Groups { get; init; }

    /// <summary>Per-member section overrides (mark → section) that win over the group's section; not resized.</summary>
    public IReadOnlyDictionary<string, SectionProperties> MemberSections { get; init; } = new Dictionary<string, SectionProperties>();

    /// <summary>Per-member length and K overrides (mark → override), stated in the record.</summary>
    public IReadOnlyDictionary<string, MemberLengthOverride> LengthOverrides { get; init; } = new Dictionary<string, MemberLengthOverride>();

    /// <summary>Per-member options overrides (mark → options), e.g. the first web member factor.</summary>
    public IReadOnlyDictionary<string, DesignOptions> MemberOptions { get; init; } = new Dictionary<string, DesignOptions>();

    /// <summary>Serviceability deflection limit as span / divisor (common practice 250).</summary>
    public double DeflectionLimitDivisor { get; init; } = AnalysisOptions.DefaultDeflectionLimitDivisor;
}
