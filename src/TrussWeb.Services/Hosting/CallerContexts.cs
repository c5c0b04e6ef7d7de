using TrussWeb.Data;
using TrussWeb.Services.Contracts;

namespace TrussWeb.Services.Hosting;

/// <summary>Nobody signed in: every call is refused. The default until the host registers its own.</summary>
public sealed class AnonymousCaller : ICallerContext
{
    public string? UserId => null;

    public string DisplayName => "anonymous";

    public IReadOnlySet<string> Roles { get; } = new HashSet<string>();
}

/// <summary>A fixed caller: start-up seeding (as an administrator), command-line verbs and tests.</summary>
public sealed class FixedCaller(string? userId, string displayName, params string[] roles) : ICallerContext, ICurrentUser
{
    public string? UserId { get; set; } = userId;

    public string DisplayName { get; set; } = displayName;

    public IReadOnlySet<string> Roles { get; set; } = roles.ToHashSet(StringComparer.Ordinal);

    /// <summary>The system acting as administrator (start-up); audit rows and stamps carry no user (null).</summary>
    public static FixedCaller System() => new("system", "TrussWeb start-up", TrussWeb.Data.Roles.Administrator) { StampAsSystem = true };

    /// <summary>When true, <see cref="ICurrentUser.UserId"/> is null (rows stamped as written by the system).</summary>
    public bool StampAsSystem { get; init; }

    string? ICurrentUser.UserId => StampAsSystem ? null : UserId;
}
