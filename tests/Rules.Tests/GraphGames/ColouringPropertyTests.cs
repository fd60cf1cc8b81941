using Bramble.Rules.GraphGames;
using Bramble.Values;

namespace Bramble.Rules.Tests.GraphGames;

/// <summary>
/// Snort and Col on thousands of random small graphs against plain search written in the test:
/// the memoised value, the split into parts, and the keys and values of relabelled and
/// colour-swapped images.
/// </summary>
public class ColouringPropertyTests
{
    [Theory]
    [InlineData("snort")]
    [InlineData("col")]
    public void RandomPositionsMatchPlainSearchSplitExactlyAndImagesAgree(string name)
    {
        var rules = Rulesets.Get(name);
        bool snort = name == "snort";
        var context = new ValueContext();
        var store = context.Store;
        var random = new Random(name == "snort" ? 1806 : 1807);
        int split = 0, relabelChecked = 0;
        for (int i = 0; i < 2500; i++)
        {
            var plain = PlainColouring.Random(random, maxVertices: 8, edgeChance: 0.3, colouredChance: 0.2);
            string text = plain.Text();
            var position = rules.Parse(text);
            var value = rules.Value(position, context);
            var expected = plain.Value(store, snort);
            // Common practice: the memoised value equals plain search of the whole graph.
            Assert.True(expected == value, $"{text}: {store.Format(value)}, plain search {store.Format(expected)}");

            var parts = position.Components();
            if (parts.Count > 1) split++;
            // Common practice (Winning Ways, ch. 2): the parts' values add up to the whole searched as one.
            Assert.True(store.Sum(parts.Select(c => PlainColouring.Read(c.Text).Value(store, snort))) == expected, text);
            // A part's moves are the whole position's moves, by the same names.
            foreach (var part in parts)
                foreach (var side in new[] { Side.Left, Side.Right })
                    Assert.All(part.Moves(side), m => Assert.Contains(m, position.Moves(side)));

            // Derived from the rules: renaming vertices and relisting edges keeps the game.
            var renamed = plain.Relabelled(random);
            var renamedPosition = rules.Parse(renamed.Text(random));
            if (((ColouringPosition)position).Parts.All(p => p.Count <= CanonicalLabelling.AlwaysExact))
            {
                Assert.Equal(position.NormalKey, renamedPosition.NormalKey);
                relabelChecked++;
                // A key is itself a position (the part in canonical order, tints as coloured leaves) with that key.
                foreach (var key in BareKeys(position)) Assert.Equal(key, ReadKey(rules, key).NormalKey);
            }
            // Derived from the rules: exchanging the colours exchanges the players, so keys flip sign.
            var swappedPosition = rules.Parse(plain.Swapped().Text());
            Assert.Equal(BareKeys(position), BareKeys(swappedPosition));
            if (i < 500)
            {
                // Fresh memos, so the images are searched rather than read from the original's entries.
                Assert.True(value == rules.Value(renamedPosition, new ValueContext(store)), renamed.Text());
                Assert.True(store.Negate(value) == rules.Value(swappedPosition, new ValueContext(store)), swappedPosition.Text);
            }
        }
        Assert.True(split > 300, $"only {split} positions split");
        Assert.True(relabelChecked > 2000, $"only {relabelChecked} renamings compared");
    }

    private static IPosition ReadKey(IRuleset rules, string key)
    {
        try
        {
            return rules.Parse(key);
        }
        catch (PositionSyntaxException e)
        {
            throw new InvalidOperationException($"key {key}: {e.Message}");
        }
    }

    private static List<string> BareKeys(IPosition position) =>
        ((ColouringPosition)position).Parts.Select(p => p.SignedKey.TrimStart('-')).Order(StringComparer.Ordinal).ToList();

    [Theory]
    [InlineData("snort")]
    [InlineData("col")]
    public void LargerTreesAndCyclesMatchPlainSearch(string name)
    {
        // Fewer, bigger graphs (up to 11 vertices, sparse), so parts are searched several moves deep.
        var rules = Rulesets.Get(name);
        var context = new ValueContext();
        var random = new Random(41);
        for (int i = 0; i < 60; i++)
        {
            var plain = PlainColouring.Random(random, maxVertices: 11, edgeChance: 0.22, colouredChance: 0.05);
            var value = rules.Value(rules.Parse(plain.Text()), context);
            // Common practice: the memoised value equals plain search of the whole graph.
            Assert.True(plain.Value(context.Store, name == "snort") == value, plain.Text());
        }
    }

    [Theory]
    [InlineData("snort")]
    [InlineData("col")]
    public void CatalogueHoldsOneOfEachPartAndMatchesPlainSearch(string name)
    {
        var rules = (ColouringRuleset)Rulesets.Get(name);
        var context = new ValueContext();
        var keys = new HashSet<string>();
        int count = 0;
        foreach (var position in rules.ComponentsUpTo(4))
        {
            count++;
            Assert.Single(position.Components());
            Assert.True(keys.Add(position.NormalKey), position.Text);
            Assert.False(position.NormalKey.StartsWith('-'));
            // Common practice: the value equals plain search.
            Assert.True(PlainColouring.Read(position.Text).Value(context.Store, name == "snort") == rules.Value(position, context), position.Text);
        }
        // Connected graphs on 1..4 vertices: 1, 1, 2, 6 (OEIS A001349, from memory); tintings up to the
        // graph's symmetries and the colour swap make the catalogue larger than 3 * 10 but smaller than 81 * 10.
        Assert.InRange(count, 30, 810);
    }
}
