using Bramble.Rules.Domineering;
using Bramble.Values;

namespace Bramble.Rules.Tests.Domineering;

/// <summary>Values and outcome classes from the literature (published Domineering results (Lachmann, Moore, Rapaport; Bullock)), compared through exact values.</summary>
public class PublishedValuesTests
{
    private readonly DomineeringRuleset _rules = new();
    private readonly ValueContext _context = new();
    private GameStore S => _context.Store;

    private Game Value(string board) => _rules.Value(_rules.Parse(board), _context);

    private static string Rectangle(int rows, int columns) => $"{rows}x{columns}";

    [Theory]
    [InlineData(1)] [InlineData(2)] [InlineData(3)] [InlineData(4)] [InlineData(7)] [InlineData(10)]
    public void VerticalStripOfNCellsIsHalfNRoundedDown(int n)
    {
        // Source: Wikipedia, "Domineering" (a vertical strip of n cells is ⌊n/2⌋).
        Assert.Equal(S.Integer(n / 2), Value(Rectangle(n, 1)));
    }

    [Theory]
    [InlineData(1)] [InlineData(2)] [InlineData(3)] [InlineData(4)] [InlineData(7)] [InlineData(10)]
    public void HorizontalStripOfNCellsIsMinusHalfNRoundedDown(int n)
    {
        // Source: Wikipedia, "Domineering" (a horizontal strip of n cells is −⌊n/2⌋).
        Assert.Equal(S.Integer(-(n / 2)), Value(Rectangle(1, n)));
    }

    [Fact]
    public void TwoByTwoSquareIsPlusMinusOne()
    {
        var value = Value("2x2");
        // Source: Lachmann, Moore, Rapaport, "Who wins Domineering on rectangular boards?", MSRI Publ. 42 (2002): 2×2 is ±1.
        Assert.Equal(S.Make([S.Integer(1)], [S.Integer(-1)]), value);
        // Same source: a first-player win.
        Assert.Equal(Outcome.N, S.OutcomeOf(value));
    }

    [Fact]
    public void TwoRowsThreeColumnsIsTwoSlashMinusHalf()
    {
        // Source: Wikipedia, "Domineering": the 2×3 board (2 rows, 3 columns) is {2 | −1/2}.
        Assert.Equal(S.Make([S.Integer(2)], [S.Number(Dyadic.Create(-1, 1))]), Value("2x3"));
    }

    [Fact]
    public void ThreeRowsTwoColumnsIsHalfSlashMinusTwo()
    {
        // Source: Wikipedia, "Domineering" (2×3 = {2 | −1/2}); the transpose negates: {1/2 | −2}.
        Assert.Equal(S.Make([S.Number(Dyadic.Half)], [S.Integer(-2)]), Value("3x2"));
    }

    [Fact]
    public void LShapedTrominoIsStar()
    {
        // Derived from the definitions (published Domineering results (Lachmann, Moore, Rapaport; Bullock) [D]): each side has one move, to a lone cell (0).
        Assert.Equal(S.Star, Value(".#/.."));
        Assert.Equal(S.Star, Value("../#."));
    }

    [Fact]
    public void LShapedTetrominoIsMinusHalf()
    {
        // Derived from the definitions: Left's only move leaves a horizontal pair (−1); Right can leave
        // a vertical pair (1) or two lone cells (0); {−1 | 0, 1} = −1/2.
        Assert.Equal(S.Number(Dyadic.Create(-1, 1)), Value("##./..."));
    }

    public static TheoryData<int, int, Side> TheoremBoards() => new()
    {
        // Uiterwijk, "Perfectly solving Domineering boards", CGW 2013 (CCIS 408, 2014), Vertical moving first:
        // every m×3 board (m > 1) is won by Vertical.
        { 2, 3, Side.Left }, { 3, 3, Side.Left }, { 4, 3, Side.Left }, { 5, 3, Side.Left },
        // every 2k×n board with n = 3, 5, 7, ... is won by Vertical.
        { 2, 5, Side.Left }, { 2, 7, Side.Left },
        // every 3×n board (n > 3) is won by Horizontal.
        { 3, 4, Side.Right }, { 3, 5, Side.Right },
        // every m×2k board with m = 5 is won by Horizontal; with m = 3 and k > 1 too.
        { 5, 2, Side.Right },
    };

    [Theory]
    [MemberData(nameof(TheoremBoards))]
    public void RectangleWinnerWithVerticalFirstFollowsTheTheorems(int rows, int columns, Side winner)
    {
        var value = Value(Rectangle(rows, columns));
        // Source: J. W. H. M. Uiterwijk, "Perfectly solving Domineering boards", CGW 2013 (see TheoremBoards).
        Assert.Equal(winner, S.OutcomeOf(value).WinnerMovingFirst(Side.Left));
    }

    [Theory]
    [MemberData(nameof(TheoremBoards))]
    public void TransposedRectangleWinnerWithHorizontalFirstIsTheMirrorStatement(int rows, int columns, Side winner)
    {
        // published Domineering results (Lachmann, Moore, Rapaport; Bullock): Horizontal first on m×n is Vertical first on n×m with the roles swapped.
        var value = Value(Rectangle(columns, rows));
        // Source: Uiterwijk, CGW 2013, as above, read on the transposed board.
        Assert.Equal(winner.Other(), S.OutcomeOf(value).WinnerMovingFirst(Side.Right));
    }

    [Fact]
    public void NoRegionOfAtMostTenCellsIsHotterThanTwo()
    {
        foreach (var region in _rules.ComponentsUpTo(10)) _rules.Value(region, _context);
        // [from memory] OEIS A000105: 1 + 2 + 5 + 12 + 35 + 108 + 369 + 1285 + 4655 = 6472 free polyominoes of 2 to 10 cells.
        Assert.Equal(6472, _context.Memo.Count);
        var hottest = _context.Memo.Values.Distinct().Max(g => S.Temperature(g));
        // Source: Uiterwijk & Barton, "New results for Domineering from combinatorial game theory endgame
        // databases", Theoretical Computer Science (2015): no single region of at most 15 cells is hotter than 2.
        Assert.True(hottest <= Dyadic.FromInteger(2), $"hottest region has temperature {hottest}");
    }
}
