using System.Collections.Concurrent;

namespace TrussWeb.Services.Tokens;

/// <summary>
/// Valid token checks remembered for <see cref="Lifetime"/> (keyed by the token's SHA-256), so a busy
/// client is not looked up in the database on every request. Revoking through the token service removes
/// the entry at once on this instance; other instances notice within <see cref="Lifetime"/>. Expiry is
/// checked on every hit. A singleton.
/// </summary>
public sealed class ApiTokenCache
{
    /// <summary>How long a valid check is reused (2026-12-02: the load run spent much of each request on the two look-ups).</summary>
    public static readonly TimeSpan Lifetime = TimeSpan.FromSeconds(10);

    private const int MaxEntries = 10_000;

    private readonly ConcurrentDictionary<string, (ApiTokenIdentity Identity, DateTime ExpiresUtc, DateTime Until)> _entries = new(StringComparer.Ordinal);

    public bool TryGet(string hash, DateTime nowUtc, out ApiTokenIdentity? identity)
    {
        identity = null;
        if (_entries.TryGetValue(hash, out var e))
        {
            if (e.Until > nowUtc && e.ExpiresUtc > nowUtc)
            {
                identity = e.Identity;
                return true;
            }

            _entries.TryRemove(hash, out _);
        }

        return false;
    }

    public void Set(string hash, ApiTokenIdentity identity, DateTime expiresUtc, DateTime nowUtc)
    {
        if (_entries.Count >= MaxEntries)
        {
            _entries.Clear();
        }

        _entries[hash] = (identity, expiresUtc, nowUtc + Lifetime);
    }

    /// <summary>Forgets every remembered check of the token (on revocation).</summary>
    public void Forget(Guid tokenId)
    {
        foreach (var (key, value) in _entries)
        {
            if (value.Identity.TokenId == tokenId)
            {
                _entries.TryRemove(key, out _);
            }
        }
    }
}
