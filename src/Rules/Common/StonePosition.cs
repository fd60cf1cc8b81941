using Bramble.Values;

namespace Bramble.Rules.Common;

/// <summary>
/// What Clobber and Konane positions share: Left's stones (x) and Right's (o) on a board, moves
/// named <c>from-to</c> by their two squares (<see cref="Move.A"/> and <see cref="Move.B"/>,
/// row * columns + column), and components that keep the whole board with the other groups'
/// stones taken off, so that a component's moves keep their names. The games differ only in how
/// a stone moves and which groups can meet.
/// </summary>
public abstract class StonePosition : IPosition
{
    /// <summary>The four orthogonal steps, in the order moves are listed.</summary>
    protected static readonly (int Dr, int Dc)[] Steps = [(-1, 0), (1, 0), (0, -1), (0, 1)];

    protected StonePosition(IRuleset ruleset, StoneGrid grid)
    {
        Ruleset = ruleset;
        Grid = grid;
        Text = grid.Text;
        Hash = TextHash.Of(Text);
    }

    public StoneGrid Grid { get; }

    public IRuleset Ruleset { get; }

    public string Text { get; }

    public ulong Hash { get; }

    public int Size => Grid.StoneCount;

    /// <summary>A move written as a player of this game would, for messages (e.g. <c>b2-c2</c>).</summary>
    protected abstract string MoveExample { get; }

    public abstract IReadOnlyList<Move> Moves(Side side);

    public abstract IPosition Play(Side side, Move move);

    public abstract IReadOnlyList<IPosition> Components();

    public abstract string NormalKey { get; }

    public string FormatMove(Move move) => $"{Grid.CellName(move.A)}-{Grid.CellName(move.B)}";

    public Move ParseMove(string text)
    {
        var (from, to) = Grid.ReadMove(text, MoveExample);
        return new Move(from, to);
    }

    protected bool Inside(int r, int c) => r >= 0 && r < Grid.Rows && c >= 0 && c < Grid.Columns;

    /// <summary>
    /// The checks every stone move starts with: both squares on the board and the mover's own
    /// stone on the first; returns the mover's stone.
    /// </summary>
    protected Stone CheckMover(Side side, Move move)
    {
        int cells = Grid.Rows * Grid.Columns;
        if (move.A < 0 || move.A >= cells || move.B < 0 || move.B >= cells)
            throw new IllegalMoveException($"{FormatMove(move)}: off the {Grid.Rows}x{Grid.Columns} board");
        var mine = StoneGrid.Of(side);
        if (Grid[move.A] != mine)
            throw new IllegalMoveException($"{FormatMove(move)} is not a legal move for {side.Word()}: {Grid.CellName(move.A)} holds no {(side == Side.Left ? "x" : "o")} stone");
        return mine;
    }

    /// <summary>The board with only these squares' stones left on it.</summary>
    protected StoneGrid Keep(int[] group)
    {
        var cells = new Stone[Grid.Rows * Grid.Columns];
        foreach (int cell in group) cells[cell] = Grid[cell];
        return new StoneGrid(Grid.Rows, Grid.Columns, cells);
    }

    /// <summary>The smallest rectangle of rows and columns holding these squares.</summary>
    protected (int Top, int Left, int Bottom, int Right) BoundingBox(int[] group)
    {
        int top = int.MaxValue, bottom = -1, left = int.MaxValue, right = -1;
        foreach (int cell in group)
        {
            int r = cell / Grid.Columns, c = cell % Grid.Columns;
            top = Math.Min(top, r); bottom = Math.Max(bottom, r);
            left = Math.Min(left, c); right = Math.Max(right, c);
        }
        return (top, left, bottom, right);
    }
}
