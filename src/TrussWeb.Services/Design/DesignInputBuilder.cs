using Microsoft.EntityFrameworkCore;
using TrussWeb.Core.Analysis;
using TrussWeb.Core.Design;
using TrussWeb.Core.Loads;
using TrussWeb.Core.Materials;
using TrussWeb.Core.Model;
using TrussWeb.Core.Sections;
using TrussWeb.Core.Sizing;
using TrussWeb.Core.TrussDesign;
using TrussWeb.Core.Validation;
using TrussWeb.Data;
using TrussWeb.Data.Entities;
using TrussWeb.Services.Catalogue;
using TrussWeb.Services.Common;
using CoreGroup = TrussWeb.Core.Model.MemberGroup;
using CoreLimitState = TrussWeb.Core.Loads.LimitState;
using CoreSupportKind = TrussWeb.Core.Model.SupportKind;

namespace TrussWeb.Services.Design;

/// <summary>
/// Maps the stored truss to Core: nodes, members, supports, restraints and purlin points to a
/// <see cref="TrussModel"/>; actions to <see cref="AreaActions"/>; combinations; group settings (section
/// from the catalogue by designation, double angles built with the group's gap and arrangement, sizing
/// limits); member overrides; the grade (project default, else the first group grade) and the standard.
/// Maps only; every number is computed by Core.
/// </summary>
internal static class DesignInputBuilder
{
    public static async Task<Truss?> LoadTrussAsync(TrussWebDbContext db, Guid trussId, CancellationToken cancellationToken) =>
        await db.Trusses
            .Include(t => t.Project)
            .Include(t => t.Nodes).ThenInclude(n => n.Support)
            .Include(t => t.Groups)
            .Include(t => t.Members)
            .Include(t => t.Actions)
            .Include(t => t.PointLoads)
            .Include(t => t.Combinations)
            .AsSplitQuery()
            .FirstOrDefaultAsync(t => t.Id == trussId, cancellationToken).ConfigureAwait(false);

    /// <summary>Builds the Core input, or the issues (by field) that stop it.</summary>
    public static async Task<(DesignContext? Context, IReadOnlyList<ValidationIssue> Issues)> BuildAsync(
        TrussWebDbContext db, Truss truss, bool forSizing, CancellationToken cancellationToken)
    {
        var catalogue = await CatalogueMapper.LoadCatalogueAsync(db, cancellationToken).ConfigureAwait(false);
        var grades = await db.SteelGrades.AsNoTracking().ToListAsync(cancellationToken).ConfigureAwait(false);
        return Build(truss, truss.Project!, catalogue, grades, forSizing);
    }

