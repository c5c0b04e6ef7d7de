using System.Globalization;
using TrussWeb.Core;
using TrussWeb.Core.Analysis;
using TrussWeb.Core.Design;
using TrussWeb.Core.Loads;
using TrussWeb.Core.Materials;
using TrussWeb.Core.Model;
using TrussWeb.Core.Sections;
using TrussWeb.Core.Standards.Sans10162;
using TrussWeb.Core.Validation;
using TrussWeb.Services.Contracts;

namespace TrussWeb.Web.Api;

/// <summary>
/// /api/v1/calculations: stateless checks that store nothing (allowed with a read token). Inputs are
/// checked against Core's outer limits (<see cref="PlausibleRange"/>) and then by Core itself; every
/// refusal names the field, the value and the limit.
/// </summary>
public static class CalculationEndpoints
{
    private const int MaxTableRows = 2000;

    private static readonly IReadOnlyList<IDesignStandard> Standards = [new Sans10162Standard()];

    public static void Map(RouteGroupBuilder api)
    {
        ArgumentNullException.ThrowIfNull(api);
        var g = api.MapGroup("/calculations").WithTags("Calculations");
        g.MapPost("/member-check", CheckMemberAsync)
            .WithName("CheckMember")
            .WithSummary("Checks one member (section, material, lengths and K, connectors, forces) and returns the result with its full calculation record. Nothing is stored.")
            .Accepts<MemberCheckRequest>("application/json")
            .Produces<MemberCheckResponse>()
            .ProducesProblem(StatusCodes.Status400BadRequest);
        g.MapPost("/truss-analysis", AnalyseAsync)
            .WithName("AnalyseTruss")
            .WithSummary("Analyses a pin-jointed plane truss for one set of nodal loads: member forces, displacements and reactions. Nothing is stored.")
            .Accepts<TrussAnalysisRequest>("application/json")
            .Produces<TrussAnalysisResponse>()
            .ProducesProblem(StatusCodes.Status400BadRequest);
    }

    private static async Task<IResult> CheckMemberAsync(HttpRequest request, ICatalogueService catalogueService, CatalogueLoadResult catalogue, CancellationToken ct)
    {
        var (body, problem) = await ApiJson.ReadAsync<MemberCheckRequest>(request);
        if (problem is not null)
        {
            return problem;
        }

        var issues = new List<ValidationIssue>();
        var standard = Standards.FirstOrDefault(s => string.Equals(s.Code, body!.Standard?.Trim() ?? s.Code, StringComparison.OrdinalIgnoreCase));
        if (standard is null)
        {
            issues.Add(new ValidationIssue("standard", $"unknown standard \"{body!.Standard}\"; known: {string.Join(", ", Standards.Select(s => s.Code))}"));
        }

        var section = ResolveSection(body!.Section, catalogue, issues);
        var lengths = Lengths(body.Lengths, issues);
        Guard.InRange(issues, "forces.tensionN", body.Forces.TensionN, 0, PlausibleRange.MaxForceN, "N");
        Guard.InRange(issues, "forces.compressionN", body.Forces.CompressionN, 0, PlausibleRange.MaxForceN, "N");
        if (body.CompressionExponent is { } n)
        {
            Guard.InRange(issues, "compressionExponent", n, 0.5, 5, string.Empty);
        }

        var connectors = Connectors(body.Connectors, issues);
        var material = section is null ? null : await MaterialAsync(body.Material, section, catalogueService, issues, ct);
        if (issues.Count > 0 || section is null || material is null || lengths is null || standard is null)
        {
            return ApiProblems.Invalid(issues);
        }

        var member = new DesignMember
        {
            Mark = string.IsNullOrWhiteSpace(body.Mark) ? "M1" : body.Mark.Trim(),
            Section = section,
            Material = material,
            Lengths = lengths,
            Connectors = section.Family == SectionFamily.DoubleAngle ? connectors : null,
            Options = new DesignOptions { CompressionExponent = body.CompressionExponent ?? 1.34 },
        };
        var coreIssues = standard.Validate(member);
        if (coreIssues.Count > 0)
        {
            return ApiProblems.Invalid(coreIssues.Select(i => new ValidationIssue(CoreField(i.Field), i.Message)).ToList());
        }

        var result = standard.CheckMember(member, new MemberForces(body.Forces.TensionN, body.Forces.CompressionN));
        var record = result.Record;
        return Results.Ok(new MemberCheckResponse(
            result.Mark,
            new SectionUsed(section.Designation, section.Family, section.Area, section.MassPerMetre, Math.Sqrt(section.Ix / section.Area), Math.Sqrt(section.Iy / section.Area), section.GoverningThickness),
            new MaterialUsed(material.Grade, material.Fy, material.Fu, material.E, material.G),
            standard.Code,
            standard.Edition,
            standard.Version,
            result.Utilization,
            result.GoverningCheck,
            result.Status.ToString(),
            result.Checks.Select(c => new CheckView(c.Name, c.Demand, c.Resistance, c.Utilization, c.Status.ToString(), c.Unit, c.Reference)).ToList(),
            record?.Steps.Select(s => new StepView(record.Title, s.Symbol, s.Description, s.Expression, s.Substituted, s.Value, s.Unit, s.Reference)).ToList() ?? [],
            record?.Notes ?? [],
            Caution.Text));
    }

