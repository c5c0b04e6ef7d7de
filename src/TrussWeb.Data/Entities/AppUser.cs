using Microsoft.AspNetCore.Identity;

namespace TrussWeb.Data.Entities;

/// <summary>An application user (ASP.NET Core Identity) with the name shown on reports and in audits.</summary>
public class AppUser : IdentityUser
{
    /// <summary>Name shown in the UI, report headers and audit views.</summary>
    public string DisplayName { get; set; } = string.Empty;
}
