namespace TrussWeb.Web.Components.Review;

/// <summary>
/// Runs a component's refresh after a review event. <see cref="TrussWeb.Services.Contracts.IReviewEvents"/> calls handlers on the
/// publishing thread, i.e. inside the circuit of the user who made the change, with that request's execution context (its
/// HttpContext, so its user). The refresh must run as the component's own user: it starts from a clean execution context on the
/// thread pool and then enters the component's dispatcher, where the circuit's authentication state names the right user.
/// </summary>
public static class LiveRefresh
{
    public static void Dispatch(Func<Func<Task>, Task> invokeAsync, Func<Task> refresh)
    {
        ArgumentNullException.ThrowIfNull(invokeAsync);
        using (ExecutionContext.SuppressFlow())
        {
            _ = Task.Run(async () =>
            {
                try
                {
                    await invokeAsync(refresh);
                }
                catch (ObjectDisposedException)
                {
                    // The circuit closed between the event and the refresh: nothing to show.
                }
            });
        }
    }
}
