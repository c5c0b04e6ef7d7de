using System.Globalization;
using Microsoft.EntityFrameworkCore;
using TrussWeb.Core.Loads;
using TrussWeb.Core.Model;
using TrussWeb.Core.Sections;
using TrussWeb.Core.Validation;
using TrussWeb.Data;
using TrussWeb.Data.Entities;
using TrussWeb.Services.Authorization;
using TrussWeb.Services.Common;
using TrussWeb.Services.Contracts;
using TrussWeb.Services.Design;
using DataCombination = TrussWeb.Data.Entities.LoadCombination;
using DataGroup = TrussWeb.Data.Entities.MemberGroup;
using DataLimitState = TrussWeb.Data.Entities.LimitState;
using DataSupportKind = TrussWeb.Data.Entities.SupportKind;

namespace TrussWeb.Services.Trusses;

/// <summary>Creating trusses and saving their input tables; every save re-designs the truss.</summary>
internal sealed class TrussService(TrussUnitOfWork work) : ITrussService
{
    /// <summary>Starting section of chord groups of a generated truss (the designer changes it or sizes).</summary>
    internal const string StartingChordSection = "2L50x50x5 s=10";

    /// <summary>Starting section of web groups of a generated truss.</summary>
    internal const string StartingWebSection = "L50x50x5";

    private static string Op(string method) => PermissionTable.Key<ITrussService>(method);

