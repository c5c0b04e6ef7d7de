namespace TrussWeb.Data;

/// <summary>The default <see cref="ICurrentUser"/>: no signed-in user, stamps are written as null.</summary>
public sealed class SystemCurrentUser : ICurrentUser
{
    /// <inheritdoc />
    public string? UserId => null;
}
