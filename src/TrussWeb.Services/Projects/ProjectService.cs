using Microsoft.EntityFrameworkCore;
using TrussWeb.Data;
using TrussWeb.Data.Entities;
using TrussWeb.Services.Authorization;
using TrussWeb.Services.Common;
using TrussWeb.Services.Contracts;
using TrussWeb.Services.Design;
using TrussWeb.Services.Review;

namespace TrussWeb.Services.Projects;

/// <summary>Project list with status roll-ups, settings and membership.</summary>
internal sealed class ProjectService(IDbContextFactory<TrussWebDbContext> factory, Authorizer authorizer, TimeProvider clock, IReviewEvents reviewEvents) : IProjectService
{
    private static string Op(string method) => PermissionTable.Key<IProjectService>(method);

    private ICallerContext Caller => authorizer.Caller;

    public async Task<ServiceResult<IReadOnlyList<ProjectSummary>>> ListMyProjectsAsync(CancellationToken cancellationToken = default)
    {
        if (authorizer.Check<IReadOnlyList<ProjectSummary>>(Op(nameof(ListMyProjectsAsync))) is { } refusal)
        {
            return refusal;
        }

        await using var db = await factory.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        var query = db.Projects.AsNoTracking();
        if (!authorizer.IsAdministrator)
        {
            query = query.Where(p => p.Memberships.Any(m => m.UserId == Caller.UserId));
        }

        var projects = await query.OrderBy(p => p.Name).ToListAsync(cancellationToken).ConfigureAwait(false);
        var list = new List<ProjectSummary>();
        foreach (var p in projects)
        {
            var role = await RoleAsync(db, p.Id, cancellationToken).ConfigureAwait(false);
            list.Add(new ProjectSummary(p.Id, p.Name, p.Client, p.Reference, p.Location, p.Revision, p.StandardCode, role, p.UpdatedUtc,
                await RollupsAsync(db, p.Id, cancellationToken).ConfigureAwait(false)));
        }

        return ServiceResult<IReadOnlyList<ProjectSummary>>.Ok(list);
    }

    public async Task<ServiceResult<ProjectDetail>> GetAsync(Guid projectId, CancellationToken cancellationToken = default)
    {
        await using var db = await factory.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        var (refusal, role) = await authorizer.CheckProjectAsync<ProjectDetail>(db, projectId, Op(nameof(GetAsync)), cancellationToken).ConfigureAwait(false);
        return refusal ?? await DetailAsync(db, projectId, role, cancellationToken).ConfigureAwait(false);
    }

    public async Task<ServiceResult<ProjectDetail>> CreateAsync(ProjectInput input, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(input);
        if (authorizer.Check<ProjectDetail>(Op(nameof(CreateAsync))) is { } refusal)
        {
            return refusal;
        }

        await using var db = await factory.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        var errors = await ValidateAsync(db, input, cancellationToken).ConfigureAwait(false);
        if (errors.Count > 0)
        {
            return ServiceResult<ProjectDetail>.Invalid(errors);
        }

        var project = new Project { Units = "SI-kN-m" };
        Apply(project, input);
        project.Memberships.Add(new ProjectMembership { UserId = Caller.UserId!, Role = Roles.ProjectLead });
        db.Projects.Add(project);
        AuditWriter.AddChanges(db, Caller, clock, project.Id);
        await db.SaveChangesAsync(cancellationToken).ConfigureAwait(false);
        return await DetailAsync(db, project.Id, Roles.ProjectLead, cancellationToken).ConfigureAwait(false);
    }

