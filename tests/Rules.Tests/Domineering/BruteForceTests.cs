using Bramble.Rules.Domineering;
using Bramble.Values;

namespace Bramble.Rules.Tests.Domineering;

/// <summary>
/// The region search (splitting, normal forms, symmetry, memo) against plain whole-board search
/// on many random small boards, seeded so every failure can be replayed.
/// </summary>
public class BruteForceTests
{
    private readonly DomineeringRuleset _rules = new();

    [Fact]
    public void RandomSmallBoardsMatchPlainSearch()
    {
        var context = new ValueContext();
        var plain = new PlainDomineering(context.Store);
        var random = new Random(20240611);
        int compared = 0, withSeveralRegions = 0;
        for (int i = 0; i < 2000; i++)
        {
            var grid = PlainDomineering.RandomGrid(random, random.Next(1, 5), random.Next(1, 6), 0.4 + 0.25 * random.NextDouble());
            string text = PlainDomineering.Text(grid);
            var position = _rules.Parse(text);
            if (position.Components().Count > 1) withSeveralRegions++;
            // Common practice: an optimisation must agree with plain search on every input.
            Assert.True(plain.Value(grid) == _rules.Value(position, context), $"board {text}");
            compared++;
        }
        Assert.Equal(2000, compared);
        // The sample must exercise sums of regions, not only single regions.
        Assert.True(withSeveralRegions > 150, $"only {withSeveralRegions} boards split");
    }

    [Fact]
    public void GeneratedSumsOfRegionsMatchPlainSearch()
    {
        var context = new ValueContext();
        var plain = new PlainDomineering(context.Store);
        foreach (string text in _rules.Generate("sums", 40, 2, seed: 7).Concat(_rules.Generate("sums", 10, 3, seed: 8)))
        {
            var position = _rules.Parse(text);
            var grid = PlainDomineering.Grid(text);
            var sumOfParts = context.Store.Sum(position.Components().Select(c => _rules.Value(c, context)));
            // Common practice: the value of a sum is the sum of the components' values, checked against plain search.
            Assert.True(plain.Value(grid) == _rules.Value(position, context), $"board {text}");
            Assert.Equal(_rules.Value(position, context), sumOfParts);
        }
    }

    [Fact]
    public void MirrorImagesHaveEqualValuesAndTransposesNegatedOnes()
    {
        var random = new Random(515);
        var store = new GameStore();
        var plain = new PlainDomineering(store);
        for (int i = 0; i < 100; i++)
        {
            var grid = PlainDomineering.RandomGrid(random, random.Next(2, 5), random.Next(2, 5), 0.75);
            var expected = plain.Value(grid);
            var images = PlainDomineering.Images(grid);
            for (int k = 0; k < images.Count; k++)
            {
                // A fresh memo per image, so no image is answered from another's entry.
                var context = new ValueContext(store);
                var value = _rules.Value(_rules.Parse(PlainDomineering.Text(images[k])), context);
                var want = k < 4 ? expected : store.Negate(expected);
                // Derived from the definitions: a mirror image keeps every domino's orientation; a transpose swaps Left and Right.
                Assert.True(want == value, $"image {k} of {PlainDomineering.Text(grid)}");
                if (i < 40)
                {
                    // The same statement checked on plain search alone, to confirm the images are right.
                    Assert.Equal(want, plain.Value(images[k]));
                }
            }
        }
    }

    [Fact]
    public void MirrorImagesShareANormalKeyAndTransposesCarryTheSign()
    {
        var random = new Random(99);
        for (int i = 0; i < 200; i++)
        {
            var grid = PlainDomineering.RandomGrid(random, random.Next(2, 5), random.Next(2, 6), 0.8);
            var position = _rules.Parse(PlainDomineering.Text(grid));
            if (position.Components().Count != 1) continue;
            string key = position.NormalKey;
            var images = PlainDomineering.Images(grid);
            for (int k = 0; k < 4; k++) Assert.Equal(key, _rules.Parse(PlainDomineering.Text(images[k])).NormalKey);
            string transposedKey = _rules.Parse(PlainDomineering.Text(images[4])).NormalKey;
            Assert.Equal(key.TrimStart('-'), transposedKey.TrimStart('-'));
        }
    }

    [Fact]
    public void SearchCountsNodesAndStopsAtTheNodeCap()
    {
        var context = new ValueContext();
        context.ResetCounters(nodeCap: 50);
        Assert.Throws<BudgetExceededException>(() => _rules.Value(_rules.Parse("4x4"), context));
        // Once the budget is lifted the search completes from where the memo left it.
        context.ResetCounters();
        var value = _rules.Value(_rules.Parse("4x4"), context);
        Assert.True(context.Nodes > 0);
        // [from memory] 4×4 is a first-player win (Breuker, Uiterwijk, van den Herik 2000 tabulate it).
        Assert.Equal(Outcome.N, context.Store.OutcomeOf(value));
    }
}
