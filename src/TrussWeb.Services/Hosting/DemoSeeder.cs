using Microsoft.AspNetCore.Identity;
using Microsoft.EntityFrameworkCore;
using Microsoft.Extensions.DependencyInjection;
using Microsoft.Extensions.Logging;
using TrussWeb.Core.Loads;
using TrussWeb.Core.Model;
using TrussWeb.Data;
using TrussWeb.Data.Entities;
using TrussWeb.Services.Contracts;
using TrussWeb.Services.Users;

namespace TrussWeb.Services.Hosting;

/// <summary>
/// Demo mode only: an invented project (a distribution shed roof for an invented client in an
/// invented town) with one generated truss, designed and sized, and one sign-in per role with known
/// DEMO passwords. Idempotent: users and the project are found by e-mail and name on later starts.
/// </summary>
public static class DemoSeeder
{
    public const string ProjectName = "Kiewietfontein Distribution Shed";

    public const string TrussName = "Main roof truss RT1";

    /// <summary>The demo sign-ins. DEMO PASSWORDS: for demo mode only, never for a real installation.</summary>
    public static IReadOnlyList<(string Email, string DisplayName, string Role, string Password)> Users { get; } =
    [
        ("designer@demo.trussweb.local", "Thandi Demo-Designer", Roles.Designer, "demo-designer-2026"),
        ("checker@demo.trussweb.local", "Pieter Demo-Checker", Roles.Checker, "demo-checker-2026"),
        ("lead@demo.trussweb.local", "Naledi Demo-Lead", Roles.ProjectLead, "demo-lead-2026"),
        ("admin@demo.trussweb.local", "Sam Demo-Admin", Roles.Administrator, "demo-admin-2026"),
    ];

    public static async Task SeedAsync(IServiceProvider scope, TextWriter output, ILogger logger, CancellationToken cancellationToken)
    {
        ArgumentNullException.ThrowIfNull(scope);
        ArgumentNullException.ThrowIfNull(output);
        var users = scope.GetRequiredService<UserManager<AppUser>>();
        var ids = new Dictionary<string, string>(StringComparer.Ordinal);
        foreach (var (email, name, role, password) in Users)
        {
            var user = await users.FindByEmailAsync(email).ConfigureAwait(false);
            if (user is null)
            {
                var (created, errors) = await UserAdminService.CreateAsync(users, new CreateUserInput(email, name, password, [role])).ConfigureAwait(false);
                if (created is null)
                {
                    logger.LogError("Demo user {Email} could not be created: {Errors}", email, string.Join("; ", errors));
                    continue;
                }

                user = created;
            }

            ids[role] = user.Id;
        }

        var factory = scope.GetRequiredService<IDbContextFactory<TrussWebDbContext>>();
        bool exists;
        await using (var db = await factory.CreateDbContextAsync(cancellationToken).ConfigureAwait(false))
        {
            exists = await db.Projects.AnyAsync(p => p.Name == ProjectName, cancellationToken).ConfigureAwait(false);
        }

        if (!exists && ids.TryGetValue(Roles.ProjectLead, out var leadId))
        {
            await SeedProjectAsync(scope, leadId, ids, logger, cancellationToken).ConfigureAwait(false);
        }

        await output.WriteLineAsync("TrussWeb DEMO MODE: invented demo data; demo passwords are for this demo only.").ConfigureAwait(false);
        foreach (var (email, _, role, password) in Users)
        {
            await output.WriteLineAsync($"  {role,-13} {email,-32} password: {password}").ConfigureAwait(false);
        }
    }

    private static async Task SeedProjectAsync(IServiceProvider scope, string leadId, Dictionary<string, string> ids, ILogger logger, CancellationToken cancellationToken)
    {
        var lead = new FixedCaller(leadId, "Naledi Demo-Lead", Roles.ProjectLead);
        var services = ServiceCollectionExtensions.ServicesFor(scope, lead);
        var project = await services.Projects.CreateAsync(new ProjectInput(
            ProjectName, "Hadeda Cold Chain Co-operative (invented)", "DEMO-0417", "Kiewietfontein (an invented town)", "A", "SANS 10162-1", "S355JR"), cancellationToken).ConfigureAwait(false);
        if (!project.IsOk)
        {
            logger.LogError("Demo project could not be created: {Message}", project.Message);
            return;
        }

        var projectId = project.Value!.Id;
        foreach (var role in new[] { Roles.Designer, Roles.Checker })
        {
            if (ids.TryGetValue(role, out var id))
            {
                await services.Projects.AddMemberAsync(projectId, new AddProjectMemberInput(id, role), cancellationToken).ConfigureAwait(false);
            }
        }

        var truss = await services.Trusses.CreateFromGeneratorAsync(projectId,
            new TrussGeneratorInput(TrussName, TrussType.PitchedPratt, 15000, 15, null, 0, 8, 5000, 2), cancellationToken).ConfigureAwait(false);
        if (!truss.IsOk)
        {
            logger.LogError("Demo truss could not be created: {Message}", truss.Message);
            return;
        }

        var t = truss.Value!;
        var actions = await services.Trusses.SaveActionsAsync(t.Id, new ActionsInput(0.15, 0.10, 0.5,
            [new WindCaseRow("W1", "Wind across the ridge, uplift", -0.9, -0.6), new WindCaseRow("W2", "Wind along the ridge, uplift", -0.7, -0.7)],
            t.Actions.Version), cancellationToken).ConfigureAwait(false);
        if (!actions.IsOk)
        {
            logger.LogError("Demo actions could not be saved: {Message}", actions.Message);
            return;
        }

        var reset = await services.Trusses.ResetCombinationsAsync(t.Id, CombinationStandard.Sans10160,
            actions.Value!.Combinations.Select(c => new RowRef(c.Id, c.Version)).ToList(), cancellationToken).ConfigureAwait(false);
        if (!reset.IsOk)
        {
            logger.LogError("Demo combinations could not be set: {Message}", reset.Message);
            return;
        }

        var proposal = await services.Design.ProposeSizingAsync(t.Id, null, cancellationToken).ConfigureAwait(false);
        if (proposal.IsOk)
        {
            var accepted = await services.Design.AcceptSizingAsync(proposal.Value!, cancellationToken).ConfigureAwait(false);
            if (!accepted.IsOk)
            {
                logger.LogError("Demo sizing could not be accepted: {Message}", accepted.Message);
            }
        }
        else
        {
            logger.LogError("Demo sizing failed: {Message}", proposal.Message);
        }
    }
}
