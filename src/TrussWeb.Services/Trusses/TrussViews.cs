using TrussWeb.Services.Review;
using TrussWeb.Core.Loads;
using TrussWeb.Data.Entities;
using TrussWeb.Services.Common;
using TrussWeb.Services.Contracts;
using TrussWeb.Services.Design;
using CoreSupportKind = TrussWeb.Core.Model.SupportKind;

namespace TrussWeb.Services.Trusses;

/// <summary>Entities and stored snapshots → the truss view records.</summary>
internal static class TrussViews
{
    public static TrussDetail ToDetail(Truss truss, IReadOnlyList<DesignSnapshot> snapshots, string? role, bool canEdit, IReadOnlyList<string> designMessages)
    {
        var project = truss.Project!;
        var byMember = snapshots.Where(s => s.MemberId is not null).ToDictionary(s => s.MemberId!.Value);
        var trussSnapshot = snapshots.FirstOrDefault(s => s.MemberId is null);
        var nodes = truss.Nodes.OrderBy(n => n.XMm).ThenBy(n => n.YMm).ThenBy(n => n.Label, StringComparer.Ordinal).ToList();
        var labels = truss.Nodes.ToDictionary(n => n.Id, n => n);
        var groups = truss.Groups.ToDictionary(g => g.Id);
        var members = truss.Members.OrderBy(m => m.Mark, NaturalComparer.Instance).Select(m =>
        {
            var s = labels.GetValueOrDefault(m.StartNodeId);
            var e = labels.GetValueOrDefault(m.EndNodeId);
            var g = groups.GetValueOrDefault(m.GroupId);
            var length = s is null || e is null ? 0 : Math.Sqrt(Math.Pow(e.XMm - s.XMm, 2) + Math.Pow(e.YMm - s.YMm, 2));
            byMember.TryGetValue(m.Id, out var snap);
            return new MemberView(m.Id, m.Version, m.Mark, m.StartNodeId, s?.Label ?? "?", m.EndNodeId, e?.Label ?? "?", m.GroupId, g?.Name ?? "?",
                g?.SectionDesignation, m.SectionDesignationOverride, length, Overrides(m), ReviewStateMachine.Parse(m.ReviewState).ToString(), snap?.Status, snap?.Utilization, snap?.Fingerprint);
        }).ToList();

        TrussDesignStatus design;
        if (trussSnapshot is null)
        {
            design = new TrussDesignStatus("NotDesigned", null, null, null, null, designMessages);
        }
        else
        {
            var doc = Json.Read<TrussResultDoc>(trussSnapshot.ResultJson);
            design = new TrussDesignStatus(trussSnapshot.Status, trussSnapshot.Utilization, doc?.MassKg, trussSnapshot.Fingerprint, trussSnapshot.UpdatedUtc,
                doc?.Warnings.Select(w => w.ToString()).ToList() ?? []);
        }

        return new TrussDetail(
            truss.Id, truss.ProjectId, truss.Version, truss.Name, truss.Kind,
            Json.Read<TrussGeneratorInput>(truss.GeneratorParametersJson is "{}" ? null : truss.GeneratorParametersJson),
            truss.SpanMm, truss.SpacingMm, truss.PurlinSpacingMm, truss.DeflectionLimitRatio, truss.ConnectionAllowanceFraction, truss.Notes,
            project.StandardCode, project.DefaultGradeName,
            nodes.Select(n => new NodeView(n.Id, n.Version, n.Label, n.XMm, n.YMm, n.IsPurlinPoint, n.IsLaterallyRestrained,
                n.Support is null ? null : (CoreSupportKind)(int)n.Support.Kind, n.Support?.Version ?? 0)).ToList(),
            members,
            truss.Groups.OrderBy(g => g.Name, StringComparer.Ordinal).Select(g => ToView(g, truss.Members.Count(m => m.GroupId == g.Id))).ToList(),
            ToView(truss.Actions),
            truss.Combinations.OrderBy(c => c.SortOrder).ThenBy(c => c.Name, StringComparer.Ordinal).Select(ToView).ToList(),
            design,
            role,
            canEdit);
    }

    public static MemberOverrides Overrides(TrussMember m) =>
        new(m.SectionDesignationOverride, m.Kx, m.Ky, m.Kz, m.LengthXMm, m.LengthYMm, m.LengthZMm, m.KLuMm, m.KLvMm, m.ConnectorCount, m.ConnectorSpacingMm, m.UseModifiedSlenderness);

    public static GroupView ToView(MemberGroup g, int count)
    {
        var limits = Json.Read<AllowedSectionsDoc>(g.AllowedSectionsJson);
        return new GroupView(g.Id, g.Version, g.Name, g.Role, g.GradeName, g.SectionDesignation,
            limits?.Families is { Count: > 0 } f ? new SizingLimits(f, limits.MinDimensionMm, limits.MinThicknessMm, limits.MaxDimensionMm) : null,
            g.DoubleAngleGapMm, DesignInputBuilder.ParseOrientation(g.BackToBackOrientation), count);
    }

    public static ActionsView ToView(TrussActions? a)
    {
        var winds = Json.Read<List<WindCaseDoc>>(a?.WindCasesJson) ?? [];
        return new ActionsView(a?.Id, a?.Version ?? 0, a?.CoveringKPa ?? 0, a?.PurlinsAndServicesKPa ?? 0, a?.ImposedKPa ?? 0,
            winds.Select((w, i) => new WindCaseRow(w.Id ?? $"W{i + 1}", w.Name, w.LeftSlopeKPa, w.RightSlopeKPa)).ToList());
    }

    public static CombinationView ToView(TrussWeb.Data.Entities.LoadCombination c)
    {
        var core = DesignInputBuilder.ToCore(c);
        var factors = core.KindFactors.OrderBy(p => p.Key).Select(p => new CombinationFactor($"kind:{p.Key}", p.Key.ToString(), p.Value))
            .Concat((core.CaseFactors ?? new Dictionary<string, double>()).OrderBy(p => p.Key, StringComparer.Ordinal)
                .Select(p => new CombinationFactor($"case:{p.Key}", $"case {p.Key}", p.Value)))
            .ToList();
        return new CombinationView(c.Id, c.Version, c.Name, core.LimitState, c.SortOrder, factors);
    }
}

/// <summary>Orders "T2" before "T10".</summary>
internal sealed class NaturalComparer : IComparer<string>
{
    public static NaturalComparer Instance { get; } = new();

    public int Compare(string? x, string? y)
    {
        if (x is null || y is null)
        {
            return string.CompareOrdinal(x, y);
        }

        var (px, nx) = Split(x);
        var (py, ny) = Split(y);
        var c = string.CompareOrdinal(px, py);
        return c != 0 ? c : nx != ny ? nx.CompareTo(ny) : string.CompareOrdinal(x, y);
    }

    private static (string Prefix, long Number) Split(string s)
    {
        var i = s.Length;
        while (i > 0 && char.IsAsciiDigit(s[i - 1]))
        {
            i--;
        }

        return i < s.Length && long.TryParse(s.AsSpan(i), out var n) ? (s[..i], n) : (s, -1);
    }
}