    public async Task<ServiceResult<TrussDetail>> CreateFromGeneratorAsync(Guid projectId, TrussGeneratorInput input, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(input);
        await using var db = await work.CreateAsync(cancellationToken).ConfigureAwait(false);
        var (refusal, role) = await work.Authorizer.CheckProjectAsync<TrussDetail>(db, projectId, Op(nameof(CreateFromGeneratorAsync)), cancellationToken).ConfigureAwait(false);
        if (refusal is not null)
        {
            return refusal;
        }

        var errors = new List<FieldError>();
        var name = input.Name?.Trim() ?? string.Empty;
        if (name.Length == 0)
        {
            errors.Add(new FieldError(nameof(input.Name), "give the truss a name"));
        }
        else if (await db.Trusses.AnyAsync(t => t.ProjectId == projectId && t.Name == name, cancellationToken).ConfigureAwait(false))
        {
            errors.Add(new FieldError(nameof(input.Name), $"the project already has a truss named '{name}'"));
        }

        var parameters = new TrussParameters
        {
            Type = input.Type,
            Span = input.SpanMm,
            PitchDegrees = input.PitchDegrees,
            ApexHeight = input.ApexHeightMm,
            HeelDepth = input.HeelDepthMm,
            PanelCount = input.PanelCount,
            TrussSpacing = input.SpacingMm,
            BottomRestraintEvery = input.BottomRestraintEvery,
        };
        errors.AddRange(parameters.Validate().Select(i => new FieldError(GeneratorField(i.Field), i.Message)));
        if (errors.Count > 0)
        {
            return ServiceResult<TrussDetail>.Invalid(errors);
        }

        TrussModel model;
        try
        {
            model = TrussGenerator.Generate(parameters);
        }
        catch (InputValidationException ex)
        {
            return ServiceResult<TrussDetail>.Invalid(ex.Issues.Select(i => new FieldError(GeneratorField(i.Field), i.Message)).ToList());
        }

        var catalogue = await Catalogue.CatalogueMapper.LoadCatalogueAsync(db, cancellationToken).ConfigureAwait(false);
        var resolver = new SectionResolver(catalogue);
        var truss = new Truss
        {
            ProjectId = projectId,
            Name = name,
            Kind = input.Type.ToString(),
            GeneratorParametersJson = Json.Write(input with { Name = name }),
            SpanMm = input.SpanMm,
            SpacingMm = input.SpacingMm,
            DeflectionLimitRatio = TrussWeb.Core.Analysis.AnalysisOptions.DefaultDeflectionLimitDivisor,
            ConnectionAllowanceFraction = AreaActions.DefaultConnectionAllowance - 1,
        };
        var nodes = new Dictionary<string, TrussNode>(StringComparer.Ordinal);
        foreach (var n in model.Nodes)
        {
            var node = new TrussNode
            {
                Label = n.Id, XMm = n.X, YMm = n.Y,
                IsPurlinPoint = model.PurlinNodes.Contains(n.Id),
                IsLaterallyRestrained = model.LateralRestraints.Contains(n.Id),
            };
            var support = model.Supports.FirstOrDefault(s => s.Node == n.Id);
            if (support is not null)
            {
                node.Support = new TrussSupport { Kind = (DataSupportKind)(int)support.Kind };
            }

            nodes[n.Id] = node;
            truss.Nodes.Add(node);
        }

        var groups = new Dictionary<string, DataGroup>(StringComparer.Ordinal);
        foreach (var g in model.Groups.Where(g => model.Members.Any(m => m.Group == g.Name)))
        {
            var chord = g.IsChord;
            var designation = chord ? StartingChordSection : StartingWebSection;
            var group = new DataGroup
            {
                Name = g.Name,
                Role = g.Role.ToString(),
                SectionDesignation = resolver.TryResolve(designation, SectionResolver.DefaultGapMm, null, out _, out _) ? designation : null,
                AllowedSectionsJson = Json.Write(new AllowedSectionsDoc(chord ? [SectionFamily.DoubleAngle] : [SectionFamily.Angle], 0, 0, null)),
                DoubleAngleGapMm = chord ? SectionResolver.DefaultGapMm : null,
                BackToBackOrientation = chord ? nameof(BackToBack.LongLegsBackToBack) : null,
            };
            groups[g.Name] = group;
            truss.Groups.Add(group);
        }

        foreach (var m in model.Members)
        {
            truss.Members.Add(new TrussMember { Mark = m.Id, StartNode = nodes[m.StartNode], EndNode = nodes[m.EndNode], Group = groups[m.Group], UseModifiedSlenderness = true });
        }

        truss.Actions = new TrussActions { WindCasesJson = "[]" };
        var cases = LoadBuilder.Build(model, new AreaActions()).Cases;
        var order = 0;
        foreach (var c in CombinationPresets.For(CombinationStandard.Sans10160, cases))
        {
            truss.Combinations.Add(ToRow(c, ++order));
        }

        db.Trusses.Add(truss);
        truss.Project = await db.Projects.FirstAsync(p => p.Id == projectId, cancellationToken).ConfigureAwait(false);
        var (failure, issues, _) = await work.CommitAsync<TrussDetail>(db, truss, "Generated", cancellationToken).ConfigureAwait(false);
        return failure ?? await work.DetailAsync(truss.Id, role, issues, cancellationToken).ConfigureAwait(false);
    }

    public async Task<ServiceResult<TrussDetail>> GetAsync(Guid trussId, CancellationToken cancellationToken = default)
    {
        await using var db = await work.CreateAsync(cancellationToken).ConfigureAwait(false);
        var (truss, refusal, role) = await work.LoadAsync<TrussDetail>(db, trussId, Op(nameof(GetAsync)), cancellationToken).ConfigureAwait(false);
        return refusal ?? await work.DetailAsync(truss!.Id, role, null, cancellationToken).ConfigureAwait(false);
    }

