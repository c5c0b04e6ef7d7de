using Microsoft.AspNetCore.Components;
using MudBlazor;
using TrussWeb.Data;
using TrussWeb.Services.Contracts;
using TrussWeb.Web.Components.Dialogs;
using TrussWeb.Web.Components.Projects;
using TrussWeb.Web.Components.Shared;

namespace TrussWeb.Web.Components.Pages.Projects;

/// <summary>One project: settings (lead), trusses with status, new-truss generator, members (lead adds and removes).</summary>
public partial class ProjectPage
{
    private static readonly string[] ProjectRoles = [Roles.Designer, Roles.Checker, Roles.ProjectLead];

    private readonly FieldErrorMap _errors = new();
    private readonly FieldErrorMap _memberErrors = new();
    private ResultKind? _loadKind;
    private string? _loadMessage;
    private ProjectDetail? _project;
    private ProjectFormModel _form = new();
    private IReadOnlyList<ConflictDetail> _conflicts = [];
    private IReadOnlyList<GradeView> _grades = [];
    private IReadOnlyList<StandardView> _standards = [];
    private IReadOnlyList<ProjectMemberView> _members = [];
    private IReadOnlyList<UserPick> _candidates = [];
    private string? _newMemberId;
    private string _newMemberRole = Roles.Designer;
    private bool _busy;

    [Parameter, EditorRequired] public required Guid ProjectId { get; set; }

    [Inject] private IProjectService Projects { get; set; } = default!;

    [Inject] private ICatalogueService Catalogue { get; set; } = default!;

    [Inject] private ICallerContext Caller { get; set; } = default!;

    [Inject] private IDialogService Dialogs { get; set; } = default!;

    [Inject] private ISnackbar Snackbar { get; set; } = default!;

    [Inject] private NavigationManager Navigation { get; set; } = default!;

    private bool IsAdministrator => Caller.Roles.Contains(Roles.Administrator);

    private bool CanManage => IsAdministrator || _project?.MyRole == Roles.ProjectLead;

    private bool CanEdit => CanManage || _project?.MyRole == Roles.Designer;

    private List<BreadcrumbItem> Crumbs =>
        [new("Projects", "/projects"), new(_project?.Name ?? "Project", null, disabled: true)];

    protected override async Task OnParametersSetAsync()
    {
        var grades = await Catalogue.ListGradesAsync();
        var standards = await Catalogue.ListStandardsAsync();
        _grades = grades.Value ?? [];
        _standards = standards.Value ?? [];
        await ReloadAsync();
    }

    private async Task ReloadAsync()
    {
        var result = await Projects.GetAsync(ProjectId);
        _loadKind = result.Kind;
        _loadMessage = result.Message;
        _project = result.Value;
        _conflicts = [];
        _errors.Clear();
        if (_project is null)
        {
            return;
        }

        _form = ProjectFormModel.From(_project);
        await LoadMembersAsync();
    }

    private async Task LoadMembersAsync()
    {
        var members = await Projects.GetMembersAsync(ProjectId);
        _members = members.Value ?? [];
        if (CanManage)
        {
            var candidates = await Projects.ListCandidateMembersAsync(ProjectId);
            _candidates = candidates.Value ?? [];
        }
    }

    private async Task SaveSettingsAsync()
    {
        if (_project is null)
        {
            return;
        }

        _busy = true;
        try
        {
            var result = await Projects.UpdateSettingsAsync(ProjectId, _form.ToInput(), _project.Version);
            switch (result.Kind)
            {
                case ResultKind.Ok:
                    _project = result.Value!;
                    _form = ProjectFormModel.From(_project);
                    _errors.Clear();
                    _conflicts = [];
                    Snackbar.Add("Settings saved.", Severity.Success);
                    break;
                case ResultKind.Invalid:
                    _errors.Set(result.Errors);
                    _conflicts = [];
                    Snackbar.Add("Not saved: check the marked fields.", Severity.Warning);
                    break;
                case ResultKind.Conflict:
                    // Keep the typed values (_form is untouched); show who changed what.
                    _conflicts = result.Conflicts;
                    break;
                default:
                    Snackbar.Add(result.Message ?? "Not saved.", Severity.Error);
                    break;
            }
        }
        finally
        {
            _busy = false;
        }
    }

    private async Task NewTrussAsync()
    {
        var parameters = new DialogParameters<NewTrussDialog> { { d => d.ProjectId, ProjectId } };
        var dialog = await Dialogs.ShowAsync<NewTrussDialog>("New truss", parameters, new DialogOptions { MaxWidth = MaxWidth.Medium, FullWidth = true });
        var outcome = await dialog.Result;
        if (outcome is { Canceled: false, Data: TrussDetail truss })
        {
            Snackbar.Add($"Truss '{truss.Name}' generated and designed.", Severity.Success);
            Navigation.NavigateTo($"/trusses/{truss.Id}");
        }
    }

    private async Task AddMemberAsync()
    {
        if (_newMemberId is null)
        {
            return;
        }

        var result = await Projects.AddMemberAsync(ProjectId, new AddProjectMemberInput(_newMemberId, _newMemberRole));
        if (result.IsOk)
        {
            _memberErrors.Clear();
            _newMemberId = null;
            Snackbar.Add($"{result.Value!.DisplayName} added as {result.Value.Role}.", Severity.Success);
            await LoadMembersAsync();
            return;
        }

        _memberErrors.Set(result.Errors);
        Snackbar.Add(result.Message ?? "Not added.", Severity.Warning);
    }

    private async Task RemoveMemberAsync(ProjectMemberView member)
    {
        var confirmed = await Dialogs.ShowMessageBoxAsync("Remove member",
            $"Remove {member.DisplayName} ({member.Role}) from this project? They will no longer see it.", yesText: "Remove", cancelText: "Keep");
        if (confirmed != true)
        {
            return;
        }

        var result = await Projects.RemoveMemberAsync(ProjectId, new RowRef(member.MembershipId, member.Version));
        Snackbar.Add(result.IsOk ? $"{member.DisplayName} removed." : result.Message ?? "Not removed.", result.IsOk ? Severity.Success : Severity.Warning);
        await LoadMembersAsync();
    }
}