    public async Task<ServiceResult<ProjectDetail>> UpdateSettingsAsync(Guid projectId, ProjectInput input, long version, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(input);
        await using var db = await factory.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        var (refusal, role) = await authorizer.CheckProjectAsync<ProjectDetail>(db, projectId, Op(nameof(UpdateSettingsAsync)), cancellationToken).ConfigureAwait(false);
        if (refusal is not null)
        {
            return refusal;
        }

        var errors = await ValidateAsync(db, input, cancellationToken).ConfigureAwait(false);
        if (errors.Count > 0)
        {
            return ServiceResult<ProjectDetail>.Invalid(errors);
        }

        var project = await db.Projects.FirstAsync(p => p.Id == projectId, cancellationToken).ConfigureAwait(false);
        db.Entry(project).Property(p => p.Version).OriginalValue = version;
        Apply(project, input);
        AuditWriter.AddChanges(db, Caller, clock, projectId);
        try
        {
            await db.SaveChangesAsync(cancellationToken).ConfigureAwait(false);
        }
        catch (DbUpdateConcurrencyException ex)
        {
            return ServiceResult<ProjectDetail>.Conflict(await Conflicts.DescribeAsync(db, ex, cancellationToken).ConfigureAwait(false));
        }

        // Standard or grade changes alter every member's design: re-design each truss.
        var trussIds = await db.Trusses.Where(t => t.ProjectId == projectId).Select(t => t.Id).ToListAsync(cancellationToken).ConfigureAwait(false);
        foreach (var id in trussIds)
        {
            await using var tdb = await factory.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
            await TrussWriteLock.AcquireAsync(tdb, id, cancellationToken).ConfigureAwait(false);
            var truss = await DesignInputBuilder.LoadTrussAsync(tdb, id, cancellationToken).ConfigureAwait(false);
            if (truss is null)
            {
                continue;
            }

            var (outcome, _, events) = await DesignRunner.DesignAndStageAsync(tdb, truss, Caller, clock, cancellationToken).ConfigureAwait(false);
            AuditWriter.AddAction(tdb, Caller, clock, projectId, nameof(Truss), id.ToString(), "Designed", newValue: outcome?.TrussSnapshot.Status ?? "NotDesigned",
                fingerprint: outcome?.TrussSnapshot.Fingerprint);
            await tdb.SaveChangesAsync(cancellationToken).ConfigureAwait(false);
            await TrussWriteLock.CommitAsync(tdb, cancellationToken).ConfigureAwait(false);
            foreach (var e in events)
            {
                reviewEvents.Publish(e);
            }
        }

        return await DetailAsync(db, projectId, role, cancellationToken).ConfigureAwait(false);
    }

    public async Task<ServiceResult<IReadOnlyList<ProjectMemberView>>> GetMembersAsync(Guid projectId, CancellationToken cancellationToken = default)
    {
        await using var db = await factory.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        var (refusal, _) = await authorizer.CheckProjectAsync<IReadOnlyList<ProjectMemberView>>(db, projectId, Op(nameof(GetMembersAsync)), cancellationToken).ConfigureAwait(false);
        return refusal ?? ServiceResult<IReadOnlyList<ProjectMemberView>>.Ok(await MembersAsync(db, projectId, cancellationToken).ConfigureAwait(false));
    }

    public async Task<ServiceResult<IReadOnlyList<UserPick>>> ListCandidateMembersAsync(Guid projectId, CancellationToken cancellationToken = default)
    {
        await using var db = await factory.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        var (refusal, _) = await authorizer.CheckProjectAsync<IReadOnlyList<UserPick>>(db, projectId, Op(nameof(ListCandidateMembersAsync)), cancellationToken).ConfigureAwait(false);
        if (refusal is not null)
        {
            return refusal;
        }

        var members = db.ProjectMemberships.Where(m => m.ProjectId == projectId).Select(m => m.UserId);
        var users = await db.Users.AsNoTracking().Where(u => !members.Contains(u.Id)).OrderBy(u => u.Email)
            .Select(u => new UserPick(u.Id, u.Email ?? u.UserName ?? u.Id, u.DisplayName)).ToListAsync(cancellationToken).ConfigureAwait(false);
        return ServiceResult<IReadOnlyList<UserPick>>.Ok(users);
    }

