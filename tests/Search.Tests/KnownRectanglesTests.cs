using Bramble.Rules;
using Bramble.Rules.Domineering;
using Bramble.Search.Board;
using Bramble.Values;

namespace Bramble.Search.Tests;

/// <summary>
/// The published theorems on empty Domineering rectangles (<see cref="KnownRectangles"/>)
/// cross-checked against the whole-board search on every board where both answer quickly, and
/// against the other published results we could retrieve. Sources: J. W. H. M. Uiterwijk,
/// "Perfectly solving Domineering boards", CGW 2013 (Springer CCIS 408, 2014), abstract;
/// Uiterwijk, "The impact of safe moves on perfectly solving Domineering boards, part 3", ICGA
/// Journal 37(4) (2014), abstract — both with Vertical (Left) moving first.
/// </summary>
public class KnownRectanglesTests
{
    private static readonly IRuleset Rules = Rulesets.Get("domineering");

    /// <summary>
    /// Every rectangle up to 7×7 that a theorem covers, and the bigger ones up to 9 rows and
    /// columns whose short side is at most 5 (each under a tenth of a second), with each side to
    /// move a theorem covers. 6×9, 9×6, 7×8 and 8×7 agree too but take 6–53 s a side, so they are
    /// in bench/README.md ("Published figures"), not here.
    /// </summary>
    public static TheoryData<int, int, Side> CoveredBoards()
    {
        var data = new TheoryData<int, int, Side>();
        for (int m = 2; m <= 9; m++)
            for (int n = 2; n <= 9; n++)
                foreach (var side in new[] { Side.Left, Side.Right })
                    if ((m * n <= 49 || Math.Min(m, n) <= 5) && KnownRectangles.Winner(m, n, side) is not null) data.Add(m, n, side);
        return data;
    }

    [Theory]
    [MemberData(nameof(CoveredBoards))]
    public void TheoremAgreesWithTheWholeBoardSearch(int m, int n, Side first)
    {
        var known = KnownRectangles.Winner(m, n, first)!;
        var position = (DomineeringPosition)Rules.Parse($"{m}x{n}");
        var answer = new WholeBoard(new BoardSearchOptions { TableLog2 = 16, Threads = 1 }).Solve(position, first);
        // Published winner: known.Theorem names the theorem and its source (CGW 2013 or ICGA 2014, see the class comment).
        Assert.True(answer.Win == (known.Winner == first),
            $"{m}x{n}, {first.Word()} first: {known.Theorem.Name} ({known.Theorem.Source}) says {known.Winner.Word()} wins, the search says {(answer.Win == true ? first : first.Other()).Word()}");
    }

    [Fact]
    public void NoTwoTheoremsDisagreeOnAnyBoardUpTo40()
    {
        for (int m = 1; m <= 40; m++)
            for (int n = 1; n <= 40; n++)
            {
                var winners = KnownRectangles.All.Where(t => t.Covers(m, n)).Select(t => t.VerticalFirstWinner).Distinct().ToList();
                // The theorems of CGW 2013 and ICGA 2014 are all proved, so none may contradict another.
                Assert.True(winners.Count <= 1, $"{m}x{n}: the theorems disagree");
            }
    }

