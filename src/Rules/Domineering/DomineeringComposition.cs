using Bramble.Values;

namespace Bramble.Rules.Domineering;

/// <summary>
/// What <c>bramble compose</c> needs from Domineering: every region of n cells (each free
/// polyomino, and its transpose when that is a different game: the transpose's value is the
/// negative), boards holding several regions apart, integers as straight strips, and the lower
/// bound on cells that a value's birthday gives.
/// </summary>
internal static class DomineeringComposition
{
    public static IEnumerable<IPosition> ComponentsOfSize(DomineeringRuleset ruleset, int cells)
    {
        // A lone cell is 0: nobody can move there.
        if (cells < 2) yield break;
        foreach (var shape in Polyominoes.UpTo(cells))
        {
            if (shape.CellCount != cells) continue;
            yield return ruleset.FromBoard(DomineeringRuleset.ToBoard(shape));
            var turned = Transpose(shape);
            // A region equal to its own transpose up to mirrors normalises as a mirror image: nothing new.
            if (NormalRegion.Of(turned).Transposed) yield return ruleset.FromBoard(DomineeringRuleset.ToBoard(turned));
        }
    }

    /// <summary>
    /// The regions of the parts set side by side, a filled column between neighbours, or one under
    /// another (a filled row between) when they would not fit in the board's 26 columns.
    /// </summary>
    public static IPosition SumOf(DomineeringRuleset ruleset, IReadOnlyList<IPosition> components)
    {
        var boards = components.Select(c => ((DomineeringPosition)c).Board).ToList();
        if (boards.Count == 0) return ruleset.FromBoard(new Board(1, 1, [0]));
        if (boards.Count == 1) return ruleset.FromBoard(boards[0]);
        int wide = boards.Sum(b => b.Columns) + boards.Count - 1;
        if (wide <= Board.MaxColumns)
        {
            var rows = new uint[boards.Max(b => b.Rows)];
            int at = 0;
            foreach (var b in boards)
            {
                for (int r = 0; r < b.Rows; r++) rows[r] |= b.EmptyRow(r) << at;
                at += b.Columns + 1;
            }
            return ruleset.FromBoard(new Board(rows.Length, wide, rows));
        }
        var stacked = new List<uint>();
        foreach (var b in boards)
        {
            if (stacked.Count > 0) stacked.Add(0);
            for (int r = 0; r < b.Rows; r++) stacked.Add(b.EmptyRow(r));
        }
        return ruleset.FromBoard(new Board(stacked.Count, boards.Max(b => b.Columns), stacked.ToArray()));
    }

    /// <summary>
    /// An integer n is a strip of 2|n| cells, upright for Left (n > 0), lying for Right: each move
    /// in it leaves the mover n − 1 more (strips longer than a board's side are cut in pieces).
    /// </summary>
    public static IEnumerable<IPosition> Construct(DomineeringRuleset ruleset, Game target, GameStore store)
    {
        if (!store.TryGetNumber(target, out var x) || !x.IsInteger || x.IsZero) yield break;
        long n = (long)x.Floor();
        long dominoes = Math.Abs(n);
        int perStrip = (n > 0 ? Board.MaxRows : Board.MaxColumns) / 2;
        if (dominoes > 64L * perStrip) yield break;
        var strips = new List<IPosition>();
        for (long left = dominoes; left > 0; left -= perStrip)
        {
            int length = (int)Math.Min(left, perStrip) * 2;
            var board = n > 0 ? new Board(length, 1, Enumerable.Repeat(1u, length).ToArray()) : new Board(1, length, [Board.RowMask(length)]);
            strips.Add(ruleset.FromBoard(board));
        }
        yield return SumOf(ruleset, strips);
    }

    /// <summary>A game of birthday b lasts b moves at least, and every move fills two cells.</summary>
    public static int LeastSize(Game target, GameStore store) => 2 * store.Birthday(target);

    public static TargetFacts Facts(Game target, GameStore store)
    {
        if (store.IsNumber(target))
            return TargetFacts.Remarks(["every number is the value of some Domineering region (Uiterwijk and Barton, Theoretical Computer Science, 2015)"]);
        if (store.TryGetUpStar(target, out var x, out int ups, out int nim) && x.IsZero && nim == 0 && ups != 0)
            return TargetFacts.Remarks([$"n·↑ and n·↓ are values of single regions of 1 + 5n cells, here {1 + 5 * Math.Abs(ups)} (Uiterwijk and Barton, Theoretical Computer Science, 2015)"]);
        return TargetFacts.None;
    }

    private static Region Transpose(Region shape)
    {
        var cells = UInt128.Zero;
        for (int r = 0; r < shape.Height; r++)
            for (int c = 0; c < shape.Width; c++)
                if (shape.Contains(r, c)) cells |= UInt128.One << (c * shape.Height + r);
        return new Region(cells, shape.Width, shape.Height);
    }
}
