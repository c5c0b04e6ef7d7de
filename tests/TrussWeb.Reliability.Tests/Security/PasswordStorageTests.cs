using Microsoft.AspNetCore.Identity;
using Microsoft.EntityFrameworkCore;
using Microsoft.Extensions.DependencyInjection;
using TrussWeb.Data;
using TrussWeb.Data.Entities;
using TrussWeb.Reliability.Tests.BadInput;
using TrussWeb.Services.Hosting;

namespace TrussWeb.Reliability.Tests.Security;

/// <summary>Passwords are stored only as salted hashes (ASP.NET Core Identity, format version 3), never as text.</summary>
public sealed class PasswordStorageTests(DemoStore store) : IClassFixture<DemoStore>
{
    [Fact]
    public async Task Demo_passwords_are_stored_as_salted_identity_v3_hashes_only()
    {
        await using var scope = store.Host.Services.CreateAsyncScope();
        var factory = scope.ServiceProvider.GetRequiredService<IDbContextFactory<TrussWebDbContext>>();
        var users = scope.ServiceProvider.GetRequiredService<UserManager<AppUser>>();
        await using var db = await factory.CreateDbContextAsync();
        var rows = await db.Users.AsNoTracking().ToListAsync();
        var hashes = new List<string>();
        foreach (var (email, _, _, password) in DemoSeeder.Users)
        {
            var row = rows.Single(u => u.Email == email);
            Assert.False(string.IsNullOrEmpty(row.PasswordHash));
            Assert.DoesNotContain(password, row.PasswordHash, StringComparison.Ordinal);
            var bytes = Convert.FromBase64String(row.PasswordHash!);
            // Source: ASP.NET Core Identity PasswordHasher, format marker 0x01 = version 3 (PBKDF2 with a random salt) (from memory)
            Assert.Equal(0x01, bytes[0]);
            Assert.True(bytes.Length >= 1 + 4 + 4 + 4 + 16 + 32, "marker, PRF, iterations, salt length, salt and subkey");
            Assert.True(await users.CheckPasswordAsync(row, password), "the hash verifies the password");
            hashes.Add(row.PasswordHash!);
        }

        Assert.Equal(hashes.Count, hashes.Distinct().Count());
        // No column of the users table holds a demo password as text.
        var text = string.Join("\n", rows.SelectMany(u => new[] { u.UserName, u.Email, u.DisplayName, u.SecurityStamp, u.ConcurrencyStamp, u.PhoneNumber }));
        Assert.All(DemoSeeder.Users, u => Assert.DoesNotContain(u.Password, text, StringComparison.Ordinal));
    }
}
