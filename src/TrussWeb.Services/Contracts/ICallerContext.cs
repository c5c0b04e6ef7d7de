namespace TrussWeb.Services.Contracts;

/// <summary>
/// Who is calling a service. Web implements it from the signed-in user (scoped per circuit/request);
/// services ask the authorizer with it on every call.
/// </summary>
public interface ICallerContext
{
    /// <summary>Identity user id; null when nobody is signed in.</summary>
    string? UserId { get; }

    string DisplayName { get; }

    /// <summary>Global (Identity) roles, names from <c>TrussWeb.Data.Roles</c>.</summary>
    IReadOnlySet<string> Roles { get; }

    bool IsAuthenticated => UserId is not null;
}
