using Microsoft.AspNetCore.Components;
using Plotly.Blazor;
using Plotly.Blazor.LayoutLib;
using Plotly.Blazor.Traces;
using Plotly.Blazor.Traces.ScatterLib;
using TrussWeb.Core.Design;
using TrussWeb.Core.Materials;
using TrussWeb.Core.Sections;

namespace TrussWeb.Web.Components.Sections;

/// <summary>Plotly chart of <see cref="ResistanceCurveData"/> (lengths in m, forces in kN for display).</summary>
public partial class ResistanceCurve
{
    private PlotlyChart? _chart;
    private IList<ITrace> _traces = [];
    private Plotly.Blazor.Layout _layout = new();
    private readonly Config _config = new() { Responsive = true, DisplayLogo = false, DisplayModeBar = Plotly.Blazor.ConfigLib.DisplayModeBarEnum.False };
    private bool _rendered;

    [Parameter, EditorRequired] public required SectionProperties Section { get; set; }

    [Parameter, EditorRequired] public required Material Material { get; set; }

    /// <summary>The member's effective lengths, mm.</summary>
    [Parameter, EditorRequired] public required EffectiveLengths Lengths { get; set; }

    /// <summary>The member's factored compressive force Cf, N.</summary>
    [Parameter, EditorRequired] public required double Cf { get; set; }

    /// <summary>Compression exponent n.</summary>
    [Parameter] public double CompressionExponent { get; set; } = new DesignOptions().CompressionExponent;

    /// <summary>Area for Cr, mm²; null = gross.</summary>
    [Parameter] public double? Area { get; set; }

    [Parameter] public int Height { get; set; } = 320;

    public ResistanceCurveData Data { get; private set; } = null!;

    private string ChartId { get; } = "tw-cr-" + Guid.NewGuid().ToString("N")[..8];

    protected override void OnParametersSet()
    {
        Data = ResistanceCurveData.Build(Section, Material, Lengths, Cf, CompressionExponent, Area);
        var xs = Data.Points.Select(p => (object)(p.EffectiveLength / 1000)).ToList();
        var xMax = Data.Points[^1].EffectiveLength / 1000;
        _traces =
        [
            new Scatter
            {
                Name = "Cr",
                Mode = ModeFlag.Lines,
                X = xs,
                Y = Data.Points.Select(p => (object)(p.Cr / 1000)).ToList(),
                Line = new Line { Color = "#1f5fa8", Width = 2 },
            },
            new Scatter
            {
                Name = "Cf",
                Mode = ModeFlag.Lines,
                X = [0.0, xMax],
                Y = [Data.Cf / 1000, Data.Cf / 1000],
                Line = new Line { Color = "#c0392b", Width = 1.5m, Dash = "dash" },
            },
            new Scatter
            {
                Name = "member",
                Mode = ModeFlag.Markers | ModeFlag.Text,
                X = [Data.Member.EffectiveLength / 1000],
                Y = [Data.Member.Cr / 1000],
                Text = "member",
                TextPosition = TextPositionEnum.TopRight,
                Marker = new Marker { Size = 10, Color = "#263238" },
            },
        ];
        _layout = new Plotly.Blazor.Layout
        {
            Margin = new Margin { L = 60, R = 20, T = 10, B = 45 },
            XAxis = [new XAxis { Title = new Plotly.Blazor.LayoutLib.XAxisLib.Title { Text = "KL = max(KxLx, KyLy) (m)" }, RangeMode = Plotly.Blazor.LayoutLib.XAxisLib.RangeModeEnum.ToZero }],
            YAxis = [new YAxis { Title = new Plotly.Blazor.LayoutLib.YAxisLib.Title { Text = "Cr (kN)" }, RangeMode = Plotly.Blazor.LayoutLib.YAxisLib.RangeModeEnum.ToZero }],
        };
    }

    protected override async Task OnAfterRenderAsync(bool firstRender)
    {
        if (_chart is not null && _rendered)
        {
            await _chart.React();
        }

        _rendered = true;
    }
}
