using Bramble.Rules;
using Bramble.Rules.Domineering;
using Bramble.Search.Board;
using Bramble.Search.Tests.Support;
using Bramble.Values;

namespace Bramble.Search.Tests;

/// <summary>
/// The bitboard search of whole Domineering boards: every shortcut (safe-move bounds, symmetric
/// table entries, move ordering) cross-checked against plain search written in the tests, on
/// random small boards with holes; and the published outcome classes of empty rectangles.
/// </summary>
public class WholeBoardTests
{
    private static readonly IRuleset Rules = Rulesets.Get("domineering");

    /// <summary>Random rectangles of 1 to 5 rows and columns with about a fifth of the cells filled.</summary>
    private static IEnumerable<DomineeringPosition> RandomBoards(int seed, int count, int maxSide = 5)
    {
        var rnd = new Random(seed);
        for (int n = 0; n < count; n++)
        {
            int rows = rnd.Next(1, maxSide + 1), columns = rnd.Next(1, maxSide + 1);
            var text = string.Join("/", Enumerable.Range(0, rows).Select(_ =>
                new string(Enumerable.Range(0, columns).Select(_ => rnd.NextDouble() < 0.2 ? '#' : '.').ToArray())));
            yield return (DomineeringPosition)Rules.Parse(text);
        }
    }

    private static void AgreesWithPlainSearch(BoardSearchOptions options, int seed, int count, int maxSide = 5)
    {
        var brute = new BruteForce();
        var solver = new WholeBoard(options with { TableLog2 = 12 });
        foreach (var position in RandomBoards(seed, count, maxSide))
        {
            foreach (var side in new[] { Side.Left, Side.Right })
            {
                var answer = solver.Solve(position, side);
                bool wins = brute.Wins(position, side);
                // Plain search (BruteForce, written in the tests) decides the outcome.
                Assert.True(answer.Win == wins, $"{side.Word()} first on {position.Text}: says {answer.Win}, plain search {wins}");
                if (!wins) continue;
                var after = position.Play(side, answer.Move!.Value);
                Assert.False(brute.Wins(after, side.Other()), $"{position.FormatMove(answer.Move.Value)} on {position.Text} does not win");
                // Every move of the principal line is legal, and the winner's moves in it win.
                IPosition p = position;
                var mover = side;
                foreach (var m in answer.Line)
                {
                    var next = p.Play(mover, m);
                    if (mover == side) Assert.False(brute.Wins(next, mover.Other()), $"line move {p.FormatMove(m)} on {p.Text} does not win");
                    p = next;
                    mover = mover.Other();
                }
            }
        }
    }

    [Fact]
    public void DefaultSearchAgreesWithPlainSearchOnRandomBoardsWithHoles() => AgreesWithPlainSearch(new BoardSearchOptions(), 1901, 1500);

    [Fact]
    public void SafeMoveBoundsAloneAgreeWithPlainSearch() =>
        AgreesWithPlainSearch(new BoardSearchOptions { Symmetry = false, CountOrdering = false, History = false }, 1902, 800);

    [Fact]
    public void SymmetricTableEntriesAloneAgreeWithPlainSearch() =>
        AgreesWithPlainSearch(new BoardSearchOptions { SafeMoveBounds = false, CountOrdering = false, History = false }, 1903, 800);

    [Fact]
    public void OrderingAloneAgreesWithPlainSearch() =>
        AgreesWithPlainSearch(new BoardSearchOptions { SafeMoveBounds = false, Symmetry = false }, 1904, 500);

    [Fact]
    public void TwoThreadsOnTheRootMovesAgreeWithPlainSearch() => AgreesWithPlainSearch(new BoardSearchOptions { Threads = 2, ShareTree = false }, 1905, 300);

    [Fact]
    public void TwoThreadsOnTheRepliesAgreeWithPlainSearch() =>
        AgreesWithPlainSearch(new BoardSearchOptions { Threads = 2, SplitBelowRoot = true, ShareTree = false }, 1911, 300);

    [Fact]
    public void ThreadsSharingTheTreeAgreeWithPlainSearch() =>
        AgreesWithPlainSearch(new BoardSearchOptions { Threads = 2, ShareTree = true }, 1913, 300);