    public async Task<ServiceResult<ProjectMemberView>> AddMemberAsync(Guid projectId, AddProjectMemberInput input, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(input);
        await using var db = await factory.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        var (refusal, _) = await authorizer.CheckProjectAsync<ProjectMemberView>(db, projectId, Op(nameof(AddMemberAsync)), cancellationToken).ConfigureAwait(false);
        if (refusal is not null)
        {
            return refusal;
        }

        if (!Roles.All.Contains(input.Role))
        {
            return ServiceResult<ProjectMemberView>.Invalid(nameof(input.Role), $"use one of {string.Join(", ", Roles.All)} (got '{input.Role}')");
        }

        var key = input.UserIdOrEmail?.Trim() ?? string.Empty;
        var upper = key.ToUpperInvariant();
        var user = await db.Users.FirstOrDefaultAsync(u => u.Id == key || u.NormalizedEmail == upper, cancellationToken).ConfigureAwait(false);
        if (user is null)
        {
            return ServiceResult<ProjectMemberView>.Invalid(nameof(input.UserIdOrEmail), $"no user '{key}'");
        }

        if (await db.ProjectMemberships.AnyAsync(m => m.ProjectId == projectId && m.UserId == user.Id, cancellationToken).ConfigureAwait(false))
        {
            return ServiceResult<ProjectMemberView>.Invalid(nameof(input.UserIdOrEmail), $"{user.Email} is already a member of this project");
        }

        var membership = new ProjectMembership { ProjectId = projectId, UserId = user.Id, Role = input.Role };
        db.ProjectMemberships.Add(membership);
        AuditWriter.AddChanges(db, Caller, clock, projectId);
        await db.SaveChangesAsync(cancellationToken).ConfigureAwait(false);
        return ServiceResult<ProjectMemberView>.Ok(new ProjectMemberView(membership.Id, membership.Version, user.Id, user.Email ?? string.Empty, user.DisplayName, membership.Role));
    }

    public async Task<ServiceResult<Done>> RemoveMemberAsync(Guid projectId, RowRef membership, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(membership);
        await using var db = await factory.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        var (refusal, _) = await authorizer.CheckProjectAsync<Done>(db, projectId, Op(nameof(RemoveMemberAsync)), cancellationToken).ConfigureAwait(false);
        if (refusal is not null)
        {
            return refusal;
        }

        var row = await db.ProjectMemberships.FirstOrDefaultAsync(m => m.Id == membership.Id && m.ProjectId == projectId, cancellationToken).ConfigureAwait(false);
        if (row is null)
        {
            return ServiceResult<Done>.Ok(default);
        }

        if (row.Role == Roles.ProjectLead && await db.ProjectMemberships.CountAsync(m => m.ProjectId == projectId && m.Role == Roles.ProjectLead, cancellationToken).ConfigureAwait(false) == 1)
        {
            return ServiceResult<Done>.Invalid(nameof(membership), "a project needs at least one project lead; add another lead first");
        }

        db.Entry(row).Property(m => m.Version).OriginalValue = membership.Version;
        db.ProjectMemberships.Remove(row);
        AuditWriter.AddChanges(db, Caller, clock, projectId);
        try
        {
            await db.SaveChangesAsync(cancellationToken).ConfigureAwait(false);
        }
        catch (DbUpdateConcurrencyException ex)
        {
            return ServiceResult<Done>.Conflict(await Conflicts.DescribeAsync(db, ex, cancellationToken).ConfigureAwait(false));
        }

        return ServiceResult<Done>.Ok(default);
    }

    private async Task<List<FieldError>> ValidateAsync(TrussWebDbContext db, ProjectInput input, CancellationToken cancellationToken)
    {
        var errors = new List<FieldError>();
        if (string.IsNullOrWhiteSpace(input.Name))
        {
            errors.Add(new FieldError(nameof(input.Name), "give the project a name"));
        }
        else if (input.Name.Trim().Length > 200)
        {
            errors.Add(new FieldError(nameof(input.Name), $"at most 200 characters (got {input.Name.Trim().Length})"));
        }

        if (string.IsNullOrWhiteSpace(input.Revision))
        {
            errors.Add(new FieldError(nameof(input.Revision), "give a revision, e.g. A"));
        }

        if (Standards.Find(input.StandardCode) is null)
        {
            errors.Add(new FieldError(nameof(input.StandardCode), $"choose one of {string.Join(", ", Standards.All.Select(s => s.Code))} (got '{input.StandardCode}')"));
        }

        if (!string.IsNullOrWhiteSpace(input.DefaultGradeName))
        {
            var name = input.DefaultGradeName.Trim();
            if (!await db.SteelGrades.AnyAsync(g => g.Name == name, cancellationToken).ConfigureAwait(false))
            {
                errors.Add(new FieldError(nameof(input.DefaultGradeName), $"grade '{name}' is not in the grade list"));
            }
        }

        return errors;
    }

