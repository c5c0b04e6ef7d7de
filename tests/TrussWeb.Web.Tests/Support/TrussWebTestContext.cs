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
    }

    Task IAsyncLifetime.InitializeAsync() => Task.CompletedTask;

    // MudBlazor registers services that only dispose asynchronously.
    Task IAsyncLifetime.DisposeAsync() => DisposeAsync().AsTask();

    /// <summary>Text content of every element matching a selector, trimmed.</summary>
    protected static List<string> Texts<T>(IRenderedComponent<T> cut, string selector) where T : Microsoft.AspNetCore.Components.IComponent =>
        cut.FindAll(selector).Select(e => e.TextContent.Trim()).ToList();
}
