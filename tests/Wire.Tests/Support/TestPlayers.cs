using System.Collections.Concurrent;
using Bramble.Rules;
using Bramble.Search;
using Bramble.Values;

namespace Bramble.Wire.Tests;

/// <summary>Thinks until halted (or its budget is spent), then plays its side's first move. Records the budgets it was given.</summary>
public sealed class PatientPlayer : IPlayer
{
    public ConcurrentQueue<TimeSpan> Budgets { get; } = new();
    public ManualResetEventSlim Started { get; } = new();
    public ManualResetEventSlim Returned { get; } = new();
    public volatile bool HaltedOnEntry;

    public string Name => "patient";

    public Decision Choose(IPosition position, Side side, TimeSpan budget, CancellationToken halt = default)
    {
        Budgets.Enqueue(budget);
        HaltedOnEntry = halt.IsCancellationRequested;
        Started.Set();
        halt.WaitHandle.WaitOne(budget);
        Returned.Set();
        var moves = position.Moves(side);
        return new Decision(moves.Count > 0 ? moves[0] : null, Nodes: 7, ElapsedMs: 0, Exact: false, Value: "1/2 + ↑*", Line: ["1.1", "2.1"]);
    }
}

/// <summary>Ignores both its budget and halt until the test lets it go: the host must answer for it.</summary>
public sealed class StubbornPlayer : IPlayer
{
    public ManualResetEventSlim Release { get; } = new();
    public int Calls;

    public string Name => "stubborn";

    public Decision Choose(IPosition position, Side side, TimeSpan budget, CancellationToken halt = default)
    {
        Interlocked.Increment(ref Calls);
        Release.Wait(TimeSpan.FromSeconds(30));
        return new Decision(position.Moves(side).LastOrDefault(), 0, 0, false);
    }
}

/// <summary>Answers with a move that is not legal.</summary>
public sealed class LiarPlayer : IPlayer
{
    public string Name => "liar";

    public Decision Choose(IPosition position, Side side, TimeSpan budget, CancellationToken halt = default) =>
        new(new Move(99, 99), 0, 0, false);
}

/// <summary>Throws.</summary>
public sealed class CrashingPlayer : IPlayer
{
    public string Name => "crashing";

    public Decision Choose(IPosition position, Side side, TimeSpan budget, CancellationToken halt = default) =>
        throw new InvalidOperationException("the crashing player crashed, as it does");
}