    public Task<ServiceResult<TrussDetail>> SaveSettingsAsync(Guid trussId, TrussSettingsInput input, CancellationToken cancellationToken = default) =>
        EditAsync(trussId, nameof(SaveSettingsAsync), cancellationToken, (db, truss, errors) =>
        {
            ArgumentNullException.ThrowIfNull(input);
            var name = input.Name?.Trim() ?? string.Empty;
            if (name.Length == 0)
            {
                errors.Add(new FieldError(nameof(input.Name), "give the truss a name"));
            }
            else if (!string.Equals(name, truss.Name, StringComparison.Ordinal)
                     && db.Trusses.Any(t => t.ProjectId == truss.ProjectId && t.Id != truss.Id && t.Name == name))
            {
                // The unique index (project, name) would refuse it at commit as an exception.
                errors.Add(new FieldError(nameof(input.Name), $"the project already has a truss named '{name}'"));
            }

            Positive(errors, nameof(input.SpacingMm), input.SpacingMm, "mm");
            AtMost(errors, nameof(input.SpacingMm), input.SpacingMm, TrussWeb.Core.Validation.PlausibleRange.MaxLengthMm, "mm");
            if (input.PurlinSpacingMm is { } ps)
            {
                Positive(errors, nameof(input.PurlinSpacingMm), ps, "mm");
                AtMost(errors, nameof(input.PurlinSpacingMm), ps, TrussWeb.Core.Validation.PlausibleRange.MaxLengthMm, "mm");
            }

            Positive(errors, nameof(input.DeflectionLimitRatio), input.DeflectionLimitRatio, "");
            if (!(input.ConnectionAllowanceFraction >= 0 && input.ConnectionAllowanceFraction < 1))
            {
                errors.Add(new FieldError(nameof(input.ConnectionAllowanceFraction), $"must be at least 0 and below 1 (0.10 = 10 %) (got {N(input.ConnectionAllowanceFraction)})"));
            }

            if (errors.Count > 0)
            {
                return;
            }

            TrussUnitOfWork.ExpectVersion(db, truss, input.Version);
            truss.Name = name;
            truss.SpacingMm = input.SpacingMm;
            truss.PurlinSpacingMm = input.PurlinSpacingMm;
            truss.DeflectionLimitRatio = input.DeflectionLimitRatio;
            truss.ConnectionAllowanceFraction = input.ConnectionAllowanceFraction;
            truss.Notes = input.Notes;
        });

    public Task<ServiceResult<TrussDetail>> SaveNodesAsync(Guid trussId, NodeTableInput input, CancellationToken cancellationToken = default) =>
        EditAsync(trussId, nameof(SaveNodesAsync), cancellationToken, (db, truss, errors) =>
        {
            ArgumentNullException.ThrowIfNull(input);
            foreach (var (row, i) in input.Rows.Select((r, i) => (r, i)))
            {
                var field = $"Rows[{i}]";
                if (string.IsNullOrWhiteSpace(row.Label))
                {
                    errors.Add(new FieldError($"{field}.Label", "give the node a label"));
                }

                Finite(errors, $"{field}.XMm", row.XMm);
                Finite(errors, $"{field}.YMm", row.YMm);
            }

            DeleteRows(db, truss.Nodes, input.Deleted, errors, n => n.Label, n =>
                truss.Members.Where(m => m.StartNodeId == n.Id || m.EndNodeId == n.Id).Select(m => m.Mark).ToList() is { Count: > 0 } used
                    ? $"node {n.Label} is used by members {string.Join(", ", used)}; delete or reconnect them first"
                    : null);
            if (errors.Count > 0)
            {
                return;
            }

            foreach (var row in input.Rows)
            {
                var node = Upsert(db, truss.Nodes, row.Id, row.Version, errors);
                if (node is null)
                {
                    continue;
                }

                node.Label = row.Label.Trim();
                node.XMm = row.XMm;
                node.YMm = row.YMm;
                node.IsPurlinPoint = row.IsPurlinPoint;
            }

            Duplicates(errors, "Rows", truss.Nodes.Select(n => n.Label), "node label");
            ModelIssues(truss, errors);
        });

