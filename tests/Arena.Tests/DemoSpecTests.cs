using Bramble.Arena.Schedule;
using Bramble.Arena.Spec;

namespace Bramble.Arena.Tests;

/// <summary>The built-in demo's match file, checked with the real rulesets (playing it is `bramble match`).</summary>
public class DemoSpecTests
{
    private static string DemoPath() => MatchFile("demo.json");

    private static string MatchFile(string name)
    {
        for (var folder = new DirectoryInfo(AppContext.BaseDirectory); folder is not null; folder = folder.Parent)
        {
            var candidate = Path.Combine(folder.FullName, "matches", name);
            if (File.Exists(candidate)) return candidate;
        }
        throw new FileNotFoundException($"matches/{name} not found above the test folder");
    }

    [Fact]
    public void TheAllotmentMatchHasSixPositionsOfEachNewRulesetAndLimitsEveryPlayerByWork()
    {
        // The loader parses every position with its ruleset, so a bad line would fail here.
        var spec = new MatchSpecLoader(RulesetFinders.Registry).Load(MatchFile("allotment.json"));
        foreach (var ruleset in new[] { "clobber", "konane", "toads-and-frogs", "cutcake" })
            Assert.Equal(6, spec.Positions.Count(p => p.Ruleset == ruleset));
        Assert.All(spec.Players.Where(p => p.Run[3] != "random"), p => Assert.Contains("--nodes", p.Run));
        // Derived from the definitions: 3 pairs × 24 positions × 2 seatings.
        Assert.Equal(144, Scheduler.Build(spec).Count);
    }

    [Fact]
    public void TheDemoIsFourPlayersOnTwelveHackenbushAndTwelveFormsPositions()
    {
        var spec = new MatchSpecLoader(RulesetFinders.Registry).Load(DemoPath());
        Assert.Equal(["pruner", "grafter", "picker", "windfall"], spec.Players.Select(p => p.Id));
        Assert.Equal(["perfect", "thermostrat", "hotstrat", "random"], spec.Players.Select(p => p.Run[3]));
        Assert.All(spec.Players, p => Assert.Equal("bramble", p.Run[0]));
        Assert.Equal(12, spec.Positions.Count(p => p.Ruleset == "hackenbush"));
        Assert.Equal(12, spec.Positions.Count(p => p.Ruleset == "forms"));
        // Derived from the definitions: 6 pairs × 24 positions × 2 seatings.
        Assert.Equal(288, Scheduler.Build(spec).Count);
        Assert.Equal(Path.GetFullPath(Path.Combine(Path.GetDirectoryName(DemoPath())!, "..", "results", "demo.jsonl")), spec.JournalPath);
    }
}
