using Bramble.Rules.Common;
using Bramble.Values;

namespace Bramble.Rules.Clobber;

/// <summary>
/// A Clobber position: Left's stones (x) and Right's (o) on a board. A move takes one of the
/// mover's stones onto an orthogonally adjacent opposing stone, which is removed; it is named
/// <c>from-to</c>, e.g. <c>b2-c2</c> (<see cref="Move.A"/> and <see cref="Move.B"/> are the two
/// squares, row * columns + column). Stones never enter empty squares, so the 4-connected groups
/// of stones never merge: each group with a move is a component. Components keep the whole
/// board with the other groups' stones taken off, so their moves keep their names.
/// </summary>
public sealed class ClobberPosition : IPosition
{
    private static readonly (int Dr, int Dc)[] s_steps = [(-1, 0), (1, 0), (0, -1), (0, 1)];
    private readonly ClobberRuleset _ruleset;
    private IReadOnlyList<int[]>? _groups;

    internal ClobberPosition(ClobberRuleset ruleset, StoneGrid grid)
    {
        _ruleset = ruleset;
        Grid = grid;
        Text = grid.Text;
        Hash = TextHash.Of(Text);
    }

    public StoneGrid Grid { get; }

    public IRuleset Ruleset => _ruleset;

    public string Text { get; }

    public ulong Hash { get; }

    public int Size => Grid.StoneCount;

    public IReadOnlyList<Move> Moves(Side side)
    {
        var mine = StoneGrid.Of(side);
        var theirs = StoneGrid.Opponent(mine);
        var moves = new List<Move>();
        for (int r = 0; r < Grid.Rows; r++)
            for (int c = 0; c < Grid.Columns; c++)
            {
                if (Grid.At(r, c) != mine) continue;
                foreach (var (dr, dc) in s_steps)
                {
                    int nr = r + dr, nc = c + dc;
                    if (nr >= 0 && nr < Grid.Rows && nc >= 0 && nc < Grid.Columns && Grid.At(nr, nc) == theirs)
                        moves.Add(new Move(Grid.Index(r, c), Grid.Index(nr, nc)));
                }
            }
        return moves;
    }

    public IPosition Play(Side side, Move move)
    {
        int cells = Grid.Rows * Grid.Columns;
        if (move.A < 0 || move.A >= cells || move.B < 0 || move.B >= cells)
            throw new IllegalMoveException($"{FormatMove(move)}: off the {Grid.Rows}x{Grid.Columns} board");
        var mine = StoneGrid.Of(side);
        if (Grid[move.A] != mine)
            throw new IllegalMoveException($"{FormatMove(move)} is not a legal move for {side.Word()}: {Grid.CellName(move.A)} holds no {(side == Side.Left ? "x" : "o")} stone");
        int distance = Math.Abs(move.A / Grid.Columns - move.B / Grid.Columns) + Math.Abs(move.A % Grid.Columns - move.B % Grid.Columns);
        if (distance != 1)
            throw new IllegalMoveException($"{FormatMove(move)} is not a legal move for {side.Word()}: a stone clobbers an orthogonal neighbour");
        if (Grid[move.B] != StoneGrid.Opponent(mine))
            throw new IllegalMoveException($"{FormatMove(move)} is not a legal move for {side.Word()}: {Grid.CellName(move.B)} holds no opposing stone");
        var next = Grid.CopyCells();
        next[move.B] = mine;
        next[move.A] = Stone.None;
        return new ClobberPosition(_ruleset, new StoneGrid(Grid.Rows, Grid.Columns, next));
    }

    public string FormatMove(Move move) => $"{Grid.CellName(move.A)}-{Grid.CellName(move.B)}";

    public Move ParseMove(string text)
    {
        var (from, to) = Grid.ReadMove(text, "b2-c2");
        return new Move(from, to);
    }

    /// <summary>The 4-connected groups of stones that hold at least one x next to an o.</summary>
    internal IReadOnlyList<int[]> Groups => _groups ??= FindGroups();

    private int[][] FindGroups()
    {
        int n = Grid.Rows * Grid.Columns;
        var seen = new bool[n];
        var result = new List<int[]>();
        var stack = new Stack<int>();
        for (int start = 0; start < n; start++)
        {
            if (seen[start] || Grid[start] == Stone.None) continue;
            var group = new List<int>();
            bool live = false;
            seen[start] = true;
            stack.Push(start);
            while (stack.Count > 0)
            {
                int cell = stack.Pop();
                group.Add(cell);
                int r = cell / Grid.Columns, c = cell % Grid.Columns;
                foreach (var (dr, dc) in s_steps)
                {
                    int nr = r + dr, nc = c + dc;
                    if (nr < 0 || nr >= Grid.Rows || nc < 0 || nc >= Grid.Columns) continue;
                    int next = Grid.Index(nr, nc);
                    if (Grid[next] == Stone.None) continue;
                    if (Grid[next] != Grid[cell]) live = true;
                    if (!seen[next])
                    {
                        seen[next] = true;
                        stack.Push(next);
                    }
                }
            }
            if (live) result.Add(group.ToArray());
        }
        return result.ToArray();
    }

    public IReadOnlyList<IPosition> Components()
    {
        var groups = Groups;
        if (groups.Count == 1 && groups[0].Length == Grid.StoneCount) return [this];
        return groups.Select(g =>
        {
            var cells = new Stone[Grid.Rows * Grid.Columns];
            foreach (int cell in g) cells[cell] = Grid[cell];
            return (IPosition)new ClobberPosition(_ruleset, new StoneGrid(Grid.Rows, Grid.Columns, cells));
        }).ToArray();
    }

    /// <summary>
    /// Each group's bounding box under the eight symmetries of the square and the exchange of
    /// colours (see <see cref="StoneGrid.SignedKey"/>); several sorted and joined by " + ".
    /// </summary>
    public string NormalKey => ComponentValues.JoinKeys(Groups.Select(KeyOf));

    private string KeyOf(int[] group)
    {
        int top = int.MaxValue, bottom = -1, left = int.MaxValue, right = -1;
        foreach (int cell in group)
        {
            int r = cell / Grid.Columns, c = cell % Grid.Columns;
            top = Math.Min(top, r); bottom = Math.Max(bottom, r);
            left = Math.Min(left, c); right = Math.Max(right, c);
        }
        if (group.Length == Grid.StoneCount) return Grid.SignedKey(top, left, bottom - top + 1, right - left + 1);
        // Other groups' stones may sit inside this group's box: key the group alone.
        var cells = new Stone[Grid.Rows * Grid.Columns];
        foreach (int cell in group) cells[cell] = Grid[cell];
        return new StoneGrid(Grid.Rows, Grid.Columns, cells).SignedKey(top, left, bottom - top + 1, right - left + 1);
    }
}
