using Bramble.Values;

namespace Bramble.Rules;

/// <summary>
/// An immutable position of one ruleset: a sum of independent components. Moves keep their
/// names for the whole game (edge ids, board cells, term numbers), and a component returned by
/// <see cref="Components"/> is itself a position whose moves carry the same names, so a move
/// chosen inside a component can be played on the whole position unchanged.
/// </summary>
public interface IPosition
{
    IRuleset Ruleset { get; }

    /// <summary>The position in the ruleset's notation (docs/&lt;ruleset&gt;.md) (parses back to an equal position).</summary>
    string Text { get; }

    /// <summary>The legal moves of <paramref name="side"/>, in a fixed order.</summary>
    IReadOnlyList<Move> Moves(Side side);

    /// <summary>Plays a move; throws <see cref="IllegalMoveException"/> when it is not legal for that side.</summary>
    IPosition Play(Side side, Move move);

    string FormatMove(Move move);

    /// <summary>Parses move text such as <c>e7</c>, <c>c4</c> or <c>2.1</c>; throws <see cref="IllegalMoveException"/> on bad syntax.</summary>
    Move ParseMove(string text);

    /// <summary>The independent summands. A finished position has none; components where nobody can move are dropped.</summary>
    IReadOnlyList<IPosition> Components();

    /// <summary>
    /// For a single component: a key equal for every component with the same game tree up to
    /// renaming (edge ids, node labels, translation, mirror images), used to share memo entries.
    /// </summary>
    string NormalKey { get; }

    /// <summary>A hash of the whole position, stable within a process, for transposition tables.</summary>
    ulong Hash { get; }

    /// <summary>A size measure for budgets and reports (edges, empty cells, term count).</summary>
    int Size { get; }
}