    [Theory]
    [InlineData("..#./...#/#.../...#")]
    public void ThreadsSharingTheTreeNameAWinningMoveWhereTheBoundsDecideTheRoot(string text)
    {
        // Found by the random cross-check of the proof-number search (measured, then dropped): the
        // bounds decide the root at once, so the table holds no move for it, and the first move in
        // the order does not win.
        var position = (DomineeringPosition)Rules.Parse(text);
        var answer = new WholeBoard(new BoardSearchOptions { Threads = 2, ShareTree = true, TableLog2 = 12 }).Solve(position, Side.Right);
        Assert.True(answer.Win);
        Assert.False(new BruteForce().Wins(position.Play(Side.Right, answer.Move!.Value), Side.Left), $"{position.FormatMove(answer.Move.Value)} does not win");
    }

    [Fact]
    public void ASearchStoppedPartWayShowsTheLegalLineItWasSearching()
    {
        // 8×8 takes millions of nodes; the budget stops it at its second check (after 4,097 nodes),
        // so the stop falls at the same node on every machine.
        var shape = new BoardShape(8, 8);
        int checks = 0;
        var search = new BoardSearch<ulong>(shape, new OutcomeTable(12), new StopSignal(), new BoardSearchOptions(), () => ++checks >= 2);
        var empty = Enumerable.Repeat(true, shape.Cells).ToArray();
        search.SetPosition(empty);
        search.Wins(0);
        var line = search.SearchLine();
        Assert.Equal(4, line.Length);
        // Replayed from the empty board, sides alternating from Left, every move of the line is
        // legal where it stands, and its place lies among the moves left open there.
        var replay = new BoardSearch<ulong>(shape, new OutcomeTable(12), new StopSignal(), new BoardSearchOptions());
        replay.SetPosition(empty);
        int side = 0;
        foreach (var (cell, place, open) in line)
        {
            Assert.Contains(cell, replay.OrderedMoves(side));
            Assert.InRange(place, 1, open);
            Assert.InRange(open, 1, replay.OrderedMoves(side).Length);
            replay.Play(side, cell);
            side = 1 - side;
        }
    }

    [Fact]
    public void ThreadsSharingTheTreeToAFewPliesAgreeWithPlainSearch() =>
        AgreesWithPlainSearch(new BoardSearchOptions { Threads = 3, ShareTree = true, ShareDepth = 3 }, 1914, 300);

    [Fact]
    public void SkippingSafeMovesAgreesWithPlainSearch() =>
        // Never searching a safe move while another move is left (Bullock 2002 states that safe moves can be ignored).
        AgreesWithPlainSearch(new BoardSearchOptions { SkipSafeMoves = true }, 1906, 1500);

    [Fact]
    public void ProtectiveBlocksInTheBoundsAgreeWithPlainSearch() =>
        // Protective 2×2 areas counted in the bounds (Bullock 2002); with a fifth of the cells filled they occur often.
        AgreesWithPlainSearch(new BoardSearchOptions { ProtectiveBlocks = true }, 1908, 800);

    [Fact]
    public void LoneSparesInTheBoundsAgreeWithPlainSearch() =>
        // Spares no opponent move can spoil together with another (Bullock 2002), without blocks.
        AgreesWithPlainSearch(new BoardSearchOptions { ProtectiveBlocks = false, LoneSpares = true }, 1910, 800);

    [Fact]
    public void BlockMarginOffAgreesWithPlainSearch() =>
        AgreesWithPlainSearch(new BoardSearchOptions { BlockMargin = false }, 1912, 600);

    [Fact]
    public void BoundsAtTheNodeOnlyAgreeWithPlainSearch() =>
        AgreesWithPlainSearch(new BoardSearchOptions { ChildBounds = false }, 1909, 600);

    [Fact]
    public void RegionLeavesAgreeWithPlainSearch() =>
        // Nodes split into small regions decided by the sum of their values (Barton and Uiterwijk, BNAIC 2014).
        AgreesWithPlainSearch(new BoardSearchOptions { RegionLeaves = true }, 1912, 2000);

