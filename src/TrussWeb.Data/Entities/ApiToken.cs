namespace TrussWeb.Data.Entities;

/// <summary>
/// A personal access token for the HTTP API. Only the lower-case hex SHA-256 of the token text is
/// stored (<see cref="TokenHash"/>), with a short non-secret <see cref="Prefix"/> that identifies it
/// in lists and finds the row; the token text itself is shown once, when it is created.
/// </summary>
public sealed class ApiToken : TrackedEntity
{
    /// <summary>Length of <see cref="TokenHash"/> (64 hex digits).</summary>
    public const int HashLength = 64;

    /// <summary>Length of <see cref="Prefix"/>.</summary>
    public const int PrefixLength = 12;

    /// <summary>The owner (Identity user id); the token acts as this user with their roles.</summary>
    public string UserId { get; set; } = string.Empty;

    public AppUser? User { get; set; }

    /// <summary>The owner's label for the token ("nightly batch checks").</summary>
    public string Name { get; set; } = string.Empty;

    /// <summary>First characters of the token text ("tw_" and 9 random characters): not secret, unique.</summary>
    public string Prefix { get; set; } = string.Empty;

    /// <summary>Lower-case hex SHA-256 of the UTF-8 token text.</summary>
    public string TokenHash { get; set; } = string.Empty;

    /// <summary>"read" or "read-write" (<c>TrussWeb.Services</c> names them).</summary>
    public string Scope { get; set; } = string.Empty;

    public DateTime ExpiresUtc { get; set; }

    public bool IsRevoked { get; set; }

    public DateTime? RevokedUtc { get; set; }

    /// <summary>When the token last authenticated a request (updated at most once a minute).</summary>
    public DateTime? LastUsedUtc { get; set; }
}
