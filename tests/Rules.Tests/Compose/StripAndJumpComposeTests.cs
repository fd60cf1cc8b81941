using Bramble.Rules.Compose;
using Bramble.Rules.Konane;
using Bramble.Rules.Tests.NewRulesets;
using Bramble.Rules.ToadsAndFrogs;
using Bramble.Values;

namespace Bramble.Rules.Tests.Compose;

/// <summary>
/// Compose for Toads and Frogs and Konane, whose components are listed by size: what is found is
/// checked by a plain search written in the test (no split into components, no symmetry), and the
/// lower bounds and layouts the listings rely on are checked the same way.
/// </summary>
public class StripAndJumpComposeTests
{
    private static ComposeReport Compose(IRuleset ruleset, Game target, GameStore store, int maxSize) =>
        new Composer(ruleset, new ValueContext(store)).Run(target, new ComposeSettings(maxSize, 1, 120_000));

    private static IEnumerable<string> Strips(int n)
    {
        int total = 1;
        for (int k = 0; k < n; k++) total *= 3;
        for (int code = 0; code < total; code++)
        {
            var c = new char[n];
            int x = code;
            for (int k = 0; k < n; k++) { c[k] = ".TF"[x % 3]; x /= 3; }
            yield return new string(c);
        }
    }

    [Fact]
    public void EveryStripValueUpToFiveSquaresIsComposedAgainNoBigger()
    {
        var store = new GameStore();
        var plain = new PlainGame(store, PlainGame.StripOptions);
        var ruleset = new ToadsAndFrogsRuleset();
        var random = new Random(5);
        // A sample of strips of up to 5 squares; the listing is exhaustive, so each value comes back at its size or smaller.
        var strips = Enumerable.Range(2, 4).SelectMany(Strips).Where(s => plain.Value(s) != store.Zero).OrderBy(_ => random.Next()).Take(40);
        foreach (var strip in strips)
        {
            var target = plain.Value(strip);
            var report = Compose(ruleset, target, store, strip.Length);
            var found = Assert.Single(report.Positions);
            Assert.True(found.Size <= strip.Length, $"{strip}: found {found.Position.Text}");
            Assert.Equal(target, plain.Value(found.Position.Text));
        }
    }

    [Fact]
    public void NoStripPlayLastsLongerThanTheBoundComposeUses()
    {
        // The bound: a strip of n squares has value of birthday at most (n - 1)^2 (docs/compose.md).
        var store = new GameStore();
        var plain = new PlainGame(store, PlainGame.StripOptions);
        var ruleset = new ToadsAndFrogsRuleset();
        for (int n = 2; n <= 7; n++)
            foreach (var strip in Strips(n))
            {
                var value = plain.Value(strip);
                Assert.True(store.Birthday(value) <= (n - 1) * (n - 1), strip);
                if (value != store.Zero) Assert.True(((IComposable)ruleset).LeastSize(value, store) <= n, strip);
            }
    }

    [Theory]
    [InlineData("*", 9)]
    [InlineData("↑", 9)]
    [InlineData("1/2", 9)]
    [InlineData("{1|0}", 9)]
    [InlineData("±1", 10)]
    public void ToadsAndFrogsTargetsAreFoundAndRechecked(string text, int maxSize)
    {
        var store = new GameStore();
        var target = store.Parse(text);
        var found = Assert.Single(Compose(new ToadsAndFrogsRuleset(), target, store, maxSize).Positions);
        Assert.Equal(target, new PlainGame(store, PlainGame.StripOptions).Value(found.Position.Text));
    }

    [Theory]
    [InlineData("*")]
    [InlineData("↑")]
    [InlineData("1")]
    [InlineData("±1")]
    [InlineData("*2")]
    public void KonaneTargetsAreFoundAndRechecked(string text)
    {
        var store = new GameStore();
        var target = store.Parse(text);
        var report = Compose(new KonaneRuleset(), target, store, 4);
        var found = Assert.Single(report.Positions);
        Assert.Equal(target, new PlainGame(store, (t, s) => PlainGame.StoneOptions(t, s, konane: true)).Value(found.Position.Text));
        // The listing covers only groups on an open board, and the report says so.
        Assert.True(report.Restricted);
        Assert.Contains(report.Notes, n => n.Contains("open board"));
    }

    [Fact]
    public void KonaneGroupsSetSideBySideDoNotMeet()
    {
        // Groups laid out by the composer: the whole board, searched as one by plain search,
        // equals the sum of the groups searched alone.
        var store = new GameStore();
        var plain = new PlainGame(store, (t, s) => PlainGame.StoneOptions(t, s, konane: true));
        IComposable ruleset = new KonaneRuleset();
        var groups = ruleset.ComponentsOfSize(2).Concat(ruleset.ComponentsOfSize(3)).ToList();
        var random = new Random(9);
        for (int trial = 0; trial < 12; trial++)
        {
            var parts = Enumerable.Range(0, random.Next(2, 4)).Select(_ => groups[random.Next(groups.Count)]).ToList();
            var whole = ruleset.SumOf(parts);
            var sum = parts.Aggregate(store.Zero, (acc, p) => store.Add(acc, plain.Value(p.Text)));
            Assert.Equal(sum, plain.Value(whole.Text));
        }
    }

    [Fact]
    public void ToadsAndFrogsStripsJoinedByWallsAddUp()
    {
        var store = new GameStore();
        var plain = new PlainGame(store, PlainGame.StripOptions);
        IComposable ruleset = new ToadsAndFrogsRuleset();
        var strips = ruleset.ComponentsOfSize(3).Concat(ruleset.ComponentsOfSize(4)).ToList();
        var random = new Random(4);
        for (int trial = 0; trial < 20; trial++)
        {
            var parts = Enumerable.Range(0, random.Next(2, 4)).Select(_ => strips[random.Next(strips.Count)]).ToList();
            var sum = parts.Aggregate(store.Zero, (acc, p) => store.Add(acc, plain.Value(p.Text)));
            Assert.Equal(sum, plain.Value(ruleset.SumOf(parts).Text));
        }
    }
}
