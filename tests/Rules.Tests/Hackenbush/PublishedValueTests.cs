using Bramble.Rules.Hackenbush;
using Bramble.Values;

namespace Bramble.Rules.Tests.Hackenbush;

/// <summary>The published Hackenbush values of Winning Ways vol. 1 ch. 2; On Numbers and Games-4, each with its source.</summary>
public sealed class PublishedValueTests
{
    private readonly HackenbushRuleset _rules = new();
    private readonly ValueContext _context = new();
    private GameStore Store => _context.Store;

    private Game Value(string text) => _rules.Value(_rules.Parse(text), _context);
    private Game Number(long numerator, int exponent = 0) => Store.Number(Dyadic.Create(numerator, exponent));
    private string Show(Game g) => Store.Format(g, ascii: true);

    private void AssertValue(Game expected, string position) =>
        Assert.True(expected == Value(position), $"{position}: expected {Show(expected)}, got {Show(Value(position))}");

    // ---------------------------------------------------------------- §2 blue-red

    [Theory]
    // Sign-expansion rule: Winning Ways vol. 1 ch. 2 [P]; these stalk values derived from the definitions (Winning Ways vol. 1 ch. 2; On Numbers and Games).
    [InlineData("B", 1, 0)]
    [InlineData("R", -1, 0)]
    [InlineData("BR", 1, 1)]
    [InlineData("RB", -1, 1)]
    [InlineData("BBR", 3, 1)]
    [InlineData("BRB", 3, 2)]
    [InlineData("BRR", 1, 2)]
    [InlineData("BBRB", 7, 2)]
    [InlineData("BRBB", 7, 3)]
    [InlineData("RBBB", -1, 3)]
    [InlineData("BRBRBR", 21, 5)]
    public void SignExpansionStalks(string stalk, long numerator, int exponent)
    {
        // Winning Ways vol. 1 ch. 2; On Numbers and Games, sign-expansion rule (Winning Ways vol. 1 ch. 2); values derived from the definitions.
        Assert.Equal(Dyadic.Create(numerator, exponent), SignExpansion.Stalk(stalk.Select(c => c == 'B' ? EdgeColour.Blue : EdgeColour.Red)));
        // The same through the ruleset's value.
        AssertValue(Number(numerator, exponent), stalk);
    }

    [Fact]
    public void BlueStemWithBlueAndRedTwigIsOne() =>
        // Winning Ways vol. 1 ch. 2; On Numbers and Games trees: ordinal sum 1:x [P]; example derived from the definitions.
        AssertValue(Number(1), "B(B,R)");

    [Fact]
    public void BlueStemWithTwoRedTwigsIsOneQuarter() =>
        // Winning Ways vol. 1 ch. 2; On Numbers and Games trees: 1:(-2) = (-2 + 4)/2^3 = 1/4, derived from the definitions.
        AssertValue(Number(1, 2), "B(R,R)");

    [Fact]
    public void EveryBlueRedPositionIsANumber()
    {
        // Conway, On Numbers and Games (1976); Winning Ways (1982): every blue-red position is a number [P].
        var random = new Random(2024);
        for (int i = 0; i < 300; i++)
        {
            var d = Shapes.Sum(random, 1 + random.Next(12), "BR");
            Assert.True(Store.IsNumber(Value(d.Bracket())), d.Bracket());
        }
    }

    // ---------------------------------------------------------------- §3 green

    [Fact]
    public void StalksThreeFourFiveAreStarTwoWonOnlyByCuttingTheThreeToOne()
    {
        var p = _rules.Parse("GGG + GGGG + GGGGG");
        // Ferguson, Game Theory, Part I §6: 3 ⊕ 4 ⊕ 5 = 2, value *2, a first-player win [P].
        Assert.Equal(Store.Nimber(2), _rules.Value(p, _context));
        var winning = p.Moves(Side.Left).Where(m => _rules.Value(p.Play(Side.Left, m), _context) == Store.Zero).ToList();
        // Ferguson Part I §6: the only winning move cuts the 3-stalk down to 1 edge, i.e. cuts its second edge e2 [P; the move D].
        Assert.Equal([new Move(2)], winning);
    }

    [Fact]
    public void GreenStalksAreNimbersAndSumByNimAddition()
    {
        var random = new Random(7);
        for (int i = 0; i < 200; i++)
        {
            var heights = Enumerable.Range(0, 1 + random.Next(5)).Select(_ => 1 + random.Next(9)).ToArray();
            var text = string.Join(" + ", heights.Select(h => new string('G', h)));
            // Ferguson Part I §6 (Bouton's theorem): a sum of green stalks is the nimber of the nim-sum of the heights [P].
            AssertValue(Store.Nimber(heights.Aggregate(0, (a, h) => a ^ h)), text);
        }
    }

    [Fact]
    public void StemWithTwoTwigsIsStar() =>
        // Colon principle, Ferguson §6.2 [P]; this example derived from the definitions (T. S. Ferguson, Game Theory, Part I §6; Winning Ways ch. 7).
        AssertValue(Store.Nimber(1), "G(G,G)");

