using System.Collections.Concurrent;
using System.Collections.Immutable;
using TrussWeb.Services.Contracts;

namespace TrussWeb.Services.Review;

/// <summary>
/// The in-process hub behind <see cref="IReviewEvents"/> (register as a singleton). Subscribers are kept per
/// project; a handler that throws does not stop delivery to the others (it is counted in
/// <see cref="HandlerFailures"/>). Crossing app instances needs a backplane (see docs/dev/review.md).
/// </summary>
public sealed class ReviewEvents : IReviewEvents
{
    private readonly ConcurrentDictionary<Guid, ImmutableList<Action<ReviewEvent>>> handlers = new();
    private long failures;

    /// <summary>How many handler calls have thrown since start (the publisher is never interrupted by a page's error).</summary>
    public long HandlerFailures => Interlocked.Read(ref failures);

    public IDisposable Subscribe(Guid projectId, Action<ReviewEvent> handler)
    {
        ArgumentNullException.ThrowIfNull(handler);
        handlers.AddOrUpdate(projectId, _ => [handler], (_, list) => list.Add(handler));
        return new Subscription(() => handlers.AddOrUpdate(projectId, _ => [], (_, list) => list.Remove(handler)));
    }

    public void Publish(ReviewEvent reviewEvent)
    {
        ArgumentNullException.ThrowIfNull(reviewEvent);
        if (!handlers.TryGetValue(reviewEvent.ProjectId, out var list))
        {
            return;
        }

        foreach (var handler in list)
        {
            try
            {
                handler(reviewEvent);
            }
#pragma warning disable CA1031 // A subscriber's failure (e.g. a closed circuit) must not undo or interrupt a committed review change.
            catch (Exception)
#pragma warning restore CA1031
            {
                Interlocked.Increment(ref failures);
            }
        }
    }

    private sealed class Subscription(Action remove) : IDisposable
    {
        private Action? remove = remove;

        public void Dispose() => Interlocked.Exchange(ref remove, null)?.Invoke();
    }
}