    /// <summary>Core's field names on the request's paths.</summary>
    private static string CoreField(string field) => field switch
    {
        "Lx" => "lengths.lxMm",
        "Ly" => "lengths.lyMm",
        "Lz" => "lengths.lzMm",
        "Kx" => "lengths.kx",
        "Ky" => "lengths.ky",
        "Kz" => "lengths.kz",
        "Fy" => "material.fyMPa",
        "Fu" => "material.fuMPa",
        "E" => "material.elasticModulusMPa",
        "G" => "material.shearModulusMPa",
        "Connectors.Spacing" => "connectors.spacingMm",
        "Connectors.IntermediateCount" => "connectors.intermediateCount",
        "CompressionExponent" => "compressionExponent",
        _ => field,
    };

    private static SectionProperties? ResolveSection(SectionInput input, CatalogueLoadResult catalogue, List<ValidationIssue> issues)
    {
        var given = new object?[] { input.Designation, input.Angle, input.RectangularHollow, input.CircularHollow }.Count(v => v is not null);
        if (given != 1)
        {
            issues.Add(new ValidationIssue("section", $"give exactly one of designation, angle, rectangularHollow, circularHollow (got {given})"));
            return null;
        }

        ISectionDimensions? dims = null;
        string? designation = null;
        if (input.Designation is { } name)
        {
            if (!catalogue.TryFind(name, out var entry, out var error))
            {
                issues.Add(new ValidationIssue("section.designation", $"{error} (got \"{(name.Length > 60 ? name[..60] + "…" : name)}\")"));
                return null;
            }

            dims = entry.Dimensions;
            designation = entry.Designation;
        }
        else if (input.Angle is { } a)
        {
            if (Dimensions(issues, "section.angle", ("longLegMm", a.LongLegMm, false), ("shortLegMm", a.ShortLegMm, false), ("thicknessMm", a.ThicknessMm, false),
                    ("rootRadiusMm", a.RootRadiusMm, true), ("toeRadiusMm", a.ToeRadiusMm, true)))
            {
                dims = new AngleDimensions(a.LongLegMm, a.ShortLegMm, a.ThicknessMm, a.RootRadiusMm, a.ToeRadiusMm);
            }
        }
        else if (input.RectangularHollow is { } r)
        {
            if (Dimensions(issues, "section.rectangularHollow", ("depthMm", r.DepthMm, false), ("widthMm", r.WidthMm, false), ("thicknessMm", r.ThicknessMm, false),
                    ("outerRadiusMm", r.OuterRadiusMm ?? 0, true)))
            {
                dims = new RectangularHollowDimensions(r.DepthMm, r.WidthMm, r.ThicknessMm, r.OuterRadiusMm);
            }
        }
        else if (input.CircularHollow is { } c)
        {
            if (Dimensions(issues, "section.circularHollow", ("diameterMm", c.DiameterMm, false), ("thicknessMm", c.ThicknessMm, false)))
            {
                dims = new CircularHollowDimensions(c.DiameterMm, c.ThicknessMm);
            }
        }

        if (dims is null)
        {
            return null;
        }

        var prefix = input.Designation is not null ? "section.designation" : input.Angle is not null ? "section.angle" : input.RectangularHollow is not null ? "section.rectangularHollow" : "section.circularHollow";
        if (input.DoubleAngle is { } pair)
        {
            if (dims is not AngleDimensions angle)
            {
                issues.Add(new ValidationIssue("section.doubleAngle", "a double angle needs an angle component (designation of an angle, or angle dimensions)"));
                return null;
            }

            if (!Guard.InRange(issues, "section.doubleAngle.gapMm", pair.GapMm, 0, 100, "mm"))
            {
                return null;
            }

            var arrangement = angle.LongLeg == angle.ShortLeg ? BackToBack.EqualLegs : pair.Arrangement;
            if (!DoubleAngle.TryCompute(angle, pair.GapMm, arrangement, out var doubled, out var pairIssues, DoubleAngle.DefaultDesignation(angle, pair.GapMm, arrangement)))
            {
                issues.AddRange(pairIssues.Select(i => new ValidationIssue($"section.doubleAngle.{i.Field}", i.Message)));
                return null;
            }

            return doubled;
        }

        var found = dims.Validate();
        if (found.Count > 0)
        {
            issues.AddRange(found.Select(i => new ValidationIssue($"{prefix}.{i.Field}", i.Message)));
            return null;
        }

        return dims.Compute(designation);
    }

