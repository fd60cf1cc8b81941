using System.Diagnostics;
using Bramble.Rules;

namespace Bramble.Search;

/// <summary>
/// The time, node and halt limits of one decision, and the count of nodes spent on it. Every
/// search of a player ticks the same budget, so the node figure a player reports covers local
/// values, the global decision and the search of large components alike.
/// </summary>
public sealed class SearchBudget
{
    private readonly Stopwatch _clock = Stopwatch.StartNew();
    private readonly long _deadlineMs;
    private readonly long _nodeCap;
    private readonly CancellationToken _halt;

    public SearchBudget(TimeSpan time, CancellationToken halt = default, long nodeCap = long.MaxValue)
    {
        _deadlineMs = Milliseconds(time);
        _nodeCap = nodeCap;
        _halt = halt;
    }

    /// <summary>A time budget in whole milliseconds; <see cref="long.MaxValue"/> for an infinite one.</summary>
    public static long Milliseconds(TimeSpan time) =>
        time == Timeout.InfiniteTimeSpan || time.TotalMilliseconds >= long.MaxValue / 2 ? long.MaxValue : (long)Math.Max(0, time.TotalMilliseconds);

    /// <summary>No limit but the halt token: for tests and exhaustive analysis.</summary>
    public static SearchBudget Unlimited(CancellationToken halt = default) => new(Timeout.InfiniteTimeSpan, halt);

    public long Nodes { get; private set; }
    public long ElapsedMs => _clock.ElapsedMilliseconds;
    public CancellationToken Halt => _halt;

    public long RemainingMs => _deadlineMs == long.MaxValue ? long.MaxValue : Math.Max(0, _deadlineMs - _clock.ElapsedMilliseconds);

    public bool NodeCapReached => Nodes >= _nodeCap;

    /// <summary>True once the time is spent, the halt token fired or the node cap was reached.</summary>
    public bool Spent => NodeCapReached || _halt.IsCancellationRequested || _clock.ElapsedMilliseconds > _deadlineMs;

    /// <summary>Counts one node; throws <see cref="BudgetExceededException"/> once the budget is spent.</summary>
    public void Tick()
    {
        Nodes++;
        if (Nodes > _nodeCap) throw new BudgetExceededException("node cap reached");
        // The clock is read every 256 nodes: often enough to stop within a millisecond or so, rarely enough to cost nothing.
        if ((Nodes & 255) == 0) ThrowIfSpent();
    }

    /// <summary>Adds nodes counted elsewhere (a <see cref="ValueContext"/>'s local-value search).</summary>
    public void Add(long nodes) => Nodes += nodes;

    public void ThrowIfSpent()
    {
        if (_halt.IsCancellationRequested) throw new BudgetExceededException("halted");
        if (_clock.ElapsedMilliseconds > _deadlineMs) throw new BudgetExceededException("time budget spent");
        if (Nodes > _nodeCap) throw new BudgetExceededException("node cap reached");
    }
}