    public Task<ServiceResult<TrussDetail>> SaveMembersAsync(Guid trussId, MemberTableInput input, CancellationToken cancellationToken = default) =>
        EditAsync(trussId, nameof(SaveMembersAsync), cancellationToken, (db, truss, errors) =>
        {
            ArgumentNullException.ThrowIfNull(input);
            DeleteRows(db, truss.Members, input.Deleted, errors, m => m.Mark, _ => null);
            foreach (var (row, i) in input.Rows.Select((r, i) => (r, i)))
            {
                var field = $"Rows[{i}]";
                var start = truss.Nodes.FirstOrDefault(n => n.Label == row.StartNode?.Trim());
                var end = truss.Nodes.FirstOrDefault(n => n.Label == row.EndNode?.Trim());
                var group = truss.Groups.FirstOrDefault(g => g.Name == row.Group?.Trim());
                if (string.IsNullOrWhiteSpace(row.Mark))
                {
                    errors.Add(new FieldError($"{field}.Mark", "give the member a mark"));
                }

                if (start is null)
                {
                    errors.Add(new FieldError($"{field}.StartNode", $"no node '{row.StartNode}' in this truss"));
                }

                if (end is null)
                {
                    errors.Add(new FieldError($"{field}.EndNode", $"no node '{row.EndNode}' in this truss"));
                }

                if (group is null)
                {
                    errors.Add(new FieldError($"{field}.Group", $"no group '{row.Group}' in this truss"));
                }

                if (start is null || end is null || group is null || string.IsNullOrWhiteSpace(row.Mark))
                {
                    continue;
                }

                var member = Upsert(db, truss.Members, row.Id, row.Version, errors);
                if (member is null)
                {
                    continue;
                }

                if (db.Entry(member).State == EntityState.Added)
                {
                    member.UseModifiedSlenderness = true;
                }

                member.Mark = row.Mark.Trim();
                member.StartNodeId = start.Id;
                member.StartNode = start;
                member.EndNodeId = end.Id;
                member.EndNode = end;
                member.GroupId = group.Id;
                member.Group = group;
            }

            Duplicates(errors, "Rows", truss.Members.Select(m => m.Mark), "member mark");
            ModelIssues(truss, errors);
        });

    public Task<ServiceResult<TrussDetail>> SaveSupportsAsync(Guid trussId, IReadOnlyList<SupportRow> rows, CancellationToken cancellationToken = default) =>
        EditAsync(trussId, nameof(SaveSupportsAsync), cancellationToken, (db, truss, errors) =>
        {
            ArgumentNullException.ThrowIfNull(rows);
            foreach (var (row, i) in rows.Select((r, i) => (r, i)))
            {
                var node = truss.Nodes.FirstOrDefault(n => n.Id == row.NodeId);
                if (node is null)
                {
                    errors.Add(new FieldError($"Rows[{i}].NodeId", "no such node in this truss"));
                    continue;
                }

                if (node.Support is { } existing)
                {
                    TrussUnitOfWork.ExpectVersion(db, existing, row.Version);
                    if (row.Kind is null)
                    {
                        db.Remove(existing);
                        node.Support = null;
                    }
                    else
                    {
                        existing.Kind = (DataSupportKind)(int)row.Kind.Value;
                    }
                }
                else if (row.Kind is { } kind)
                {
                    node.Support = new TrussSupport { NodeId = node.Id, Kind = (DataSupportKind)(int)kind };
                    db.Add(node.Support);
                }
            }

            ModelIssues(truss, errors);
        });

    public Task<ServiceResult<TrussDetail>> SaveRestraintsAsync(Guid trussId, IReadOnlyList<RestraintRow> rows, CancellationToken cancellationToken = default) =>
        EditAsync(trussId, nameof(SaveRestraintsAsync), cancellationToken, (db, truss, errors) =>
        {
            ArgumentNullException.ThrowIfNull(rows);
            foreach (var (row, i) in rows.Select((r, i) => (r, i)))
            {
                var node = truss.Nodes.FirstOrDefault(n => n.Id == row.NodeId);
                if (node is null)
                {
                    errors.Add(new FieldError($"Rows[{i}].NodeId", "no such node in this truss"));
                    continue;
                }

                TrussUnitOfWork.ExpectVersion(db, node, row.Version);
                node.IsLaterallyRestrained = row.IsLaterallyRestrained;
            }

            ModelIssues(truss, errors);
        });

