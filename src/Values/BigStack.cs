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

    public static void Run(Action work, int stackBytes = DefaultBytes) => Run<bool>(() => { work(); return true; }, stackBytes);
}