    private static bool Dimensions(List<ValidationIssue> issues, string prefix, params (string Name, double Value, bool MayBeZero)[] values)
    {
        var ok = true;
        foreach (var (name, value, mayBeZero) in values)
        {
            ok &= mayBeZero && value == 0 || Guard.InRange(issues, $"{prefix}.{name}", value, mayBeZero ? 0 : PlausibleRange.MinDimensionMm, PlausibleRange.MaxDimensionMm, "mm");
        }

        return ok;
    }

    private static EffectiveLengths? Lengths(LengthsInput l, List<ValidationIssue> issues)
    {
        var before = issues.Count;
        Guard.InRange(issues, "lengths.lxMm", l.LxMm, PlausibleRange.MinLengthMm, PlausibleRange.MaxLengthMm, "mm");
        Guard.InRange(issues, "lengths.lyMm", l.LyMm, PlausibleRange.MinLengthMm, PlausibleRange.MaxLengthMm, "mm");
        if (l.LzMm is { } lz)
        {
            Guard.InRange(issues, "lengths.lzMm", lz, PlausibleRange.MinLengthMm, PlausibleRange.MaxLengthMm, "mm");
        }

        Guard.InRange(issues, "lengths.kx", l.Kx, PlausibleRange.MinK, PlausibleRange.MaxK, string.Empty);
        Guard.InRange(issues, "lengths.ky", l.Ky, PlausibleRange.MinK, PlausibleRange.MaxK, string.Empty);
        Guard.InRange(issues, "lengths.kz", l.Kz, PlausibleRange.MinK, PlausibleRange.MaxK, string.Empty);
        if (l.KLuMm is { } klu)
        {
            Guard.InRange(issues, "lengths.kLuMm", klu, PlausibleRange.MinLengthMm, PlausibleRange.MaxLengthMm, "mm");
        }

        if (l.KLvMm is { } klv)
        {
            Guard.InRange(issues, "lengths.kLvMm", klv, PlausibleRange.MinLengthMm, PlausibleRange.MaxLengthMm, "mm");
        }

        return issues.Count > before ? null : new EffectiveLengths
        {
            Lx = l.LxMm, Ly = l.LyMm, Lz = l.LzMm ?? l.LyMm, Kx = l.Kx, Ky = l.Ky, Kz = l.Kz, KLu = l.KLuMm, KLv = l.KLvMm,
            LxSource = "given", LySource = "given", LzSource = l.LzMm is null ? "equal to the out-of-plane length" : "given",
        };
    }

    private static ConnectorLayout? Connectors(ConnectorsInput? c, List<ValidationIssue> issues)
    {
        if (c is null)
        {
            return null;
        }

        if (c.IntermediateCount is { } count and (< 0 or > 100))
        {
            issues.Add(new ValidationIssue("connectors.intermediateCount", $"must be from 0 to 100 (got {count})"));
        }

        if (c.SpacingMm is { } a)
        {
            Guard.InRange(issues, "connectors.spacingMm", a, PlausibleRange.MinLengthMm, PlausibleRange.MaxLengthMm, "mm");
        }

        return new ConnectorLayout { IntermediateCount = c.IntermediateCount, Spacing = c.SpacingMm, UseModifiedSlenderness = c.UseModifiedSlenderness };
    }

