using Bramble.Rules;
using Bramble.Values;

namespace Bramble.Search;

/// <summary>
/// A player: chooses a move for a side within a budget and reports what it did. Players never see
/// protocol text; src/Wire adapts them to twine/1. A player instance is used by one thread at a time.
/// </summary>
public interface IPlayer
{
    string Name { get; }

    /// <summary>
    /// Chooses a move for <paramref name="side"/>; <see cref="Decision.Move"/> is null when the side
    /// has no legal move. Must return promptly once <paramref name="halt"/> is cancelled or the
    /// budget is spent, with the best move found so far.
    /// </summary>
    Decision Choose(IPosition position, Side side, TimeSpan budget, CancellationToken halt = default);
}

/// <summary>What a player did for one move.</summary>
/// <param name="Move">The chosen move, or null when there is none.</param>
/// <param name="Nodes">Search nodes (or local-value nodes) visited.</param>
/// <param name="ElapsedMs">Wall-clock milliseconds spent.</param>
/// <param name="Exact">True when the choice rests on a complete exact analysis.</param>
/// <param name="Value">The position's value in notation, when known.</param>
/// <param name="Winning">True/false when the player knows whether the side to move wins; null if unknown.</param>
/// <param name="Line">The line considered, as move texts, best first.</param>
/// <param name="Estimated">True when the choice read a thermograph estimated by bounded local search (a component over budget).</param>
public sealed record Decision(
    Move? Move,
    long Nodes,
    long ElapsedMs,
    bool Exact,
    string? Value = null,
    bool? Winning = null,
    IReadOnlyList<string>? Line = null,
    bool Estimated = false);
