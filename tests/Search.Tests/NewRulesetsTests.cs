using Bramble.Rules;
using Bramble.Values;

namespace Bramble.Search.Tests;

/// <summary>
/// Perfect (decomposition search) and alphabeta (whole-position search) must agree on who wins
/// random small positions of the rulesets added with issue 17, and agree with the outcome class
/// of the exact value: common practice, two independent searches checked against each other.
/// </summary>
public class NewRulesetsTests
{
    private static readonly TimeSpan Plenty = TimeSpan.FromMinutes(1);

    [Theory]
    [InlineData("cutcake", "rectangles", 3)]
    [InlineData("toads-and-frogs", "starts", 7)]
    [InlineData("toads-and-frogs", "strips", 8)]
    [InlineData("toads-and-frogs", "sums", 2)]
    [InlineData("clobber", "random", 7)]
    [InlineData("clobber", "strips", 8)]
    [InlineData("konane", "random", 7)]
    [InlineData("konane", "strips", 9)]
    public void PerfectAndAlphabetaAgreeOnRandomPositions(string rulesetName, string generator, int size)
    {
        var rules = Rulesets.Get(rulesetName);
        var perfect = Players.Create("perfect");
        var alphabeta = Players.Create("alphabeta");
        var context = new ValueContext();
        foreach (var text in rules.Generate(generator, 40, size, seed: 17))
        {
            var position = rules.Parse(text);
            var outcome = context.Store.OutcomeOf(rules.Value(position, context));
            foreach (var side in new[] { Side.Left, Side.Right })
            {
                var a = perfect.Choose(position, side, Plenty);
                var b = alphabeta.Choose(position, side, Plenty);
                Assert.True(a.Exact && b.Exact, $"{text}: a search did not finish");
                Assert.True(a.Winning == b.Winning, $"{rulesetName} {text}, {side.Word()} first: perfect {a.Winning}, alphabeta {b.Winning}");
                // The outcome class says who wins with each side starting (the outcome letters L, R, N, P of docs/cli.md).
                bool firstWins = side == Side.Left ? outcome is Outcome.L or Outcome.N : outcome is Outcome.R or Outcome.N;
                Assert.True(firstWins == a.Winning, $"{rulesetName} {text}, {side.Word()} first: value says {firstWins}");
            }
        }
    }
}
