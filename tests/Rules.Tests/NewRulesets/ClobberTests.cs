using Bramble.Values;

namespace Bramble.Rules.Tests.NewRulesets;

public class ClobberTests
{
    private readonly IRuleset _rules = Rulesets.Get("clobber");
    private readonly ValueContext _context = new();

    private Game V(string text) => _rules.Value(_rules.Parse(text), _context);

    [Fact]
    public void OneStoneOfEachColourIsStar()
    {
        // Worked example, derived from the definitions: each side's only move leaves a lone stone, 0.
        Assert.Equal(_context.Store.Star, V("xo"));
        Assert.Equal(_context.Store.Star, V("o/x"));
    }

    [Fact]
    public void AlternatingStripsOfEvenLengthAreFirstPlayerWinsExceptLengthSix()
    {
        // Albert, Grossman, Nowakowski, Wolfe, "An introduction to Clobber" (INTEGERS 5(2), 2005) conjectured, and
        // arXiv:2509.08985 (2025) proved, that the alternating 1×n strip of even length is a first-player win
        // except for n = 6, where it is 0 (as recorded from those sources; the exact wording was not retrieved).
        for (int n = 2; n <= 12; n += 2)
        {
            string strip = string.Concat(Enumerable.Repeat("xo", n / 2));
            var outcome = _context.Store.OutcomeOf(V(strip));
            if (n == 6) Assert.Equal(_context.Store.Zero, V(strip));
            else Assert.True(outcome == Outcome.N, $"{strip} is {outcome}");
        }
    }

    [Fact]
    public void RandomBoardsMatchPlainSearchSplitExactlyAndImagesAgree()
    {
        var plain = new PlainGame(_context.Store, (t, s) => PlainGame.StoneOptions(t, s, konane: false));
        var random = new Random(77);
        int split = 0;
        for (int i = 0; i < 1200; i++)
        {
            // Half the boards are two patches with an empty column between, so many split.
            int h = random.Next(1, 4), w = random.Next(1, 4);
            bool twoPatches = i % 2 == 1;
            string Patch(int width) => new(Enumerable.Range(0, width).Select(_ => "xo."[random.Next(3)]).ToArray());
            string Row() => twoPatches ? Patch(w) + "." + Patch(2) : Patch(w + 1);
            string text = string.Join("/", Enumerable.Range(0, h).Select(_ => Row()));
            var position = _rules.Parse(text);
            var value = _rules.Value(position, _context);
            // Common practice: the memoised value equals plain search of the whole board.
            Assert.True(plain.Value(text) == value, text);
            var parts = position.Components();
            if (parts.Count > 1) split++;
            // Common practice: the groups' values add up to the whole searched as one.
            Assert.True(_context.Store.Sum(parts.Select(c => plain.Value(c.Text))) == value, text);
            // Derived from the rules: a half turn keeps the game; swapping colours swaps the players.
            string turned = new(text.Reverse().ToArray());
            string swapped = new(text.Select(c => c == 'x' ? 'o' : c == 'o' ? 'x' : c).ToArray());
            Assert.Equal(position.NormalKey, _rules.Parse(turned).NormalKey);
            if (i < 300)
            {
                // A fresh memo, so the image is searched rather than read from the original's entry.
                Assert.True(value == _rules.Value(_rules.Parse(turned), new ValueContext(_context.Store)), turned);
                Assert.True(_context.Store.Negate(value) == _rules.Value(_rules.Parse(swapped), new ValueContext(_context.Store)), swapped);
            }
            // Every Clobber value is all-small, so its atomic weight exists (Albert et al. 2005; Winning Ways ch. 8).
            Assert.NotNull(_context.Store.AtomicWeight(value));
        }
        Assert.True(split > 100, $"only {split} boards split");
    }

    [Fact]
    public void AtomicWeightsOfClobberPositionsAddAndObeyTheTwoAheadRule()
    {
        var store = _context.Store;
        var random = new Random(3);
        var values = new List<Game>();
        for (int i = 0; i < 300; i++)
        {
            int h = random.Next(1, 3), w = random.Next(2, 5);
            string text = string.Join("/", Enumerable.Range(0, h).Select(_ => new string(Enumerable.Range(0, w).Select(_ => "xxo."[random.Next(4)]).ToArray())));
            values.Add(V(text));
        }
        int decided = 0;
        for (int i = 0; i < 400; i++)
        {
            var g = values[random.Next(values.Count)];
            var h = values[random.Next(values.Count)];
            var awG = store.AtomicWeight(g)!.Value;
            var awH = store.AtomicWeight(h)!.Value;
            var awSum = store.AtomicWeight(store.Add(g, h));
            Assert.NotNull(awSum);
            // Atomic weight is additive (Winning Ways ch. 8; Siegel, Combinatorial Game Theory, 2013, ch. II.7) — from memory.
            Assert.True(store.Add(awG, awH) == awSum!.Value, $"aw({store.Format(g)} + {store.Format(h)})");
            // Two-ahead rule (Winning Ways ch. 8) — from memory: aw ≥ 2 gives G > 0, aw ≤ −2 gives G < 0.
            var sum = store.Add(g, h);
            if (store.Leq(store.Integer(2), awSum.Value)) { Assert.True(store.Less(store.Zero, sum)); decided++; }
            if (store.Leq(awSum.Value, store.Integer(-2))) { Assert.True(store.Less(sum, store.Zero)); decided++; }
        }
        Assert.True(decided > 10, $"only {decided} sums had weight two or more");
    }

    [Fact]
    public void MovesAreFromToAndComponentsKeepNames()
    {
        var p = _rules.Parse("xo./..x/..o");
        Assert.Equal(["a1-b1", "c2-c3"], p.Moves(Side.Left).Select(p.FormatMove));
        Assert.Equal(p.ParseMove("a1-b1"), p.ParseMove("a1xb1"));
        Assert.Equal(".x./..x/..o", p.Play(Side.Left, p.ParseMove("a1-b1")).Text);
        Assert.Throws<IllegalMoveException>(() => p.Play(Side.Left, p.ParseMove("a1-a2")));
        Assert.Throws<IllegalMoveException>(() => p.ParseMove("z9-a1"));
        var parts = p.Components();
        Assert.Equal(2, parts.Count);
        Assert.Equal("c2-c3", parts[1].FormatMove(parts[1].Moves(Side.Left)[0]));
    }

    [Fact]
    public void ReaderPointsAtFaults()
    {
        Assert.Equal("xox/oxo", _rules.Parse("2x3").Text);
        Assert.Equal("xo./oox", _rules.Parse("●○□/WWB").Text);
        var e = Assert.Throws<PositionSyntaxException>(() => _rules.Parse("xo/xq"));
        Assert.Equal(4, e.Column);
        foreach (var text in PlainGame.FuzzTexts(new Random(11), "xo./#2 \n", ["xox/o.x", "3x4"], 3000))
            PlainGame.ReadsOrPointsAtFault(_rules, text);
    }
}
