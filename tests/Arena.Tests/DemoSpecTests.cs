using Bramble.Arena.Schedule;
using Bramble.Arena.Spec;

namespace Bramble.Arena.Tests;

/// <summary>The built-in demo's match file, checked with the real rulesets (playing it is `bramble match`).</summary>
public class DemoSpecTests
{
    private static string DemoPath()
    {
        for (var folder = new DirectoryInfo(AppContext.BaseDirectory); folder is not null; folder = folder.Parent)
        {
            var candidate = Path.Combine(folder.FullName, "matches", "demo.json");
            if (File.Exists(candidate)) return candidate;
        }
        throw new FileNotFoundException("matches/demo.json not found above the test folder");
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
