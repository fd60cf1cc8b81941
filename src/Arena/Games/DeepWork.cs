namespace Bramble.Arena.Games;

/// <summary>
/// Runs exact analysis on its own thread with a large stack (value computations recurse as deep
/// as the game tree) and hands back a task, so a game worker awaits it instead of blocking a
/// thread-pool thread on <c>BigStack.Run</c>'s join.
/// </summary>
public static class DeepWork
{
    public const int StackBytes = 256 * 1024 * 1024;

    public static Task<T> RunAsync<T>(Func<T> work)
    {
        var done = new TaskCompletionSource<T>(TaskCreationOptions.RunContinuationsAsynchronously);
        var thread = new Thread(() =>
        {
            try { done.SetResult(work()); }
            catch (Exception e) { done.SetException(e); }
        }, StackBytes)
        {
            IsBackground = true,
            Name = "bramble analysis",
        };
        thread.Start();
        return done.Task;
    }
}