    public Task<ServiceResult<TrussDetail>> SaveGroupsAsync(Guid trussId, GroupTableInput input, CancellationToken cancellationToken = default) =>
        EditAsync(trussId, nameof(SaveGroupsAsync), cancellationToken, (db, truss, errors) =>
        {
            ArgumentNullException.ThrowIfNull(input);
            DeleteRows(db, truss.Groups, input.Deleted, errors, g => g.Name, g =>
                truss.Members.Where(m => m.GroupId == g.Id).Select(m => m.Mark).ToList() is { Count: > 0 } used
                    ? $"group {g.Name} still has members {string.Join(", ", used)}; move them first"
                    : null);
            foreach (var (row, i) in input.Rows.Select((r, i) => (r, i)))
            {
                var field = $"Rows[{i}]";
                if (string.IsNullOrWhiteSpace(row.Name))
                {
                    errors.Add(new FieldError($"{field}.Name", "give the group a name"));
                }

                if (!Enum.TryParse<MemberRole>(row.Role, ignoreCase: true, out _))
                {
                    errors.Add(new FieldError($"{field}.Role", $"use one of {string.Join(", ", Enum.GetNames<MemberRole>())} (got '{row.Role}')"));
                }

                if (row.DoubleAngleGapMm is { } gap && !(gap >= 0 && double.IsFinite(gap)))
                {
                    errors.Add(new FieldError($"{field}.DoubleAngleGapMm", $"must be at least 0 mm (got {N(gap)} mm)"));
                }

                if (row.Limits is { } limits)
                {
                    var constraints = new TrussWeb.Core.Sizing.SizingConstraints
                    {
                        Families = limits.Families.ToHashSet(),
                        MinDimension = limits.MinDimensionMm,
                        MinThickness = limits.MinThicknessMm,
                        MaxDimension = limits.MaxDimensionMm ?? double.PositiveInfinity,
                    };
                    errors.AddRange(constraints.Validate().Select(v => new FieldError($"{field}.Limits.{LimitField(v.Field)}", v.Message)));
                }

                var group = Upsert(db, truss.Groups, row.Id, row.Version, errors);
                if (group is null)
                {
                    continue;
                }

                group.Name = row.Name?.Trim() ?? string.Empty;
                group.Role = row.Role;
                group.GradeName = string.IsNullOrWhiteSpace(row.GradeName) ? null : row.GradeName.Trim();
                group.SectionDesignation = string.IsNullOrWhiteSpace(row.SectionDesignation) ? null : row.SectionDesignation.Trim();
                group.AllowedSectionsJson = row.Limits is { } l ? Json.Write(new AllowedSectionsDoc(l.Families, l.MinDimensionMm, l.MinThicknessMm, l.MaxDimensionMm)) : "{}";
                group.DoubleAngleGapMm = row.DoubleAngleGapMm;
                group.BackToBackOrientation = row.Orientation?.ToString();
            }

            Duplicates(errors, "Rows", truss.Groups.Select(g => g.Name), "group name");
        }, sectionCheck: true);

    public Task<ServiceResult<TrussDetail>> SaveActionsAsync(Guid trussId, ActionsInput input, CancellationToken cancellationToken = default) =>
        EditAsync(trussId, nameof(SaveActionsAsync), cancellationToken, (db, truss, errors) =>
        {
            ArgumentNullException.ThrowIfNull(input);
            var actions = new AreaActions
            {
                RoofCoveringKPa = input.CoveringKPa,
                PurlinsAndServicesKPa = input.PurlinsAndServicesKPa,
                ImposedKPaOnPlan = input.ImposedKPa,
                WindCases = input.WindCases.Select(w => new WindCase(w.Id, w.Name, w.LeftSlopeKPa, w.RightSlopeKPa)).ToList(),
            };
            NonNegative(errors, nameof(input.CoveringKPa), input.CoveringKPa, "kPa");
            NonNegative(errors, nameof(input.PurlinsAndServicesKPa), input.PurlinsAndServicesKPa, "kPa");
            NonNegative(errors, nameof(input.ImposedKPa), input.ImposedKPa, "kPa");
            foreach (var (w, i) in input.WindCases.Select((w, i) => (w, i)))
            {
                if (string.IsNullOrWhiteSpace(w.Id))
                {
                    errors.Add(new FieldError($"WindCases[{i}].Id", "give the wind case an id, e.g. W1"));
                }

                Finite(errors, $"WindCases[{i}].LeftSlopeKPa", w.LeftSlopeKPa);
                Finite(errors, $"WindCases[{i}].RightSlopeKPa", w.RightSlopeKPa);
            }

            Duplicates(errors, "WindCases", input.WindCases.Select(w => w.Id), "wind case id");
            if (errors.Count > 0)
            {
                return;
            }

            if (truss.Actions is null)
            {
                truss.Actions = new TrussActions { TrussId = truss.Id };
                db.Add(truss.Actions);
            }
            else
            {
                TrussUnitOfWork.ExpectVersion(db, truss.Actions, input.Version);
            }

            truss.Actions.CoveringKPa = actions.RoofCoveringKPa;
            truss.Actions.PurlinsAndServicesKPa = actions.PurlinsAndServicesKPa;
            truss.Actions.ImposedKPa = actions.ImposedKPaOnPlan;
            truss.Actions.WindCasesJson = Json.Write(input.WindCases.Select(w => new WindCaseDoc(w.Id.Trim(), w.Name, w.LeftSlopeKPa, w.RightSlopeKPa)).ToList());
        });

