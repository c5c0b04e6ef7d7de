using Microsoft.Extensions.DependencyInjection;
using MudBlazor.Services;

namespace TrussWeb.Web.Tests.Support;

/// <summary>bUnit base: MudBlazor services, loose JS interop (MudBlazor and Plotly call JS), and the seed-data catalogue.</summary>
public abstract class TrussWebTestContext : BunitContext, IAsyncLifetime
{
    protected TrussWebTestContext()
    {
        JSInterop.Mode = JSRuntimeMode.Loose;
        Services.AddMudServices();
        Services.AddSingleton(TestData.Catalogue);
        Services.AddSingleton<TrussWeb.Services.Contracts.IReviewService>(Reviews);
        Services.AddSingleton<TrussWeb.Services.Contracts.IReviewEvents>(ReviewHub);
        Services.AddSingleton<TrussWeb.Services.Contracts.IExportService>(Exports);
        Services.AddSingleton<TrussWeb.Services.Contracts.IExportEvents>(Exports);
    }

    /// <summary>The export service every page gets (the project page embeds the export area).</summary>
    protected Fakes.FakeExportService Exports { get; } = new();

    /// <summary>The review service every page and panel gets (pages embed review panels); tests set its reviews.</summary>
    protected Fakes.FakeReviewService Reviews { get; } = new();

    /// <summary>The real in-process event hub: a test publishes on it as the service would after a commit.</summary>
    protected TrussWeb.Services.Review.ReviewEvents ReviewHub { get; } = new();

    Task IAsyncLifetime.InitializeAsync() => Task.CompletedTask;

    // MudBlazor registers services that only dispose asynchronously.
    Task IAsyncLifetime.DisposeAsync() => DisposeAsync().AsTask();

    /// <summary>Text content of every element matching a selector, trimmed.</summary>
    protected static List<string> Texts<T>(IRenderedComponent<T> cut, string selector) where T : Microsoft.AspNetCore.Components.IComponent =>
        cut.FindAll(selector).Select(e => e.TextContent.Trim()).ToList();
}
