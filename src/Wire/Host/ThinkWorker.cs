using System.Collections.Concurrent;
using Bramble.Values;

namespace Bramble.Wire;

/// <summary>
/// The thread players think on: one long-lived thread with the big stack (players recurse as deep
/// as the game tree), reused from move to move rather than started per <c>think</c>. When a player
/// has to be abandoned, the host retires the worker with it and starts a new one; the old thread
/// ends once the stuck player returns.
/// </summary>
internal sealed class ThinkWorker : IDisposable
{
    private readonly BlockingCollection<Action> _jobs = new();

    public ThinkWorker()
    {
        var thread = new Thread(Work, BigStack.DefaultBytes) { IsBackground = true, Name = "think" };
        thread.Start();
    }

    public void Run(Action job) => _jobs.Add(job);

    private void Work()
    {
        foreach (var job in _jobs.GetConsumingEnumerable()) job();
    }

    /// <summary>No more jobs; the thread ends after the current one.</summary>
    public void Dispose() => _jobs.CompleteAdding();
}
