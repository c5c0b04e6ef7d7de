namespace TrussWeb.Data.Tests.Support;

/// <summary>A settable current user: tests switch it between saves to act as different people.</summary>
public sealed class TestUser : ICurrentUser
{
    public string? UserId { get; set; }
}
