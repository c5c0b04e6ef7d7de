using System.Security.Cryptography;
using System.Text;
using Microsoft.EntityFrameworkCore;
using TrussWeb.Data;

namespace TrussWeb.Services.Tokens;

/// <summary>Who a valid token acts as: the owner, their global roles, and the token's scope.</summary>
public sealed record ApiTokenIdentity(Guid TokenId, string Prefix, string UserId, string DisplayName, IReadOnlyList<string> Roles, string Scope);

/// <summary>The outcome of checking a presented token: the identity, or why it was refused.</summary>
public sealed record ApiTokenCheck(ApiTokenIdentity? Identity, string? Failure)
{
    public bool Succeeded => Identity is not null;
}

/// <summary>
/// Checks presented token text for the API's bearer scheme: well formed, known (by prefix, then the
/// SHA-256 compared in constant time), not revoked, not expired, owner not locked out. Records the last
/// use at most once a minute so a busy client does not write on every request.
/// </summary>
public sealed class ApiTokenAuthenticator(IDbContextFactory<TrussWebDbContext> factory, TimeProvider clock, ApiTokenCache cache)
{
    /// <summary>Shortest interval between two writes of <c>LastUsedUtc</c>.</summary>
    public static readonly TimeSpan LastUsedResolution = TimeSpan.FromMinutes(1);

    public async Task<ApiTokenCheck> CheckAsync(string? token, CancellationToken cancellationToken = default)
    {
        var prefix = ApiTokenText.PrefixOf(token);
        if (prefix is null)
        {
            return new ApiTokenCheck(null, "The bearer token is not a TrussWeb access token.");
        }

        var hashKey = ApiTokenText.Hash(token!);
        if (cache.TryGet(hashKey, clock.GetUtcNow().UtcDateTime, out var known))
        {
            return new ApiTokenCheck(known, null);
        }

        await using var db = await factory.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        var row = await db.ApiTokens.AsNoTracking()
            .Where(t => t.Prefix == prefix)
            .Select(t => new { t.Id, t.TokenHash, t.IsRevoked, t.ExpiresUtc, t.LastUsedUtc, t.Scope, t.UserId, User = t.User! })
            .FirstOrDefaultAsync(cancellationToken).ConfigureAwait(false);
        var hash = ApiTokenText.Hash(token!);
        if (row is null || !CryptographicOperations.FixedTimeEquals(Encoding.ASCII.GetBytes(hash), Encoding.ASCII.GetBytes(row.TokenHash)))
        {
            return new ApiTokenCheck(null, "The access token is not known.");
        }

        var now = clock.GetUtcNow().UtcDateTime;
        if (row.IsRevoked)
        {
            return new ApiTokenCheck(null, "The access token has been revoked.");
        }

        if (row.ExpiresUtc <= now)
        {
            return new ApiTokenCheck(null, "The access token has expired.");
        }

        if (row.User.LockoutEnd is { } end && end > clock.GetUtcNow())
        {
            return new ApiTokenCheck(null, "The token's user is locked out.");
        }

        var roles = await (from ur in db.UserRoles.AsNoTracking()
                           join r in db.Roles.AsNoTracking() on ur.RoleId equals r.Id
                           where ur.UserId == row.UserId
                           select r.Name!).ToListAsync(cancellationToken).ConfigureAwait(false);
        if (row.LastUsedUtc is null || now - row.LastUsedUtc.Value >= LastUsedResolution)
        {
            // Bypasses the version and stamps on purpose: last use is bookkeeping, not an edit.
            await db.ApiTokens.Where(t => t.Id == row.Id).ExecuteUpdateAsync(s => s.SetProperty(t => t.LastUsedUtc, now), cancellationToken).ConfigureAwait(false);
        }

        var name = string.IsNullOrWhiteSpace(row.User.DisplayName) ? row.User.Email ?? row.UserId : row.User.DisplayName;
        var identity = new ApiTokenIdentity(row.Id, prefix, row.UserId, name, roles, row.Scope);
        cache.Set(hashKey, identity, row.ExpiresUtc, now);
        return new ApiTokenCheck(identity, null);
    }
}
