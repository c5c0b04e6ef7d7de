using Microsoft.AspNetCore.Components;
using MudBlazor;
using TrussWeb.Core.Loads;
using TrussWeb.Core.Model;
using TrussWeb.Core.Records;
using TrussWeb.Core.Sections;
using TrussWeb.Services.Contracts;
using TrussWeb.Web.Components.Shared;

namespace TrussWeb.Web.Components.Trusses;

/// <summary>Load combinations: name, limit state and every factor; reset to a standard's presets after a confirm.</summary>
public partial class CombinationsEditor
{
    private List<ComboEdit> _rows = [];
    private List<string> _keys = [];
    private Dictionary<string, string> _labels = new(StringComparer.Ordinal);

    public override bool IsDirty => _rows.Any(r => r.IsChanged);

    protected override void Load(TrussDetail truss)
    {
        _rows = truss.Combinations.OrderBy(c => c.SortOrder).Select(ComboEdit.From).ToList();
        var kinds = Enum.GetNames<LoadKind>().Select(k => $"kind:{k}");
        var cases = truss.Actions.WindCases.Select(w => $"case:{w.Id}");
        var used = truss.Combinations.SelectMany(c => c.Factors).Select(f => f.Key);
        _keys = kinds.Concat(cases).Concat(used).Distinct(StringComparer.Ordinal).ToList();
        _labels = truss.Combinations.SelectMany(c => c.Factors).GroupBy(f => f.Key, StringComparer.Ordinal).ToDictionary(g => g.Key, g => g.First().Label, StringComparer.Ordinal);
    }

    private string LabelOf(string key) => _labels.TryGetValue(key, out var l) ? l : key[(key.IndexOf(':', StringComparison.Ordinal) + 1)..];

    private static string PresetName(CombinationStandard p) => p switch
    {
        CombinationStandard.Sans10160 => "SANS 10160",
        CombinationStandard.Asce7Lrfd => "ASCE 7 (LRFD)",
        CombinationStandard.En1990 => "EN 1990",
        _ => p.ToString(),
    };

    private void Add() => _rows.Add(new ComboEdit { Name = $"C{_rows.Count + 1}", SortOrder = _rows.Count + 1 });

    private async Task SaveAsync()
    {
        Busy = true;
        try
        {
            var changed = Enumerable.Range(0, _rows.Count).Where(i => !_rows[i].Deleted && _rows[i].RowChanged).ToList();
            var deleted = _rows.Where(r => r.Deleted && r.Id is not null).Select(r => new RowRef(r.Id!.Value, r.Version)).ToList();
            var input = new CombinationTableInput(changed.Select(i => _rows[i].ToRow(LabelOf)).ToList(), deleted);
            await HandleAsync(await Trusses.SaveCombinationsAsync(Truss.Id, input), changed, "Combinations");
        }
        finally
        {
            Busy = false;
        }
    }

    private async Task ResetAsync(CombinationStandard preset)
    {
        var ok = await Dialogs.ShowMessageBoxAsync("Reset combinations",
            $"Replace all {Truss.Combinations.Count} combinations with the {PresetName(preset)} presets? Edited factors are lost.", yesText: "Replace", cancelText: "Keep mine");
        if (ok != true)
        {
            return;
        }

        Busy = true;
        try
        {
            var loaded = Truss.Combinations.Select(c => new RowRef(c.Id, c.Version)).ToList();
            await HandleAsync(await Trusses.ResetCombinationsAsync(Truss.Id, preset, loaded), null, "Combinations");
        }
        finally
        {
            Busy = false;
        }
    }

    private sealed class ComboEdit
    {
        private readonly Dictionary<string, double> _factors = new(StringComparer.Ordinal);

        public CombinationView? Original { get; init; }
        public Guid? Id { get; init; }
        public long Version { get; init; }
        public string Name { get; set; } = string.Empty;
        public LimitState LimitState { get; set; }
        public int SortOrder { get; set; }
        public bool Deleted { get; set; }

        public double Factor(string key) => _factors.GetValueOrDefault(key);

        public void SetFactor(string key, double value) => _factors[key] = value;

        public CombinationRow ToRow(Func<string, string> label) =>
            new(Id, Version, Name.Trim(), LimitState, SortOrder, _factors.Where(kv => kv.Value != 0).Select(kv => new CombinationFactor(kv.Key, label(kv.Key), kv.Value)).ToList());

        public bool RowChanged => Original is null || Original.Name != Name || Original.LimitState != LimitState
            || !Original.Factors.Where(f => f.Factor != 0).ToDictionary(f => f.Key, f => f.Factor).OrderBy(kv => kv.Key, StringComparer.Ordinal)
                .SequenceEqual(_factors.Where(kv => kv.Value != 0).OrderBy(kv => kv.Key, StringComparer.Ordinal));

        public bool IsChanged => Deleted || RowChanged;

        public static ComboEdit From(CombinationView c)
        {
            var e = new ComboEdit { Original = c, Id = c.Id, Version = c.Version, Name = c.Name, LimitState = c.LimitState, SortOrder = c.SortOrder };
            foreach (var f in c.Factors)
            {
                e._factors[f.Key] = f.Factor;
            }

            return e;
        }
    }
}
