using Microsoft.AspNetCore.Components;
using Microsoft.AspNetCore.Components.Routing;
using Microsoft.AspNetCore.Components.Web;
using MudBlazor;
using TrussWeb.Core.Design;
using TrussWeb.Core.Materials;
using TrussWeb.Core.Records;
using TrussWeb.Core.Sections;
using TrussWeb.Services.Contracts;
using TrussWeb.Web.Components.Members;
using TrussWeb.Web.Components.Review;
using TrussWeb.Web.Components.Sections;

namespace TrussWeb.Web.Components.Pages.Members;

/// <summary>
/// One member: its stored design and record, and its overrides (section, lengths, K, connectors).
/// Saving goes through <see cref="IDesignService.UpdateMemberDesignAsync"/>, which re-designs the truss.
/// </summary>
public partial class MemberPage
{
    private static readonly AxisEditor[] Axes =
    [
        new("x", nameof(MemberOverrides.LengthXMm), nameof(MemberOverrides.Kx), l => l.LxMm, l => l.Kx, l => l.LxSource,
            e => e.LengthXMm, (e, v) => e.LengthXMm = v, e => e.Kx, (e, v) => e.Kx = v),
        new("y", nameof(MemberOverrides.LengthYMm), nameof(MemberOverrides.Ky), l => l.LyMm, l => l.Ky, l => l.LySource,
            e => e.LengthYMm, (e, v) => e.LengthYMm = v, e => e.Ky, (e, v) => e.Ky = v),
        new("z", nameof(MemberOverrides.LengthZMm), nameof(MemberOverrides.Kz), l => l.LzMm, l => l.Kz, l => l.LzSource,
            e => e.LengthZMm, (e, v) => e.LengthZMm = v, e => e.Kz, (e, v) => e.Kz = v),
    ];

    private ErrorBoundary? _boundary;
    private bool _loading = true;
    private bool _saving;
    private string? _failure;
    private ResultKind _failureKind;
    private Guid _trussId;
    private string? _trussName;
    private string? _groupSection;
    private bool _canEdit;
    private bool _isDoubleAngle;
    private SectionFamily? _family;
    private MemberDesignDetail? _detail;
    private MemberEditModel _edit = new();
    private MemberOverrides? _stored;
    private CalcRecord _record = new("Calculation record");
    private Dictionary<string, string> _errors = new(StringComparer.Ordinal);
    private string? _formMessage;
    private ConflictDetail? _conflict;
    private string? _shownSection;
    private SectionOutline? _outline;
    private string? _drawingNote;
    private SectionProperties? _curveSection;
    private Material? _material;
    private EffectiveLengths _lengths = new() { Lx = 1, Ly = 1, Lz = 1 };
    private IReadOnlyList<GradeView> _grades = [];
    private MemberReviewPanel? _reviewPanel;

    [Parameter] public Guid Id { get; set; }

    /// <summary>The member's truss; when missing the page looks for the member in the caller's projects.</summary>
    [SupplyParameterFromQuery(Name = "truss")] public Guid? Truss { get; set; }

    [Inject] private IDesignService Design { get; set; } = null!;

    [Inject] private ITrussService Trusses { get; set; } = null!;

    [Inject] private IProjectService Projects { get; set; } = null!;

    [Inject] private ICatalogueService CatalogueService { get; set; } = null!;

    [Inject] private CatalogueLoadResult Catalogue { get; set; } = null!;

    [Inject] private IDialogService Dialogs { get; set; } = null!;

    [Inject] private ISnackbar Snackbar { get; set; } = null!;

    private bool IsDirty => _stored is not null && _edit.ToOverrides() != _stored;

    protected override async Task OnParametersSetAsync()
    {
        _loading = true;
        _failure = null;
        var trussId = Truss ?? await FindTrussAsync();
        if (trussId is null)
        {
            Fail(ResultKind.NotFound, "No truss of your projects has this member.");
            return;
        }

        _trussId = trussId.Value;
        var truss = await Trusses.GetAsync(_trussId);
        if (!truss.IsOk)
        {
            Fail(truss.Kind, truss.Message);
            return;
        }

        var t = truss.Value!;
        var member = t.Members.FirstOrDefault(m => m.Id == Id);
        if (member is null)
        {
            Fail(ResultKind.NotFound, "The member does not exist in this truss.");
            return;
        }

        _trussName = t.Name;
        _canEdit = t.CanEdit;
        _groupSection = member.GroupSection;
        var group = t.Groups.FirstOrDefault(g => g.Id == member.GroupId);
        var grades = await CatalogueService.ListGradesAsync();
        _grades = grades.Value ?? [];
        var design = await Design.GetMemberDesignAsync(_trussId, Id);
        if (!design.IsOk)
        {
            Fail(design.Kind, design.Message);
            return;
        }

        Show(design.Value!, resetForm: true);
        _isDoubleAngle = group?.DoubleAngleGapMm is not null || _detail!.Row.Section.StartsWith('2');
        _family = _isDoubleAngle ? SectionFamily.DoubleAngle : Catalogue.TryFind(_detail!.Row.Section, out var e, out _) ? e.Family : null;
        _loading = false;
    }