    [Fact]
    public void RegionLeavesOfFewCellsAgreeWithPlainSearch() =>
        // A cap of four cells: most regions are too big to value, or are counted as one side's integer.
        AgreesWithPlainSearch(new BoardSearchOptions { RegionLeaves = true, RegionLeafCells = 4 }, 1913, 1500);

    [Fact]
    public void RegionLeavesWithoutTheOtherShortcutsAgreeWithPlainSearch() =>
        AgreesWithPlainSearch(new BoardSearchOptions
        {
            RegionLeaves = true, SafeMoveBounds = false, Symmetry = false, CountOrdering = false, History = false,
        }, 1914, 1000);

    [Fact]
    public void BlocksOnlyWhereRunsAreExactlyTwoAgreeWithPlainSearch() =>
        AgreesWithPlainSearch(new BoardSearchOptions { RunEndBlocks = false }, 1915, 600);

    /// <summary>
    /// The bounds on their own, at the root, on boards of up to 6×7 with a third to a half of the
    /// cells filled: whatever they decide, plain search decides the same. Run-end blocks must have
    /// changed the verdict on some of these boards, or the test would not exercise them.
    /// </summary>
    [Fact]
    public void TheBoundsDecideOnlyWhatPlainSearchDecides()
    {
        var brute = new BruteForce();
        var rnd = new Random(1916);
        int decided = 0, byRunEnds = 0;
        for (int n = 0; n < 20000; n++)
        {
            int rows = rnd.Next(2, 7), columns = rnd.Next(2, 8);
            double fill = 0.3 + 0.2 * rnd.NextDouble();
            var empty = new bool[rows * columns];
            for (int p = 0; p < empty.Length; p++) empty[p] = rnd.NextDouble() >= fill;
            if (empty.Count(e => e) > 26) continue;
            var position = (DomineeringPosition)Rules.Parse(string.Join("/", Enumerable.Range(0, rows).Select(r =>
                new string(Enumerable.Range(0, columns).Select(c => empty[r * columns + c] ? '.' : '#').ToArray()))));
            var shape = new BoardShape(rows, columns);
            var withEnds = new BoardSearch<ulong>(shape, new OutcomeTable(4), new StopSignal(), new BoardSearchOptions());
            var without = new BoardSearch<ulong>(shape, new OutcomeTable(4), new StopSignal(), new BoardSearchOptions { RunEndBlocks = false });
            withEnds.SetPosition(empty);
            without.SetPosition(empty);
            foreach (var side in new[] { Side.Left, Side.Right })
            {
                int s = side == Side.Left ? 0 : 1;
                int verdict = withEnds.BoundVerdict(s);
                if (verdict == 0) continue;
                decided++;
                if (without.BoundVerdict(s) != verdict) byRunEnds++;
                Assert.True(brute.Wins(position, side) == verdict > 0, $"{side.Word()} first on {position.Text}: the bounds say {(verdict > 0 ? "win" : "loss")}");
            }
        }
        Assert.True(decided > 10000, $"only {decided} positions decided by the bounds");
        Assert.True(byRunEnds > 2000, $"run-end blocks changed only {byRunEnds} verdicts");
    }

