using Microsoft.AspNetCore.Components;
using Plotly.Blazor;
using Plotly.Blazor.Interop;
using Plotly.Blazor.LayoutLib;
using Plotly.Blazor.Traces;
using Plotly.Blazor.Traces.ScatterLib;
using TrussWeb.Core.Analysis;
using TrussWeb.Core.Model;
using TrussWeb.Core.TrussDesign;

namespace TrussWeb.Web.Components.Truss;

/// <summary>Plotly elevation of a truss; the traces come from <see cref="TrussElevationData"/>.</summary>
public partial class TrussElevation
{
    private PlotlyChart? _chart;
    private IList<ITrace> _traces = [];
    private Plotly.Blazor.Layout _layout = new();
    private readonly Config _config = new() { Responsive = true, DisplayLogo = false, DisplayModeBar = Plotly.Blazor.ConfigLib.DisplayModeBarEnum.False };
    private bool _subscribed;

    /// <summary>The truss, mm.</summary>
    [Parameter, EditorRequired] public required TrussModel Model { get; set; }

    /// <summary>What to show on the members.</summary>
    [Parameter] public ElevationMode Mode { get; set; } = ElevationMode.Geometry;

    /// <summary>Analysis result, for <see cref="ElevationMode.AxialForce"/>.</summary>
    [Parameter] public AnalysisResult? Analysis { get; set; }

    /// <summary>Combination to show in axial force mode; null = the envelope.</summary>
    [Parameter] public string? Combination { get; set; }

    /// <summary>Member outcomes, for <see cref="ElevationMode.Utilization"/>.</summary>
    [Parameter] public IReadOnlyList<MemberOutcome>? Outcomes { get; set; }

    /// <summary>Write node ids beside the nodes.</summary>
    [Parameter] public bool ShowNodeLabels { get; set; }

    /// <summary>Height of the plot, px.</summary>
    [Parameter] public int Height { get; set; } = 360;

    /// <summary>Raised with the member mark when a member or its label is clicked.</summary>
    [Parameter] public EventCallback<string> OnMemberSelected { get; set; }

    /// <summary>The prepared drawing (for the title and tests).</summary>
    public TrussElevationData Data { get; private set; } = null!;

    private string ChartId { get; } = "tw-elev-" + Guid.NewGuid().ToString("N")[..8];

    protected override void OnParametersSet()
    {
        Data = TrussElevationData.Build(Model, Mode, Analysis, Combination, Outcomes);
        _traces = BuildTraces(Data, ShowNodeLabels);
        _layout = new Plotly.Blazor.Layout
        {
            ShowLegend = false,
            HoverMode = HoverModeEnum.Closest,
            Margin = new Margin { L = 40, R = 20, T = 10, B = 40 },
            XAxis = [new XAxis { Title = new Plotly.Blazor.LayoutLib.XAxisLib.Title { Text = "x (m)" }, ZeroLine = false }],
            YAxis = [new YAxis { Title = new Plotly.Blazor.LayoutLib.YAxisLib.Title { Text = "y (m)" }, ScaleAnchor = "x", ScaleRatio = 1, ZeroLine = false }],
            PlotBgColor = "#ffffff",
        };
    }

    protected override async Task OnAfterRenderAsync(bool firstRender)
    {
        // Later parameter changes redraw the existing plot; the first drawing is the chart's own.
        if (_chart is not null && _subscribed)
        {
            await _chart.React();
        }
    }

    private void OnChartRendered() => _ = InvokeAsync(async () =>
    {
        try
        {
            await SubscribeClicksAsync();
        }
        catch (Exception ex)
        {
            await DispatchExceptionAsync(ex);
        }
    });

    /// <summary>Subscribes to clicks once the chart has drawn (plotly.js adds its event hooks in newPlot).</summary>
    private async Task SubscribeClicksAsync()
    {
        if (_chart is null || _subscribed)
        {
            return;
        }

        _subscribed = true;
        await _chart.SubscribeClickEvent();
    }

