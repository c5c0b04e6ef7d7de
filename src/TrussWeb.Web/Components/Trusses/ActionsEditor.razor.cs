using Microsoft.AspNetCore.Components;
using MudBlazor;
using TrussWeb.Core.Loads;
using TrussWeb.Core.Model;
using TrussWeb.Core.Records;
using TrussWeb.Core.Sections;
using TrussWeb.Services.Contracts;
using TrussWeb.Web.Components.Shared;

namespace TrussWeb.Web.Components.Trusses;

/// <summary>Area actions on the roof (kPa on plan/slope as the services define them) and the wind cases (uplift negative).</summary>
public partial class ActionsEditor
{
    private double _covering;
    private double _services;
    private double _imposed;
    private List<WindEdit> _wind = [];

    public override bool IsDirty =>
        _covering != Truss.Actions.CoveringKPa || _services != Truss.Actions.PurlinsAndServicesKPa || _imposed != Truss.Actions.ImposedKPa
        || !_wind.Select(w => w.ToRow()).SequenceEqual(Truss.Actions.WindCases);

    protected override void Load(TrussDetail truss)
    {
        _covering = truss.Actions.CoveringKPa;
        _services = truss.Actions.PurlinsAndServicesKPa;
        _imposed = truss.Actions.ImposedKPa;
        _wind = truss.Actions.WindCases.Select(w => new WindEdit { Id = w.Id, Name = w.Name, Left = w.LeftSlopeKPa, Right = w.RightSlopeKPa }).ToList();
    }

    private IEnumerable<string> ShownFields() =>
        new[] { "CoveringKPa", "PurlinsAndServicesKPa", "ImposedKPa" }
            .Concat(Enumerable.Range(0, _wind.Count).SelectMany(i => new[] { $"WindCases[{i}].Id", $"WindCases[{i}].Name", $"WindCases[{i}].LeftSlopeKPa", $"WindCases[{i}].RightSlopeKPa" }));

    private async Task SaveAsync()
    {
        Busy = true;
        try
        {
            var input = new ActionsInput(_covering, _services, _imposed, _wind.Select(w => w.ToRow()).ToList(), Truss.Actions.Version);
            await HandleAsync(await Trusses.SaveActionsAsync(Truss.Id, input), null, "Actions");
        }
        finally
        {
            Busy = false;
        }
    }

    private sealed class WindEdit
    {
        public string Id { get; set; } = string.Empty;
        public string Name { get; set; } = string.Empty;
        public double Left { get; set; }
        public double Right { get; set; }

        public WindCaseRow ToRow() => new(Id.Trim(), Name, Left, Right);
    }
}
