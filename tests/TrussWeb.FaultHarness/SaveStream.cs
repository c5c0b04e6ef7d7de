using System.Globalization;
using Microsoft.Extensions.DependencyInjection;
using TrussWeb.Data;
using TrussWeb.Services.Contracts;

namespace TrussWeb.FaultHarness;

/// <summary>
/// One designer saving member K factors one after another through <see cref="IDesignService.UpdateMemberDesignAsync"/>
/// (each save re-designs the truss). Save number i sets member i mod n to Kx = <see cref="KxOf"/>(i). Before each
/// save it prints <c>try i memberId kx</c>; only after the service returned Ok it prints
/// <c>ack i memberId kx version</c>.
/// </summary>
public static class SaveStream
{
    /// <summary>A distinct K for every save number (0.5 to 1.5 for the first 10 000 saves; inside Core's plausible 0.1 to 10).</summary>
    public static double KxOf(int i) => Math.Round(0.5 + (i % 10_000) * 1e-4, 4);

    public static async Task<int> RunAsync(StorageHost host, int from, int count, int pauseMs, TextWriter output, CancellationToken cancellationToken)
    {
        var designer = await host.DemoUserAsync(Roles.Designer).ConfigureAwait(false);
        var trussId = await host.DemoTrussIdAsync(cancellationToken).ConfigureAwait(false);
        await using var scope = host.ScopeAs(designer);
        var trusses = scope.ServiceProvider.GetRequiredService<ITrussService>();
        var design = scope.ServiceProvider.GetRequiredService<IDesignService>();
        var members = await LoadAsync(trusses, trussId, cancellationToken).ConfigureAwait(false);
        await output.WriteLineAsync(FormattableString.Invariant($"ready {trussId} {members.Count}")).ConfigureAwait(false);
        for (var i = from; i < from + count; i++)
        {
            var kx = KxOf(i);
            for (var attempt = 0; ; attempt++)
            {
                var m = members[i % members.Count];
                await output.WriteLineAsync(FormattableString.Invariant($"try {i} {m.Id} {kx.ToString("R", CultureInfo.InvariantCulture)}")).ConfigureAwait(false);
                var result = await design.UpdateMemberDesignAsync(trussId, m.Id, new MemberDesignInput(m.Overrides with { Kx = kx }, m.Version), cancellationToken)
                    .ConfigureAwait(false);
                if (result.IsOk)
                {
                    members[i % members.Count] = m with { Version = result.Value!.MemberVersion, Overrides = result.Value.Overrides };
                    await output.WriteLineAsync(FormattableString.Invariant(
                        $"ack {i} {m.Id} {kx.ToString("R", CultureInfo.InvariantCulture)} {result.Value.MemberVersion}")).ConfigureAwait(false);
                    break;
                }

                if (result.Kind != ResultKind.Conflict || attempt >= 5)
                {
                    await Console.Error.WriteLineAsync($"save {i} failed: {result.Kind} {result.Message}").ConfigureAwait(false);
                    return 2;
                }

                members = await LoadAsync(trusses, trussId, cancellationToken).ConfigureAwait(false);
            }

            if (pauseMs > 0)
            {
                await Task.Delay(pauseMs, cancellationToken).ConfigureAwait(false);
            }
        }

        await output.WriteLineAsync("done").ConfigureAwait(false);
        return 0;
    }

    private static async Task<List<MemberView>> LoadAsync(ITrussService trusses, Guid trussId, CancellationToken cancellationToken)
    {
        var detail = await trusses.GetAsync(trussId, cancellationToken).ConfigureAwait(false);
        if (!detail.IsOk)
        {
            throw new InvalidOperationException($"The truss could not be read: {detail.Message}");
        }

        return detail.Value!.Members.OrderBy(m => m.Mark, StringComparer.Ordinal).ToList();
    }
}
