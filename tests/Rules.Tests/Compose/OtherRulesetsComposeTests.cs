using Bramble.Rules.Clobber;
using Bramble.Rules.Compose;
using Bramble.Rules.Cutcake;
using Bramble.Values;

namespace Bramble.Rules.Tests.Compose;

/// <summary>Compose on the rulesets beyond the first three: theorems that rule targets out, constructions, and a round trip through every registered ruleset.</summary>
public class OtherRulesetsComposeTests
{
    private static ComposeReport Compose(IRuleset ruleset, string target, GameStore store, int? maxSize = null) =>
        new Composer(ruleset, new ValueContext(store)).Run(store.Parse(target), new ComposeSettings(maxSize, 1, 120_000));

    [Theory]
    [InlineData("1/2")]
    [InlineData("*")]
    [InlineData("↑")]
    [InlineData("±1")]
    public void CutcakeRulesOutEveryValueThatIsNotAnInteger(string target)
    {
        var report = Compose(new CutcakeRuleset(), target, new GameStore());
        Assert.Empty(report.Positions);
        Assert.Equal(ComposeStop.RuledOut, report.Stop);
        // Winning Ways, ch. 2: every Cutcake position is an integer.
        Assert.Contains(report.Notes, n => n.Contains("integer") && n.Contains("Winning Ways"));
    }

    [Fact]
    public void CutcakeIntegersAreStripsAndCheckedByTheValuePath()
    {
        var store = new GameStore();
        var cutcake = new CutcakeRuleset();
        for (int n = -5; n <= 5; n++)
        {
            if (n == 0) continue;
            var found = Assert.Single(Compose(cutcake, n.ToString(), store).Positions);
            // A strip of |n| + 1 cells is |n| cuts for its owner only (Winning Ways, ch. 2).
            Assert.Equal(Math.Abs(n) + 1, found.Size);
            Assert.Equal(store.Integer(n), cutcake.Value(cutcake.Parse(found.Position.Text), new ValueContext(store)));
        }
    }

    [Theory]
    [InlineData("1")]
    [InlineData("-1/2")]
    [InlineData("±1")]
    [InlineData("{2|1}")]
    public void ClobberRulesOutValuesThatAreNotAllSmall(string target)
    {
        var report = Compose(new ClobberRuleset(), target, new GameStore());
        Assert.Empty(report.Positions);
        Assert.Equal(ComposeStop.RuledOut, report.Stop);
        // Albert, Grossman, Nowakowski and Wolfe, "An introduction to Clobber", INTEGERS 5 (2005): Clobber is all-small.
        Assert.Contains(report.Notes, n => n.Contains("all-small"));
    }

    [Theory]
    [InlineData("*")]
    [InlineData("↑")]
    [InlineData("↓*")]
    public void ClobberInfinitesimalsAreFoundAndRechecked(string target)
    {
        var store = new GameStore();
        var clobber = new ClobberRuleset();
        var found = Assert.Single(Compose(clobber, target, store, maxSize: 6).Positions);
        Assert.Equal(store.Parse(target), clobber.Value(clobber.Parse(found.Position.Text), new ValueContext(store)));
    }

    [Fact]
    public void EveryRegisteredRulesetComposesValuesOfItsOwnSmallComponents()
    {
        var store = new GameStore();
        foreach (var ruleset in Rulesets.All)
        {
            var context = new ValueContext(store);
            var components = ruleset.Generate(ruleset.Generators[0], 4, 3, seed: 11)
                .SelectMany(t => ruleset.Parse(t).Components())
                .Where(c => c.Size <= 5)
                .Take(3);
            foreach (var component in components)
            {
                var target = ruleset.Value(component, context);
                var report = new Composer(ruleset, context).Run(target, new ComposeSettings(5, 1, 60_000));
                // Whatever is reported has the target's value by the ordinary value path, parsed afresh.
                Assert.All(report.Positions, p => Assert.Equal(target, ruleset.Value(ruleset.Parse(p.Position.Text), new ValueContext(store))));
                // Where the listing is exhaustive, the component itself was looked at: something no bigger is found.
                if (!report.Sampled && !report.Restricted && ruleset is not Bramble.Rules.Forms.FormsRuleset)
                    Assert.True(report.Positions.Count == 1 && report.Positions[0].Size <= component.Size, $"{ruleset.Name}: {component.Text}");
            }
        }
    }
}