    public Task<ServiceResult<TrussDetail>> SaveCombinationsAsync(Guid trussId, CombinationTableInput input, CancellationToken cancellationToken = default) =>
        EditAsync(trussId, nameof(SaveCombinationsAsync), cancellationToken, (db, truss, errors) =>
        {
            ArgumentNullException.ThrowIfNull(input);
            DeleteRows(db, truss.Combinations, input.Deleted, errors, c => c.Name, _ => null);
            foreach (var (row, i) in input.Rows.Select((r, i) => (r, i)))
            {
                var field = $"Rows[{i}]";
                if (string.IsNullOrWhiteSpace(row.Name))
                {
                    errors.Add(new FieldError($"{field}.Name", "give the combination a name"));
                }

                foreach (var (f, j) in row.Factors.Select((f, j) => (f, j)))
                {
                    if (!(f.Key.StartsWith("kind:", StringComparison.Ordinal) && Enum.TryParse<LoadKind>(f.Key[5..], out _)) && !f.Key.StartsWith("case:", StringComparison.Ordinal))
                    {
                        errors.Add(new FieldError($"{field}.Factors[{j}].Key", $"use 'kind:<{string.Join("|", Enum.GetNames<LoadKind>())}>' or 'case:<case id>' (got '{f.Key}')"));
                    }

                    Finite(errors, $"{field}.Factors[{j}].Factor", f.Factor);
                }

                var combination = Upsert(db, truss.Combinations, row.Id, row.Version, errors);
                if (combination is null)
                {
                    continue;
                }

                combination.Name = row.Name?.Trim() ?? string.Empty;
                combination.LimitState = row.LimitState == TrussWeb.Core.Loads.LimitState.Sls ? DataLimitState.Sls : DataLimitState.Uls;
                combination.SortOrder = row.SortOrder;
                combination.FactorsJson = Json.Write(new SortedDictionary<string, double>(
                    row.Factors.GroupBy(f => f.Key, StringComparer.Ordinal).ToDictionary(g => g.Key, g => g.Last().Factor), StringComparer.Ordinal));
            }

            Duplicates(errors, "Rows", truss.Combinations.Select(c => c.Name), "combination name");
        });

