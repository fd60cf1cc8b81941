using Bramble.Arena;
using Bramble.Arena.Journal;
using Bramble.Arena.Spec;
using Bramble.Rules;
using Bramble.Values;

namespace Bramble.Wire.Tests;

// The example engine of examples/RandomEngine against `bramble engine --strategy random`, both as
// child processes, refereed by a small loop here that keeps its own copy of the position and checks
// every pick against the rules.
public class ExampleMatchTests
{
    private static readonly IRuleset s_domineering = Rulesets.Get("domineering");

    [Fact]
    public void ExampleEnginePlaysAShortMatchAgainstBrambleRandom()
    {
        using var example = EngineProcess.Example(seed: 11);
        using var bramble = EngineProcess.Bramble("--strategy", "random", "--seed", "12");
        Assert.StartsWith("welcome name=random-example ", example.Ask("hello twine 1"));
        Assert.StartsWith("welcome name=bramble ", bramble.Ask("hello twine 1"));
        Assert.Equal("ok", example.Ask("set seed 3"));

        var games = 0;
        foreach (var position in new[] { "4x4", "..#./..../....", "3x5" })
            foreach (var (left, right) in new[] { (example, bramble), (bramble, example) })
                foreach (var first in new[] { Side.Left, Side.Right })
                {
                    var plies = Play(left, right, position, first);
                    Assert.InRange(plies, 1, 8); // every move fills two of at most 16 cells
                    games++;
                }
        Assert.Equal(12, games);
        Assert.Equal("bye", example.Ask("bye"));
        Assert.Equal("bye", bramble.Ask("bye"));
        Assert.Equal(0, example.WaitForExit());
        Assert.Equal(0, bramble.WaitForExit());
    }

    [Fact]
    public async Task ExampleEnginePlaysAMatchInTheArenaHarnessWithoutForfeits()
    {
        var folder = Directory.CreateTempSubdirectory("bramble-example-match-");
        try
        {
            var bin = AppContext.BaseDirectory;
            File.WriteAllText(Path.Combine(folder.FullName, "garden.txt"), "# small garden beds\n3x3\n..#./..../....\n");
            var spec = $$"""
                {
                  "title": "Garden club: the example engine",
                  "ruleset": "domineering",
                  "positions": { "file": "garden.txt" },
                  "players": [
                    { "id": "example", "run": ["dotnet", {{Json(Path.Combine(bin, "random-engine.dll"))}}, "5"] },
                    { "id": "bramble", "run": ["dotnet", {{Json(Path.Combine(bin, "bramble.dll"))}}, "engine", "--strategy", "random"] }
                  ],
                  "format": "round-robin",
                  "seats": "all-four",
                  "clock": { "base_ms": 10000, "inc_ms": 100 },
                  "parallel": 1,
                  "adjudicate": "never",
                  "journal": "games.jsonl"
                }
                """;
            var specPath = Path.Combine(folder.FullName, "match.json");
            File.WriteAllText(specPath, spec);
            var match = new MatchSpecLoader(RulesetFinders.Registry).Load(specPath);
            var report = await new MatchRunner(match, new MatchOptions { Fresh = true, Log = Serilog.Core.Logger.None }).RunAsync();
            Assert.Equal(8, report.Records.Count); // 2 positions, one pair, four ways
            // Every game ended because the loser had no move: no crash, time-out, bad move or bad reply.
            Assert.All(report.Records, r => Assert.Equal(GameEnd.NoMove, r.End));
        }
        finally
        {
            folder.Delete(recursive: true);
        }
    }

    private static string Json(string text) => System.Text.Json.JsonSerializer.Serialize(text);

    [Fact]
    public void ExampleEngineAnswersBadRequestsWithErr()
    {
        using var example = EngineProcess.Example(seed: 1);
        Assert.StartsWith("welcome ", example.Ask("hello twine 1"));
        Assert.StartsWith("err bad-request ", example.Ask("think left"));
        Assert.StartsWith("err bad-position ", example.Ask("begin domineering 3x"));
        Assert.Equal("ok components=1", example.Ask("begin domineering 2x2"));
        Assert.StartsWith("err bad-move ", example.Ask("apply left c7"));
        Assert.StartsWith("err unknown-setting ", example.Ask("set colour blue"));
        Assert.StartsWith("err unknown-request ", example.Ask("ponder"));
        example.CloseInput();
        Assert.Equal(0, example.WaitForExit());
    }

    /// <summary>One game, to the side without a move; returns the number of moves made.</summary>
    private static int Play(EngineProcess left, EngineProcess right, string text, Side first)
    {
        var engines = new[] { left, right };
        var position = s_domineering.Parse(text);
        foreach (var engine in engines)
            Assert.Equal($"ok components={position.Components().Count}", engine.Ask($"begin domineering {text}"));
        var side = first;
        for (var plies = 0; ; plies++)
        {
            var mover = side == Side.Left ? left : right;
            var reply = Codec.ParseReply(mover.Ask($"think {side.Word()} clock=10000 inc=100"));
            var pick = Assert.IsType<PickReply>(reply.Message);
            if (pick.Move is null)
            {
                Assert.Empty(position.Moves(side)); // "pick none" only when there really is no move
                return plies;
            }
            var move = position.ParseMove(pick.Move);
            Assert.Contains(move, position.Moves(side));
            position = position.Play(side, move);
            foreach (var engine in engines) Assert.Equal("ok", engine.Ask($"apply {side.Word()} {pick.Move}"));
            side = side.Other();
        }
    }
}
