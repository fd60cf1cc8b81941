using System.Diagnostics;
using Bramble.Values;

namespace Bramble.Rules;

/// <summary>
/// What local-value computation needs: the game store the values live in, a memo of component
/// values by (ruleset, normal key), a node counter and an optional budget. Not thread-safe, like
/// the store it wraps: one per thread.
/// </summary>
public sealed class ValueContext
{
    private readonly Stopwatch _clock = Stopwatch.StartNew();
    private long _deadlineMs = long.MaxValue;
    private long _nodeCap = long.MaxValue;
    // Whether the store's long computations answer to the budget: from ResetCounters until
    // EndBudget, so that a budget left over from an earlier task never stops later work.
    private bool _watching;

    public ValueContext(GameStore? store = null)
    {
        Store = store ?? new GameStore();
        // The budget holds inside the store's own long computations too (one canonical form
        // can take minutes), not only between the nodes this context counts.
        Store.Interrupt = () => { if (_watching) CheckClock(); };
    }

    public GameStore Store { get; }

    /// <summary>Component values by "ruleset:normal key"; a database file loads into and saves from this.</summary>
    public Dictionary<string, Game> Memo { get; } = new(StringComparer.Ordinal);

    /// <summary>Search nodes visited since the context was made (or <see cref="ResetCounters"/>).</summary>
    public long Nodes { get; private set; }

    public CancellationToken Cancellation { get; set; }

    /// <summary>Restarts the node count and the clock, and sets a budget (null: unlimited).</summary>
    public void ResetCounters(long? budgetMs = null, long? nodeCap = null)
    {
        Nodes = 0;
        _clock.Restart();
        _deadlineMs = budgetMs ?? long.MaxValue;
        _nodeCap = nodeCap ?? long.MaxValue;
        _watching = true;
    }

    /// <summary>
    /// Ends the budget's hold on the store's own computations (the node count and the clock stay
    /// readable): work done next with this context's store, outside any budgeted task, is not cut short.
    /// </summary>
    public void EndBudget() => _watching = false;

    public long ElapsedMs => _clock.ElapsedMilliseconds;

    /// <summary>Counts one node and throws <see cref="BudgetExceededException"/> once the budget is spent.</summary>
    public void Tick()
    {
        Nodes++;
        if (Nodes > _nodeCap) throw new BudgetExceededException("node cap reached");
        if ((Nodes & 63) == 0) CheckClock();
    }

    /// <summary>Throws <see cref="BudgetExceededException"/> when the time budget is spent or the work was cancelled.</summary>
    public void CheckClock()
    {
        if (_clock.ElapsedMilliseconds > _deadlineMs || Cancellation.IsCancellationRequested)
            throw new BudgetExceededException("time budget spent");
    }

    public bool TryGetMemo(IRuleset ruleset, string key, out Game value) => Memo.TryGetValue(ruleset.Name + ":" + key, out value);
    public void SetMemo(IRuleset ruleset, string key, Game value) => Memo[ruleset.Name + ":" + key] = value;
}
