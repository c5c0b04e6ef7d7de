using TrussWeb.Services.Tokens;

namespace TrussWeb.Api.Tests;

/// <summary>The memory of valid token checks: ends after its lifetime, at the token's expiry, and on revocation.</summary>
public sealed class ApiTokenCacheTests
{
    private static readonly DateTime Now = new(2026, 12, 2, 1, 0, 0, DateTimeKind.Utc);

    private static ApiTokenIdentity Identity(Guid id) => new(id, "tw_abcdefghi", "user", "User", ["Designer"], "read");

    [Fact]
    public void A_check_is_reused_within_its_lifetime_and_not_after()
    {
        var cache = new ApiTokenCache();
        var id = Guid.NewGuid();
        cache.Set("h", Identity(id), Now.AddDays(1), Now);
        Assert.True(cache.TryGet("h", Now + ApiTokenCache.Lifetime - TimeSpan.FromMilliseconds(1), out var hit));
        Assert.Equal(id, hit!.TokenId);
        Assert.False(cache.TryGet("h", Now + ApiTokenCache.Lifetime, out _));
    }

    [Fact]
    public void A_token_that_expires_while_remembered_is_not_reused()
    {
        var cache = new ApiTokenCache();
        cache.Set("h", Identity(Guid.NewGuid()), Now.AddSeconds(2), Now);
        Assert.True(cache.TryGet("h", Now.AddSeconds(1), out _));
        Assert.False(cache.TryGet("h", Now.AddSeconds(2), out _));
    }

    [Fact]
    public void Forgetting_a_token_drops_its_check()
    {
        var cache = new ApiTokenCache();
        var id = Guid.NewGuid();
        cache.Set("h", Identity(id), Now.AddDays(1), Now);
        cache.Set("other", Identity(Guid.NewGuid()), Now.AddDays(1), Now);
        cache.Forget(id);
        Assert.False(cache.TryGet("h", Now, out _));
        Assert.True(cache.TryGet("other", Now, out _));
    }
}