    public static (DesignContext? Context, IReadOnlyList<ValidationIssue> Issues) Build(
        Truss truss, Project project, CatalogueLoadResult catalogue, IReadOnlyList<SteelGradeEntry> gradeRows, bool forSizing)
    {
        var issues = new List<ValidationIssue>();
        var standard = Standards.Find(project.StandardCode);
        if (standard is null)
        {
            issues.Add(new ValidationIssue(nameof(Project.StandardCode), $"standard '{project.StandardCode}' is not available; choose one of {string.Join(", ", Standards.All.Select(s => s.Code))}"));
        }

        var gradeName = project.DefaultGradeName ?? truss.Groups.Select(g => g.GradeName).FirstOrDefault(n => n is not null);
        SteelGrade? grade = null;
        if (gradeName is null)
        {
            issues.Add(new ValidationIssue(nameof(Project.DefaultGradeName), "choose a default steel grade for the project"));
        }
        else
        {
            var row = gradeRows.FirstOrDefault(g => string.Equals(g.Name, gradeName, StringComparison.OrdinalIgnoreCase));
            if (row is null)
            {
                issues.Add(new ValidationIssue(nameof(Project.DefaultGradeName), $"grade '{gradeName}' is not in the grade list"));
            }
            else
            {
                grade = CatalogueMapper.ToCore(row);
            }
        }

        var nodeLabel = truss.Nodes.ToDictionary(n => n.Id, n => n.Label);
        var resolver = new SectionResolver(catalogue);
        var groupSections = new Dictionary<string, ResolvedSection?>(StringComparer.Ordinal);
        var settings = new Dictionary<string, GroupDesignSettings>(StringComparer.Ordinal);
        foreach (var g in truss.Groups.OrderBy(g => g.Name, StringComparer.Ordinal))
        {
            if (!Enum.TryParse<MemberRole>(g.Role, ignoreCase: true, out _))
            {
                issues.Add(new ValidationIssue($"Groups[{g.Name}].Role", $"unknown role '{g.Role}'; use one of {string.Join(", ", Enum.GetNames<MemberRole>())}"));
            }

            var orientation = ParseOrientation(g.BackToBackOrientation);
            ResolvedSection? section = null;
            if (!string.IsNullOrWhiteSpace(g.SectionDesignation))
            {
                if (resolver.TryResolve(g.SectionDesignation, g.DoubleAngleGapMm, orientation, out var s, out var error))
                {
                    section = s;
                }
                else
                {
                    issues.Add(new ValidationIssue($"Groups[{g.Name}].SectionDesignation", error ?? "unknown section"));
                }
            }

            groupSections[g.Name] = section;
            var limits = Json.Read<AllowedSectionsDoc>(g.AllowedSectionsJson);
            SizingConstraints? constraints = null;
            if (forSizing && limits?.Families is { Count: > 0 } families)
            {
                constraints = new SizingConstraints
                {
                    Families = families.ToHashSet(),
                    MinDimension = limits.MinDimensionMm,
                    MinThickness = limits.MinThicknessMm,
                    MaxDimension = limits.MaxDimensionMm ?? double.PositiveInfinity,
                };
                issues.AddRange(constraints.Validate().Select(v => v with { Field = $"Groups[{g.Name}].Limits.{v.Field}" }));
            }

            settings[g.Name] = new GroupDesignSettings
            {
                Group = g.Name,
                Section = section?.Properties,
                Constraints = constraints,
                DoubleAngleGap = g.DoubleAngleGapMm ?? SectionResolver.DefaultGapMm,
                Orientation = orientation ?? BackToBack.LongLegsBackToBack,
            };
        }

        var memberSections = new Dictionary<string, ResolvedSection>(StringComparer.Ordinal);
        var lengthOverrides = new Dictionary<string, MemberLengthOverride>(StringComparer.Ordinal);
        var connectors = new Dictionary<string, ConnectorLayout>(StringComparer.Ordinal);
        foreach (var m in truss.Members.OrderBy(m => m.Mark, StringComparer.Ordinal))
        {
            var group = truss.Groups.FirstOrDefault(g => g.Id == m.GroupId);
            if (!string.IsNullOrWhiteSpace(m.SectionDesignationOverride))
            {
                if (resolver.TryResolve(m.SectionDesignationOverride, group?.DoubleAngleGapMm, ParseOrientation(group?.BackToBackOrientation), out var s, out var error))
                {
                    memberSections[m.Mark] = s!;
                }
                else
                {
                    issues.Add(new ValidationIssue($"Members[{m.Mark}].SectionOverride", error ?? "unknown section"));
                }
            }

            if ((m.LengthXMm ?? m.LengthYMm ?? m.LengthZMm ?? m.Kx ?? m.Ky ?? m.Kz ?? m.KLuMm ?? m.KLvMm) is not null)
            {
                lengthOverrides[m.Mark] = new MemberLengthOverride
                {
                    Lx = m.LengthXMm, Ly = m.LengthYMm, Lz = m.LengthZMm, Kx = m.Kx, Ky = m.Ky, Kz = m.Kz, KLu = m.KLuMm, KLv = m.KLvMm,
                };
            }

            if (m.ConnectorCount is not null || m.ConnectorSpacingMm is not null || !m.UseModifiedSlenderness)
            {
                connectors[m.Mark] = new ConnectorLayout { IntermediateCount = m.ConnectorCount, Spacing = m.ConnectorSpacingMm, UseModifiedSlenderness = m.UseModifiedSlenderness };
            }
        }

        var model = BuildModel(truss);
        issues.AddRange(TrussModelValidator.Validate(model));

        var actions = ToAreaActions(truss, nodeLabel);
        var combinations = truss.Combinations.OrderBy(c => c.SortOrder).ThenBy(c => c.Name, StringComparer.Ordinal).Select(ToCore).ToList();
        if (issues.Count > 0 || grade is null || standard is null)
        {
            return (null, issues);
        }

        var input = new TrussDesignInput
        {
            Model = model,
            Actions = actions,
            Combinations = combinations,
            Grade = grade,
            Standard = standard,
            Groups = settings,
            MemberSections = memberSections.ToDictionary(p => p.Key, p => p.Value.Properties, StringComparer.Ordinal),
            LengthOverrides = lengthOverrides,
            DeflectionLimitDivisor = truss.DeflectionLimitRatio,
        };
        if (!forSizing)
        {
            issues.AddRange(TrussDesigner.Validate(input));
            if (issues.Count > 0)
            {
                return (null, issues);
            }
        }

        return (new DesignContext(truss, project, input, resolver, groupSections, memberSections, connectors,
            truss.Members.ToDictionary(m => m.Mark, StringComparer.Ordinal), grade), []);
    }

