using System.Globalization;
using Microsoft.EntityFrameworkCore;
using TrussWeb.Data;
using TrussWeb.Data.Entities;
using TrussWeb.Services.Authorization;
using TrussWeb.Services.Common;
using TrussWeb.Services.Contracts;

namespace TrussWeb.Services.Tokens;

/// <summary>The caller's personal access tokens. Creation and revocation are written to the audit log (never the token text).</summary>
internal sealed class ApiTokenService(IDbContextFactory<TrussWebDbContext> factory, Authorizer authorizer, TimeProvider clock, ApiTokenCache cache) : IApiTokenService
{
    /// <summary>Longest lifetime of a token.</summary>
    public static readonly TimeSpan MaxLifetime = TimeSpan.FromDays(366);

    /// <summary>Longest token name.</summary>
    public const int MaxNameLength = 100;

    public async Task<ServiceResult<IReadOnlyList<ApiTokenView>>> ListMyTokensAsync(CancellationToken cancellationToken = default)
    {
        if (authorizer.Check<IReadOnlyList<ApiTokenView>>(Op(nameof(ListMyTokensAsync))) is { } refusal)
        {
            return refusal;
        }

        await using var db = await factory.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        var rows = await db.ApiTokens.AsNoTracking().Where(t => t.UserId == authorizer.Caller.UserId).ToListAsync(cancellationToken).ConfigureAwait(false);
        return ServiceResult<IReadOnlyList<ApiTokenView>>.Ok(rows.OrderByDescending(t => t.CreatedUtc).Select(View).ToList());
    }

    public async Task<ServiceResult<CreatedApiToken>> CreateAsync(ApiTokenInput input, CancellationToken cancellationToken = default)
    {
        if (authorizer.Check<CreatedApiToken>(Op(nameof(CreateAsync))) is { } refusal)
        {
            return refusal;
        }

        ArgumentNullException.ThrowIfNull(input);
        var errors = Validate(input, clock.GetUtcNow().UtcDateTime);
        if (errors.Count > 0)
        {
            return ServiceResult<CreatedApiToken>.Invalid(errors);
        }

        await using var db = await factory.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        var (token, row) = NewRow(authorizer.Caller.UserId!, input);
        db.ApiTokens.Add(row);
        AuditWriter.AddAction(db, authorizer.Caller, clock, null, nameof(ApiToken), row.Id.ToString(), "TokenCreated",
            newValue: $"{row.Prefix} {row.Scope} until {row.ExpiresUtc.ToString("yyyy-MM-dd HH:mm", CultureInfo.InvariantCulture)} UTC", comment: row.Name);
        await db.SaveChangesAsync(cancellationToken).ConfigureAwait(false);
        return ServiceResult<CreatedApiToken>.Ok(new CreatedApiToken(View(row), token));
    }

    public async Task<ServiceResult<ApiTokenView>> RevokeAsync(Guid tokenId, long version, CancellationToken cancellationToken = default)
    {
        if (authorizer.Check<ApiTokenView>(Op(nameof(RevokeAsync))) is { } refusal)
        {
            return refusal;
        }

        await using var db = await factory.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        var row = await db.ApiTokens.FirstOrDefaultAsync(t => t.Id == tokenId && t.UserId == authorizer.Caller.UserId, cancellationToken).ConfigureAwait(false);
        if (row is null)
        {
            return ServiceResult<ApiTokenView>.NotFound("No such token of yours.");
        }

        if (row.IsRevoked)
        {
            return ServiceResult<ApiTokenView>.Ok(View(row));
        }

        db.Entry(row).Property(t => t.Version).OriginalValue = version;
        row.IsRevoked = true;
        row.RevokedUtc = clock.GetUtcNow().UtcDateTime;
        AuditWriter.AddAction(db, authorizer.Caller, clock, null, nameof(ApiToken), row.Id.ToString(), "TokenRevoked", oldValue: row.Prefix, comment: row.Name);
        try
        {
            await db.SaveChangesAsync(cancellationToken).ConfigureAwait(false);
        }
        catch (DbUpdateConcurrencyException ex)
        {
            return ServiceResult<ApiTokenView>.Conflict(await Conflicts.DescribeAsync(db, ex, cancellationToken).ConfigureAwait(false));
        }

        cache.Forget(row.Id);
        return ServiceResult<ApiTokenView>.Ok(View(row));
    }

    /// <summary>Field-named problems with a token request at <paramref name="nowUtc"/>.</summary>
    public static IReadOnlyList<FieldError> Validate(ApiTokenInput input, DateTime nowUtc)
    {
        ArgumentNullException.ThrowIfNull(input);
        var errors = new List<FieldError>();
        if (string.IsNullOrWhiteSpace(input.Name) || input.Name.Trim().Length > MaxNameLength)
        {
            errors.Add(new FieldError(nameof(ApiTokenInput.Name), $"give a name of 1 to {MaxNameLength} characters"));
        }

        if (!ApiTokenScopes.All.Contains(input.Scope, StringComparer.Ordinal))
        {
            errors.Add(new FieldError(nameof(ApiTokenInput.Scope), $"must be \"{ApiTokenScopes.Read}\" or \"{ApiTokenScopes.ReadWrite}\" (got \"{input.Scope}\")"));
        }

        var expires = DateTime.SpecifyKind(input.ExpiresUtc, DateTimeKind.Utc);
        if (expires <= nowUtc)
        {
            errors.Add(new FieldError(nameof(ApiTokenInput.ExpiresUtc), "must be in the future"));
        }
        else if (expires > nowUtc + MaxLifetime)
        {
            errors.Add(new FieldError(nameof(ApiTokenInput.ExpiresUtc), $"must be at most {MaxLifetime.TotalDays.ToString(CultureInfo.InvariantCulture)} days ahead"));
        }

        return errors;
    }

    /// <summary>A new row for <paramref name="userId"/> and its token text (the row keeps only the hash).</summary>
    internal static (string Token, ApiToken Row) NewRow(string userId, ApiTokenInput input)
    {
        var token = ApiTokenText.Generate();
        var row = new ApiToken
        {
            Id = Guid.NewGuid(),
            UserId = userId,
            Name = input.Name.Trim(),
            Prefix = ApiTokenText.PrefixOf(token)!,
            TokenHash = ApiTokenText.Hash(token),
            Scope = input.Scope,
            ExpiresUtc = DateTime.SpecifyKind(input.ExpiresUtc, DateTimeKind.Utc),
        };
        return (token, row);
    }

    internal static ApiTokenView View(ApiToken t) =>
        new(t.Id, t.Version, t.Name, t.Prefix, t.Scope, t.CreatedUtc, t.ExpiresUtc, t.IsRevoked, t.RevokedUtc, t.LastUsedUtc);

    private static string Op(string method) => PermissionTable.Key<IApiTokenService>(method);
}
