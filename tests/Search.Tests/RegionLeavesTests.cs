using Bramble.Rules;
using Bramble.Rules.Domineering;
using Bramble.Search.Board;
using Bramble.Values;

namespace Bramble.Search.Tests;

/// <summary>
/// Region leaves of the whole-board search: a board split into small regions gets the outcome of
/// the sum of the regions' values, each region valued on its own as a separate position by the
/// ruleset (not by the whole-board search), and of published values.
/// </summary>
public class RegionLeavesTests
{
    private static readonly IRuleset Rules = Rulesets.Get("domineering");

    /// <summary>The empty cells of view s (view 0 the board, view 1 its transpose) as a bitboard.</summary>
    private static ulong ViewBits(BoardShape shape, DomineeringPosition position, int s)
    {
        ulong bits = 0;
        for (int r = 0; r < shape.Rows; r++)
            for (int c = 0; c < shape.Columns; c++)
            {
                if (!position.Board.IsEmpty(r, c)) continue;
                int p = r * shape.Columns + c;
                bits |= 1UL << (s == 0 ? p : shape.ToOther[0][p]);
            }
        return bits;
    }

    /// <summary>Whether the side wins moving first, by the region leaves alone; fails when they cannot decide.</summary>
    private static bool LeafWins(string text, Side side, int cap = 12)
    {
        var position = (DomineeringPosition)Rules.Parse(text);
        var shape = new BoardShape(position.Board.Rows, position.Board.Columns);
        var leaves = new RegionLeaves<ulong>(shape, cap);
        int s = side == Side.Left ? 0 : 1;
        Assert.True(leaves.TryDecide(ViewBits(shape, position, s), s, out bool wins), $"{text} not decided");
        return wins;
    }

    [Theory]
    // The 2×2 square is ±1 = {1 | −1} (Lachmann, Moore, Rapaport, "When is a sum of games a
    // Domineering position?", MSRI Publ. 42, 2002): whoever starts wins.
    [InlineData("../..", true, true)]
    // ±1 + ±1 = 0: whoever starts loses.
    [InlineData("..#../..#..", false, false)]
    // ±1 + 1 (a vertical pair only Left can use) = {2 | 0}: whoever starts wins.
    [InlineData("..#./..#.", true, true)]
    // ±1 + 1 + 1 = {3 | 1} > 0: Left wins either way.
    [InlineData("..#.#./..#.#.", true, false)]
    // A row of four only Right can use is −2 (two disjoint horizontal dominoes; common practice):
    // with ±1, {−1 | −3} < 0, Right wins either way.
    [InlineData("..#..../..#####", false, true)]
    public void PublishedValuesGiveTheOutcome(string text, bool leftFirstWins, bool rightFirstWins)
    {
        Assert.Equal(leftFirstWins, LeafWins(text, Side.Left));
        Assert.Equal(rightFirstWins, LeafWins(text, Side.Right));
        // The whole-board search with the leaves on says the same.
        var solver = new WholeBoard(new BoardSearchOptions { RegionLeaves = true, TableLog2 = 10 });
        var position = (DomineeringPosition)Rules.Parse(text);
        Assert.Equal(leftFirstWins, solver.Solve(position, Side.Left).Win);
        Assert.Equal(rightFirstWins, solver.Solve(position, Side.Right).Win);
    }

    [Fact]
    public void ASplitBoardGetsTheOutcomeOfTheSumOfItsRegionsValuedApart()
    {
        // Random boards of two blocks (up to 3×4 each) side by side with a wall of holes between
        // them, some holes inside: each block is valued as a position of its own by the ruleset,
        // the values added, and the sum's outcome class decides who wins moving first.
        var rnd = new Random(1915);
        var context = new ValueContext();
        var store = context.Store;
        var plain = new WholeBoard(new BoardSearchOptions { TableLog2 = 12 });
        var withLeaves = new WholeBoard(new BoardSearchOptions { RegionLeaves = true, TableLog2 = 12 });
        for (int n = 0; n < 300; n++)
        {
            int rows = rnd.Next(1, 4), a = rnd.Next(1, 5), b = rnd.Next(1, 5);
            string Row(int width) => new(Enumerable.Range(0, width).Select(_ => rnd.NextDouble() < 0.15 ? '#' : '.').ToArray());
            var left = Enumerable.Range(0, rows).Select(_ => Row(a)).ToArray();
            var right = Enumerable.Range(0, rows).Select(_ => Row(b)).ToArray();
            string text = string.Join("/", left.Zip(right, (l, r) => l + "#" + r));
            var sum = store.Add(Rules.Value(Rules.Parse(string.Join("/", left)), context), Rules.Value(Rules.Parse(string.Join("/", right)), context));
            var outcome = store.OutcomeOf(sum);
            bool leftWins = outcome is Outcome.L or Outcome.N, rightWins = outcome is Outcome.R or Outcome.N;
            Assert.True(leftWins == LeafWins(text, Side.Left), $"Left first on {text}: the sum is {outcome}");
            Assert.True(rightWins == LeafWins(text, Side.Right), $"Right first on {text}: the sum is {outcome}");
            var position = (DomineeringPosition)Rules.Parse(text);
            foreach (var (side, wins) in new[] { (Side.Left, leftWins), (Side.Right, rightWins) })
            {
                Assert.Equal(wins, plain.Solve(position, side).Win);
                Assert.Equal(wins, withLeaves.Solve(position, side).Win);
            }
        }
    }

    [Fact]
    public void BoardsOfMoreThan64CellsUseTheWideBitboards()
    {
        // Random 8×9 boards (72 cells, so 128-bit bitboards) with about half the cells filled: the
        // leaves agree with the whole-board search without them (cross-checked against plain
        // search in WholeBoardTests).
        var rnd = new Random(1916);
        var plain = new WholeBoard(new BoardSearchOptions { TableLog2 = 12 });
        var withLeaves = new WholeBoard(new BoardSearchOptions { RegionLeaves = true, TableLog2 = 12 });
        for (int n = 0; n < 40; n++)
        {
            var text = string.Join("/", Enumerable.Range(0, 8).Select(_ =>
                new string(Enumerable.Range(0, 9).Select(_ => rnd.NextDouble() < 0.5 ? '#' : '.').ToArray())));
            var position = (DomineeringPosition)Rules.Parse(text);
            foreach (var side in new[] { Side.Left, Side.Right })
                Assert.True(plain.Solve(position, side).Win == withLeaves.Solve(position, side).Win, $"{side.Word()} first on {text}");
        }
    }

    [Fact]
    public void ARegionTooBigForBothSidesIsLeftToTheSearch()
    {
        // A 3×5 block (15 cells, both sides can move) with a cap of 12 cannot be valued.
        var position = (DomineeringPosition)Rules.Parse("...../...../.....");
        var shape = new BoardShape(3, 5);
        var leaves = new RegionLeaves<ulong>(shape, 12);
        Assert.False(leaves.TryDecide(ViewBits(shape, position, 0), 0, out _));
        // Regions only one side can use are integers at any size (common practice): a column of
        // seven cells only Left can use is 3, a row of four only Right can use is −2; the sum 1 > 0.
        string text = ".#..../.#####/.#####/.#####/.#####/.#####/.#####";
        Assert.True(LeafWins(text, Side.Left, cap: 2));
        Assert.False(LeafWins(text, Side.Right, cap: 2));
    }
}
