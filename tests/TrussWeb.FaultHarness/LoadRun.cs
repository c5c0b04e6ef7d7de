using System.Diagnostics;
using Microsoft.Extensions.DependencyInjection;
using TrussWeb.Data;
using TrussWeb.Services.Contracts;
using TrussWeb.Services.Hosting;

namespace TrussWeb.FaultHarness;

/// <summary>What one concurrent user did: its member, the member's version before the run, saves that returned Ok, conflicts met, the last acknowledged K and version, and each Ok save's time.</summary>
public sealed record UserOutcome(
    int User,
    string UserId,
    Guid MemberId,
    string Mark,
    long InitialVersion,
    int Saves,
    int Conflicts,
    double? LastAckKx,
    long LastAckVersion,
    IReadOnlyList<double> SaveMilliseconds);

/// <summary>
/// A bounded load run: <c>users</c> designers (created for the run and added to the demo project), each in
/// its own scope, all started together, each saving <c>saves</c> K factors of its own member of the demo
/// truss through <see cref="IDesignService.UpdateMemberDesignAsync"/> (save + re-design of the whole truss).
/// A conflict is reloaded and retried (at most <c>MaxRetries</c> per save). The whole run is cancelled at
/// <c>timeLimit</c>, so it never hangs.
/// </summary>
public static class LoadRun
{
    public const int MaxRetries = 50;

    /// <summary>User u's save j sets Kx to a value no other user or save uses (0.6 to 0.99).</summary>
    public static double KxOf(int user, int save) => Math.Round(0.6 + user * 0.01 + (save + 1) * 1e-4, 4);

    public static Task<IReadOnlyList<UserOutcome>> RunAsync(StorageHost host, int users, int saves, TimeSpan timeLimit, CancellationToken cancellationToken = default) =>
        RunAsync([host], users, saves, timeLimit, cancellationToken);

    /// <summary>As above, with user u served by <c>hosts[u % hosts.Count]</c> (app instances over one database).</summary>
    public static async Task<IReadOnlyList<UserOutcome>> RunAsync(IReadOnlyList<StorageHost> hosts, int users, int saves, TimeSpan timeLimit,
        CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(hosts);
        var host = hosts[0];
        using var limit = CancellationTokenSource.CreateLinkedTokenSource(cancellationToken);
        limit.CancelAfter(timeLimit);
        var ct = limit.Token;
        var trussId = await host.DemoTrussIdAsync(ct).ConfigureAwait(false);
        var callers = await CreateUsersAsync(host, trussId, users, ct).ConfigureAwait(false);

        IReadOnlyList<MemberView> members;
        await using (var scope = host.ScopeAs(callers[0]))
        {
            var detail = await scope.ServiceProvider.GetRequiredService<ITrussService>().GetAsync(trussId, ct).ConfigureAwait(false);
            members = detail.Value?.Members.OrderBy(m => m.Mark, StringComparer.Ordinal).ToList()
                      ?? throw new InvalidOperationException($"The truss could not be read: {detail.Message}");
        }

        if (members.Count < users)
        {
            throw new InvalidOperationException($"The demo truss has {members.Count} members, fewer than {users} users.");
        }

        using var start = new SemaphoreSlim(0, users);
        var tasks = Enumerable.Range(0, users).Select(u => Task.Run(() => UserAsync(hosts[u % hosts.Count], callers[u], u, trussId, members[u], saves, start, ct), ct)).ToList();
        start.Release(users);
        return await Task.WhenAll(tasks).WaitAsync(timeLimit + TimeSpan.FromSeconds(30), cancellationToken).ConfigureAwait(false);
    }

