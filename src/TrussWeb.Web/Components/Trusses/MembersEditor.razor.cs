using Microsoft.AspNetCore.Components;
using MudBlazor;
using TrussWeb.Core.Loads;
using TrussWeb.Core.Model;
using TrussWeb.Core.Records;
using TrussWeb.Core.Sections;
using TrussWeb.Services.Contracts;
using TrussWeb.Web.Components.Shared;

namespace TrussWeb.Web.Components.Trusses;

/// <summary>Members: mark, end nodes and group (member table), and a section override per member (member design).</summary>
public partial class MembersEditor
{
    private List<MemberEdit> _rows = [];

    public override bool IsDirty => _rows.Any(r => r.IsChanged);

    protected override void Load(TrussDetail truss) => _rows = truss.Members.Select(MemberEdit.From).ToList();

    private IEnumerable<string> ShownFields() =>
        Enumerable.Range(0, _rows.Count).SelectMany(i => new[] { $"Rows[{i}].Mark", $"Rows[{i}].StartNode", $"Rows[{i}].EndNode", $"Rows[{i}].Group", $"Override[{i}]" });

    private void Add() => _rows.Add(new MemberEdit
    {
        Mark = $"M{_rows.Count + 1}", StartNode = Truss.Nodes.FirstOrDefault()?.Label ?? string.Empty,
        EndNode = Truss.Nodes.Skip(1).FirstOrDefault()?.Label ?? string.Empty, Group = Truss.Groups.FirstOrDefault()?.Name ?? string.Empty,
    });

    private async Task SaveAsync()
    {
        Busy = true;
        try
        {
            var changed = Enumerable.Range(0, _rows.Count).Where(i => !_rows[i].Deleted && _rows[i].RowChanged).ToList();
            var deleted = _rows.Where(r => r.Deleted && r.Id is not null).Select(r => new RowRef(r.Id!.Value, r.Version)).ToList();
            var overrides = Enumerable.Range(0, _rows.Count).Where(i => !_rows[i].Deleted && _rows[i].OverrideChanged).ToList();
            var typed = _rows;
            var detail = Truss;
            if (changed.Count > 0 || deleted.Count > 0)
            {
                var input = new MemberTableInput(changed.Select(i => typed[i]).Select(r => new MemberRow(r.Id, r.Version, r.Mark.Trim(), r.StartNode, r.EndNode, r.Group)).ToList(), deleted);
                var result = await Trusses.SaveMembersAsync(Truss.Id, input);
                if (!result.IsOk)
                {
                    await HandleAsync(result, changed, "Members");
                    return;
                }

                detail = result.Value!;
            }

            foreach (var i in overrides)
            {
                var row = typed[i];
                var stored = detail.Members.First(m => m.Id == row.Id);
                var section = string.IsNullOrWhiteSpace(row.SectionOverride) ? null : row.SectionOverride.Trim();
                var result = await Design.UpdateMemberDesignAsync(Truss.Id, stored.Id,
                    new MemberDesignInput(stored.Overrides with { SectionOverride = section }, stored.Version));
                if (!result.IsOk)
                {
                    Errors.Set(result.Errors.Count > 0 ? result.Errors.Select(e => new FieldError($"Override[{i}]", e.Message)) : [new FieldError($"Override[{i}]", result.Message ?? "not saved")]);
                    Snackbar.Add($"Section override of {row.Mark} not saved.", MudBlazor.Severity.Warning);
                    _rows = typed;
                    return;
                }
            }

            if (overrides.Count > 0)
            {
                var reread = await Trusses.GetAsync(Truss.Id);
                detail = reread.Value ?? detail;
            }

            await HandleAsync(ServiceResult<TrussDetail>.Ok(detail), null, "Members");
        }
        finally
        {
            Busy = false;
        }
    }

    private sealed class MemberEdit
    {
        public MemberView? Original { get; init; }
        public Guid? Id { get; init; }
        public long Version { get; init; }
        public string Mark { get; set; } = string.Empty;
        public string StartNode { get; set; } = string.Empty;
        public string EndNode { get; set; } = string.Empty;
        public string Group { get; set; } = string.Empty;
        public string? SectionOverride { get; set; }
        public bool Deleted { get; set; }

        public bool RowChanged => Original is null || Original.Mark != Mark || Original.StartNode != StartNode || Original.EndNode != EndNode || Original.Group != Group;

        public bool OverrideChanged => Original is not null && (string.IsNullOrWhiteSpace(SectionOverride) ? null : SectionOverride.Trim()) != Original.SectionOverride;

        public bool IsChanged => Deleted || RowChanged || OverrideChanged;

        public static MemberEdit From(MemberView m) => new()
        {
            Original = m, Id = m.Id, Version = m.Version, Mark = m.Mark, StartNode = m.StartNode, EndNode = m.EndNode, Group = m.Group, SectionOverride = m.SectionOverride,
        };
    }
}
