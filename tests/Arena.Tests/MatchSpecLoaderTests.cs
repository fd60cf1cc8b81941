using Bramble.Arena.Fixture;
using Bramble.Arena.Spec;

namespace Bramble.Arena.Tests;

public class MatchSpecLoaderTests
{
    private static readonly MatchSpecLoader s_loader = new(FixtureProgram.Rulesets);

    private static object Player(string id) => new { id, run = new[] { "engine-" + id } };

    [Fact]
    public void EveryErrorIsListedWithItsJsonPath()
    {
        using var folder = new TempFolder();
        var path = folder.Write("bad.json", """
        {
          "ruleset": "heaps",
          "positions": { "file": "missing.txt" },
          "players": [ { "id": "a", "run": "a.exe --fast" }, { "id": "a", "run": [] }, { "run": ["x", 3] } ],
          "format": "ladder",
          "seats": "two",
          "clock": { "base_ms": -5, "inc": 1 },
          "parallel": 0,
          "adjudicate": "sometimes",
          "sprt": { "null_elo": 10, "alternative_elo": 5 },
          "colour": "blue"
        }
        """);
        var e = Assert.Throws<MatchSpecException>(() => s_loader.Load(path));
        var paths = e.Errors.Select(x => x.Path).ToList();
        // common practice: all problems at once, each at its JSON path
        Assert.Contains("$.positions.file", paths);
        Assert.Contains("$.players[0].run", paths);
        Assert.Contains("$.players[1].id", paths);
        Assert.Contains("$.players[1].run", paths);
        Assert.Contains("$.players[2].id", paths);
        Assert.Contains("$.players[2].run[1]", paths);
        Assert.Contains("$.format", paths);
        Assert.Contains("$.seats", paths);
        Assert.Contains("$.clock.base_ms", paths);
        Assert.Contains("$.clock.inc", paths);
        Assert.Contains("$.parallel", paths);
        Assert.Contains("$.adjudicate", paths);
        Assert.Contains("$.sprt.alternative_elo", paths);
        Assert.Contains("$.sprt", paths); // three players
        Assert.Contains("$.colour", paths);
        Assert.Contains("shell", e.Errors.Single(x => x.Path == "$.players[0].run").Message);
        Assert.Contains("$.players[1].id", e.Message);
    }

    [Fact]
    public void SuiteLinesParseWithTheirRulesetsAndCommentsAndRelativePaths()
    {
        using var folder = new TempFolder();
        folder.Write("suites/garden.txt", """
        # a garden suite
        L3 + R2   # trailing comment
           
        heaps: N4 + N1
        #
        N7
        """);
        var path = folder.Spec(new
        {
            title = "Garden",
            ruleset = "heaps",
            positions = new { file = "suites/garden.txt" },
            players = new[] { Player("a"), Player("b") },
        }, "specs/../garden.json");
        var spec = s_loader.Load(path);
        Assert.Equal(["L3 + R2", "N4 + N1", "N7"], spec.Positions.Select(p => p.Text));
        Assert.All(spec.Positions, p => Assert.Equal("heaps", p.Ruleset));
        Assert.Equal("suites/garden.txt line 2", spec.Positions[0].Source);
        Assert.Equal(folder.Path, spec.Folder);
        Assert.Equal(Path.Combine(folder.Path, "results", "garden.jsonl"), spec.JournalPath);
        Assert.Equal(SeatPlan.AllFour, spec.Seats);
        Assert.Equal(new TimeControl(10_000, 100), spec.Clock);
    }

    [Fact]
    public void BadPositionsAreReportedWithLineAndCaret()
    {
        using var folder = new TempFolder();
        folder.Write("s.txt", "L3\nL3 + Q9\nchess: e4\n");
        var path = folder.Spec(new { ruleset = "heaps", positions = new { file = "s.txt" }, players = new[] { Player("a"), Player("b") } });
        var e = Assert.Throws<MatchSpecException>(() => s_loader.Load(path));
        Assert.Equal(2, e.Errors.Count);
        Assert.Contains("s.txt line 2", e.Errors[0].Message);
        Assert.Contains("L3 + Q9\n     ^", e.Errors[0].Message);
        Assert.Contains("unknown ruleset 'chess'", e.Errors[1].Message);
    }

