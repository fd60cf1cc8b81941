using Bramble.Values;

namespace Bramble.Rules.Tests.GraphGames;

public class ColTests() : GraphGameFixture("col")
{
    [Fact]
    public void LoneVertexIsStarAndTintedVertexIsOneMove()
    {
        // Winning Ways, ch. 2 (from memory): an untinted spot is {0|0} = *; a spot next to blue may
        // only be painted red, {|0} = -1, and one next to red is 1.
        Assert.Equal(Store.Star, V("[1]"));
        Assert.Equal(Store.Integer(-1), V("[1-2B]"));
        Assert.Equal(Store.Integer(1), V("[1-2R]"));
    }

    [Fact]
    public void ShortPathsAreZero()
    {
        // Derived by hand from the rules: in two joined spots a move leaves the other spot to the
        // opponent, so P2 = {-1|1} = 0; in P3 the best moves are at an end, {-1/2|1/2} = 0.
        Assert.Equal(Store.Zero, V("P2"));
        Assert.Equal(Store.Zero, V("P3"));
        // Derived by hand: spots 2-3 with 2 next to red. Left painting 2 leaves 3 to Right (-1), painting
        // 3 leaves 2 next to both colours (0); Right may only paint 3, leaving 2 to Left (1):
        // {-1, 0 | 1} = {0|1} = 1/2.
        Assert.Equal(Store.Parse("1/2"), V("[1R-2-3]"));
    }

    [Fact]
    public void EveryColValueIsANumberOrANumberPlusStar()
    {
        // Winning Ways, vol. 1, ch. 2 (from memory; also On Numbers and Games, ch. 8): every Col
        // position has value x or x + * for a number x.
        var random = new Random(2);
        int stars = 0, fractions = 0;
        for (int i = 0; i < 1500; i++)
        {
            var plain = PlainColouring.Random(random, maxVertices: 9, edgeChance: 0.3, colouredChance: 0.15);
            var g = V(plain.Text());
            bool number = Store.IsNumber(g);
            Assert.True(number || Store.IsNumber(Store.Add(g, Store.Star)), $"{plain.Text()} = {Store.Format(g)}");
            if (!number) stars++;
            if (number && Store.TryGetNumber(g, out var x) && !x.IsInteger) fractions++;
        }
        // The property is not vacuous: both kinds, and fractions, occur.
        Assert.True(stars > 100 && fractions > 20, $"{stars} with a star, {fractions} fractions");
    }

    [Fact]
    public void ColIsColdAndSnortOnTheSameGraphIsNot()
    {
        foreach (var text in new[] { "P4", "P5", "2x3", "[1-2,1-3,1-4,4-5]" })
        {
            // Winning Ways, ch. 2 and 6 (from memory): Col is cold (temperature at most 0), Snort hot.
            Assert.True(Store.Temperature(V(text)) <= Dyadic.Zero, text);
            var snort = Rulesets.Get("snort");
            Assert.True(Store.Temperature(snort.Value(snort.Parse(text), Context)) > Dyadic.Zero, text);
        }
    }
}
