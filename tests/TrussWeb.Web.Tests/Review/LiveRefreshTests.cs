using TrussWeb.Web.Components.Review;

namespace TrussWeb.Web.Tests.Review;

public class LiveRefreshTests
{
    private static readonly AsyncLocal<string?> RequestUser = new();

    [Fact]
    public async Task The_refresh_does_not_see_the_publishers_execution_context()
    {
        // Stands for the publisher's HttpContext (IHttpContextAccessor keeps it in an AsyncLocal): it must not reach the other page.
        RequestUser.Value = "the designer who published";
        var seen = new TaskCompletionSource<string?>(TaskCreationOptions.RunContinuationsAsynchronously);

        LiveRefresh.Dispatch(refresh => refresh(), () =>
        {
            seen.SetResult(RequestUser.Value);
            return Task.CompletedTask;
        });

        Assert.Null(await seen.Task.WaitAsync(TimeSpan.FromSeconds(10)));
        Assert.Equal("the designer who published", RequestUser.Value);
    }

    [Fact]
    public async Task A_closed_page_is_ignored()
    {
        var called = new TaskCompletionSource(TaskCreationOptions.RunContinuationsAsynchronously);

        LiveRefresh.Dispatch(_ =>
        {
            called.SetResult();
            throw new ObjectDisposedException("circuit");
        }, () => Task.CompletedTask);

        await called.Task.WaitAsync(TimeSpan.FromSeconds(10));
    }
}
