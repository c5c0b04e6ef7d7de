using Microsoft.AspNetCore.DataProtection;
using Microsoft.AspNetCore.Identity;
using Microsoft.EntityFrameworkCore;
using Microsoft.Extensions.Configuration;
using Microsoft.Extensions.DependencyInjection;
using Microsoft.Extensions.DependencyInjection.Extensions;
using TrussWeb.Data;
using TrussWeb.Data.Entities;
using TrussWeb.Services.Authorization;
using TrussWeb.Services.Catalogue;
using TrussWeb.Services.Common;
using TrussWeb.Services.Contracts;
using TrussWeb.Services.Design;
using TrussWeb.Services.Exports;
using TrussWeb.Services.Projects;
using TrussWeb.Services.Review;
using TrussWeb.Services.Tokens;
using TrussWeb.Services.Trusses;
using TrussWeb.Services.Users;

namespace TrussWeb.Services.Hosting;

/// <summary>Registers the use-case services, Identity (users, roles, password and lockout rules) and data protection.</summary>
public static class ServiceCollectionExtensions
{
    /// <summary>Minimum password length.</summary>
    public const int PasswordLength = 10;

    /// <summary>Failed sign-ins before a lockout.</summary>
    public const int MaxFailedAccessAttempts = 5;

    /// <summary>Length of a lockout.</summary>
    public static readonly TimeSpan LockoutDuration = TimeSpan.FromMinutes(15);

    /// <summary>
    /// Call after <c>AddTrussWebData</c>. The host registers a scoped <see cref="ICallerContext"/>
    /// (the signed-in user) and <see cref="ICurrentUser"/>; until then every call is refused
    /// (<see cref="AnonymousCaller"/>). Web adds the sign-in manager and cookies on the returned Identity setup.
    /// </summary>
    public static IServiceCollection AddTrussWebServices(this IServiceCollection services, IConfiguration configuration)
    {
        ArgumentNullException.ThrowIfNull(services);
        ArgumentNullException.ThrowIfNull(configuration);
        services.TryAddSingleton(TimeProvider.System);
        services.TryAddScoped<ICallerContext, AnonymousCaller>();
        services.AddScoped<Authorizer>();
        services.AddScoped<TrussUnitOfWork>();
        services.AddScoped<IProjectService, ProjectService>();
        services.AddScoped<ITrussService, TrussService>();
        services.AddScoped<IDesignService, DesignService>();
        services.AddScoped<ICatalogueService, CatalogueService>();
        services.AddScoped<IUserAdminService, UserAdminService>();
        services.AddScoped<IReviewService, ReviewService>();
        services.AddScoped<IApiTokenService, ApiTokenService>();
        services.AddScoped<ApiTokenAuthenticator>();
        services.TryAddSingleton<ApiTokenCache>();
        services.TryAddSingleton<IReviewEvents, ReviewEvents>();
        services.TryAddSingleton(_ => ExportOptions.From(configuration, configuration["contentRoot"] ?? Directory.GetCurrentDirectory()));
        services.TryAddSingleton<IExportRenderer, ReportRenderer>();
        services.TryAddSingleton<ExportJobRunner>();
        services.TryAddSingleton<IExportEvents>(sp => sp.GetRequiredService<ExportJobRunner>());
        services.AddHostedService(sp => sp.GetRequiredService<ExportJobRunner>());
        services.AddScoped<IExportService, ExportService>();

        services.AddDataProtection().SetApplicationName("TrussWeb").PersistKeysToDbContext<TrussWebDbContext>();
        services.AddIdentityCore<AppUser>(ConfigureIdentity)
            .AddRoles<IdentityRole>()
            .AddEntityFrameworkStores<TrussWebDbContext>()
            .AddDefaultTokenProviders();
        return services;
    }

    /// <summary>Password and lockout rules: at least 10 characters with a digit; 5 failed attempts lock for 15 minutes.</summary>
    public static void ConfigureIdentity(IdentityOptions options)
    {
        ArgumentNullException.ThrowIfNull(options);
        options.Password.RequiredLength = PasswordLength;
        options.Password.RequireDigit = true;
        options.Password.RequireLowercase = false;
        options.Password.RequireUppercase = false;
        options.Password.RequireNonAlphanumeric = false;
        options.Lockout.AllowedForNewUsers = true;
        options.Lockout.MaxFailedAccessAttempts = MaxFailedAccessAttempts;
        options.Lockout.DefaultLockoutTimeSpan = LockoutDuration;
        options.User.RequireUniqueEmail = true;
    }

    /// <summary>The six services acting as <paramref name="caller"/> (start-up seeding, command line, tests), over a scope's data services.</summary>
    public static ServiceSet ServicesFor(IServiceProvider scope, ICallerContext caller)
    {
        ArgumentNullException.ThrowIfNull(scope);
        var factory = scope.GetRequiredService<IDbContextFactory<TrussWebDbContext>>();
        var clock = scope.GetRequiredService<TimeProvider>();
        var authorizer = new Authorizer(caller);
        var events = scope.GetService<IReviewEvents>() ?? new ReviewEvents();
        var work = new TrussUnitOfWork(factory, authorizer, clock, events);
        return new ServiceSet(
            new ProjectService(factory, authorizer, clock, events),
            new TrussService(work),
            new DesignService(work),
            new CatalogueService(factory, authorizer, clock),
            new UserAdminService(scope.GetRequiredService<UserManager<AppUser>>(), factory, authorizer, clock),
            new ReviewService(factory, authorizer, clock, events),
            scope.GetService<ExportJobRunner>() is { } runner
                ? new ExportService(factory, authorizer, runner, new ReviewService(factory, authorizer, clock, events))
                : null);
    }

    /// <summary>The access-token service acting as <paramref name="caller"/> (command line, tests).</summary>
    public static IApiTokenService TokenServiceFor(IServiceProvider scope, ICallerContext caller)
    {
        ArgumentNullException.ThrowIfNull(scope);
        return new ApiTokenService(scope.GetRequiredService<IDbContextFactory<TrussWebDbContext>>(), new Authorizer(caller), scope.GetRequiredService<TimeProvider>(),
            scope.GetService<ApiTokenCache>() ?? new ApiTokenCache());
    }
}

/// <summary>The service interfaces bound to one caller (Exports is null where no export runner is registered).</summary>
public sealed record ServiceSet(IProjectService Projects, ITrussService Trusses, IDesignService Design, ICatalogueService Catalogue, IUserAdminService Users,
    IReviewService Review, IExportService? Exports = null);
