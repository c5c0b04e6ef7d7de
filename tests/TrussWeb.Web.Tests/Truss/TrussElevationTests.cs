using TrussWeb.Web.Components.Truss;
using TrussWeb.Web.Tests.Support;

namespace TrussWeb.Web.Tests.Truss;

public class TrussElevationTests : TrussWebTestContext
{
    [Fact]
    public void Axial_force_view_names_the_combination_and_explains_T_and_C()
    {
        var sized = TestData.SizedTruss;
        var combination = sized.Design.Analysis.Combinations[0].Name;

        var cut = Render<TrussElevation>(p => p
            .Add(c => c.Model, sized.FinalInput.Model)
            .Add(c => c.Mode, ElevationMode.AxialForce)
            .Add(c => c.Analysis, sized.Design.Analysis)
            .Add(c => c.Combination, combination));

        Assert.Equal($"Axial force, {combination}", cut.Find("[data-testid=elevation-title]").TextContent.Trim());
        var legend = cut.Find("[data-testid=elevation-legend]").TextContent;
        Assert.Contains("T tension", legend);
        Assert.Contains("C compression", legend);
        Assert.Equal(sized.FinalInput.Model.Members.Count, cut.Instance.Data.Segments.Count);
    }

    [Fact]
    public void Member_labels_sit_above_the_top_chord_and_below_the_bottom_chord()
    {
        var data = TrussElevationData.Build(TestData.Pratt24(), ElevationMode.Geometry);

        var labels = (Plotly.Blazor.Traces.Scatter)TrussElevation.BuildTraces(data, showNodeLabels: false)[data.Segments.Count];

        for (var i = 0; i < data.Segments.Count; i++)
        {
            var expected = data.Segments[i].Role switch
            {
                Core.Model.MemberRole.TopChord => Plotly.Blazor.Traces.ScatterLib.TextPositionEnum.TopCenter,
                Core.Model.MemberRole.BottomChord => Plotly.Blazor.Traces.ScatterLib.TextPositionEnum.BottomCenter,
                _ => Plotly.Blazor.Traces.ScatterLib.TextPositionEnum.MiddleRight,
            };
            Assert.Equal(expected, labels.TextPositionArray[i]);
            Assert.Equal(data.Segments[i].Label, labels.TextArray[i]);
        }
    }
}
