using TrussWeb.Core.Analysis;
using TrussWeb.Core.Loads;
using TrussWeb.Core.Records;
using TrussWeb.Web.Components.Truss;
using TrussWeb.Web.Tests.Support;

namespace TrussWeb.Web.Tests.Truss;

public class TrussElevationDataTests
{
    private static readonly Core.TrussDesign.TrussDesignResult Design = TestData.SizedTruss.Design;

    private static Core.Model.TrussModel Model => TestData.SizedTruss.FinalInput.Model;

    [Fact]
    public void Geometry_has_one_segment_per_member_with_its_mark_at_the_midpoint()
    {
        var data = TrussElevationData.Build(Model, ElevationMode.Geometry);

        Assert.Equal(Model.Members.Select(m => m.Id), data.Segments.Select(s => s.Mark));
        var nodes = Model.NodeMap();
        foreach (var (member, seg) in Model.Members.Zip(data.Segments))
        {
            var a = nodes[member.StartNode];
            var b = nodes[member.EndNode];
            Assert.Equal((a.X + b.X) / 2 / 1000, seg.MidX, 9);
            Assert.Equal((a.Y + b.Y) / 2 / 1000, seg.MidY, 9);
            Assert.Equal(a.X / 1000, seg.X1, 9);
            Assert.Equal(b.Y / 1000, seg.Y2, 9);
            Assert.Equal(member.Id, seg.Label);
        }
    }

    [Fact]
    public void Combination_colour_and_label_follow_the_sign_of_the_force()
    {
        var uls = Design.Analysis.Combinations.Where(c => c.LimitState == LimitState.Uls).ToList();
        Assert.True(uls.Count >= 2);
        var sawTension = false;
        var sawCompression = false;
        foreach (var combination in uls)
        {
            var data = TrussElevationData.Build(Model, ElevationMode.AxialForce, Design.Analysis, combination.Name);
            foreach (var seg in data.Segments)
            {
                var axial = combination.MemberForces[seg.Mark];
                Assert.Equal(combination.Name, seg.Combination);
                if (axial >= 1)
                {
                    sawTension = true;
                    Assert.Equal(ForceSense.Tension, seg.Sense);
                    Assert.Equal(TrussElevationData.TensionColour, seg.Colour);
                    Assert.Equal($"{seg.Mark} T {Display.Sig(axial / 1000)} kN", seg.Label);
                }
                else if (axial <= -1)
                {
                    sawCompression = true;
                    Assert.Equal(ForceSense.Compression, seg.Sense);
                    Assert.Equal(TrussElevationData.CompressionColour, seg.Colour);
                    Assert.Equal($"{seg.Mark} C {Display.Sig(-axial / 1000)} kN", seg.Label);
                }
            }
        }

        Assert.True(sawTension && sawCompression, "the gravity and uplift combinations give both senses");
    }

    [Fact]
    public void Tension_and_compression_colours_differ()
    {
        Assert.NotEqual(TrussElevationData.TensionColour, TrussElevationData.CompressionColour);
    }

    [Fact]
    public void Envelope_shows_the_larger_magnitude_with_its_sense_and_combination()
    {
        var data = TrussElevationData.Build(Model, ElevationMode.AxialForce, Design.Analysis);

        Assert.Contains("envelope", data.Title, StringComparison.OrdinalIgnoreCase);
        foreach (var seg in data.Segments)
        {
            Envelope e = Design.Analysis.EnvelopeOf(seg.Mark);
            if (e.MaxTension > e.MaxCompression)
            {
                Assert.Equal(ForceSense.Tension, seg.Sense);
                Assert.Equal(e.MaxTension / 1000, seg.Value!.Value, 9);
                Assert.Equal(e.TensionCombination, seg.Combination);
            }
            else if (e.MaxCompression > e.MaxTension)
            {
                Assert.Equal(ForceSense.Compression, seg.Sense);
                Assert.Equal(-e.MaxCompression / 1000, seg.Value!.Value, 9);
                Assert.Equal(e.CompressionCombination, seg.Combination);
            }
        }

        // Members with both senses in the envelope exist here (wind uplift reverses the webs).
        Assert.Contains(Design.Analysis.Envelopes, e => e.MaxTension > 0 && e.MaxCompression > 0);
    }

    [Fact]
    public void Utilization_mode_labels_each_member_with_its_design_utilization()
    {
        var data = TrussElevationData.Build(Model, ElevationMode.Utilization, outcomes: Design.Members);

        foreach (var seg in data.Segments)
        {
            var outcome = Design.Members.Single(m => m.Mark == seg.Mark);
            Assert.Equal(outcome.Design.Utilization, seg.Value);
            Assert.Equal($"{seg.Mark} {Display.Sig(outcome.Design.Utilization)}", seg.Label);
            Assert.Equal(TrussElevationData.UtilizationColour(outcome.Design.Utilization), seg.Colour);
        }
    }

    [Fact]
    public void Utilization_colour_scale_runs_from_green_to_red()
    {
        Assert.Equal("rgb(46,139,87)", TrussElevationData.UtilizationColour(0));
        Assert.Equal("rgb(192,57,43)", TrussElevationData.UtilizationColour(1.0));
        Assert.NotEqual(TrussElevationData.UtilizationColour(0.5), TrussElevationData.UtilizationColour(0.95));
    }

    [Fact]
    public void Axial_mode_without_analysis_is_refused()
    {
        Assert.Throws<ArgumentNullException>(() => TrussElevationData.Build(Model, ElevationMode.AxialForce));
    }

    [Fact]
    public void Click_on_a_member_line_or_its_label_gives_its_mark()
    {
        var data = TrussElevationData.Build(Model, ElevationMode.Geometry);
        var n = data.Segments.Count;

        Assert.Equal(data.Segments[3].Mark, TrussElevation.MarkAt(data, 3, 0));
        Assert.Equal(data.Segments[5].Mark, TrussElevation.MarkAt(data, n, 5));
        Assert.Null(TrussElevation.MarkAt(data, n + 1, 0));
        Assert.Equal(n + 2, TrussElevation.BuildTraces(data, showNodeLabels: true).Count);
    }
}