    [Fact]
    public void ColonPrincipleOnATree() =>
        // Colon principle, Ferguson §6.2 / Winning Ways ch. 7: value(v) = ⊕ (value(c) + 1); at the top
        // of the stem (1+1) ⊕ (0+1) ⊕ ((1⊕1)+1) = 2 ⊕ 1 ⊕ 1 = 2, so the stem is *3 — derived from the definitions.
        AssertValue(Store.Nimber(3), "G(GG,G,G(G,G))");

    [Theory]
    // Fusion principle, Ferguson §6.3 [P]: a circuit of n edges through the ground is *1 for odd n, 0 for even n (derived from the definitions).
    [InlineData("[G0-0]", 1)]
    [InlineData("[G0-1,G1-0]", 0)]
    [InlineData("[G0-1,G1-2,G2-0]", 1)]
    [InlineData("[G0-1,G1-2,G2-3,G3-0]", 0)]
    [InlineData("[G0-1,G1-2,G2-3,G3-4,G4-0]", 1)]
    // A stem edge with a triangle on top is *2; a stem with a loop on top is *2 (Ferguson §6.3, derived).
    [InlineData("[G0-1,G1-2,G2-3,G3-1]", 2)]
    [InlineData("[G0-1,G1-1]", 2)]
    public void FusionPrincipleExamples(string text, int nimber)
    {
        // T. S. Ferguson, Game Theory, Part I §6; Winning Ways ch. 7, fusion principle (Ferguson, Game Theory, §6.3), examples derived from the definitions.
        AssertValue(Store.Nimber(nimber), text);
        Assert.Equal(nimber, Fusion.NimValue(_rules.ParsePosition(text)));
    }

    // ---------------------------------------------------------------- §4 blue-red-green

    [Fact]
    public void GreenBlueIsUpStar() =>
        // derived from the definitions by exhaustive play: GB = ↑*, by exhaustive play from the definitions [D].
        AssertValue(Store.UpStar(Dyadic.Zero, 1, 1), "GB");

    [Fact]
    public void GreenRedIsDownStar() =>
        // derived from the definitions by exhaustive play: GR = ↓* [D].
        AssertValue(Store.UpStar(Dyadic.Zero, -1, 1), "GR");

    [Fact]
    public void BlueGreenIsOneStar() =>
        // derived from the definitions by exhaustive play: BG = 1* [D].
        AssertValue(Store.UpStar(Dyadic.One, 0, 1), "BG");

    [Fact]
    public void GreenStalksOfTwoAndThree()
    {
        // derived from the definitions by exhaustive play: GG = *2, GGG = *3 [D].
        AssertValue(Store.Nimber(2), "GG");
        AssertValue(Store.Nimber(3), "GGG");
    }

    [Fact]
    public void GreenBlueBlueIsZeroUpStarOverZero()
    {
        var upStar = Store.UpStar(Dyadic.Zero, 1, 1);
        var expected = Store.Make([Store.Zero, upStar], [Store.Zero]);
        // derived from the definitions by exhaustive play: GBB = {0,↑*|0} [D].
        AssertValue(expected, "GBB");
        var g = Value("GBB");
        // derived from the definitions by exhaustive play: fuzzy, strictly between ↑* and ⇑* [D].
        Assert.Equal(Outcome.N, Store.OutcomeOf(g));
        Assert.True(Store.Less(upStar, g) && Store.Less(g, Store.UpStar(Dyadic.Zero, 2, 1)));
    }

    [Fact]
    public void UpStarHasTheCanonicalFormZeroStarOverZero() =>
        // Winning Ways ch. 3; Siegel 2013: ↑* = {0,*|0} [P]; GB is ↑* (derived from the definitions by exhaustive play).
        AssertValue(Store.Make([Store.Zero, Store.Star], [Store.Zero]), "GB");

    [Theory]
    // Flowers, derived from the definitions by exhaustive play [D: exhaustive play from the definitions]: green stem, loop petals on top.
    [InlineData("[G0-1,B1-1]", "up*")]
    [InlineData("[G0-1,B1-1,B1-1]", "{0,up*|0}")]
    [InlineData("[G0-1,R1-1]", "down*")]
    [InlineData("[G0-1,B1-1,R1-1]", "*")]
    [InlineData("[G0-1,G1-1]", "*2")]
    [InlineData("[G0-1,G1-2,B2-2,R2-2]", "*2")]
    public void Flowers(string text, string value) =>
        // derived from the definitions by exhaustive play flowers, derived by exhaustive play from the definitions.
        AssertValue(Store.Parse(value), text);

    [Fact]
    public void GreenEdgeUnderABlueRedStalkIsTheOrdinalSumStarColonX()
    {
        var random = new Random(11);
        for (int i = 0; i < 100; i++)
        {
            var stalk = new string(Enumerable.Range(0, 1 + random.Next(6)).Select(_ => random.Next(2) == 0 ? 'B' : 'R').ToArray());
            var x = Value(stalk);
            // McKay, Milley, Nowakowski, arXiv:1202.5654: a green edge topped by a blue-red stalk of value x is *:x [P].
            AssertValue(Store.OrdinalSum(Store.Star, x), "G" + stalk);
        }
    }
}
