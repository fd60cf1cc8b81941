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
public sealed class ClobberPosition : StonePosition
{
    private IReadOnlyList<int[]>? _groups;

    internal ClobberPosition(ClobberRuleset ruleset, StoneGrid grid) : base(ruleset, grid)
    {
    }

    protected override string MoveExample => "b2-c2";

    public override IReadOnlyList<Move> Moves(Side side)
    {
        var mine = StoneGrid.Of(side);
        var theirs = StoneGrid.Opponent(mine);
        var moves = new List<Move>();
        for (int r = 0; r < Grid.Rows; r++)
            for (int c = 0; c < Grid.Columns; c++)
            {
                if (Grid.At(r, c) != mine) continue;
                foreach (var (dr, dc) in Steps)
                {
                    int nr = r + dr, nc = c + dc;
                    if (Inside(nr, nc) && Grid.At(nr, nc) == theirs)
                        moves.Add(new Move(Grid.Index(r, c), Grid.Index(nr, nc)));
                }
            }
        return moves;
    }

    public override IPosition Play(Side side, Move move)
    {
        var mine = CheckMover(side, move);
        int distance = Math.Abs(move.A / Grid.Columns - move.B / Grid.Columns) + Math.Abs(move.A % Grid.Columns - move.B % Grid.Columns);
        if (distance != 1)
            throw new IllegalMoveException($"{FormatMove(move)} is not a legal move for {side.Word()}: a stone clobbers an orthogonal neighbour");
        if (Grid[move.B] != StoneGrid.Opponent(mine))
            throw new IllegalMoveException($"{FormatMove(move)} is not a legal move for {side.Word()}: {Grid.CellName(move.B)} holds no opposing stone");
        var next = Grid.CopyCells();
        next[move.B] = mine;
        next[move.A] = Stone.None;
        return new ClobberPosition((ClobberRuleset)Ruleset, new StoneGrid(Grid.Rows, Grid.Columns, next));
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
                foreach (var (dr, dc) in Steps)
                {
                    int nr = r + dr, nc = c + dc;
                    if (!Inside(nr, nc)) continue;
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

    public override IReadOnlyList<IPosition> Components()
    {
        var groups = Groups;
        if (groups.Count == 1 && groups[0].Length == Grid.StoneCount) return [this];
        return groups.Select(g => (IPosition)new ClobberPosition((ClobberRuleset)Ruleset, Keep(g))).ToArray();
    }

    /// <summary>
    /// Each group's bounding box under the eight symmetries of the square and the exchange of
    /// colours (see <see cref="StoneGrid.SignedKey"/>); several sorted and joined by " + ".
    /// </summary>
    public override string NormalKey => ComponentValues.JoinKeys(Groups.Select(KeyOf));

    private string KeyOf(int[] group)
    {
        var (top, left, bottom, right) = BoundingBox(group);
        // Other groups' stones may sit inside this group's box: key the group alone.
        var grid = group.Length == Grid.StoneCount ? Grid : Keep(group);
        return grid.SignedKey(top, left, bottom - top + 1, right - left + 1);
    }
}
