using System.Diagnostics;
using Bramble.Arena.Journal;
using Bramble.Rules;
using Bramble.Values;
using Serilog;

namespace Bramble.Arena.Games;

/// <summary>What exact analysis says about a finished game.</summary>
/// <param name="Theory">Who wins the start position with perfect play, given who moves first; null when out of budget.</param>
/// <param name="Analysed">How many plies, from the first, analysis could judge.</param>
public sealed record GameReview(Side? Theory, IReadOnlyList<Blunder> Blunders, int Analysed);

/// <summary>
/// Exact analysis for the referee, in-process and within a budget: the canonical value v of a
/// position (the ruleset's exact value, memoised by component) tells who wins with a given side to
/// move — the winner moving first for the outcome class of v. Running out of budget means "not
/// known", never a guess. One analyst per game worker: the value store behind it is not
/// thread-safe, and keeping it from game to game lets the memo of component values pay off.
/// A cancel (the match is stopping) ends any analysis in progress at once, as "not known".
/// </summary>
/// <param name="newContext">Makes the value contexts (a database may be loaded into them); null: empty ones.</param>
public sealed class Analyst(ILogger log, CancellationToken cancel = default, Func<ValueContext>? newContext = null)
{
    private const int StoreLimit = 2_000_000;
    private readonly Func<ValueContext> _newContext = newContext ?? (() => new ValueContext());
    private ValueContext? _context;

    /// <summary>The context analysis runs in now (its memo holds the component values learnt).</summary>
    public ValueContext Context => _context ??= _newContext();
    private readonly HashSet<string> _warned = new(StringComparer.Ordinal);

    /// <summary>The winner of <paramref name="position"/> with <paramref name="mover"/> to move, or null when not known within the budget.</summary>
    public Side? Winner(IPosition position, Side mover, long budgetMs) =>
        Budgeted(position, budgetMs, v => Context.Store.OutcomeOf(v).WinnerMovingFirst(mover));

    /// <summary>
    /// For <c>adjudicate: numbers</c>: when every component is a number the sum x is a number, and
    /// the game is over in all but name (x &gt; 0 Left wins, x &lt; 0 Right, x = 0 the side not to move).
    /// Null when some component is not a number or the budget ran out.
    /// </summary>
    public Side? NumbersWinner(IPosition position, Side mover, long budgetMs)
    {
        var clock = Stopwatch.StartNew();
        foreach (var component in position.Components())
        {
            if (Budgeted(component, budgetMs - clock.ElapsedMilliseconds, v => Context.Store.IsNumber(v)) != true) return null;
        }
        return Winner(position, mover, budgetMs - clock.ElapsedMilliseconds);
    }

    /// <summary>
    /// Theory and blunders for the positions of a game (start position first, one more after each
    /// move, movers alternating from <paramref name="first"/>): the mover at ply k blundered when it
    /// could win the position before its move and cannot win the one after. Plies are judged from
    /// the first on until the budget (for the whole game) runs out.
    /// With <paramref name="nodes"/> the budget is that many nodes instead of time, and the game is
    /// analysed in a fresh value context, so that what is judged depends on the game alone — not
    /// on the machine, its load, or the games this analyst saw before (a reproducible match).
    /// </summary>
    public GameReview Review(IReadOnlyList<IPosition> positions, Side first, string left, string right, long budgetMs, long? nodes = null)
    {
        if ((nodes is null && budgetMs <= 0) || positions.Count == 0) return new GameReview(null, [], 0);
        var clock = Stopwatch.StartNew();
        var winners = new List<Side>();
        var mover = first;
        var kept = _context;
        if (nodes is not null) _context = _newContext();
        try
        {
            long used = 0;
            foreach (var position in positions)
            {
                var side = mover;
                var winner = nodes is { } cap
                    ? Budgeted(position, long.MaxValue, v => Context.Store.OutcomeOf(v).WinnerMovingFirst(side), cap - used)
                    : Winner(position, mover, budgetMs - clock.ElapsedMilliseconds);
                if (nodes is not null) used += Context.Nodes;
                if (winner is not { } w) break;
                winners.Add(w);
                mover = mover.Other();
            }
        }
        finally
        {
            if (nodes is not null) _context = kept;
        }
        if (winners.Count == 0) return new GameReview(null, [], 0);
        var blunders = new List<Blunder>();
        mover = first;
        for (var ply = 1; ply < winners.Count; ply++)
        {
            if (winners[ply - 1] == mover && winners[ply] != mover)
                blunders.Add(new Blunder(ply, mover == Side.Left ? left : right));
            mover = mover.Other();
        }
        return new GameReview(winners[0], blunders, winners.Count - 1);
    }

    /// <summary>
    /// <paramref name="read"/> of the position's value, both within the budget: the store's own
    /// long computations (one canonical form of a long mixed stalk takes minutes) answer to it too.
    /// </summary>
    private T? Budgeted<T>(IPosition position, long budgetMs, Func<Game, T> read, long? nodeCap = null) where T : struct
    {
        if (budgetMs <= 0 || nodeCap <= 0 || cancel.IsCancellationRequested) return null;
        if (_context is { } old && old.Store.Count > StoreLimit) _context = null;
        var context = Context;
        context.Cancellation = cancel;
        context.ResetCounters(budgetMs == long.MaxValue ? null : budgetMs, nodeCap);
        try
        {
            return read(position.Ruleset.Value(position, context));
        }
        catch (BudgetExceededException)
        {
            return null;
        }
        catch (Exception e) when (e is not OutOfMemoryException)
        {
            // Analysis is a service to the standings, never a reason to stop a match.
            lock (_warned)
                if (_warned.Add(position.Ruleset.Name + e.GetType().Name))
                    log.Warning("Exact analysis of {Ruleset} positions failed ({Error}); theory and blunders stay unknown for them", position.Ruleset.Name, e.Message);
            return null;
        }
        finally
        {
            context.EndBudget();
        }
    }
}
