namespace TrussWeb.Services.Contracts;

/// <summary>
/// The caller's own personal access tokens for the HTTP API: list, create (the token text is returned
/// once and never stored) and revoke. A token acts as its owner with the owner's roles, limited by its scope.
/// </summary>
public interface IApiTokenService
{
    /// <summary>The caller's tokens, newest first (never the token text: only its prefix).</summary>
    Task<ServiceResult<IReadOnlyList<ApiTokenView>>> ListMyTokensAsync(CancellationToken cancellationToken = default);

    /// <summary>Creates a token for the caller; <see cref="CreatedApiToken.Token"/> is the only time the text is shown.</summary>
    Task<ServiceResult<CreatedApiToken>> CreateAsync(ApiTokenInput input, CancellationToken cancellationToken = default);

    /// <summary>Revokes one of the caller's tokens; <paramref name="version"/> is the Version the caller loaded.</summary>
    Task<ServiceResult<ApiTokenView>> RevokeAsync(Guid tokenId, long version, CancellationToken cancellationToken = default);
}

/// <summary>Names of the two scopes: a read token may only read and run stateless calculations.</summary>
public static class ApiTokenScopes
{
    public const string Read = "read";

    public const string ReadWrite = "read-write";

    public static IReadOnlyList<string> All { get; } = [Read, ReadWrite];
}

/// <summary>A new token: a name (1 to 100 characters), scope <see cref="ApiTokenScopes"/> and expiry (in the future, at most 366 days ahead).</summary>
public sealed record ApiTokenInput(string Name, string Scope, DateTime ExpiresUtc);

public sealed record ApiTokenView(
    Guid Id,
    long Version,
    string Name,
    string Prefix,
    string Scope,
    DateTime CreatedUtc,
    DateTime ExpiresUtc,
    bool IsRevoked,
    DateTime? RevokedUtc,
    DateTime? LastUsedUtc)
{
    /// <summary>"active", "expired" or "revoked" at <paramref name="nowUtc"/>.</summary>
    public string StateAt(DateTime nowUtc) => IsRevoked ? "revoked" : ExpiresUtc <= nowUtc ? "expired" : "active";
}

/// <summary>The created token and its text (shown once: only its SHA-256 is stored).</summary>
public sealed record CreatedApiToken(ApiTokenView View, string Token);
