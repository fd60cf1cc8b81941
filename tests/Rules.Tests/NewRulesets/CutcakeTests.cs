using Bramble.Values;

namespace Bramble.Rules.Tests.NewRulesets;

public class CutcakeTests
{
    private readonly IRuleset _rules = Rulesets.Get("cutcake");

    /// <summary>
    /// Winning Ways ch. 2 closed form (from memory, not checked against the text): with 2^a ≤ columns
    /// &lt; 2^(a+1) and 2^b ≤ rows &lt; 2^(b+1), a piece is worth ⌊columns/2^b⌋ − 1 when a &gt; b,
    /// −(⌊rows/2^a⌋ − 1) when b &gt; a, and 0 when a = b (Left cuts between columns).
    /// </summary>
    private static long ClosedForm(int rows, int columns)
    {
        int a = (int)Math.Log2(columns), b = (int)Math.Log2(rows);
        return a > b ? (columns >> b) - 1 : b > a ? -((rows >> a) - 1) : 0;
    }

    [Fact]
    public void EveryPieceUpToSixteenBySixteenMatchesTheClosedForm()
    {
        var context = new ValueContext();
        for (int r = 1; r <= 16; r++)
            for (int c = 1; c <= 16; c++)
                // Winning Ways ch. 2 (from memory): the closed form above.
                Assert.Equal(context.Store.Integer(ClosedForm(r, c)), _rules.Value(_rules.Parse($"{r}x{c}"), context));
    }

    [Fact]
    public void RandomSumsMatchPlainSearchAndSplitExactly()
    {
        var context = new ValueContext();
        var plain = new PlainGame(context.Store, PlainGame.CakeOptions);
        var random = new Random(41);
        // Pieces up to 3x4: the plain search walks every multiset of pieces a sum can be cut into,
        // and three 5x5 pieces already give more of those than a unit test can afford.
        for (int i = 0; i < 1500; i++)
        {
            var pieces = Enumerable.Range(0, random.Next(1, 4)).Select(_ => $"{random.Next(1, 4)}x{random.Next(1, 5)}").ToList();
            var position = _rules.Parse(string.Join(" + ", pieces));
            var value = _rules.Value(position, context);
            pieces.Sort(StringComparer.Ordinal);
            // Common practice: the memoised value equals plain search of the whole sum.
            Assert.Equal(plain.Value(string.Join("+", pieces)), value);
            // Common practice: the value of a sum is the sum of its components' values.
            Assert.Equal(value, context.Store.Sum(position.Components().Select(c => _rules.Value(c, new ValueContext(context.Store)))));
        }
    }

    [Fact]
    public void TransposedPieceHasTheNegatedValueAndTheNegatedKey()
    {
        var store = new GameStore();
        for (int r = 1; r <= 7; r++)
            for (int c = 1; c <= 7; c++)
            {
                var p = _rules.Parse($"{r}x{c}");
                var t = _rules.Parse($"{c}x{r}");
                // Derived from the rules: turning the cake a quarter turn swaps Left's cuts and Right's.
                Assert.Equal(store.Negate(_rules.Value(p, new ValueContext(store))), _rules.Value(t, new ValueContext(store)));
                if (r != c && r * c > 1) Assert.Equal(p.NormalKey.TrimStart('-'), t.NormalKey.TrimStart('-'));
            }
    }

    [Fact]
    public void MovesAreNamedByPieceAndCutAndRenumberAfterACut()
    {
        var p = _rules.Parse("2x3 + 1x2");
        Assert.Equal(["1.v1", "1.v2", "2.v1"], p.Moves(Side.Left).Select(p.FormatMove));
        Assert.Equal(["1.h1"], p.Moves(Side.Right).Select(p.FormatMove));
        var after = p.Play(Side.Left, p.ParseMove("1.v1"));
        Assert.Equal("2x1 + 2x2 + 1x2", after.Text);
        Assert.Throws<IllegalMoveException>(() => p.Play(Side.Right, p.ParseMove("1.v1")));
        Assert.Throws<IllegalMoveException>(() => p.Play(Side.Left, p.ParseMove("2.v5")));
        Assert.Throws<IllegalMoveException>(() => p.ParseMove("v1"));
        // A component keeps its piece number, so its moves play on the whole position.
        var second = p.Components()[1];
        Assert.Equal("2.v1", second.FormatMove(second.Moves(Side.Left)[0]));
    }

    [Fact]
    public void ReaderAcceptsSizesAndDrawingsAndPointsAtFaults()
    {
        Assert.Equal("2x4 + 1x3", _rules.Parse("..../.... + 1 x 3").Text);
        Assert.Equal("0", _rules.Parse(" 0 ").Text);
        var e = Assert.Throws<PositionSyntaxException>(() => _rules.Parse("3x4 + 2y5"));
        Assert.Equal(7, e.Column);
        foreach (var text in PlainGame.FuzzTexts(new Random(5), "0123x+ ./#", ["3x4 + 2x5", "../.. + 1x1"], 3000))
            PlainGame.ReadsOrPointsAtFault(_rules, text);
    }
}