    private static async Task<Material?> MaterialAsync(MaterialInput m, SectionProperties section, ICatalogueService catalogue, List<ValidationIssue> issues, CancellationToken ct)
    {
        if (m.Grade is { } name)
        {
            if (m.FyMPa is not null || m.FuMPa is not null)
            {
                issues.Add(new ValidationIssue("material", "give either grade or fyMPa and fuMPa, not both"));
                return null;
            }

            var grades = await GradesAsync(catalogue, ct);
            var grade = grades.Value?.FirstOrDefault(g => string.Equals(g.Name, name.Trim(), StringComparison.OrdinalIgnoreCase));
            if (grade is null)
            {
                issues.Add(new ValidationIssue("material.grade", $"unknown grade \"{(name.Length > 60 ? name[..60] : name)}\"; known: {string.Join(", ", grades.Value?.Select(g => g.Name) ?? [])}"));
                return null;
            }

            var steel = new SteelGrade(grade.Name, grade.Standard, grade.Bands.Select(b => new ThicknessBand(b.MaxThicknessMm, b.FyMPa)).ToList(), grade.FuMPa, grade.EMPa, grade.GMPa);
            if (!steel.TryFyFor(section.GoverningThickness, out _))
            {
                issues.Add(new ValidationIssue("material.grade", string.Create(CultureInfo.InvariantCulture,
                    $"grade {steel.Name} covers thicknesses up to {steel.MaxThickness} mm (section thickness {section.GoverningThickness} mm)")));
                return null;
            }

            return steel.For(section.GoverningThickness);
        }

        if (m.FyMPa is not { } fy || m.FuMPa is not { } fu)
        {
            issues.Add(new ValidationIssue("material", "give grade, or both fyMPa and fuMPa"));
            return null;
        }

        var ok = Guard.InRange(issues, "material.fyMPa", fy, PlausibleRange.MinStrengthMPa, PlausibleRange.MaxStrengthMPa, "MPa");
        ok &= Guard.InRange(issues, "material.fuMPa", fu, PlausibleRange.MinStrengthMPa, PlausibleRange.MaxStrengthMPa, "MPa");
        var e = m.ElasticModulusMPa ?? Material.SansE;
        var gMod = m.ShearModulusMPa ?? Material.SansG;
        ok &= Guard.InRange(issues, "material.elasticModulusMPa", e, PlausibleRange.MinModulusMPa, PlausibleRange.MaxModulusMPa, "MPa");
        ok &= Guard.InRange(issues, "material.shearModulusMPa", gMod, PlausibleRange.MinModulusMPa, PlausibleRange.MaxModulusMPa, "MPa");
        if (!ok)
        {
            return null;
        }

        var material = new Material("given", fy, fu, e, gMod);
        var found = material.Validate();
        if (found.Count > 0)
        {
            issues.AddRange(found.Select(i => new ValidationIssue(CoreField(i.Field), i.Message)));
            return null;
        }

        return material;
    }

    /// <summary>How long the grade list is reused by stateless checks (grades change only by an administrator's edit).</summary>
    public static readonly TimeSpan GradeCacheLifetime = TimeSpan.FromSeconds(30);

    private static (DateTime Until, ServiceResult<IReadOnlyList<GradeView>> Grades)? _grades;

    /// <summary>The grades through the catalogue service (so the caller is authorized), reused for <see cref="GradeCacheLifetime"/>.</summary>
    private static async Task<ServiceResult<IReadOnlyList<GradeView>>> GradesAsync(ICatalogueService catalogue, CancellationToken ct)
    {
        var cached = _grades;
        if (cached is { } c && c.Until > DateTime.UtcNow)
        {
            return c.Grades;
        }

        var fresh = await catalogue.ListGradesAsync(ct);
        if (fresh.IsOk)
        {
            _grades = (DateTime.UtcNow + GradeCacheLifetime, fresh);
        }

        return fresh;
    }

