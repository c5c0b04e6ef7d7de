using TrussWeb.Services.Contracts;
using TrussWeb.Services.Review;

namespace TrussWeb.Services.Tests;

public sealed class ReviewEventsTests
{
    private static ReviewEvent EventFor(Guid project) =>
        new(project, Guid.NewGuid(), Guid.NewGuid(), "TC1", MemberReviewState.AwaitingCheck, MemberReviewState.Approved, "ReviewApprove", "u1", DateTime.UnixEpoch);

    [Fact]
    public void Subscribers_get_only_their_project_and_nothing_after_disposing()
    {
        var hub = new ReviewEvents();
        var a = Guid.NewGuid();
        var b = Guid.NewGuid();
        var gotA = new List<ReviewEvent>();
        var gotB = new List<ReviewEvent>();
        var subA = hub.Subscribe(a, gotA.Add);
        using var subB = hub.Subscribe(b, gotB.Add);

        var first = EventFor(a);
        hub.Publish(first);
        subA.Dispose();
        subA.Dispose();
        hub.Publish(EventFor(a));

        Assert.Equal([first], gotA);
        Assert.Empty(gotB);
    }

    [Fact]
    public void A_throwing_subscriber_does_not_stop_the_others()
    {
        var hub = new ReviewEvents();
        var project = Guid.NewGuid();
        var got = 0;
        using var bad = hub.Subscribe(project, _ => throw new InvalidOperationException("circuit gone"));
        using var good = hub.Subscribe(project, _ => got++);

        hub.Publish(EventFor(project));

        Assert.Equal(1, got);
        Assert.Equal(1, hub.HandlerFailures);
    }
}
