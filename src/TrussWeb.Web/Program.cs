using System.Security.Claims;
using Microsoft.AspNetCore.Components.Authorization;
using Microsoft.AspNetCore.Identity;
using Microsoft.EntityFrameworkCore;
using MudBlazor.Services;
using TrussWeb.Web;
using TrussWeb.Data;
using TrussWeb.Data.Entities;
using TrussWeb.Services.Contracts;
using TrussWeb.Services.Hosting;
using TrussWeb.Web.Components;
using TrussWeb.Web.Hosting;

// "--demo" is a switch without a value: keep it away from the command-line configuration provider,
// which would otherwise take the next argument as its value.
var builder = WebApplication.CreateBuilder(args.Where(a => a != "--demo").ToArray());
if (AdminCommands.IsVerb(args))
{
    builder.Logging.SetMinimumLevel(LogLevel.Warning);
}

builder.Services.AddRazorComponents()
    .AddInteractiveServerComponents();
builder.Services.AddMudServices();
builder.Services.AddTrussWebCatalogue(builder.Configuration);

builder.Services.AddHttpContextAccessor();
builder.Services.AddScoped<SignedInCaller>();
builder.Services.AddScoped<ICallerContext>(sp => sp.GetRequiredService<SignedInCaller>());
builder.Services.AddScoped<ICurrentUser>(sp => sp.GetRequiredService<SignedInCaller>());
builder.Services.AddTrussWebData(builder.Configuration, builder.Environment.ContentRootPath);
builder.Services.AddTrussWebServices(builder.Configuration);
new IdentityBuilder(typeof(AppUser), typeof(IdentityRole), builder.Services).AddSignInManager();
builder.Services.AddAuthentication(IdentityConstants.ApplicationScheme).AddIdentityCookies();
builder.Services.AddAuthorization();
builder.Services.AddCascadingAuthenticationState();
builder.AddTrussWebDeployment();

var app = builder.Build();

// Admin verbs (migrate, create-user, reset-password, backup, restore) run instead of the web host.
if (AdminCommands.IsVerb(args))
{
    return await AdminCommands.RunAsync(args, app.Services, Console.Out, Console.Error);
}

await TrussWebStartup.InitialiseAsync(app.Services, TrussWebStartupOptions.From(builder.Configuration, args, builder.Environment.ContentRootPath));

app.UseTrussWebDeployment();
if (!app.Environment.IsDevelopment())
{
    app.UseExceptionHandler("/Error", createScopeForErrors: true);
}

app.UseStatusCodePagesWithReExecute("/not-found", createScopeForStatusCodePages: true);
app.UseAuthentication();
app.UseAuthorization();
app.UseAntiforgery();

app.MapStaticAssets();
app.MapRazorComponents<App>()
    .AddInteractiveServerRenderMode();

app.Lifetime.ApplicationStarted.Register(() =>
{
    foreach (var url in app.Urls)
    {
        Console.WriteLine($"TrussWeb is listening on {url}");
    }
});

await app.RunAsync();
return 0;

/// <summary>Entry point type, public for WebApplicationFactory in tests.</summary>
public partial class Program;

/// <summary>
/// The signed-in user for services (<see cref="ICallerContext"/>) and for the audit stamps
/// (<see cref="ICurrentUser"/>): the HTTP request's user, else the Blazor circuit's authentication state.
/// </summary>
internal sealed class SignedInCaller(IHttpContextAccessor http, IServiceProvider services) : ICallerContext, ICurrentUser
{
    private ClaimsPrincipal Principal
    {
        get
        {
            if (http.HttpContext?.User is { Identity.IsAuthenticated: true } user)
            {
                return user;
            }

            var state = services.GetService<AuthenticationStateProvider>();
            try
            {
                var task = state?.GetAuthenticationStateAsync();
                return task is { IsCompletedSuccessfully: true } ? task.Result.User : new ClaimsPrincipal();
            }
            catch (InvalidOperationException)
            {
                return new ClaimsPrincipal();
            }
        }
    }

    public string? UserId => Principal.Identity?.IsAuthenticated == true ? Principal.FindFirstValue(ClaimTypes.NameIdentifier) : null;

    public string DisplayName => Principal.Identity?.Name ?? "anonymous";

    public IReadOnlySet<string> Roles => Principal.FindAll(ClaimTypes.Role).Select(c => c.Value).ToHashSet(StringComparer.Ordinal);
}
