using System.Text.Json.Nodes;
using Bramble.Rules;
using Bramble.Values;

namespace Bramble.Web.Tests;

/// <summary>What the endpoints answer to good requests, checked against published values and the engine's own analysis.</summary>
public sealed class ApiTests(BoardServer board) : IClassFixture<BoardServer>
{
    [Fact]
    public async Task AnalysisOfAStalkGivesItsPublishedValue()
    {
        var (status, a) = await board.Post("/api/analyse", new { ruleset = "hackenbush", start = "BRB + BR", first = "left" });
        Assert.Equal(200, status);
        Assert.True((bool)a["exact"]!);
        // Sign expansion: BRB = 3/4, BR = 1/2 (Winning Ways vol. 1 ch. 2; worked values derived from the definitions).
        Assert.Equal("5/4", (string?)a["value"]);
        Assert.Equal("L", (string?)a["outcome"]);
        Assert.Equal("left", (string?)a["left_first_wins"]);
        Assert.Equal("left", (string?)a["right_first_wins"]);
        var parts = a["components"]!.AsArray();
        Assert.Equal(["3/4", "1/2"], parts.Select(p => (string)p!["value"]!).ToArray());
    }

    [Fact]
    public async Task TwoByTwoDomineeringIsAFirstPlayerWin()
    {
        var (_, a) = await board.Post("/api/analyse", new { ruleset = "domineering", start = "2x2", first = "left" });
        // The 2×2 square is ±1, a first-player win (Lachmann, Moore, Rapaport, More Games of No Chance, 2002).
        Assert.Equal("±1", (string?)a["value"]);
        Assert.Equal("N", (string?)a["outcome"]);
        Assert.Equal("left", (string?)a["left_first_wins"]);
        Assert.Equal("right", (string?)a["right_first_wins"]);
    }

    [Fact]
    public async Task AnalysisOverBudgetSaysSoAndEstimates()
    {
        var (status, a) = await board.Post("/api/analyse", new { ruleset = "domineering", start = "7x7", first = "left", budget_ms = 1 });
        Assert.Equal(200, status);
        Assert.False((bool)a["exact"]!);
        Assert.Null(a["value"]);
        Assert.Contains("not exact within 1 ms", (string)a["note"]!);
        Assert.False(string.IsNullOrEmpty((string?)a["estimate"]));
    }

    [Fact]
    public async Task ComputerRepliesWithALegalMoveForItsSide()
    {
        var (status, r) = await board.Post("/api/play", new { ruleset = "hackenbush", start = "BRB + G(B,R) + [B0-1,R1-2,G2-0,B1-3]", first = "left", moves = Array.Empty<string>(), move = "e1", opponent = "perfect", computer = "right", level = "quick" });
        Assert.Equal(200, status);
        var reply = r["reply"]!;
        Assert.Equal("right", (string?)reply["side"]);
        var moves = r["board"]!["moves"]!.AsArray().Select(m => (string)m!["move"]!).ToList();
        Assert.Equal(2, moves.Count);
        Assert.Equal((string?)reply["move"], moves[1]);
        // The reply is legal: the position after it rebuilds without complaint, with Left to move.
        var (s2, b2) = await board.Post("/api/board", new { ruleset = "hackenbush", start = "BRB + G(B,R) + [B0-1,R1-2,G2-0,B1-3]", first = "left", moves });
        Assert.Equal(200, s2);
        Assert.Equal("left", (string?)b2["to_move"]);
    }

    [Fact]
    public async Task ComputerMovesFirstWhenItIsItsTurn()
    {
        var (_, r) = await board.Post("/api/play", new { ruleset = "domineering", start = "3x3", first = "right", moves = Array.Empty<string>(), opponent = "thermostrat", computer = "right", level = "quick" });
        Assert.Equal("right", (string?)r["reply"]!["side"]);
        Assert.Equal("left", (string?)r["board"]!["to_move"]);
    }

    [Fact]
    public async Task HintListsExactlyTheWinningMoves()
    {
        var start = "GGG + GGGG + GGGGG";
        var (_, h) = await board.Post("/api/hint", new { ruleset = "hackenbush", start, first = "left", moves = Array.Empty<string>() });
        // 3 ⊕ 4 ⊕ 5 = 2: the only winning move cuts the 3-stalk down to 1 edge, i.e. its second edge e2
        // (Ferguson, Game Theory, Part I §6; the move derived from the definitions).
        Assert.Equal(["e2"], h["winning"]!.AsArray().Select(m => (string)m!).ToArray());
    }

