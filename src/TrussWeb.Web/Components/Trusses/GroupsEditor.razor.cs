using Microsoft.AspNetCore.Components;
using MudBlazor;
using TrussWeb.Core.Loads;
using TrussWeb.Core.Model;
using TrussWeb.Core.Records;
using TrussWeb.Core.Sections;
using TrussWeb.Services.Contracts;
using TrussWeb.Web.Components.Shared;

namespace TrussWeb.Web.Components.Trusses;

/// <summary>Member groups: section (picked from the catalogue), grade, sizing limits and double-angle arrangement.</summary>
public partial class GroupsEditor
{
    private static readonly string[] RowFields = ["Name", "Role", "SectionDesignation", "GradeName", "Limits.Families", "Limits.MinDimensionMm", "Limits.MaxDimensionMm", "Limits.MinThicknessMm", "DoubleAngleGapMm", "Orientation"];

    private List<GroupEdit> _rows = [];
    private IReadOnlyList<GradeView> _grades = [];

    public override bool IsDirty => _rows.Any(r => r.IsChanged);

    protected override async Task OnInitializedAsync()
    {
        var grades = await Catalogue.ListGradesAsync();
        _grades = grades.Value ?? [];
    }

    protected override void Load(TrussDetail truss) => _rows = truss.Groups.Select(GroupEdit.From).ToList();

    private IEnumerable<string> ShownFields() =>
        Enumerable.Range(0, _rows.Count).SelectMany(i => RowFields.Select(f => $"Rows[{i}].{f}"));

    private async Task<IEnumerable<string>> SearchAsync(string? text, CancellationToken cancellationToken)
    {
        var result = await Catalogue.ListSectionsAsync(new SectionFilter(Search: string.IsNullOrWhiteSpace(text) ? null : text), cancellationToken);
        return (result.Value ?? []).Select(s => s.Designation);
    }

    private void Add() => _rows.Add(new GroupEdit { Name = $"G{_rows.Count + 1}", Role = nameof(MemberRole.Diagonal) });

    private async Task SaveAsync()
    {
        Busy = true;
        try
        {
            var changed = Enumerable.Range(0, _rows.Count).Where(i => !_rows[i].Deleted && _rows[i].RowChanged).ToList();
            var deleted = _rows.Where(r => r.Deleted && r.Id is not null).Select(r => new RowRef(r.Id!.Value, r.Version)).ToList();
            var input = new GroupTableInput(changed.Select(i => _rows[i].ToRow()).ToList(), deleted);
            await HandleAsync(await Trusses.SaveGroupsAsync(Truss.Id, input), changed, "Groups");
        }
        finally
        {
            Busy = false;
        }
    }

    private sealed class GroupEdit
    {
        public GroupView? Original { get; init; }
        public Guid? Id { get; init; }
        public long Version { get; init; }
        public string Name { get; set; } = string.Empty;
        public string Role { get; set; } = string.Empty;
        public string? GradeName { get; set; }
        public string? SectionDesignation { get; set; }
        public IReadOnlyCollection<SectionFamily> Families { get; set; } = [];
        public double MinDimensionMm { get; set; }
        public double MinThicknessMm { get; set; }
        public double? MaxDimensionMm { get; set; }
        public double? DoubleAngleGapMm { get; set; }
        public BackToBack? Orientation { get; set; }
        public bool Deleted { get; set; }

        private SizingLimits? Limits => !Families.Any() && MinDimensionMm == 0 && MinThicknessMm == 0 && MaxDimensionMm is null
            ? null
            : new SizingLimits(Families.ToList(), MinDimensionMm, MinThicknessMm, MaxDimensionMm);

        public GroupRow ToRow() => new(Id, Version, Name.Trim(), Role, GradeName, SectionDesignation, Limits, DoubleAngleGapMm, Orientation);

        public bool RowChanged => Original is null || Original.Name != Name || Original.Role != Role || Original.GradeName != GradeName
            || Original.SectionDesignation != SectionDesignation || Original.DoubleAngleGapMm != DoubleAngleGapMm || Original.Orientation != Orientation
            || !SameLimits(Original.Limits, Limits);

        public bool IsChanged => Deleted || RowChanged;

        private static bool SameLimits(SizingLimits? a, SizingLimits? b) =>
            (a is null && b is null) || (a is not null && b is not null && a.MinDimensionMm == b.MinDimensionMm && a.MinThicknessMm == b.MinThicknessMm
                && a.MaxDimensionMm == b.MaxDimensionMm && a.Families.OrderBy(x => x).SequenceEqual(b.Families.OrderBy(x => x)));

        public static GroupEdit From(GroupView g) => new()
        {
            Original = g, Id = g.Id, Version = g.Version, Name = g.Name, Role = g.Role, GradeName = g.GradeName, SectionDesignation = g.SectionDesignation,
            Families = g.Limits?.Families.ToList() ?? [], MinDimensionMm = g.Limits?.MinDimensionMm ?? 0, MinThicknessMm = g.Limits?.MinThicknessMm ?? 0,
            MaxDimensionMm = g.Limits?.MaxDimensionMm, DoubleAngleGapMm = g.DoubleAngleGapMm, Orientation = g.Orientation,
        };
    }
}
