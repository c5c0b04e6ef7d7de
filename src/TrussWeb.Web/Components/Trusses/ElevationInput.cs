using TrussWeb.Core.Analysis;
using TrussWeb.Core.Design;
using TrussWeb.Core.Model;
using TrussWeb.Core.Records;
using TrussWeb.Core.TrussDesign;
using TrussWeb.Services.Contracts;

namespace TrussWeb.Web.Components.Trusses;

/// <summary>
/// What <c>TrussElevation</c> draws, restated from the stored truss and design the services return:
/// geometry from the node and member tables, the envelope forces and utilizations from the stored
/// member results. Nothing is calculated here; values are copied as they are.
/// </summary>
public sealed record ElevationInput(TrussModel Model, AnalysisResult? Analysis, IReadOnlyList<MemberOutcome>? Outcomes)
{
    public static ElevationInput From(TrussDetail truss, TrussDesignView? design)
    {
        ArgumentNullException.ThrowIfNull(truss);
        var model = new TrussModel
        {
            Name = truss.Name,
            Nodes = truss.Nodes.Select(n => new Node(n.Label, n.XMm, n.YMm)).ToList(),
            Members = truss.Members.Select(m => new Member(m.Mark, m.StartNode, m.EndNode, m.Group)).ToList(),
            Supports = truss.Nodes.Where(n => n.Support is not null).Select(n => new Support(n.Label, n.Support!.Value)).ToList(),
            Groups = truss.Groups.Select(g => new MemberGroup(g.Name, Enum.TryParse<MemberRole>(g.Role, out var r) ? r : MemberRole.Diagonal)).ToList(),
            LateralRestraints = truss.Nodes.Where(n => n.IsLaterallyRestrained).Select(n => n.Label).ToList(),
            PurlinNodes = truss.Nodes.Where(n => n.IsPurlinPoint).Select(n => n.Label).ToList(),
            Span = truss.SpanMm,
            TrussSpacing = truss.SpacingMm,
        };

        if (design is null || design.Members.Count == 0)
        {
            return new ElevationInput(model, null, null);
        }

        // Stored magnitudes (N, both ≥ 0), as the envelope holds them.
        var envelopes = design.Members.Select(r => new Envelope(r.Mark, r.Forces.MaxTensionN, r.Forces.TensionCombination,
            r.Forces.MaxCompressionN, r.Forces.CompressionCombination)).ToList();
        var analysis = new AnalysisResult { Cases = [], Combinations = [], Envelopes = envelopes, Deflections = [] };
        var outcomes = design.Members.Select(r => new MemberOutcome(r.Mark, r.Group, r.LengthMm, envelopes.First(e => e.MemberId == r.Mark),
            new EffectiveLengths { Lx = r.Lengths.LxMm, Ly = r.Lengths.LyMm, Lz = r.Lengths.LzMm },
            new MemberDesignResult(r.Mark, r.Section, design.StandardCode, design.StandardVersion, [], r.Utilization, r.GoverningCheck,
                TrussStatusText.ToStatus(r.Status) ?? CheckStatus.NotApplicable, null),
            r.GoverningCombination)).ToList();
        return new ElevationInput(model, analysis, outcomes);
    }
}