    [Fact]
    public void PositionsWithoutAnyRulesetAreAnError()
    {
        using var folder = new TempFolder();
        folder.Write("s.txt", "heaps: L3\nL2\n");
        var path = folder.Spec(new { positions = new { file = "s.txt" }, players = new[] { Player("a"), Player("b") } });
        var e = Assert.Throws<MatchSpecException>(() => s_loader.Load(path));
        Assert.Contains("s.txt line 2: no ruleset", Assert.Single(e.Errors).Message);
    }

    [Fact]
    public void GeneratorsAndSeveralSourcesCombine()
    {
        using var folder = new TempFolder();
        folder.Write("s.txt", "L1\n");
        var path = folder.Spec(new
        {
            positions = new object[]
            {
                new { file = "s.txt", ruleset = "heaps" },
                new { generate = "random", count = 5, size = 4, seed = 9, ruleset = "heaps" },
            },
            players = new[] { Player("a"), Player("b") },
            format = "challenger",
            focus = "b",
            seats = "swap",
        });
        var spec = s_loader.Load(path);
        Assert.Equal(6, spec.Positions.Count);
        // Derived from the definitions: the generator is seeded, so the same spec gives the same positions.
        Assert.Equal(new HeapsRuleset().Generate("random", 5, 4, 9), spec.Positions.Skip(1).Select(p => p.Text));
        Assert.Equal(TournamentFormat.Challenger, spec.Format);
        Assert.Equal("b", spec.Focus);
    }

    [Fact]
    public void ChallengerNeedsAFocusThatIsAPlayer()
    {
        using var folder = new TempFolder();
        folder.Write("s.txt", "L1\n");
        var path = folder.Spec(new { ruleset = "heaps", positions = new { file = "s.txt" }, players = new[] { Player("a"), Player("b") }, format = "challenger", focus = "zed" });
        var e = Assert.Throws<MatchSpecException>(() => s_loader.Load(path));
        Assert.Equal("$.focus", Assert.Single(e.Errors).Path);
    }

    [Fact]
    public void InvalidJsonSaysWhere()
    {
        using var folder = new TempFolder();
        var path = folder.Write("broken.json", "{\n  \"title\": \"x\",\n  \"players\": [ ,\n}");
        var e = Assert.Throws<MatchSpecException>(() => s_loader.Load(path));
        Assert.Contains("line 3", Assert.Single(e.Errors).Message);
    }

    [Fact]
    public void CommentsAndTrailingCommasAreAllowed()
    {
        using var folder = new TempFolder();
        folder.Write("s.txt", "L1\n");
        var path = folder.Write("m.json", """
        {
          // the players
          "ruleset": "heaps",
          "positions": { "file": "s.txt" },
          "players": [ { "id": "a", "run": ["a"] }, { "id": "b", "run": ["b"], "settings": { "strategy": "hotstrat", "depth": 3 } }, ],
          "sprt": { "null_elo": 0, "alternative_elo": 20 },
          "seed": -3,
          "analysis_nodes": 5000,
        }
        """);
        var spec = s_loader.Load(path);
        Assert.Equal(-3, spec.Seed);
        Assert.Equal(5000, spec.AnalysisNodes);
        Assert.Equal([new("strategy", "hotstrat"), new("depth", "3")], spec.Players[1].Settings);
        Assert.Equal(new SprtSpec(0, 20, 0.05, 0.05), spec.Sprt);
    }

    [Fact]
    public void OldSpellingsAreAnsweredWithTheCurrentOnes()
    {
        using var folder = new TempFolder();
        folder.Write("s.txt", "L1\n");
        var path = folder.Write("old.json", """
        {
          "ruleset": "heaps",
          "positions": { "file": "s.txt" },
          "players": [ { "id": "a", "run": ["a"] }, { "id": "b", "run": ["b"] } ],
          "format": "gauntlet",
          "focus": "a",
          "sprt": { "elo0": 0, "elo1": 20 }
        }
        """);
        var e = Assert.Throws<MatchSpecException>(() => s_loader.Load(path));
        // Each old spelling gets one message at its own JSON path, showing the new spelling; nothing else
        // (no "missing null_elo" on top, no complaint about focus).
        Assert.Equal(["$.format", "$.sprt.elo0", "$.sprt.elo1"], e.Errors.Select(x => x.Path).Order());
        Assert.Contains("\"format\": \"challenger\"", e.Errors.Single(x => x.Path == "$.format").Message);
        Assert.Contains("\"null_elo\": 0", e.Errors.Single(x => x.Path == "$.sprt.elo0").Message);
        Assert.Contains("\"alternative_elo\": 20", e.Errors.Single(x => x.Path == "$.sprt.elo1").Message);
    }
}
