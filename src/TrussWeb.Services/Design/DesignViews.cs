using TrussWeb.Services.Review;
using TrussWeb.Data.Entities;
using TrussWeb.Services.Common;
using TrussWeb.Services.Contracts;

namespace TrussWeb.Services.Design;

/// <summary>Stored snapshots → design view records (never recomputed).</summary>
internal static class DesignViews
{
    public static TrussDesignView Truss(Guid trussId, IReadOnlyList<DesignSnapshot> snapshots, IReadOnlyList<TrussMember> members, IReadOnlyList<FieldError> messages)
    {
        var trussSnapshot = snapshots.FirstOrDefault(s => s.MemberId is null);
        if (trussSnapshot is null)
        {
            return new TrussDesignView(trussId, "NotDesigned", 0, 0, 0, [], [], messages, null, string.Empty, string.Empty, DesignFingerprint.CoreVersion, null);
        }

        var doc = Json.Read<TrussResultDoc>(trussSnapshot.ResultJson)!;
        var byId = members.ToDictionary(m => m.Id);
        var rows = snapshots.Where(s => s.MemberId is { } id && byId.ContainsKey(id))
            .Select(s => Row(s, byId[s.MemberId!.Value]))
            .OrderBy(r => r.Mark, Trusses.NaturalComparer.Instance)
            .ToList();
        return new TrussDesignView(trussId, trussSnapshot.Status, doc.MaxUtilization, doc.MassKg, doc.MassWithAllowanceKg, doc.Totals, rows, doc.Warnings,
            trussSnapshot.Fingerprint, trussSnapshot.StandardCode, trussSnapshot.StandardVersion, trussSnapshot.CoreVersion, trussSnapshot.UpdatedUtc);
    }

    public static MemberDesignRow Row(DesignSnapshot s, TrussMember member)
    {
        var inputs = Json.Read<MemberInputsDoc>(s.InputsJson)!;
        var results = Json.Read<MemberResultDoc>(s.ResultJson)!;
        return new MemberDesignRow(member.Id, inputs.Mark, inputs.Group, inputs.Section.Designation, inputs.Material.Grade, inputs.LengthMm, inputs.Forces, inputs.Lengths,
            results.Utilization, results.GoverningCheck, results.GoverningCombination, results.Status, ReviewStateMachine.Parse(member.ReviewState).ToString(), s.Fingerprint);
    }

    public static MemberDesignDetail Detail(DesignSnapshot s, TrussMember member)
    {
        var results = Json.Read<MemberResultDoc>(s.ResultJson)!;
        return new MemberDesignDetail(Row(s, member), Trusses.TrussViews.Overrides(member), member.Version, results.Checks, results.Steps, results.Notes,
            s.InputsJson, s.CoreVersion, s.StandardCode, s.StandardVersion, s.UpdatedUtc);
    }
}
