namespace Bramble.Values.Tests;

public class CanonicalFormTests
{
    private readonly GameStore _store = new();

    [Theory]
    // Canonical forms, Winning Ways ch. 3 and Siegel, Combinatorial Game Theory (2013) — derived from the definitions by exhaustive play.
    [InlineData("{0|*}", "↑")]
    [InlineData("{0,*|0}", "↑*")]
    [InlineData("{0|↑*}", "⇑")]
    [InlineData("{0|↑}", "⇑*")]
    [InlineData("{0|⇑*}", "3↑")]
    [InlineData("{*|0}", "↓")]
    [InlineData("{0,*|0,*}", "*2")]
    [InlineData("{0|0}", "*")]
    [InlineData("{|}", "0")]
    [InlineData("{0|}", "1")]
    [InlineData("{0|1}", "1/2")]
    [InlineData("{1|0}", "{1|0}")]
    [InlineData("{2|-2}", "±2")]
    [InlineData("{3|1,*}", "{3|*}")]
    [InlineData("{1|0,*}", "{1|0,*}")]
    [InlineData("{2||1|0}", "{2||1|0}")]
    public void CanonicalFormsAndNotation(string written, string canonical)
    {
        var g = _store.Parse(written);
        Assert.Equal(canonical, _store.Format(g));
        Assert.Equal(g, _store.Parse(canonical));
    }

    [Fact]
    public void UpsAreTheStoresUpStarFamily()
    {
        // ↑, ⇑, ⇑* positive; ↑* fuzzy (Winning Ways ch. 3; derived from the definitions by exhaustive play).
        Assert.Equal(Outcome.L, _store.OutcomeOf(_store.Parse("↑")));
        Assert.Equal(Outcome.L, _store.OutcomeOf(_store.Parse("⇑")));
        Assert.Equal(Outcome.L, _store.OutcomeOf(_store.Parse("⇑*")));
        Assert.Equal(Outcome.N, _store.OutcomeOf(_store.Parse("↑*")));
        Assert.Equal(_store.Parse("⇑"), _store.Add(_store.Up, _store.Up));
        Assert.Equal(_store.Parse("↑*"), _store.Add(_store.Up, _store.Star));
    }

    [Fact]
    public void SumsBuiltFromOptionsMatchTheUpStarShortcut()
    {
        // n·↑ + *m computed by the tag shortcut equals the sum computed from options (derived from the definitions).
        var viaTrees = new GameStore();
        for (int n = -4; n <= 4; n++)
            for (int m = 0; m < 4; m++)
            {
                var tagged = _store.UpStar(Dyadic.Zero, n, m);
                var tree = TreeGame.FromStore(_store, tagged);
                var rebuilt = tree.ToStore(viaTrees);
                Assert.Equal(_store.Format(tagged), viaTrees.Format(rebuilt));
            }
    }

    [Theory]
    [InlineData("↑", "1")]
    [InlineData("⇑", "2")]
    [InlineData("3↑", "3")]
    [InlineData("↓", "-1")]
    [InlineData("↑*", "1")]
    [InlineData("*", "0")]
    [InlineData("*3", "0")]
    [InlineData("0", "0")]
    public void AtomicWeights(string game, string weight)
    {
        // aw(n·↑) = n, aw(↑*) = 1, aw(*n) = 0 — derived from the definitions by exhaustive play (aw(tiny) is left out: tiny is not all-small) [M: from memory, Winning Ways ch. 8].
        var aw = _store.AtomicWeight(_store.Parse(game));
        Assert.NotNull(aw);
        Assert.Equal(_store.Parse(weight), aw!.Value);
    }

    [Fact]
    public void AtomicWeightIsUndefinedForNonAllSmallGames()
    {
        Assert.Null(_store.AtomicWeight(_store.Parse("{1|0}")));
        Assert.Null(_store.AtomicWeight(_store.Parse("1/2")));
    }

    [Fact]
    public void TwoAheadRuleOnRandomAllSmallGames()
    {
        // Two-ahead rule: aw(G) ≥ 2 implies G > 0, aw(G) ≤ -2 implies G < 0 (Winning Ways ch. 8; Siegel 2013 ch. II) [M].
        var rng = new Random(17);
        int checkedCount = 0;
        for (int i = 0; i < 3000; i++)
        {
            var g = RandomAllSmall(rng, 4);
            var aw = _store.AtomicWeight(g);
            Assert.NotNull(aw);
            if (_store.Leq(_store.Integer(2), aw!.Value)) { Assert.Equal(Outcome.L, _store.OutcomeOf(g)); checkedCount++; }
            if (_store.Leq(aw.Value, _store.Integer(-2))) { Assert.Equal(Outcome.R, _store.OutcomeOf(g)); checkedCount++; }
        }
        Assert.True(checkedCount > 20);
    }

    private Game RandomAllSmall(Random rng, int depth)
    {
        if (depth == 0 || rng.Next(4) == 0) return _store.Zero;
        var l = Enumerable.Range(0, rng.Next(1, 3)).Select(_ => RandomAllSmall(rng, depth - 1)).ToArray();
        var r = Enumerable.Range(0, rng.Next(1, 3)).Select(_ => RandomAllSmall(rng, depth - 1)).ToArray();
        var g = _store.Make(l, r);
        // add a few ups so weights spread out
        return rng.Next(3) == 0 ? _store.Add(g, _store.UpStar(Dyadic.Zero, rng.Next(-3, 4), 0)) : g;
    }

    [Fact]
    public void OrdinalSumOfBlueEdgeMatchesTheFormula()
    {
        // 1:x = x + 1 for x ≥ 0, else (x + j)/2^(j-1) with j the least positive integer with x + j > 1
        // (Winning Ways vol. 1 ch. 2; On Numbers and Games: the formula [M], the ordinal sum itself [P], Winning Ways ch. 2).
        var one = _store.Integer(1);
        var rng = new Random(23);
        for (int i = 0; i < 300; i++)
        {
            var x = Dyadic.Create(rng.Next(-40, 40), rng.Next(0, 4));
            Dyadic expected;
            if (x.Sign >= 0) expected = x + Dyadic.One;
            else
            {
                int j = 1;
                while (x + j <= Dyadic.One) j++;
                expected = (x + j).Shift(j - 1);
            }
            Assert.True(_store.TryGetNumber(_store.OrdinalSum(one, _store.Number(x)), out var got));
            Assert.Equal(expected, got);
        }
    }

    [Fact]
    public void OrdinalSumExamples()
    {
        // Blue-red stalks via ordinal sums: BR = 1:(-1) = 1/2, BRR = 1:(-1:-1) = 1/4 (Winning Ways vol. 1 ch. 2; On Numbers and Games, sign expansion, derived).
        var blue = _store.Integer(1);
        var red = _store.Integer(-1);
        Assert.Equal(_store.Parse("1/2"), _store.OrdinalSum(blue, red));
        Assert.Equal(_store.Parse("1/4"), _store.OrdinalSum(blue, _store.OrdinalSum(red, red)));
        // A green edge topped by a blue edge: *:1 = ↑* (derived from the definitions by exhaustive play, GB = ↑*, derived from the definitions).
        Assert.Equal(_store.Parse("↑*"), _store.OrdinalSum(_store.Star, blue));
        // *:* = *2 (a green stalk of two edges, Winning Ways ch. 7).
        Assert.Equal(_store.Nimber(2), _store.OrdinalSum(_store.Star, _store.Star));
    }
}
