using TrussWeb.Core.Design;
using TrussWeb.Core.Records;

namespace TrussWeb.Reports.Book;

/// <summary>
/// Splits a member's flat record back into the checks it came from, by the identity of each step:
/// a run of steps that belongs to one check's record gets that record's title and notes; steps that
/// belong to no check (the member's own result, or a detailed sub-check) form their own group.
/// Every step and every note of the member record is printed exactly once, in record order.
/// </summary>
internal static class RecordGroups
{
    internal sealed record Group(string Title, IReadOnlyList<CalcStep> Steps, IReadOnlyList<string> Notes);

    public static (IReadOnlyList<string> MemberNotes, IReadOnlyList<Group> Groups) Split(MemberDesignResult design)
    {
        var record = design.Record;
        if (record is null)
        {
            return ([], []);
        }

        var owners = new Dictionary<CalcStep, CalcRecord>(ReferenceEqualityComparer.Instance);
        foreach (var check in design.Checks)
        {
            if (check.Record is null)
            {
                continue;
            }

            foreach (var step in check.Record.Steps)
            {
                owners.TryAdd(step, check.Record);
            }
        }

        var groups = new List<Group>();
        var printedNotes = new List<string>();
        CalcRecord? current = null;
        List<CalcStep>? steps = null;
        var started = false;
        foreach (var step in record.Steps)
        {
            var owner = owners.GetValueOrDefault(step);
            if (!started || !ReferenceEquals(owner, current))
            {
                Flush();
                current = owner;
                steps = [];
                started = true;
            }

            steps!.Add(step);
        }

        Flush();
        var remaining = new List<string>(record.Notes);
        foreach (var n in printedNotes)
        {
            remaining.Remove(n);
        }

        return (remaining, groups);

        void Flush()
        {
            if (steps is null || steps.Count == 0)
            {
                return;
            }

            if (current is not null)
            {
                var notes = printedNotes.Contains(current.Notes.FirstOrDefault() ?? "\u0000") ? [] : current.Notes;
                printedNotes.AddRange(notes);
                groups.Add(new Group(current.Title, steps, notes));
            }
            else
            {
                var title = steps.Count == 1 && steps[0].Symbol == "U" ? "Member result" : "Further steps of the member record";
                groups.Add(new Group(title, steps, []));
            }
        }
    }
}
