using TrussWeb.Services.Contracts;

namespace TrussWeb.Web.Tests.Fakes;

public sealed class FakeCaller(string userId, string name, params string[] roles) : ICallerContext
{
    public string? UserId { get; } = userId;

    public string DisplayName { get; } = name;

    public IReadOnlySet<string> Roles { get; } = roles.ToHashSet(StringComparer.Ordinal);
}