    [Theory]
    // "among the larger boards solved 4 were not solved before, i.e., 10×11, 14×11, 18×6, and 18×11,
    // all being a win for Vertical" — Uiterwijk, CGW 2013, abstract of the preprint; 18×6 is outside
    // the theorems, the others fall under 2k×11.
    [InlineData(10, 11, true)]
    [InlineData(14, 11, true)]
    [InlineData(18, 11, true)]
    [InlineData(18, 6, null)]
    // "3 boards that were not solved before, i.e., 6 x 15, being a win for Vertical, and 11 x 14 and
    // 11 x 18, both being a win for Horizontal" — Uiterwijk, "The impact of safe moves on perfectly
    // solving Domineering boards, part 1", ICGA Journal 37(2) (2014), abstract: 11×14 and 11×18 fall
    // under 11×2k, k ≥ 6 (part 3); 6×15 under no theorem (part 3 only conjectures (4k+2)×15).
    [InlineData(11, 14, false)]
    [InlineData(11, 18, false)]
    [InlineData(6, 15, null)]
    // "6 × 19, 10 × 15, 14 × 15, and 18 × 15, all being a win for Vertical" — part 2, ICGA Journal
    // 37(3) (2014), abstract: found by the knowledge rules, under no theorem.
    [InlineData(6, 19, null)]
    [InlineData(10, 15, null)]
    [InlineData(14, 15, null)]
    [InlineData(18, 15, null)]
    // "Using the convention that Vertical starts, the 8×15, 11×9, 12×8, 12×15, 14×8, and 17×6 boards
    // are all won by Vertical, whereas the 6×17, 8×12, 9×11, and 11×10 boards are all won by
    // Horizontal" — Uiterwijk, "11×11 Domineering is solved: the first player wins", CG 2016
    // (LNCS 10068), abstract: boards solved by search, none of them under a theorem.
    [InlineData(8, 15, null)]
    [InlineData(11, 9, null)]
    [InlineData(12, 8, null)]
    [InlineData(6, 17, null)]
    [InlineData(8, 12, null)]
    [InlineData(9, 11, null)]
    [InlineData(11, 10, null)]
    // 8×8 is a first-player win (Breuker, Uiterwijk, van den Herik, "Solving 8×8 Domineering",
    // TCS 230 (2000), abstract) and 11×11 too (CG 2016, abstract): solved by search, no theorem.
    [InlineData(8, 8, null)]
    [InlineData(11, 11, null)]
    public void TheoremsAgreeWithOtherPublishedResults(int m, int n, bool? verticalWins)
    {
        var known = KnownRectangles.Winner(m, n, Side.Left);
        // Source: see the comment above each row.
        Assert.Equal(verticalWins, known is null ? null : known.Winner == Side.Left);
    }

    [Fact]
    public void TwoByTwoIsAFirstPlayerWinAsPublished()
    {
        // "the 2 x 2 board is a win for the first player" — Lachmann, Moore, Rapaport, "Who wins Domineering
        // on rectangular boards?", MSRI Publ. 42 (2002), introduction. The other outcome found for boards up
        // to 8×8 outside the theorems, 8×8 a first-player win (Breuker, Uiterwijk, van den Herik, TCS 230
        // (2000), abstract), does not solve within seconds here (bench/README.md).
        var position = (DomineeringPosition)Rules.Parse("2x2");
        var solver = new WholeBoard(new BoardSearchOptions { TableLog2 = 12, Threads = 1 });
        Assert.Null(KnownRectangles.Winner(position, Side.Left));
        Assert.True(solver.Solve(position, Side.Left).Win);
        Assert.True(solver.Solve(position, Side.Right).Win);
    }

    [Fact]
    public void HorizontalFirstIsVerticalFirstOnTheTransposedBoard()
    {
        // 9×2 with Right first is 2×9 with Vertical first, a win for Vertical by 2k×n (CGW 2013): the
        // first player, here Right, wins.
        var known = KnownRectangles.Winner(9, 2, Side.Right)!;
        Assert.Equal(Side.Right, known.Winner);
        Assert.Same(KnownRectangles.EvenRowsOddColumns, known.Theorem);
    }

    [Fact]
    public void BoardsWithFilledCellsAreNotAnsweredByTheorems()
    {
        var position = (DomineeringPosition)Rules.Parse("..../..../..../..#./..../..../..../..../....");
        // The theorems are about empty rectangles only (CGW 2013): 9×4 with one cell filled gets no answer.
        Assert.Null(KnownRectangles.Winner(position, Side.Left));
        Assert.NotNull(KnownRectangles.Winner((DomineeringPosition)Rules.Parse("9x4"), Side.Left));
    }
}