    public Task<ServiceResult<TrussDetail>> ResetCombinationsAsync(Guid trussId, CombinationStandard preset, IReadOnlyList<RowRef> loaded, CancellationToken cancellationToken = default) =>
        EditAsync(trussId, nameof(ResetCombinationsAsync), cancellationToken, (db, truss, errors) =>
        {
            ArgumentNullException.ThrowIfNull(loaded);
            if (!Enum.IsDefined(preset))
            {
                errors.Add(new FieldError(nameof(preset), $"unknown preset {(int)preset}"));
                return;
            }

            var known = loaded.ToDictionary(r => r.Id);
            var added = truss.Combinations.Where(c => !known.ContainsKey(c.Id)).ToList();
            if (added.Count > 0)
            {
                errors.Add(new FieldError("Loaded", $"combinations {string.Join(", ", added.Select(c => c.Name))} were added since you loaded the table; reload first"));
                return;
            }

            DeleteRows(db, truss.Combinations, loaded, errors, c => c.Name, _ => null);
            var model = DesignInputBuilder.Build(truss, truss.Project!, new CatalogueLoadResult([], []), [], forSizing: true).Context?.Input.Model;
            var nodeLabel = truss.Nodes.ToDictionary(n => n.Id, n => n.Label);
            var cases = model is null ? [] : LoadBuilder.Build(model, DesignInputBuilder.ToAreaActions(truss, nodeLabel)).Cases;
            if (model is null)
            {
                // Without a valid model (e.g. no grade yet) wind cases still come from the actions.
                cases = DesignInputBuilder.ToAreaActions(truss, nodeLabel).WindCases.Select(w => new LoadCase(w.Id, w.Name, LoadKind.Wind, [])).ToList();
            }

            var order = 0;
            foreach (var c in CombinationPresets.For(preset, cases))
            {
                var row = ToRow(c, ++order);
                row.TrussId = truss.Id;
                truss.Combinations.Add(row);
                db.Add(row);
            }
        }, auditAction: "CombinationsReset");

    internal static DataCombination ToRow(TrussWeb.Core.Loads.LoadCombination c, int order) => new()
    {
        Name = c.Name,
        LimitState = c.LimitState == TrussWeb.Core.Loads.LimitState.Sls ? DataLimitState.Sls : DataLimitState.Uls,
        FactorsJson = DesignInputBuilder.FactorsJson(c),
        SortOrder = order,
    };

    /// <summary>Load, authorize, apply the edit (collecting field errors), then re-design and save; nothing is saved when there are errors.</summary>
    private async Task<ServiceResult<TrussDetail>> EditAsync(Guid trussId, string method, CancellationToken cancellationToken,
        Action<TrussWebDbContext, Truss, List<FieldError>> edit, bool sectionCheck = false, string? auditAction = null)
    {
        await using var db = await work.CreateAsync(cancellationToken).ConfigureAwait(false);
        var (truss, refusal, role) = await work.LoadForWriteAsync<TrussDetail>(db, trussId, Op(method), cancellationToken).ConfigureAwait(false);
        if (refusal is not null)
        {
            return refusal;
        }

        var errors = new List<FieldError>();
        var conflicts = new List<ConflictDetail>();
        try
        {
            edit(db, truss!, errors);
        }
        catch (StaleRowException stale)
        {
            conflicts.Add(stale.Detail);
        }

        if (conflicts.Count > 0)
        {
            return ServiceResult<TrussDetail>.Conflict(conflicts);
        }

        if (errors.Count == 0 && sectionCheck)
        {
            var (_, issues) = await DesignInputBuilder.BuildAsync(db, truss!, forSizing: false, cancellationToken).ConfigureAwait(false);
            errors.AddRange(issues.Where(i => i.Field.EndsWith(".SectionDesignation", StringComparison.Ordinal) || i.Field.Contains(".Limits", StringComparison.Ordinal))
                .Select(i => new FieldError(i.Field, i.Message)));
        }

        if (errors.Count > 0)
        {
            return ServiceResult<TrussDetail>.Invalid(errors);
        }

        var (failure, designIssues, _) = await work.CommitAsync<TrussDetail>(db, truss!, auditAction, cancellationToken).ConfigureAwait(false);
        return failure ?? await work.DetailAsync(trussId, role, designIssues, cancellationToken).ConfigureAwait(false);
    }

    /// <summary>Finds the row to update (checking the caller's version) or adds a new one.</summary>
    private static T? Upsert<T>(TrussWebDbContext db, List<T> rows, Guid? id, long version, List<FieldError> errors)
        where T : TrackedEntity, new()
    {
        if (id is null || id == Guid.Empty)
        {
            var row = new T();
            rows.Add(row);
            db.Add(row);
            return row;
        }

        var existing = rows.FirstOrDefault(r => r.Id == id);
        if (existing is null)
        {
            throw new StaleRowException(Conflicts.Deleted(typeof(T).Name, id.Value, null));
        }

        TrussUnitOfWork.ExpectVersion(db, existing, version);
        return existing;
    }

