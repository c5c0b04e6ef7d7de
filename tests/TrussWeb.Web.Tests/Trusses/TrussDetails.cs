using TrussWeb.Core.Model;
using TrussWeb.Services.Contracts;

namespace TrussWeb.Web.Tests.Trusses;

/// <summary>A small stored truss for the editor tests: three nodes, two members, one group.</summary>
public static class TrussDetails
{
    public static TrussDetail Small(bool canEdit = true)
    {
        var id = Guid.NewGuid();
        var groupId = Guid.NewGuid();
        NodeView[] nodes =
        [
            new(Guid.NewGuid(), 3, "N1", 0, 0, false, true, SupportKind.Pin, 2),
            new(Guid.NewGuid(), 5, "N2", 3000, 800, true, false, null, 0),
            new(Guid.NewGuid(), 4, "N3", 6000, 0, false, true, SupportKind.RollerX, 1),
        ];
        var overrides = new MemberOverrides(null, null, null, null, null, null, null, null, null, null, null, false);
        MemberView[] members =
        [
            new(Guid.NewGuid(), 1, "T1", nodes[0].Id, "N1", nodes[1].Id, "N2", groupId, "TopChord", "L50x50x5", null, 3105, overrides, "Draft", "Pass", 0.5, "fp1"),
            new(Guid.NewGuid(), 1, "T2", nodes[1].Id, "N2", nodes[2].Id, "N3", groupId, "TopChord", "L50x50x5", null, 3105, overrides, "Draft", "Pass", 0.6, "fp2"),
        ];
        return new TrussDetail(id, Guid.NewGuid(), 9, "Test truss", "Generated", null, 6000, 5000, null, 250, 0.1, null, "SANS 10162-1", "S355JR",
            nodes, members, [new GroupView(groupId, 2, "TopChord", "TopChord", null, "L50x50x5", null, null, null, 2)],
            new ActionsView(Guid.NewGuid(), 6, 0.15, 0.1, 0.5, [new WindCaseRow("W1", "Uplift", -0.9, -0.6)]),
            [], new TrussDesignStatus("Pass", 0.6, 40, "fp", DateTime.UtcNow, []), "Designer", canEdit);
    }
}
