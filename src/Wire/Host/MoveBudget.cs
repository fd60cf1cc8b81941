namespace Bramble.Wire;

/// <summary>
/// Turns <c>think … clock=&lt;ms&gt; inc=&lt;ms&gt;</c> into a thinking budget for one move, so the
/// engine never loses on time in a normal match. The rule (also in docs/protocol.md):
/// <code>
/// reserve   = 50 ms + clock / 20                 pipe and process latency, and a margin for error
/// usable    = clock − reserve                    (negative when the clock is nearly gone)
/// moves     = clamp(⌈size / 2⌉, 4, 30)           moves this side may still have to make
/// share     = max(0, usable) / moves + inc · 3/4
/// budget    = min(budget-ms, share, usable + inc / 2), at least 1 ms
/// </code>
/// Every move of a combinatorial game removes material (an edge, two cells, a term's option), so a
/// side rarely has more than half the position's size left to play; counting at least 4 moves keeps
/// the first moves from spending the whole clock when the estimate is too low, and since each move
/// spends at most a quarter of what is usable, the clock decays geometrically. Near the end of the
/// clock the last cap keeps half of each increment back, so a clock that lives on its increment
/// settles a little below the reserve instead of running out, as long as the latency of one move
/// stays under half the increment.
/// Without <c>clock=</c> the budget is simply the <c>budget-ms</c> setting.
/// </summary>
public static class MoveBudget
{
    public const long ReserveMs = 50;
    public const int FewestMoves = 4;
    public const int MostMoves = 30;

    /// <summary>
    /// The time limit of a player limited by nodes: the whole clock but the reserve (or the
    /// <c>budget-ms</c> setting without a clock). It exists so that a node limit set too high for
    /// the clock costs a weak move rather than a game on time; a move that reaches it may differ
    /// from run to run.
    /// </summary>
    public static TimeSpan SafetyNet(long? clockMs, long budgetMs) =>
        TimeSpan.FromMilliseconds(Math.Max(1, clockMs is { } clock ? clock - ReserveMs - clock / 20 : budgetMs));

    public static TimeSpan For(long? clockMs, long? incMs, long budgetMs, int positionSize)
    {
        if (clockMs is not { } clock) return TimeSpan.FromMilliseconds(Math.Max(1, budgetMs));
        var inc = incMs ?? 0;
        var usable = clock - ReserveMs - clock / 20;
        var moves = Math.Clamp((positionSize + 1) / 2, FewestMoves, MostMoves);
        var share = Math.Max(0, usable) / moves + inc * 3 / 4;
        var budget = Math.Min(Math.Min(budgetMs, share), usable + inc / 2);
        return TimeSpan.FromMilliseconds(Math.Max(1, budget));
    }
}
