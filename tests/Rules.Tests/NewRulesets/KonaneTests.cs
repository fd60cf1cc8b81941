using Bramble.Values;

namespace Bramble.Rules.Tests.NewRulesets;

public class KonaneTests
{
    private readonly IRuleset _rules = Rulesets.Get("konane");
    private readonly ValueContext _context = new();

    private Game V(string text) => _rules.Value(_rules.Parse(text), _context);
    private Game G(string value) => _context.Store.Parse(value);

    [Fact]
    public void SmallLinesWorkedFromTheRules()
    {
        // Derived from the definitions (the rules as stated by Ernst, "Playing Konane mathematically", UMAP
        // Journal 16(2), 1995; his tables of values were not retrieved, so none is quoted here).
        // xo. : Left's one jump leaves a lone stone (0), Right has none: {0|} = 1.
        Assert.Equal(G("1"), V("xo."));
        Assert.Equal(G("-1"), V(".xo"));
        Assert.Equal(G("0"), V("xo"));
        // xo.o. : Left may stop after one jump (..xo. = {0|0} = *) or go on (....x = 0); Right cannot move: {0,*|} = 1.
        Assert.Equal(G("*"), V("..xo."));
        Assert.Equal(G("1"), V("xo.o."));
    }

    [Fact]
    public void RandomBoardsMatchPlainSearchSplitExactlyAndImagesAgree()
    {
        var plain = new PlainGame(_context.Store, (t, s) => PlainGame.StoneOptions(t, s, konane: true));
        var random = new Random(1995);
        int split = 0;
        for (int i = 0; i < 2000; i++)
        {
            string text;
            if (i % 2 == 0)
            {
                int h = random.Next(1, 4), w = random.Next(2, 6);
                text = string.Join("/", Enumerable.Range(0, h).Select(_ => new string(Enumerable.Range(0, w).Select(_ => "xo.."[random.Next(4)]).ToArray())));
            }
            else
            {
                // Two short lines with a gap between: far enough apart, they are separate components.
                string Patch() => new(Enumerable.Range(0, random.Next(2, 5)).Select(_ => "xo."[random.Next(3)]).ToArray());
                text = Patch() + new string('.', random.Next(1, 8)) + Patch();
            }
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
            if (i < 500)
            {
                // A fresh memo, so the image is searched rather than read from the original's entry.
                Assert.True(value == _rules.Value(_rules.Parse(turned), new ValueContext(_context.Store)), turned);
                Assert.True(_context.Store.Negate(value) == _rules.Value(_rules.Parse(swapped), new ValueContext(_context.Store)), swapped);
            }
        }
        Assert.True(split > 40, $"only {split} boards split");
    }

    [Fact]
    public void MovesJumpAlongALineAndMayStopAfterAnyJump()
    {
        var p = _rules.Parse("xo.o.");
        Assert.Equal(["a1-c1", "a1-e1"], p.Moves(Side.Left).Select(p.FormatMove));
        Assert.Equal("....x", p.Play(Side.Left, p.ParseMove("a1-e1")).Text);
        Assert.Equal("..xo.", p.Play(Side.Left, p.ParseMove("a1-c1")).Text);
        Assert.Throws<IllegalMoveException>(() => p.Play(Side.Left, p.ParseMove("a1-d1")));
        Assert.Throws<IllegalMoveException>(() => p.Play(Side.Right, p.ParseMove("b1-c1")));
        Assert.Throws<IllegalMoveException>(() => p.ParseMove("a1"));
    }

    [Fact]
    public void ReaderPointsAtFaults()
    {
        var e = Assert.Throws<PositionSyntaxException>(() => _rules.Parse("xo./x"));
        Assert.Equal(5, e.Column);
        foreach (var text in PlainGame.FuzzTexts(new Random(13), "xo./#4 x", ["xo./..x", "4x4"], 3000))
            PlainGame.ReadsOrPointsAtFault(_rules, text);
    }
}