    [Fact]
    public void TheBlockAndSpareRaceHasItsClosedForms()
    {
        var sure = SureMoves.Shared;
        for (int x = 0; x <= SureMoves.MaxSpare; x++)
        {
            // Spares alone: the side takes one, the opponent spoils two (the previous bound, derived in docs/domineering.md).
            Assert.Equal((x + 2) / 3, sure.Get(0, 0, x, movesFirst: true));
            Assert.Equal((Math.Max(0, x - 2) + 2) / 3, sure.Get(0, 0, x, movesFirst: false));
        }
        for (int p = 0; p <= SureMoves.MaxBlocks; p++)
        {
            // Blocks alone: each one the side plays into is worth two moves, and the opponent spoils one per turn.
            Assert.Equal(2 * ((p + 1) / 2), sure.Get(p, 0, 0, movesFirst: true));
            Assert.Equal(2 * (p / 2), sure.Get(p, 0, 0, movesFirst: false));
        }
        for (int p = 0; p <= SureMoves.MaxBlocks; p++)
        {
            // In the margin race a block the side takes also takes the opponent's two moves in it: four.
            Assert.Equal(4 * ((p + 1) / 2), SureMoves.Margin.Get(p, 0, 0, movesFirst: true));
            Assert.Equal(4 * (p / 2), SureMoves.Margin.Get(p, 0, 0, movesFirst: false));
        }
        for (int v = 0; v <= SureMoves.MaxSpare; v++)
        {
            // Lone spares alone: the side takes one, the opponent spoils one.
            Assert.Equal((v + 1) / 2, sure.Get(0, v, 0, movesFirst: true));
            Assert.Equal(v / 2, sure.Get(0, v, 0, movesFirst: false));
        }
        // More material never lowers the figure.
        for (int p = 0; p < SureMoves.MaxBlocks; p += 3)
            for (int v = 0; v < SureMoves.MaxSpare; v += 2)
                for (int x = 0; x < SureMoves.MaxSpare; x++)
                    foreach (bool first in new[] { true, false })
                    {
                        Assert.True(sure.Get(p + 1, v, x, first) >= sure.Get(p, v, x, first));
                        Assert.True(sure.Get(p, v + 1, x, first) >= sure.Get(p, v, x, first));
                        Assert.True(sure.Get(p, v, x + 1, first) >= sure.Get(p, v, x, first));
                    }
    }

    [Fact]
    public void SkippingSafeMovesWithoutBoundsAgreesWithPlainSearch() =>
        AgreesWithPlainSearch(new BoardSearchOptions { SkipSafeMoves = true, SafeMoveBounds = false }, 1907, 800);

    /// <summary>
    /// Empty rectangles and their outcome classes. Sources: m×3 won by Vertical, 2k×n (n = 3, 5, 7)
    /// won by Vertical, 3×n (n &gt; 3) won by Horizontal, m×2k won by Horizontal for m = 5 and for
    /// m = 3, 7 with k &gt; 1 — Uiterwijk, "Perfectly solving Domineering boards", CGW 2013 (CCIS 408,
    /// 2014), all with Vertical first; Horizontal first on m×n is Vertical first on n×m with the
    /// roles swapped. 2×2 is ±1: Lachmann, Moore, Rapaport, MSRI Publ. 42 (2002).
    /// </summary>
    public static TheoryData<int, int, Outcome> Rectangles()
    {
        var data = new TheoryData<int, int, Outcome>();
        for (int m = 2; m <= 7; m++)
            for (int n = 2; n <= 7; n++)
            {
                var v = VerticalFirst(m, n);
                var h = VerticalFirst(n, m);
                if (v is null || h is null) continue;
                data.Add(m, n, OutcomeExtensions.FromWinners(v.Value ? Side.Left : Side.Right, h.Value ? Side.Right : Side.Left));
            }
        return data;
    }

    /// <summary>True when Vertical moving first wins m×n by the theorems of Uiterwijk (CGW 2013), false when Horizontal does, null when they do not say.</summary>
    private static bool? VerticalFirst(int m, int n)
    {
        if (m == 2 && n == 2) return true; // ±1 (Lachmann, Moore, Rapaport 2002)
        if (n == 3) return true; // every m×3 board, m > 1
        if (m % 2 == 0 && (n == 5 || n == 7)) return true; // 2k×n, n = 3, 5, 7
        if (m == 3 && n > 3) return false; // 3×n, n > 3
        if (n % 2 == 0 && (m == 5 || ((m == 3 || m == 7) && n >= 4))) return false; // m×2k
        return null;
    }

    [Theory]
    [MemberData(nameof(Rectangles))]
    public void EmptyRectanglesHaveTheirPublishedOutcomeClass(int m, int n, Outcome published)
    {
        var position = (DomineeringPosition)Rules.Parse($"{m}x{n}");
        var solver = new WholeBoard(new BoardSearchOptions { TableLog2 = 18 });
        var left = solver.Solve(position, Side.Left);
        var right = solver.Solve(position, Side.Right);
        var outcome = OutcomeExtensions.FromWinners(left.Win!.Value ? Side.Left : Side.Right, right.Win!.Value ? Side.Right : Side.Left);
        // Published class: see Rectangles and VerticalFirst for the source of each.
        Assert.Equal(published, outcome);
    }

