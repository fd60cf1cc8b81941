using System.Collections.Concurrent;
using Bramble.Rules;
using Bramble.Values;

namespace Bramble.Web;

/// <summary>
/// Value contexts lent to requests one at a time (a context, like its game store, is not
/// thread-safe). Keeping them between requests keeps their memo of component values, so after a
/// move only the component that changed is worked out again. A context whose store has grown
/// past a limit is dropped rather than returned, which bounds the memory a long session uses.
/// </summary>
public sealed class ContextPool
{
    private const int StoreLimit = 1_000_000;
    private readonly ConcurrentBag<ValueContext> _free = new();

    public ValueContext Rent() => _free.TryTake(out var context) ? context : new ValueContext();

    /// <summary>Lends a context for one request, tied to the request's cancellation, on a thread with a big stack (deep game trees recurse).</summary>
    public T Lend<T>(CancellationToken cancel, Func<ValueContext, T> work)
    {
        var context = Rent();
        context.Cancellation = cancel;
        try
        {
            return BigStack.Run(() => work(context), 64 * 1024 * 1024);
        }
        finally
        {
            Return(context);
        }
    }

    public void Return(ValueContext context)
    {
        context.Cancellation = CancellationToken.None;
        if (context.Store.Count < StoreLimit && _free.Count < 8) _free.Add(context);
    }
}