    private static async Task<IResult> AnalyseAsync(HttpRequest request)
    {
        var (body, problem) = await ApiJson.ReadAsync<TrussAnalysisRequest>(request);
        if (problem is not null)
        {
            return problem;
        }

        var issues = new List<ValidationIssue>();
        foreach (var (name, count) in new[] { ("nodes", body!.Nodes.Count), ("members", body.Members.Count), ("supports", body.Supports.Count), ("loads", body.Loads.Count) })
        {
            if (count > MaxTableRows)
            {
                issues.Add(new ValidationIssue(name, $"must have at most {MaxTableRows} rows (got {count})"));
            }
        }

        for (var i = 0; i < body.Nodes.Count; i++)
        {
            Guard.InRange(issues, $"nodes[{i}].xMm", body.Nodes[i].XMm, -PlausibleRange.MaxCoordinateMm, PlausibleRange.MaxCoordinateMm, "mm");
            Guard.InRange(issues, $"nodes[{i}].yMm", body.Nodes[i].YMm, -PlausibleRange.MaxCoordinateMm, PlausibleRange.MaxCoordinateMm, "mm");
        }

        for (var i = 0; i < body.Members.Count; i++)
        {
            if (body.Members[i].AreaMm2 is { } area)
            {
                Guard.InRange(issues, $"members[{i}].areaMm2", area, TrussSolver.MinAreaMm2, TrussSolver.MaxAreaMm2, "mm²");
            }
        }

        for (var i = 0; i < body.Loads.Count; i++)
        {
            Guard.InRange(issues, $"loads[{i}].fxN", body.Loads[i].FxN, -PlausibleRange.MaxForceN, PlausibleRange.MaxForceN, "N");
            Guard.InRange(issues, $"loads[{i}].fyN", body.Loads[i].FyN, -PlausibleRange.MaxForceN, PlausibleRange.MaxForceN, "N");
        }

        Guard.InRange(issues, "defaultAreaMm2", body.DefaultAreaMm2, TrussSolver.MinAreaMm2, TrussSolver.MaxAreaMm2, "mm²");
        Guard.InRange(issues, "elasticModulusMPa", body.ElasticModulusMPa, PlausibleRange.MinModulusMPa, PlausibleRange.MaxModulusMPa, "MPa");
        var nodeLabels = body.Nodes.Select(n => n.Label).ToHashSet(StringComparer.Ordinal);
        for (var i = 0; i < body.Loads.Count; i++)
        {
            if (!nodeLabels.Contains(body.Loads[i].Node))
            {
                issues.Add(new ValidationIssue($"loads[{i}].node", $"no node labelled \"{body.Loads[i].Node}\""));
            }
        }

        if (issues.Count > 0)
        {
            return ApiProblems.Invalid(issues);
        }

        var xs = body.Nodes.Select(n => n.XMm).DefaultIfEmpty(0);
        var model = new TrussModel
        {
            Name = "API truss",
            Nodes = body.Nodes.Select(n => new Node(n.Label, n.XMm, n.YMm)).ToList(),
            Members = body.Members.Select(m => new Member(m.Mark, m.Start, m.End, MemberGroup.Diagonals.Name)).ToList(),
            Supports = body.Supports.Select(s => new Support(s.Node, s.Kind)).ToList(),
            Span = Math.Max(1, xs.Max() - xs.Min()),
            TrussSpacing = 1000,
        };
        var loadCase = new LoadCase("L1", "Given loads", LoadKind.Other, body.Loads.Select(l => new NodalLoad(l.Node, l.FxN, l.FyN)).ToList());
        var options = new AnalysisOptions
        {
            DefaultArea = _ => body.DefaultAreaMm2,
            DefaultElasticModulus = body.ElasticModulusMPa,
            Members = body.Members.Where(m => m.AreaMm2 is not null).ToDictionary(m => m.Mark, m => new MemberStiffness(body.ElasticModulusMPa, m.AreaMm2!.Value), StringComparer.Ordinal),
        };
        if (!TrussSolver.TryAnalyse(model, [loadCase], [], options, out var result, out var coreIssues))
        {
            return ApiProblems.Invalid(coreIssues);
        }

        var r = result!.Case("L1");
        return Results.Ok(new TrussAnalysisResponse(
            model.Members.Select(m => new MemberForceResult(m.Id, model.LengthOf(m), r.MemberForces[m.Id])).ToList(),
            model.Nodes.Select(n => new NodeResult(n.Id, r.Displacements[n.Id].X, r.Displacements[n.Id].Y)).ToList(),
            r.Reactions.Select(p => new NodeResult(p.Key, p.Value.X, p.Value.Y)).ToList(),
            r.AppliedTotal.X,
            r.AppliedTotal.Y,
            Caution.Text));
    }
}
