using TrussWeb.Core.Validation;

namespace TrussWeb.Core.Loads;

/// <summary>Nodal load cases built from area actions, with warnings (e.g. a purlin off a node).</summary>
public sealed record LoadBuildResult(IReadOnlyList<LoadCase> Cases, IReadOnlyList<ValidationIssue> Warnings);