    private static void Apply(Project project, ProjectInput input)
    {
        project.Name = input.Name.Trim();
        project.Client = Blank(input.Client);
        project.Reference = Blank(input.Reference);
        project.Location = Blank(input.Location);
        project.Revision = input.Revision.Trim();
        project.StandardCode = Standards.Find(input.StandardCode)!.Code;
        project.DefaultGradeName = Blank(input.DefaultGradeName);
    }

    private static string? Blank(string? s) => string.IsNullOrWhiteSpace(s) ? null : s.Trim();

    private async Task<string?> RoleAsync(TrussWebDbContext db, Guid projectId, CancellationToken cancellationToken) =>
        await db.ProjectMemberships.Where(m => m.ProjectId == projectId && m.UserId == Caller.UserId).Select(m => m.Role)
            .FirstOrDefaultAsync(cancellationToken).ConfigureAwait(false);

    private async Task<ServiceResult<ProjectDetail>> DetailAsync(TrussWebDbContext db, Guid projectId, string? role, CancellationToken cancellationToken)
    {
        var p = await db.Projects.AsNoTracking().FirstAsync(x => x.Id == projectId, cancellationToken).ConfigureAwait(false);
        return ServiceResult<ProjectDetail>.Ok(new ProjectDetail(p.Id, p.Version, p.Name, p.Client, p.Reference, p.Location, p.Revision, p.StandardCode,
            p.DefaultGradeName, role, p.CreatedUtc, p.UpdatedUtc, await RollupsAsync(db, projectId, cancellationToken).ConfigureAwait(false)));
    }

    private static async Task<IReadOnlyList<ProjectMemberView>> MembersAsync(TrussWebDbContext db, Guid projectId, CancellationToken cancellationToken) =>
        await db.ProjectMemberships.AsNoTracking().Where(m => m.ProjectId == projectId).OrderBy(m => m.Role).ThenBy(m => m.User!.Email)
            .Select(m => new ProjectMemberView(m.Id, m.Version, m.UserId, m.User!.Email ?? string.Empty, m.User.DisplayName, m.Role))
            .ToListAsync(cancellationToken).ConfigureAwait(false);

    /// <summary>Per truss: members by stored design status (no snapshot = not designed) and by review state.</summary>
    internal static async Task<IReadOnlyList<TrussStatusRollup>> RollupsAsync(TrussWebDbContext db, Guid projectId, CancellationToken cancellationToken)
    {
        var trusses = await db.Trusses.AsNoTracking().Where(t => t.ProjectId == projectId).OrderBy(t => t.Name)
            .Select(t => new { t.Id, t.Name }).ToListAsync(cancellationToken).ConfigureAwait(false);
        var ids = trusses.Select(t => t.Id).ToList();
        var members = await db.TrussMembers.AsNoTracking().Where(m => ids.Contains(m.TrussId)).Select(m => new { m.Id, m.TrussId, m.ReviewState })
            .ToListAsync(cancellationToken).ConfigureAwait(false);
        var status = await db.DesignSnapshots.AsNoTracking().Where(s => ids.Contains(s.TrussId) && s.MemberId != null)
            .Select(s => new { s.MemberId, s.Status }).ToListAsync(cancellationToken).ConfigureAwait(false);
        var byMember = status.ToDictionary(s => s.MemberId!.Value, s => s.Status);
        return trusses.Select(t =>
        {
            var mine = members.Where(m => m.TrussId == t.Id).ToList();
            var states = mine.Select(m => byMember.GetValueOrDefault(m.Id)).ToList();
            return new TrussStatusRollup(t.Id, t.Name, mine.Count,
                states.Count(s => s is "Pass" or "NotApplicable"),
                states.Count(s => s == "Fail"),
                states.Count(s => s is null),
                states.Count(s => s == "OutOfScope"),
                mine.GroupBy(m => ReviewStateMachine.Parse(m.ReviewState).ToString(), StringComparer.Ordinal).OrderBy(g => g.Key, StringComparer.Ordinal).ToDictionary(g => g.Key, g => g.Count(), StringComparer.Ordinal));
        }).ToList();
    }
}