    /// <summary>The Core model of the stored geometry (nodes by label, members by mark, group roles).</summary>
    public static TrussModel BuildModel(Truss truss)
    {
        var nodeLabel = truss.Nodes.ToDictionary(n => n.Id, n => n.Label);
        var groupNames = truss.Groups.ToDictionary(g => g.Id, g => g.Name);
        var nodes = truss.Nodes.OrderBy(n => n.Label, StringComparer.Ordinal).ToList();
        return new TrussModel
        {
            Name = truss.Name,
            Nodes = nodes.Select(n => new Node(n.Label, n.XMm, n.YMm)).ToList(),
            Members = truss.Members.OrderBy(m => m.Mark, StringComparer.Ordinal)
                .Select(m => new Member(m.Mark, nodeLabel.GetValueOrDefault(m.StartNodeId, "?"), nodeLabel.GetValueOrDefault(m.EndNodeId, "?"), groupNames.GetValueOrDefault(m.GroupId, "?")))
                .ToList(),
            Supports = nodes.Where(n => n.Support is not null).Select(n => new Support(n.Label, (CoreSupportKind)(int)n.Support!.Kind)).ToList(),
            Groups = truss.Groups.OrderBy(g => g.Name, StringComparer.Ordinal)
                .Select(g => new CoreGroup(g.Name, Enum.TryParse<MemberRole>(g.Role, ignoreCase: true, out var r) ? r : MemberRole.Web)).ToList(),
            LateralRestraints = nodes.Where(n => n.IsLaterallyRestrained).Select(n => n.Label).ToList(),
            PurlinNodes = nodes.Where(n => n.IsPurlinPoint).Select(n => n.Label).ToList(),
            Span = truss.SpanMm,
            TrussSpacing = truss.SpacingMm,
        };
    }

    public static AreaActions ToAreaActions(Truss truss, IReadOnlyDictionary<Guid, string> nodeLabel)
    {
        var a = truss.Actions;
        var winds = Json.Read<List<WindCaseDoc>>(a?.WindCasesJson) ?? [];
        var pointCases = truss.PointLoads
            .GroupBy(p => p.CaseName, StringComparer.Ordinal)
            .OrderBy(g => g.Key, StringComparer.Ordinal)
            .Select(g => new LoadCase(g.Key, g.Key, LoadKind.Other,
                g.Select(p => new NodalLoad(nodeLabel.GetValueOrDefault(p.NodeId, "?"), p.FxN, p.FyN)).ToList()))
            .ToList();
        return new AreaActions
        {
            RoofCoveringKPa = a?.CoveringKPa ?? 0,
            PurlinsAndServicesKPa = a?.PurlinsAndServicesKPa ?? 0,
            ImposedKPaOnPlan = a?.ImposedKPa ?? 0,
            WindCases = winds.Select((w, i) => new WindCase(w.Id ?? $"W{i + 1}", w.Name, w.LeftSlopeKPa, w.RightSlopeKPa)).ToList(),
            ConnectionAllowance = 1 + truss.ConnectionAllowanceFraction,
            PointLoadCases = pointCases,
        };
    }

    /// <summary>Stored factors: "kind:&lt;LoadKind&gt;" and "case:&lt;id&gt;" keys (a bare key is read as a case id).</summary>
    public static TrussWeb.Core.Loads.LoadCombination ToCore(TrussWeb.Data.Entities.LoadCombination row)
    {
        var factors = Json.Read<Dictionary<string, double>>(row.FactorsJson) ?? [];
        var kinds = new Dictionary<LoadKind, double>();
        var cases = new Dictionary<string, double>(StringComparer.Ordinal);
        foreach (var (key, value) in factors)
        {
            if (key.StartsWith("kind:", StringComparison.Ordinal) && Enum.TryParse<LoadKind>(key[5..], out var kind))
            {
                kinds[kind] = value;
            }
            else
            {
                cases[key.StartsWith("case:", StringComparison.Ordinal) ? key[5..] : key] = value;
            }
        }

        return new TrussWeb.Core.Loads.LoadCombination(row.Name, row.LimitState == TrussWeb.Data.Entities.LimitState.Sls ? CoreLimitState.Sls : CoreLimitState.Uls, kinds, cases);
    }

    public static string FactorsJson(TrussWeb.Core.Loads.LoadCombination combination)
    {
        var map = new SortedDictionary<string, double>(StringComparer.Ordinal);
        foreach (var (kind, f) in combination.KindFactors)
        {
            map[$"kind:{kind}"] = f;
        }

        foreach (var (id, f) in combination.CaseFactors ?? new Dictionary<string, double>())
        {
            map[$"case:{id}"] = f;
        }

        return Json.Write(map);
    }

    public static BackToBack? ParseOrientation(string? text) =>
        Enum.TryParse<BackToBack>(text, ignoreCase: true, out var o) ? o : null;
}
