using Bramble.Rules.Common;
using Bramble.Values;

namespace Bramble.Rules.Konane;

/// <summary>
/// A Konane position: Left's stones (x) and Right's (o) on a board. A move jumps one of the
/// mover's stones over an orthogonally adjacent opposing stone into the empty square beyond,
/// and may go on jumping in the same direction; every jumped stone is removed. A move is named
/// <c>from-to</c>, e.g. <c>c3-c7</c> for a double jump (<see cref="Move.A"/> and
/// <see cref="Move.B"/> are the two squares, row * columns + column).
/// </summary>
public sealed class KonanePosition : StonePosition
{
    private IReadOnlyList<int[]>? _clusters;

    internal KonanePosition(KonaneRuleset ruleset, StoneGrid grid) : base(ruleset, grid)
    {
    }

    protected override string MoveExample => "c3-c5";

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
                    // Each landing square along the line is a move of its own: the jumper may stop after any jump.
                    int jr = r + dr, jc = c + dc;
                    while (Inside(jr + dr, jc + dc) && Grid.At(jr, jc) == theirs && Grid.At(jr + dr, jc + dc) == Stone.None)
                    {
                        moves.Add(new Move(Grid.Index(r, c), Grid.Index(jr + dr, jc + dc)));
                        jr += 2 * dr;
                        jc += 2 * dc;
                        if (!Inside(jr, jc)) break;
                    }
                }
            }
        return moves;
    }

    public override IPosition Play(Side side, Move move)
    {
        var mine = CheckMover(side, move);
        int r0 = move.A / Grid.Columns, c0 = move.A % Grid.Columns, r1 = move.B / Grid.Columns, c1 = move.B % Grid.Columns;
        int distance = Math.Abs(r1 - r0) + Math.Abs(c1 - c0);
        if ((r0 != r1 && c0 != c1) || distance == 0 || distance % 2 != 0)
            throw new IllegalMoveException($"{FormatMove(move)} is not a legal move for {side.Word()}: a stone jumps along a row or column, two squares per jump");
        int dr = Math.Sign(r1 - r0), dc = Math.Sign(c1 - c0);
        var next = Grid.CopyCells();
        var theirs = StoneGrid.Opponent(mine);
        for (int k = 1; k <= distance; k++)
        {
            int cell = Grid.Index(r0 + k * dr, c0 + k * dc);
            var want = k % 2 == 1 ? theirs : Stone.None;
            if (Grid[cell] != want)
                throw new IllegalMoveException($"{FormatMove(move)} is not a legal move for {side.Word()}: {Grid.CellName(cell)} {(want == Stone.None ? "is not empty" : "holds no opposing stone to jump")}");
            next[cell] = Stone.None;
        }
        next[move.A] = Stone.None;
        next[move.B] = mine;
        return new KonanePosition((KonaneRuleset)Ruleset, new StoneGrid(Grid.Rows, Grid.Columns, next));
    }

    /// <summary>
    /// Groups of stones that no sequence of moves can bring together, found with two reach bounds
    /// for a group of n stones left to itself (both proved in docs/konane.md):
    /// <list type="bullet">
    /// <item>every jump lands next to the square of the stone it removes and there are at most
    /// n − 1 jumps, so every stone stays within n − 1 squares (Manhattan distance) of a square
    /// the group held at the start;</item>
    /// <item>a stone first reaches the d-th column (or row) beyond the group's bounding box only
    /// after 2d − 1 jumps, so no stone leaves the box widened by ⌊n/2⌋ on each side.</item>
    /// </list>
    /// Two groups can only meet (a stone next to the other group's stone, or wanting to land on
    /// one) if both bounds allow it; starting from single stones, groups that may meet are merged
    /// until none may, and groups where nobody can move are dropped (nothing can reach them).
    /// </summary>
    internal IReadOnlyList<int[]> Clusters => _clusters ??= FindClusters();

    /// <summary>How far beyond its bounding box a group of <paramref name="stones"/> stones can ever put a stone.</summary>
    internal static int Reach(int stones) => stones / 2;

    private int[][] FindClusters()
    {
        // Orthogonal neighbours always may meet, so the merging starts from the connected groups
        // (the fixpoint is the same from any start finer than it: merging only ever adds).
        var clusters = new List<Cluster>();
        int cells = Grid.Rows * Grid.Columns;
        var owner = new Cluster?[cells];
        var stack = new Stack<int>();
        for (int start = 0; start < cells; start++)
        {
            if (Grid[start] == Stone.None || owner[start] is not null) continue;
            var cluster = new Cluster(start, Grid.Columns);
            owner[start] = cluster;
            stack.Push(start);
            while (stack.Count > 0)
            {
                int cell = stack.Pop();
                int r = cell / Grid.Columns, c = cell % Grid.Columns;
                foreach (var (dr, dc) in Steps)
                {
                    if (!Inside(r + dr, c + dc)) continue;
                    int next = Grid.Index(r + dr, c + dc);
                    if (Grid[next] == Stone.None || owner[next] is not null) continue;
                    owner[next] = cluster;
                    cluster.Add(next, Grid.Columns);
                    stack.Push(next);
                }
            }
            clusters.Add(cluster);
        }
        bool merged = true;
        while (merged)
        {
            merged = false;
            for (int a = 0; a < clusters.Count && !merged; a++)
                for (int b = a + 1; b < clusters.Count && !merged; b++)
                {
                    if (!MayMeet(clusters[a], clusters[b])) continue;
                    clusters[a].Absorb(clusters[b]);
                    clusters.RemoveAt(b);
                    merged = true;
                }
        }
        return clusters.Select(c => c.Cells.Order().ToArray()).Where(HasMoves).ToArray();
    }

    private bool MayMeet(Cluster a, Cluster b)
    {
        // The box bound: the empty lines between the boxes must be crossed from both sides.
        int reach = Reach(a.Cells.Count) + Reach(b.Cells.Count);
        int rowGap = Math.Max(b.Top - a.Bottom, a.Top - b.Bottom) - 1;
        int columnGap = Math.Max(b.Left - a.Right, a.Left - b.Right) - 1;
        if (rowGap > reach || columnGap > reach) return false;
        // The distance bound: stones within a − 1 and b − 1 of their groups, and one square apart.
        return Distance(a.Cells, b.Cells) <= a.Cells.Count + b.Cells.Count - 1;
    }

    /// <summary>A group being assembled: its squares and bounding box.</summary>
    private sealed class Cluster
    {
        public Cluster(int cell, int columns)
        {
            Cells = [cell];
            Top = Bottom = cell / columns;
            Left = Right = cell % columns;
        }

        public List<int> Cells { get; }
        public int Top { get; private set; }
        public int Bottom { get; private set; }
        public int Left { get; private set; }
        public int Right { get; private set; }

        public void Add(int cell, int columns)
        {
            Cells.Add(cell);
            Top = Math.Min(Top, cell / columns);
            Bottom = Math.Max(Bottom, cell / columns);
            Left = Math.Min(Left, cell % columns);
            Right = Math.Max(Right, cell % columns);
        }

        public void Absorb(Cluster other)
        {
            Cells.AddRange(other.Cells);
            Top = Math.Min(Top, other.Top);
            Bottom = Math.Max(Bottom, other.Bottom);
            Left = Math.Min(Left, other.Left);
            Right = Math.Max(Right, other.Right);
        }
    }

    private int Distance(List<int> a, List<int> b)
    {
        int best = int.MaxValue;
        foreach (int x in a)
            foreach (int y in b)
                best = Math.Min(best, Math.Abs(x / Grid.Columns - y / Grid.Columns) + Math.Abs(x % Grid.Columns - y % Grid.Columns));
        return best;
    }

    private bool HasMoves(int[] cluster)
    {
        foreach (int cell in cluster)
        {
            int r = cell / Grid.Columns, c = cell % Grid.Columns;
            var theirs = StoneGrid.Opponent(Grid[cell]);
            foreach (var (dr, dc) in Steps)
                if (Inside(r + 2 * dr, c + 2 * dc) && Grid.At(r + dr, c + dc) == theirs && Grid.At(r + 2 * dr, c + 2 * dc) == Stone.None) return true;
        }
        return false;
    }

    public override IReadOnlyList<IPosition> Components()
    {
        var clusters = Clusters;
        if (clusters.Count == 1 && clusters[0].Length == Grid.StoneCount) return [this];
        return clusters.Select(cluster => (IPosition)new KonanePosition((KonaneRuleset)Ruleset, Keep(cluster))).ToArray();
    }

    /// <summary>
    /// Each group keyed by the part of the board it can ever use: its bounding box widened by
    /// ⌊n/2⌋ squares on each side (<see cref="Reach"/>), cut off at the board's edges (so an edge the group can reach is
    /// part of the key and one it cannot reach is not), under the eight symmetries of the square
    /// and the exchange of colours (see <see cref="StoneGrid.SignedKey"/>).
    /// </summary>
    public override string NormalKey => ComponentValues.JoinKeys(Clusters.Select(KeyOf));

    private string KeyOf(int[] cluster)
    {
        var (top, left, bottom, right) = BoundingBox(cluster);
        int margin = Reach(cluster.Length);
        top = Math.Max(0, top - margin);
        left = Math.Max(0, left - margin);
        bottom = Math.Min(Grid.Rows - 1, bottom + margin);
        right = Math.Min(Grid.Columns - 1, right + margin);
        var grid = cluster.Length == Grid.StoneCount ? Grid : Keep(cluster);
        return grid.SignedKey(top, left, bottom - top + 1, right - left + 1);
    }
}