    /// <summary>The mark behind a clicked trace/point, or null (see <see cref="BuildTraces"/> for the trace order).</summary>
    public static string? MarkAt(TrussElevationData data, int traceIndex, int pointIndex)
    {
        ArgumentNullException.ThrowIfNull(data);
        var n = data.Segments.Count;
        if (traceIndex >= 0 && traceIndex < n)
        {
            return data.Segments[traceIndex].Mark;
        }

        return traceIndex == n && pointIndex >= 0 && pointIndex < n ? data.Segments[pointIndex].Mark : null;
    }

    /// <summary>Traces: one line per member (index = member order), one text trace with the midpoint labels, then the nodes.</summary>
    public static IList<ITrace> BuildTraces(TrussElevationData data, bool showNodeLabels)
    {
        ArgumentNullException.ThrowIfNull(data);
        var traces = new List<ITrace>(data.Segments.Count + 2);
        foreach (var s in data.Segments)
        {
            traces.Add(new Scatter
            {
                Name = s.Mark,
                Mode = ModeFlag.Lines,
                X = [s.X1, s.X2],
                Y = [s.Y1, s.Y2],
                Line = new Line { Color = s.Colour, Width = 4 },
                HoverInfo = HoverInfoFlag.Text,
                Text = s.Combination is null ? s.Label : $"{s.Label} ({s.Combination})",
            });
        }

        traces.Add(new Scatter
        {
            Name = "labels",
            Mode = ModeFlag.Markers | ModeFlag.Text,
            X = data.Segments.Select(s => (object)s.MidX).ToList(),
            Y = data.Segments.Select(s => (object)s.MidY).ToList(),
            TextArray = data.Segments.Select(s => s.Label).ToList(),
            TextPositionArray = data.Segments.Select(s => (TextPositionEnum?)(s.Role switch
            {
                MemberRole.TopChord => TextPositionEnum.TopCenter,
                MemberRole.BottomChord => TextPositionEnum.BottomCenter,
                _ => TextPositionEnum.MiddleRight,
            })).ToList(),
            TextFont = new TextFont { Size = 9, Color = "#263238" },
            Marker = new Marker { Size = 7, Color = "#ffffff", Line = new Plotly.Blazor.Traces.ScatterLib.MarkerLib.Line { Color = "#455a64", Width = 1 } },
            HoverInfo = HoverInfoFlag.Text,
        });
        traces.Add(new Scatter
        {
            Name = "nodes",
            Mode = showNodeLabels ? ModeFlag.Markers | ModeFlag.Text : ModeFlag.Markers,
            X = data.Nodes.Select(n => (object)n.X).ToList(),
            Y = data.Nodes.Select(n => (object)n.Y).ToList(),
            TextArray = data.Nodes.Select(n => n.Id).ToList(),
            TextPosition = TextPositionEnum.BottomCenter,
            Marker = new Marker { Size = 6, Color = "#263238" },
            HoverInfo = HoverInfoFlag.Text,
            TextFont = new TextFont { Size = 9, Color = "#546e7a" },
        });
        return traces;
    }

    /// <summary>An index from Plotly's event data (a number, or a JSON number), or -1.</summary>
    public static int ToIndex(object? value) => value switch
    {
        int i => i,
        long l => (int)l,
        double d => (int)d,
        System.Text.Json.JsonElement { ValueKind: System.Text.Json.JsonValueKind.Number } e when e.TryGetInt32(out var v) => v,
        _ => -1,
    };

    private void OnClick(IEnumerable<EventDataPoint> points)
    {
        var p = points.FirstOrDefault();
        if (p is null)
        {
            return;
        }

        var mark = MarkAt(Data, ToIndex(p.CurveNumber), ToIndex(p.PointNumber ?? p.PointIndex));
        if (mark is not null)
        {
            _ = InvokeAsync(async () =>
            {
                try
                {
                    await OnMemberSelected.InvokeAsync(mark);
                }
                catch (Exception ex)
                {
                    await DispatchExceptionAsync(ex);
                }
            });
        }
    }
}