    private static void DeleteRows<T>(TrussWebDbContext db, List<T> rows, IReadOnlyList<RowRef> deleted, List<FieldError> errors,
        Func<T, string> label, Func<T, string?> blocker)
        where T : TrackedEntity
    {
        foreach (var (reference, i) in deleted.Select((d, i) => (d, i)))
        {
            var row = rows.FirstOrDefault(r => r.Id == reference.Id);
            if (row is null)
            {
                continue; // already gone: the caller wanted it gone
            }

            if (blocker(row) is { } why)
            {
                errors.Add(new FieldError($"Deleted[{i}]", why));
                continue;
            }

            TrussUnitOfWork.ExpectVersion(db, row, reference.Version);
            rows.Remove(row);
            db.Remove(row);
        }
    }

    private static void ModelIssues(Truss truss, List<FieldError> errors)
    {
        if (errors.Count > 0)
        {
            return;
        }

        var model = DesignInputBuilder.BuildModel(truss);
        errors.AddRange(TrussModelValidator.Validate(model).Select(i => new FieldError(i.Field, i.Message)));
    }

    private static void Duplicates(List<FieldError> errors, string field, IEnumerable<string> values, string what)
    {
        foreach (var dup in values.GroupBy(v => v, StringComparer.Ordinal).Where(g => g.Count() > 1))
        {
            errors.Add(new FieldError(field, $"{what} '{dup.Key}' is used more than once"));
        }
    }

    private static void Positive(List<FieldError> errors, string field, double value, string unit)
    {
        if (!(value > 0) || !double.IsFinite(value))
        {
            errors.Add(new FieldError(field, $"must be greater than 0{(unit.Length > 0 ? " " + unit : "")} (got {N(value)}{(unit.Length > 0 ? " " + unit : "")})"));
        }
    }

    /// <summary>Refuses a finite value above Core's outer limit (e.g. 1e308 mm), naming the limit.</summary>
    private static void AtMost(List<FieldError> errors, string field, double value, double max, string unit)
    {
        if (double.IsFinite(value) && value > max)
        {
            errors.Add(new FieldError(field, $"must be at most {N(max)} {unit} (got {N(value)} {unit})"));
        }
    }

    private static void NonNegative(List<FieldError> errors, string field, double value, string unit)
    {
        if (!(value >= 0) || !double.IsFinite(value))
        {
            errors.Add(new FieldError(field, $"must be at least 0 {unit} (got {N(value)} {unit})"));
        }
    }

    private static void Finite(List<FieldError> errors, string field, double value)
    {
        if (!double.IsFinite(value))
        {
            errors.Add(new FieldError(field, $"must be a finite number (got {N(value)})"));
        }
    }

    private static string N(double v) => v.ToString("G", CultureInfo.InvariantCulture);

    private static string GeneratorField(string coreField) => coreField switch
    {
        nameof(TrussParameters.Span) => nameof(TrussGeneratorInput.SpanMm),
        nameof(TrussParameters.TrussSpacing) => nameof(TrussGeneratorInput.SpacingMm),
        nameof(TrussParameters.HeelDepth) => nameof(TrussGeneratorInput.HeelDepthMm),
        nameof(TrussParameters.ApexHeight) => nameof(TrussGeneratorInput.ApexHeightMm),
        _ => coreField,
    };

    private static string LimitField(string coreField) => coreField switch
    {
        "MinDimension" => nameof(SizingLimits.MinDimensionMm),
        "MinThickness" => nameof(SizingLimits.MinThicknessMm),
        "MaxDimension" => nameof(SizingLimits.MaxDimensionMm),
        _ => coreField,
    };

    /// <summary>A row the caller edits no longer exists.</summary>
    private sealed class StaleRowException(ConflictDetail detail) : Exception(detail.Message)
    {
        public ConflictDetail Detail { get; } = detail;
    }
}