    private async Task<Guid?> FindTrussAsync()
    {
        var projects = await Projects.ListMyProjectsAsync();
        foreach (var p in projects.Value ?? [])
        {
            var detail = await Projects.GetAsync(p.Id);
            foreach (var truss in detail.Value?.Trusses ?? [])
            {
                var t = await Trusses.GetAsync(truss.TrussId);
                if (t.Value?.Members.Any(m => m.Id == Id) == true)
                {
                    return truss.TrussId;
                }
            }
        }

        return null;
    }

    private void Fail(ResultKind kind, string? message)
    {
        _failureKind = kind;
        _failure = message ?? "The member could not be loaded.";
        _loading = false;
    }

    private void Show(MemberDesignDetail detail, bool resetForm)
    {
        _detail = detail;
        _stored = detail.Overrides;
        if (resetForm)
        {
            _edit = MemberEditModel.From(detail.Overrides);
        }

        _record = new CalcRecord($"Calculation record of member {detail.Row.Mark} ({detail.Row.Section})");
        foreach (var s in detail.Steps)
        {
            _record.Add(new CalcStep(s.Symbol, s.Description, s.Expression, s.Substituted, s.Value, s.Unit, s.Reference));
        }

        foreach (var note in detail.Notes)
        {
            _record.Note(note);
        }

        var l = detail.Row.Lengths;
        _lengths = new EffectiveLengths { Lx = l.LxMm, Ly = l.LyMm, Lz = l.LzMm, Kx = l.Kx, Ky = l.Ky, Kz = l.Kz, KLu = l.KLuMm, KLv = l.KLvMm };
        UpdateSectionView();
    }

    /// <summary>Drawing and curve of the chosen section (the pending choice before saving).</summary>
    private void UpdateSectionView()
    {
        var d = _detail!;
        _shownSection = _edit.SectionOverride != _stored?.SectionOverride ? _edit.SectionOverride ?? _groupSection ?? d.Row.Section : d.Row.Section;
        _outline = null;
        _curveSection = null;
        _material = null;
        if (_shownSection is null || !Catalogue.TryFind(_shownSection, out var entry, out _))
        {
            _drawingNote = "The drawing and resistance curve are shown for single catalogue sections; this member's record below gives its properties.";
            return;
        }

        _outline = SectionOutline.For(entry.Dimensions, entry.Properties);
        _curveSection = entry.Properties;
        var grade = _grades.FirstOrDefault(g => string.Equals(g.Name, d.Row.Grade, StringComparison.OrdinalIgnoreCase));
        if (grade is not null)
        {
            var steel = new SteelGrade(grade.Name, grade.Standard, grade.Bands.Select(b => new ThicknessBand(b.MaxThicknessMm, b.FyMPa)).ToList(), grade.FuMPa, grade.EMPa, grade.GMPa);
            if (steel.TryFyFor(entry.Properties.GoverningThickness, out _))
            {
                _material = steel.For(entry.Properties.GoverningThickness);
            }
        }
    }

    private void OnSectionChosen(string? designation)
    {
        _edit.SectionOverride = designation;
        _errors.Remove(nameof(MemberOverrides.SectionOverride));
        UpdateSectionView();
    }

    private void Set(Action apply, string field)
    {
        apply();
        _errors.Remove(field);
    }

    private string? ErrorFor(string field) => _errors.TryGetValue(field, out var message) ? message : null;

