namespace Bramble.Values;

/// <summary>
/// Runs deep recursive work (canonical forms of big games recurse as deep as the game tree) on a
/// thread with a large stack, so a 10^5-edge position does not overflow the default 1 MiB one.
/// </summary>
public static class BigStack
{
    public const int DefaultBytes = 512 * 1024 * 1024;

    public static T Run<T>(Func<T> work, int stackBytes = DefaultBytes)
    {
        T result = default!;
        Exception? failure = null;
        var thread = new Thread(() =>
        {
            try { result = work(); }
            catch (Exception e) { failure = e; }
        }, stackBytes);
        thread.Start();
        thread.Join();
        if (failure is not null) System.Runtime.ExceptionServices.ExceptionDispatchInfo.Capture(failure).Throw();
        return result;
    }

    /// <summary>
    /// Like <see cref="Run{T}"/>, but waits at most <paramref name="wait"/>: false when the work
    /// is not done by then. The work then goes on in a background thread, which does not keep the
    /// process alive; the caller should also have asked it to stop (a deadline or a token).
    /// </summary>
    public static bool TryRun<T>(Func<T> work, TimeSpan wait, out T result, int stackBytes = DefaultBytes)
    {
        T value = default!;
        Exception? failure = null;
        var thread = new Thread(() =>
        {
            try { value = work(); }
            catch (Exception e) { failure = e; }
        }, stackBytes) { IsBackground = true };
        thread.Start();
        if (!thread.Join(wait))
        {
            result = default!;
            return false;
        }
        if (failure is not null) System.Runtime.ExceptionServices.ExceptionDispatchInfo.Capture(failure).Throw();
        result = value;
        return true;
    }

    public static void Run(Action work, int stackBytes = DefaultBytes) => Run<bool>(() => { work(); return true; }, stackBytes);
}
