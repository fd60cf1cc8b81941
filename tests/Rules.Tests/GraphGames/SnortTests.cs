using Bramble.Values;

namespace Bramble.Rules.Tests.GraphGames;

public class SnortTests() : GraphGameFixture("snort")
{
    [Fact]
    public void LoneVertexIsStarAndTintedVertexIsOneMove()
    {
        // Winning Ways, ch. 6 (from memory): an untinted spot is {0|0} = *; a spot tinted blue
        // (next to blue, so only Left may colour it) is {0|} = 1, and tinted red is -1.
        Assert.Equal(Store.Star, V("[1]"));
        Assert.Equal(Store.Integer(1), V("[1-2B]"));
        Assert.Equal(Store.Integer(-1), V("[1-2R]"));
        // Next to both colours nobody may colour it: 0.
        Assert.Equal(Store.Zero, V("[1B-2-3R]"));
    }

    [Fact]
    public void ShortPathsAreSwitches()
    {
        // Derived by hand from the rules (Winning Ways, ch. 6 works such snakes the same way): a move at
        // one end of two joined spots leaves the other tinted for the mover, so P2 = {1|-1} = ±1; the
        // middle of three leaves two tinted spots, so P3 = {2|-2} = ±2.
        Assert.Equal(Store.Parse("±1"), V("P2"));
        Assert.Equal(Store.Parse("±2"), V("P3"));
    }

    [Fact]
    public void StarGraphHasTemperatureEqualToItsLeaves()
    {
        // Huntemann & Maciosowski, "Degrees are useless in Snort when measuring temperature"
        // (arXiv:2406.02107, abstract): "K_{1,n} has temperature n".
        for (int n = 1; n <= 7; n++)
        {
            string star = "[" + string.Join(",", Enumerable.Range(2, n).Select(leaf => $"1-{leaf}")) + "]";
            Assert.Equal(Dyadic.FromInteger(n), Store.Temperature(V(star)));
        }
    }

    [Fact]
    public void RowsOfTrianglesAreFirstPlayerWins()
    {
        // Gauthier & Huntemann, "Snort played on triangular grids" (arXiv:2412.00849, abstract): on
        // triangular grids with one row of triangles the first player wins. A row of k triangles is
        // drawn here as vertices 1..k+2 with i joined to i+1 and i+2 (our reading of the definition).
        for (int k = 1; k <= 9; k++)
        {
            var edges = new List<string>();
            for (int i = 1; i <= k + 2; i++)
            {
                if (i + 1 <= k + 2) edges.Add($"{i}-{i + 1}");
                if (i + 2 <= k + 2) edges.Add($"{i}-{i + 2}");
            }
            Assert.Equal(Outcome.N, Store.OutcomeOf(V("[" + string.Join(",", edges) + "]")));
        }
    }

    [Fact]
    public void SnortIsHot()
    {
        // Winning Ways, ch. 6 (from memory): Snort is hot. Not every graph is (the 5-cycle is *), but
        // these small ones give the first player a gain (the 4-cycle is 0: the second player answers opposite): positive temperature.
        foreach (var text in new[] { "P2", "P4", "P5", "2x3", "[1-2,1-3,1-4,4-5]" })
            Assert.True(Store.Temperature(V(text)) > Dyadic.Zero, text);
    }

    [Fact]
    public void MovesAreVertexNumbersAndIllegalOnesAreExplained()
    {
        var p = Rules.Parse("[1-2B-3,3-4,5]");
        Assert.Equal(["1", "3", "4", "5"], p.Moves(Side.Left).Select(p.FormatMove));
        Assert.Equal(["4", "5"], p.Moves(Side.Right).Select(p.FormatMove));
        Assert.Equal("[1-2B-3-4R,5]", p.Play(Side.Right, p.ParseMove("v4")).Text);
        var e = Assert.Throws<IllegalMoveException>(() => p.Play(Side.Right, p.ParseMove("1")));
        Assert.Contains("next to blue vertex 2", e.Message);
        Assert.Throws<IllegalMoveException>(() => p.Play(Side.Left, p.ParseMove("2")));
        Assert.Throws<IllegalMoveException>(() => p.Play(Side.Left, p.ParseMove("9")));
        Assert.Throws<IllegalMoveException>(() => p.ParseMove("x"));
    }
}