    private async Task SaveAsync()
    {
        if (_detail is null || _saving)
        {
            return;
        }

        _saving = true;
        _formMessage = null;
        _conflict = null;
        _errors = new Dictionary<string, string>(StringComparer.Ordinal);
        try
        {
            var result = await Design.UpdateMemberDesignAsync(_trussId, Id, new MemberDesignInput(_edit.ToOverrides(), _detail.MemberVersion));
            switch (result.Kind)
            {
                case ResultKind.Ok:
                    Show(result.Value!, resetForm: true);
                    if (_reviewPanel is not null)
                    {
                        // The save may have made an approval stale or changed the designer of record: show the review as stored now.
                        await _reviewPanel.ReloadAsync();
                    }

                    Snackbar.Add($"Saved; member {result.Value!.Row.Mark} re-designed, utilization {Display.Sig(result.Value.Row.Utilization)}.", Severity.Success);
                    break;
                case ResultKind.Invalid:
                    foreach (var error in result.Errors)
                    {
                        var field = Axes.Any(a => a.LengthField == error.Field || a.KField == error.Field) || IsFormField(error.Field) ? error.Field : "";
                        if (field.Length > 0)
                        {
                            _errors[field] = _errors.TryGetValue(field, out var earlier) ? $"{earlier} {error.Message}" : error.Message;
                        }
                        else
                        {
                            _formMessage = (_formMessage is null ? "" : _formMessage + " ") + error;
                        }
                    }

                    Snackbar.Add("Not saved: some inputs need attention.", Severity.Warning);
                    break;
                case ResultKind.Conflict:
                    _conflict = result.Conflicts.FirstOrDefault() ?? new ConflictDetail("Member", Id.ToString(), null, null, null, null, false, [], new Dictionary<string, string?>(), null, result.Message ?? "");
                    Snackbar.Add("Not saved: someone else changed this member.", Severity.Warning);
                    break;
                default:
                    _formMessage = result.Message ?? "The change could not be saved.";
                    Snackbar.Add(_formMessage, Severity.Error);
                    break;
            }
        }
        finally
        {
            _saving = false;
        }
    }

    /// <summary>
    /// A review step bumps the member's version: re-read the stored design so the next save carries it. With unsaved
    /// edits the form is left alone; their save then meets a conflict that names the reviewer.
    /// </summary>
    private async Task ReviewChangedAsync(MemberReviewView review)
    {
        if (_detail is null || IsDirty || _saving)
        {
            return;
        }

        var design = await Design.GetMemberDesignAsync(_trussId, Id);
        if (design.IsOk)
        {
            Show(design.Value!, resetForm: true);
        }
    }

    private static bool IsFormField(string field) => field is nameof(MemberOverrides.SectionOverride) or nameof(MemberOverrides.ConnectorCount)
        or nameof(MemberOverrides.ConnectorSpacingMm) or nameof(MemberOverrides.UseModifiedSlenderness);

    private async Task ReloadStoredAsync()
    {
        var design = await Design.GetMemberDesignAsync(_trussId, Id);
        if (design.IsOk)
        {
            _conflict = null;
            _errors.Clear();
            Show(design.Value!, resetForm: true);
        }
        else
        {
            _formMessage = design.Message;
        }
    }

    private void Revert()
    {
        if (_stored is not null)
        {
            _edit = MemberEditModel.From(_stored);
            _errors.Clear();
            _formMessage = null;
            UpdateSectionView();
        }
    }

    private async Task ConfirmLeaveAsync(LocationChangingContext context)
    {
        if (!IsDirty)
        {
            return;
        }

        var leave = await Dialogs.ShowMessageBoxAsync("Leave without saving?",
            "This member has changes that are not saved. Leave the page and lose them?", yesText: "Leave", cancelText: "Stay");
        if (leave != true)
        {
            context.PreventNavigation();
        }
    }

    private void Recover() => _boundary?.Recover();

    private static CheckStatus StatusOf(string status) => Enum.TryParse<CheckStatus>(status, ignoreCase: true, out var s) ? s : CheckStatus.OutOfScope;

    private static string Kn(double newtons) => $"{Display.Sig(newtons / 1000)} kN";

    /// <summary>One axis row of the lengths form: design values, where they came from, and the override fields.</summary>
    private sealed record AxisEditor(
        string Name,
        string LengthField,
        string KField,
        Func<LengthsView, double> Length,
        Func<LengthsView, double> K,
        Func<LengthsView, string> Source,
        Func<MemberEditModel, double?> GetLength,
        Action<MemberEditModel, double?> SetLength,
        Func<MemberEditModel, double?> GetK,
        Action<MemberEditModel, double?> SetK);
}
