using Bramble.Values;

namespace Bramble.Rules.Tests.NewRulesets;

public class ToadsAndFrogsTests
{
    private readonly IRuleset _rules = Rulesets.Get("toads-and-frogs");
    private readonly ValueContext _context = new();

    private Game V(string text) => _rules.Value(_rules.Parse(text), _context);
    private Game G(string value) => _context.Store.Parse(value);

    [Fact]
    public void SmallValuesFromEricksonsProgramNotes()
    {
        // J. Erickson, notes to his Toads and Frogs program (HELP_TOADS): "|t f| returns *" and "|t tf| = 1/2".
        Assert.Equal(G("*"), V("T.F"));
        Assert.Equal(G("1/2"), V("T.TF"));
        // Same notes: after Left's move "| tf| = 0"; after Right's "|ft | = 1".
        Assert.Equal(G("0"), V(".TF"));
        Assert.Equal(G("1"), V("FT."));
    }

    [Fact]
    public void TheOpeningGameOfEricksonsPaperIsAFirstPlayerWin()
    {
        // Erickson, "New Toads and Frogs results" (1996), p. 299: in TT□FF "Left moves first and wins",
        // along TT□FF, T□TFF, TFT□F, TF□TF, TFFT□, TFF□T with every move forced.
        string[] line = ["TT.FF", "T.TFF", "TFT.F", "TF.TF", "TFFT.", "TFF.T"];
        var p = _rules.Parse(line[0]);
        for (int k = 1; k < line.Length; k++)
        {
            var side = k % 2 == 1 ? Side.Left : Side.Right;
            var moves = p.Moves(side);
            Assert.Single(moves);
            p = p.Play(side, moves[0]);
            Assert.Equal(line[k], p.Text);
        }
        Assert.Empty(p.Moves(Side.Right));
        // By the mirror symmetry Right moving first wins too: a first-player win.
        Assert.Equal(Outcome.N, _context.Store.OutcomeOf(V("TT.FF")));
        Assert.Equal(G("*"), V("TT.FF"));
        // Derived from the definitions (T□TFF = {0 | TFT□F} = {0|*}): ↑.
        Assert.Equal(G("↑"), V("T.TFF"));
    }

    [Fact]
    public void EricksonsConjectureE1ForTwoEmptySquares()
    {
        // Erickson's conjecture E1 (1996), as restated by T. Thanatipanonda, "Further hopping with Toads
        // and Frogs", Electronic J. Combinatorics 18 (2011): T^a □□ F^b = {{a−3 | a−b} | {* | 3−b}} for all
        // a > b ≥ 2. (The retrieved text lost the □ symbols; the family with two empty squares is the one
        // these values fit — with one empty square every such start is *, checked below.)
        for (int b = 2; b <= 4; b++)
            for (int a = b + 1; a <= 7; a++)
            {
                var expected = G($"{{{{{a - 3}|{a - b}}}|{{*|{3 - b}}}}}");
                Assert.True(expected == V($"T^{a}□□F^{b}"), $"T^{a}□□F^{b}");
                // Derived by the same search: one empty square between the armies leaves *.
                Assert.Equal(G("*"), V($"T^{a}□F^{b}"));
            }
    }

    [Fact]
    public void EricksonsConjecturesE2AndE3ForThreeEmptySquares()
    {
        // Erickson's conjectures as restated by Thanatipanonda, "Further hopping with Toads and Frogs",
        // Electronic J. Combinatorics 18 (2011): "E2: T^a □□□ FF = {a − 2 | a − 2} for all a ≥ 2." and
        // "E3: T^a □□□ FFF = a − 7/2 for all a ≥ 5." (The retrieved text lost the □ symbols; three empty
        // squares is the count these values fit — two squares is E1's family, whose values differ — and
        // the same paper lists T^a □□□ FFF among the families it settles.)
        for (int a = 2; a <= 9; a++)
            Assert.True(G($"{{{a - 2}|{a - 2}}}") == V($"T^{a}□□□FF"), $"T^{a}□□□FF");
        for (int a = 5; a <= 9; a++)
            Assert.True(G($"{2 * a - 7}/2") == V($"T^{a}□□□FFF"), $"T^{a}□□□FFF");
    }