    private static async Task<UserOutcome> UserAsync(StorageHost host, FixedCaller caller, int u, Guid trussId, MemberView member, int saves, SemaphoreSlim start,
        CancellationToken ct)
    {
        await start.WaitAsync(ct).ConfigureAwait(false);
        await using var scope = host.ScopeAs(caller);
        var design = scope.ServiceProvider.GetRequiredService<IDesignService>();
        var version = member.Version;
        var overrides = member.Overrides;
        var ok = 0;
        var conflicts = 0;
        double? last = null;
        var times = new List<double>(saves);
        for (var j = 0; j < saves; j++)
        {
            var kx = KxOf(u, j);
            for (var attempt = 0; ; attempt++)
            {
                var watch = Stopwatch.StartNew();
                var result = await design.UpdateMemberDesignAsync(trussId, member.Id, new MemberDesignInput(overrides with { Kx = kx }, version), ct).ConfigureAwait(false);
                watch.Stop();
                if (result.IsOk)
                {
                    ok++;
                    times.Add(watch.Elapsed.TotalMilliseconds);
                    version = result.Value!.MemberVersion;
                    overrides = result.Value.Overrides;
                    last = kx;
                    break;
                }

                if (result.Kind != ResultKind.Conflict || result.Conflicts.Count == 0)
                {
                    throw new InvalidOperationException($"user {u} save {j}: {result.Kind} {result.Message}");
                }

                conflicts++;
                if (attempt >= MaxRetries)
                {
                    throw new InvalidOperationException($"user {u} save {j}: still in conflict after {MaxRetries} retries: {result.Message}");
                }

                var fresh = await design.GetMemberDesignAsync(trussId, member.Id, ct).ConfigureAwait(false);
                if (!fresh.IsOk)
                {
                    throw new InvalidOperationException($"user {u}: the member could not be re-read: {fresh.Message}");
                }

                version = fresh.Value!.MemberVersion;
                overrides = fresh.Value.Overrides;
            }
        }

        return new UserOutcome(u, caller.UserId!, member.Id, member.Mark, member.Version, ok, conflicts, last, version, times);
    }

    /// <summary>Creates <paramref name="count"/> designers (as the demo administrator) and adds them to the demo project (as the demo lead).</summary>
    public static async Task<IReadOnlyList<FixedCaller>> CreateUsersAsync(StorageHost host, Guid trussId, int count, CancellationToken ct)
    {
        var admin = await host.DemoUserAsync(Roles.Administrator).ConfigureAwait(false);
        var lead = await host.DemoUserAsync(Roles.ProjectLead).ConfigureAwait(false);
        Guid projectId;
        await using (var scope = host.ScopeAs(lead))
        {
            var detail = await scope.ServiceProvider.GetRequiredService<ITrussService>().GetAsync(trussId, ct).ConfigureAwait(false);
            projectId = detail.Value?.ProjectId ?? throw new InvalidOperationException(detail.Message);
        }

        var callers = new List<FixedCaller>();
        var run = Guid.NewGuid().ToString("N")[..6];
        for (var i = 0; i < count; i++)
        {
            var email = $"load-{run}-{i:00}@load.trussweb.local";
            var name = $"Load designer {i:00}";
            await using (var scope = host.ScopeAs(admin))
            {
                var created = await scope.ServiceProvider.GetRequiredService<IUserAdminService>()
                    .CreateUserAsync(new CreateUserInput(email, name, TrussWebStartup.GeneratePassword(), [Roles.Designer]), ct).ConfigureAwait(false);
                if (!created.IsOk)
                {
                    throw new InvalidOperationException($"{email} could not be created: {created.Message}");
                }

                callers.Add(new FixedCaller(created.Value!.Id, name, Roles.Designer));
            }

            await using (var scope = host.ScopeAs(lead))
            {
                var added = await scope.ServiceProvider.GetRequiredService<IProjectService>()
                    .AddMemberAsync(projectId, new AddProjectMemberInput(callers[^1].UserId!, Roles.Designer), ct).ConfigureAwait(false);
                if (!added.IsOk)
                {
                    throw new InvalidOperationException($"{email} could not join the project: {added.Message}");
                }
            }
        }

        return callers;
    }

    /// <summary>The q-quantile (0..1) of <paramref name="values"/> by the nearest-rank method.</summary>
    public static double Percentile(IReadOnlyList<double> values, double q)
    {
        var sorted = values.Order().ToArray();
        if (sorted.Length == 0)
        {
            return double.NaN;
        }

        var rank = (int)Math.Ceiling(q * sorted.Length);
        return sorted[Math.Clamp(rank - 1, 0, sorted.Length - 1)];
    }
}
