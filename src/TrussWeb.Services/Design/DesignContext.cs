using TrussWeb.Core.Design;
using TrussWeb.Core.Materials;
using TrussWeb.Core.TrussDesign;
using TrussWeb.Data.Entities;

namespace TrussWeb.Services.Design;

/// <summary>A truss loaded from the database and mapped to Core, ready to design or size.</summary>
internal sealed record DesignContext(
    Truss Truss,
    Project Project,
    TrussDesignInput Input,
    SectionResolver Sections,
    IReadOnlyDictionary<string, ResolvedSection?> GroupSections,
    IReadOnlyDictionary<string, ResolvedSection> MemberSections,
    IReadOnlyDictionary<string, ConnectorLayout> MemberConnectors,
    IReadOnlyDictionary<string, TrussMember> MembersByMark,
    SteelGrade Grade);