    [Fact]
    public void RandomStripsMatchPlainSearchSplitExactlyAndMirrorToTheNegative()
    {
        var plain = new PlainGame(_context.Store, PlainGame.StripOptions);
        var random = new Random(2024);
        int split = 0;
        for (int i = 0; i < 3000; i++)
        {
            var chars = Enumerable.Range(0, random.Next(2, 10)).Select(_ => "TF..#"[random.Next(random.Next(2) == 0 ? 4 : 5)]).ToArray();
            // Every third strip is two strips with a wall between, so many split.
            string text = i % 3 == 0 ? new string(chars) + "#" + new string(chars.Reverse().ToArray()) : new(chars);
            if (text.All(c => c == '#')) continue;
            // Common practice: the memoised value equals plain search of the whole strip, and the parts' values add up to it.
            var (position, value, splits) = plain.Check(_rules, _context, text);
            if (splits) split++;
            // Derived from the rules: reversing the strip and swapping toads with frogs swaps the players.
            string mirror = new(text.Reverse().Select(c => c == 'T' ? 'F' : c == 'F' ? 'T' : c).ToArray());
            if (i < 1000)
            {
                // A fresh memo, so the image is searched rather than read from the original's entry.
                Assert.True(_context.Store.Negate(value) == _rules.Value(_rules.Parse(mirror), new ValueContext(_context.Store)), mirror);
            }
            Assert.Equal(Flip(position.NormalKey), _rules.Parse(mirror).NormalKey);
        }
        Assert.True(split > 100, $"only {split} strips split");
    }

    /// <summary>The key of the mirror image: each component key's sign flips, except for self-mirrored components.</summary>
    private static string Flip(string key)
    {
        if (key == "0") return key;
        var parts = key.Split(" + ").Select(k => k.StartsWith('-') ? k[1..] : Mirror(k) == k ? k : "-" + k).ToList();
        parts.Sort(StringComparer.Ordinal);
        return string.Join(" + ", parts);
    }

    private static string Mirror(string k) => new(k.Reverse().Select(c => c == 'T' ? 'F' : c == 'F' ? 'T' : c).ToArray());

    [Fact]
    public void MovesNameTheSquareOfThePiece()
    {
        var p = _rules.Parse("T.TF.F");
        Assert.Equal(["1", "3"], p.Moves(Side.Left).Select(p.FormatMove));
        Assert.Equal(p.ParseMove("3"), p.ParseMove("3-5"));
        Assert.Equal(p.ParseMove("3"), p.ParseMove("3>"));
        Assert.Equal("T..FTF", p.Play(Side.Left, p.ParseMove("3")).Text);
        Assert.Throws<IllegalMoveException>(() => p.ParseMove("3-4"));
        Assert.Throws<IllegalMoveException>(() => p.Play(Side.Right, p.ParseMove("1")));
        Assert.Throws<IllegalMoveException>(() => p.ParseMove("c"));
    }

    [Fact]
    public void ReaderAcceptsThePapersFormsAndPointsAtFaults()
    {
        Assert.Equal("TTT..FF", _rules.Parse("T³□□F²").Text);
        Assert.Equal("TFTF.F", _rules.Parse("(TF)^2 □ F").Text);
        Assert.Equal("TF#.F", _rules.Parse("tf + .f").Text);
        var e = Assert.Throws<PositionSyntaxException>(() => _rules.Parse("TT.XF"));
        Assert.Equal(3, e.Column);
        foreach (var text in PlainGame.FuzzTexts(new Random(9), "TF.#()^2³□+ x", ["TT.FF", "(TF)^2□F", "T³□F"], 3000))
            PlainGame.ReadsOrPointsAtFault(_rules, text);
    }
}