    [Fact]
    public async Task ThermographOfTheTwoByThreeBoard()
    {
        var (status, t) = await board.Post("/api/thermograph", new { ruleset = "domineering", position = "../../.." });
        Assert.Equal(200, status);
        // 3 rows by 2 columns is {1/2|-2}: mean -3/4, temperature 5/4 (Wikipedia, "Domineering", transposed).
        Assert.Equal("5/4", (string?)t["temperature"]);
        Assert.Equal("-3/4", (string?)t["mean"]);
        Assert.Contains("<svg", (string)t["svg"]!);
    }

    [Fact]
    public async Task DescribeTakesAPositionApartForTheEditor()
    {
        var (_, h) = await board.Post("/api/describe", new { ruleset = "hackenbush", position = "[B0-1,R1-2]" });
        var edges = h["edges"]!.AsArray();
        Assert.Equal(2, edges.Count);
        Assert.Equal("blue", (string?)edges[0]!["colour"]);
        Assert.Equal(0, (int)edges[0]!["from"]!);
        var (_, d) = await board.Post("/api/describe", new { ruleset = "domineering", position = "..#/..." });
        Assert.Equal(["c1"], d["grid"]!["filled"]!.AsArray().Select(c => (string)c!).ToArray());
    }

    [Fact]
    public async Task ReplayGivesEveryPlyWithItsValue()
    {
        var (_, r) = await board.Post("/api/replay", new { ruleset = "hackenbush", start = "BRB", first = "left", moves = new[] { "e3", "e2" } });
        var plies = r["plies"]!.AsArray();
        Assert.Equal(3, plies.Count);
        // BRB = 3/4, then BR = 1/2, then B = 1 (sign expansion, derived from the definitions).
        Assert.Equal(["3/4", "1/2", "1"], plies.Select(p => (string)p!["value"]!).ToArray());
    }

    [Fact]
    public async Task SetupListsEveryRegisteredRuleset()
    {
        var body = JsonNode.Parse(await board.Client.GetStringAsync("/api/setup"))!;
        var names = body["rulesets"]!.AsArray().Select(r => (string)r!["name"]!).ToList();
        Assert.Equal(Rulesets.All.Select(r => r.Name), names);
        // Every example parses in its ruleset, so a new game starts from it.
        foreach (var r in body["rulesets"]!.AsArray())
            Rulesets.Get((string)r!["name"]!).Parse((string)r["example"]!);
    }
}

/// <summary>An engine of the user's own, named in the engines file, answers through twine/1.</summary>
public sealed class EngineTests(BoardWithEngine board) : IClassFixture<BoardWithEngine>
{
    [Fact]
    public async Task NamedEngineRepliesWithALegalMove()
    {
        var (status, r) = await board.Post("/api/play", new { ruleset = "domineering", start = "3x3", first = "left", moves = Array.Empty<string>(), move = "a1", opponent = "engine:gardener", computer = "right", level = "quick" });
        Assert.Equal(200, status);
        Assert.Equal("engine:gardener", (string?)r["reply"]!["by"]);
        var moves = r["board"]!["moves"]!.AsArray().Select(m => (string)m!["move"]!).ToList();
        var position = Rulesets.Get("domineering").Parse("3x3").Play(Side.Left, new Move(0));
        Assert.Contains(moves[1], position.Moves(Side.Right).Select(position.FormatMove));
        var setup = JsonNode.Parse(await board.Client.GetStringAsync("/api/setup"))!;
        Assert.Contains("engine:gardener", setup["engines"]!.AsArray().Select(e => (string)e!["name"]!));
    }

    [Fact]
    public void EnginesFileErrorsNameTheJsonPath()
    {
        var file = Path.Combine(board.Folder, "bad.json");
        File.WriteAllText(file, """{"engines":[{"id":"x","run":"./x --fast"}]}""");
        var e = Assert.Throws<EngineListException>(() => EngineRoster.Load(file));
        Assert.Contains("$.engines[0].run", e.Message);
    }
}
