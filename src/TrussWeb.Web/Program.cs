using System.Security.Claims;
using Microsoft.AspNetCore.Components.Authorization;
using Microsoft.AspNetCore.Identity;
using Microsoft.EntityFrameworkCore;
using MudBlazor.Services;
using TrussWeb.Web;
using TrussWeb.Web.Api;
using TrussWeb.Data;
using TrussWeb.Data.Entities;
using TrussWeb.Services.Contracts;
using TrussWeb.Services.Hosting;
using TrussWeb.Web.Components;
using TrussWeb.Web.Hosting;
using TrussWeb.Web.Security;

// "--demo" is a switch without a value: keep it away from the command-line configuration provider,
// which would otherwise take the next argument as its value.
var builder = WebApplication.CreateBuilder(args.Where(a => a != "--demo").ToArray());

// Serve the packages' static files (MudBlazor, Plotly) when the app runs from its build output in any
// environment, not only in Development; in a published folder the files are in wwwroot and this is a no-op.
builder.WebHost.UseStaticWebAssets();

// Database commands and per-request framework lines are logged only as warnings unless a configuration asks for more (appsettings.json is
// not read when the app is started from another folder, e.g. the repository root by scripts/start.sh).
builder.Logging.AddFilter("Microsoft.EntityFrameworkCore", LogLevel.Warning);
builder.Logging.AddFilter("Microsoft.AspNetCore", LogLevel.Warning);
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
builder.Services.AddScoped<IUserClaimsPrincipalFactory<AppUser>, DisplayNameClaimsPrincipalFactory>();
builder.Services.ConfigureApplicationCookie(options =>
{
    options.LoginPath = ReturnUrls.SignInPath;
    options.LogoutPath = ReturnUrls.SignOutPath;
    options.AccessDeniedPath = ReturnUrls.DeniedPath;
    options.ReturnUrlParameter = "returnUrl";
});
builder.Services.AddAuthorization();
builder.Services.AddCascadingAuthenticationState();
builder.AddTrussWebDeployment();
builder.AddTrussWebApi();

var app = builder.Build();

// Admin verbs (migrate, create-user, reset-password, backup, restore) run instead of the web host.
if (AdminCommands.IsVerb(args))
{
    return await AdminCommands.RunAsync(args, app.Services, Console.Out, Console.Error);
}

await TrussWebStartup.InitialiseAsync(app.Services, TrussWebStartupOptions.From(builder.Configuration, args, builder.Environment.ContentRootPath));

app.UseTrussWebDeployment();
app.UseTrussWebSecurityHeaders();
if (!app.Environment.IsDevelopment())
{
    app.UseExceptionHandler("/Error", createScopeForErrors: true);
}

app.UseStatusCodePagesWithReExecute("/not-found", createScopeForStatusCodePages: true);
app.UseAuthentication();
app.UseAuthorization();
app.UseAntiforgery();
app.MapTrussWebApi();

app.MapStaticAssets();
app.MapSignOut();
app.MapExportDownloads();
TrussWeb.Web.Components.Review.AuditCsvEndpoint.MapAuditCsv(app);
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

