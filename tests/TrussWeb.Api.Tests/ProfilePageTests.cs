using Bunit;
using Microsoft.EntityFrameworkCore;
using Microsoft.Extensions.DependencyInjection;
using MudBlazor.Services;
using TrussWeb.Api.Tests.Support;
using TrussWeb.Services.Contracts;
using TrussWeb.Services.Hosting;
using TrussWeb.Web.Components.Pages.Account;

namespace TrussWeb.Api.Tests;

/// <summary>The profile page creates a token (shown once, works on the API) and revokes it (401 afterwards), over the real token service and database.</summary>
public sealed class ProfilePageTests(SqliteApp app) : IClassFixture<SqliteApp>
{
    [Fact]
    public async Task A_user_creates_a_token_sees_it_once_and_revokes_it()
    {
        using var scope = app.Services.CreateScope();
        var userId = await app.UserIdAsync(Demo.Checker);
        var service = TrussWeb.Services.Hosting.ServiceCollectionExtensions.TokenServiceFor(scope.ServiceProvider, new FixedCaller(userId, "checker", "Checker"));
        await using var ctx = new BunitContext();
        ctx.JSInterop.Mode = JSRuntimeMode.Loose;
        ctx.Services.AddMudServices();
        ctx.Services.AddSingleton(service);
        ctx.Services.AddSingleton(TimeProvider.System);
        var cut = ctx.Render<ProfilePage>();

        cut.Find("input[data-testid=token-name]").Change("spreadsheet pull");
        await cut.Find("[data-testid=token-create]").ClickAsync(new Microsoft.AspNetCore.Components.Web.MouseEventArgs());
        var token = cut.WaitForElement("[data-testid=token-text]").TextContent.Trim();
        Assert.StartsWith("tw_", token, StringComparison.Ordinal);
        var row = cut.Find("[data-testid=token-row]");
        Assert.Equal(token[..12], row.GetAttribute("data-prefix"));
        Assert.Equal("active", cut.Find("[data-testid=token-state]").TextContent.Trim());
        Assert.DoesNotContain(token[13..], row.TextContent, StringComparison.Ordinal);
        Assert.Equal(System.Net.HttpStatusCode.OK, (await app.WithToken(token).GetAsync("/api/v1/review/queue")).StatusCode);

        await cut.Find("[data-testid=token-revoke]").ClickAsync(new Microsoft.AspNetCore.Components.Web.MouseEventArgs());
        cut.WaitForAssertion(() => Assert.Equal("revoked", cut.Find("[data-testid=token-state]").TextContent.Trim()));
        Assert.Empty(cut.FindAll("[data-testid=token-text]"));
        await (await app.WithToken(token).GetAsync("/api/v1/review/queue")).ProblemAsync(401);
        var stored = await app.WithDbAsync(db => db.ApiTokens.AsNoTracking().SingleAsync(t => t.Prefix == token.Substring(0, 12)));
        Assert.True(stored.IsRevoked);
    }

    [Fact]
    public async Task A_name_that_is_too_long_is_refused_on_the_page_naming_the_limit()
    {
        using var scope = app.Services.CreateScope();
        var userId = await app.UserIdAsync(Demo.Checker);
        await using var ctx = new BunitContext();
        ctx.JSInterop.Mode = JSRuntimeMode.Loose;
        ctx.Services.AddMudServices();
        ctx.Services.AddSingleton(TrussWeb.Services.Hosting.ServiceCollectionExtensions.TokenServiceFor(scope.ServiceProvider, new FixedCaller(userId, "checker", "Checker")));
        ctx.Services.AddSingleton(TimeProvider.System);
        var cut = ctx.Render<ProfilePage>();
        await cut.Find("[data-testid=token-create]").ClickAsync(new Microsoft.AspNetCore.Components.Web.MouseEventArgs());
        cut.WaitForAssertion(() => Assert.Contains("1 to 100 characters", cut.Find("[data-testid=token-message]").TextContent, StringComparison.Ordinal));
        Assert.Empty(cut.FindAll("[data-testid=token-text]"));
    }
}