    [Theory]
    // 5×5 is a second-player win, 6×6 a first-player win: the m×n table of
    // Breuker, Uiterwijk, van den Herik, "Solving 8×8 Domineering", TCS 230 (2000) — from memory,
    // agreeing with the class reported for these boards by the decomposition search of this project.
    [InlineData(5, 5, Outcome.P)]
    [InlineData(6, 6, Outcome.N)]
    public void SquaresHaveTheirPublishedOutcomeClass(int m, int n, Outcome published) => EmptyRectanglesHaveTheirPublishedOutcomeClass(m, n, published);

    [Fact]
    public void PerfectPlayerUsesTheWholeBoardSearchOnBigBoards()
    {
        var position = Rules.Parse("6x6");
        var d = new PerfectPlayer().Choose(position, Side.Left, TimeSpan.FromMinutes(2));
        // 6×6 is a first-player win (as above); the line starts with the chosen move.
        Assert.True(d.Exact);
        Assert.True(d.Winning);
        Assert.Equal(position.FormatMove(d.Move!.Value), d.Line![0]);
    }

    [Fact]
    public void ASavedTableResumesASolveAtTheSizeItWasWrittenWith()
    {
        var position = (DomineeringPosition)Rules.Parse("5x5");
        var first = new WholeBoard(new BoardSearchOptions { TableLog2 = 14 });
        var fresh = first.Solve(position, Side.Left);
        using var file = new MemoryStream();
        first.SaveTable(file);
        file.Position = 0;
        // A solver that would pick another size reads the table back at the saved one.
        var second = new WholeBoard(new BoardSearchOptions { TableLog2 = 18 });
        second.LoadTable(file);
        Assert.Equal(1L << 14, second.Table!.Buckets);
        var resumed = second.Solve(position, Side.Left);
        // 5×5 is a second-player win (as above); the resumed solve finds the root in the table.
        Assert.False(fresh.Win);
        Assert.Equal(fresh.Win, resumed.Win);
        Assert.True(resumed.Nodes < fresh.Nodes, $"resumed {resumed.Nodes} nodes, fresh {fresh.Nodes}");
    }

    [Fact]
    public void ATableFileOfAnotherKindIsRefusedWithWhatItStartsWith()
    {
        using var file = new MemoryStream();
        using (var w = new BinaryWriter(file, System.Text.Encoding.UTF8, leaveOpen: true)) w.Write("orchard-ledger/2");
        file.Position = 0;
        var e = Assert.Throws<InvalidDataException>(() => new WholeBoard().LoadTable(file));
        Assert.Contains("orchard-ledger/2", e.Message);
    }

    [Fact]
    public void ATableFileOfAnEarlierLayoutIsRefusedWithWhatToDo()
    {
        using var file = new MemoryStream();
        using (var w = new BinaryWriter(file, System.Text.Encoding.UTF8, leaveOpen: true))
        {
            w.Write("bramble-board-table/1");
            w.Write(4);
            w.Write(4);
        }
        file.Position = 0;
        var e = Assert.Throws<InvalidDataException>(() => new WholeBoard().LoadTable(file));
        Assert.Contains("earlier version", e.Message);
        Assert.Contains("solve again", e.Message);
    }

    [Fact]
    public void TheTableGrowsWithTheBoardAndStaysWithinTheMemory()
    {
        int previous = 0;
        for (int cells = 4; cells <= 128; cells += 4)
        {
            int log2 = WholeBoard.TableLog2For(cells);
            Assert.True(log2 >= previous, $"{cells} cells: 2^{log2} buckets after 2^{previous}");
            Assert.True(log2 == 16 || (32L << log2) <= GC.GetGCMemoryInfo().TotalAvailableMemoryBytes / 8);
            previous = log2;
        }
    }
}
