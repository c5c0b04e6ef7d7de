using Microsoft.AspNetCore.Components;
using MudBlazor;
using TrussWeb.Core.Loads;
using TrussWeb.Core.Model;
using TrussWeb.Core.Records;
using TrussWeb.Core.Sections;
using TrussWeb.Services.Contracts;
using TrussWeb.Web.Components.Shared;

namespace TrussWeb.Web.Components.Trusses;

/// <summary>Nodes with their purlin point, lateral restraint and support. Saved with one button (nodes, then supports, then restraints).</summary>
public partial class NodesEditor
{
    private List<NodeEdit> _rows = [];

    public override bool IsDirty => _rows.Any(r => r.IsChanged);

    protected override void Load(TrussDetail truss) => _rows = truss.Nodes.Select(NodeEdit.From).ToList();

    private IEnumerable<string> ShownFields() =>
        Enumerable.Range(0, _rows.Count).SelectMany(i => new[] { $"Rows[{i}].Label", $"Rows[{i}].XMm", $"Rows[{i}].YMm" });

    private void Add() => _rows.Add(new NodeEdit { Label = $"N{_rows.Count + 1}" });

    private async Task SaveAsync()
    {
        Busy = true;
        try
        {
            var changed = Enumerable.Range(0, _rows.Count).Where(i => !_rows[i].Deleted && _rows[i].NodeChanged).ToList();
            var deleted = _rows.Where(r => r.Deleted && r.Id is not null).Select(r => new RowRef(r.Id!.Value, r.Version)).ToList();
            var detail = Truss;
            if (changed.Count > 0 || deleted.Count > 0)
            {
                var input = new NodeTableInput(changed.Select(i => _rows[i]).Select(r => new NodeRow(r.Id, r.Version, r.Label.Trim(), r.XMm, r.YMm, r.IsPurlinPoint)).ToList(), deleted);
                var typed = _rows;
                var result = await Trusses.SaveNodesAsync(Truss.Id, input);
                if (!result.IsOk)
                {
                    await HandleAsync(result, changed, "Nodes");
                    return;
                }

                detail = result.Value!;
                // The node rows are stored: take them fresh (new versions) and keep the typed supports and restraints.
                var byLabel = typed.Where(r => !r.Deleted).GroupBy(r => r.Label.Trim(), StringComparer.Ordinal).ToDictionary(g => g.Key, g => g.First(), StringComparer.Ordinal);
                _rows = detail.Nodes.Select(NodeEdit.From).ToList();
                foreach (var r in _rows)
                {
                    if (byLabel.TryGetValue(r.Label, out var t))
                    {
                        r.Support = t.Support;
                        r.IsLaterallyRestrained = t.IsLaterallyRestrained;
                    }
                }

                await AcceptPartAsync(detail);
            }

            var fresh = detail.Nodes.ToDictionary(n => n.Label, StringComparer.Ordinal);
            var live = _rows.Where(r => !r.Deleted && fresh.ContainsKey(r.Label.Trim())).ToList();
            var supports = live.Where(r => fresh[r.Label.Trim()].Support != r.Support)
                .Select(r => new SupportRow(fresh[r.Label.Trim()].Id, r.Support, fresh[r.Label.Trim()].SupportVersion)).ToList();
            if (supports.Count > 0)
            {
                var result = await Trusses.SaveSupportsAsync(Truss.Id, supports);
                if (!result.IsOk)
                {
                    await HandleAsync(result, null, "Supports");
                    return;
                }

                detail = result.Value!;
                await AcceptPartAsync(detail);
                fresh = detail.Nodes.ToDictionary(n => n.Label, StringComparer.Ordinal);
            }

            var restraints = live.Where(r => fresh[r.Label.Trim()].IsLaterallyRestrained != r.IsLaterallyRestrained)
                .Select(r => new RestraintRow(fresh[r.Label.Trim()].Id, r.IsLaterallyRestrained, fresh[r.Label.Trim()].Version)).ToList();
            if (restraints.Count > 0)
            {
                var result = await Trusses.SaveRestraintsAsync(Truss.Id, restraints);
                if (!result.IsOk)
                {
                    await HandleAsync(result, null, "Restraints");
                    return;
                }

                detail = result.Value!;
            }

            await HandleAsync(ServiceResult<TrussDetail>.Ok(detail), null, "Nodes");
        }
        finally
        {
            Busy = false;
        }
    }

    private sealed class NodeEdit
    {
        public NodeView? Original { get; init; }
        public Guid? Id { get; init; }
        public long Version { get; init; }
        public string Label { get; set; } = string.Empty;
        public double XMm { get; set; }
        public double YMm { get; set; }
        public bool IsPurlinPoint { get; set; }
        public bool IsLaterallyRestrained { get; set; }
        public SupportKind? Support { get; set; }
        public bool Deleted { get; set; }

        public bool NodeChanged => Original is null || Original.Label != Label || Original.XMm != XMm || Original.YMm != YMm || Original.IsPurlinPoint != IsPurlinPoint;

        public bool IsChanged => Deleted || NodeChanged || Original!.IsLaterallyRestrained != IsLaterallyRestrained || Original.Support != Support;

        public static NodeEdit From(NodeView n) => new()
        {
            Original = n, Id = n.Id, Version = n.Version, Label = n.Label, XMm = n.XMm, YMm = n.YMm,
            IsPurlinPoint = n.IsPurlinPoint, IsLaterallyRestrained = n.IsLaterallyRestrained, Support = n.Support,
        };
    }
}
