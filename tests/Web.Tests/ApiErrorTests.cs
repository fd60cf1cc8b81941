using System.Text.Json.Nodes;

namespace Bramble.Web.Tests;

/// <summary>Every endpoint's answer to bad requests: a 4xx with a message (and the column or JSON path at fault).</summary>
public sealed class ApiErrorTests(BoardServer board) : IClassFixture<BoardServer>
{
    private static object Game(string ruleset, string start, params string[] moves) => new { ruleset, start, first = "left", moves };

    [Fact]
    public async Task UnknownRulesetIsRefusedWithTheKnownOnes()
    {
        var (status, body) = await board.Post("/api/board", Game("checkers", "x"));
        Assert.Equal(400, status);
        Assert.Contains("unknown ruleset 'checkers'", (string)body["error"]!);
        Assert.Contains("hackenbush", (string)body["error"]!);
        Assert.Equal("ruleset", (string?)body["path"]);
    }

    [Fact]
    public async Task BadNotationNamesItsColumn()
    {
        var (status, body) = await board.Post("/api/board", Game("hackenbush", "BRX"));
        Assert.Equal(400, status);
        Assert.Equal(3, (int)body["column"]!);
        Assert.Equal("BRX", (string?)body["text"]);
        Assert.StartsWith("bad position: column 3", (string)body["error"]!);
    }

    [Fact]
    public async Task IllegalMoveInTheGameNamesItsPlace()
    {
        // e1 and e2 are blue, e3 red: Left, moving first, may not cut e3.
        var (status, body) = await board.Post("/api/board", Game("hackenbush", "BBR", "e3", "e2"));
        Assert.Equal(400, status);
        Assert.Equal("moves[0]", (string?)body["path"]);
        Assert.Contains("not a legal move for left", (string)body["error"]!);
    }

    [Fact]
    public async Task MoveThatIsNotAMoveIsRefused()
    {
        var (status, body) = await board.Post("/api/play", new { ruleset = "domineering", start = "3x3", first = "left", moves = Array.Empty<string>(), move = "zz" });
        Assert.Equal(400, status);
        Assert.Equal("move", (string?)body["path"]);
    }

    [Fact]
    public async Task IllegalMoveInPlayLeavesTheGameAsItWas()
    {
        // Right's red edge e2 clicked while Left is to move.
        var (status, body) = await board.Post("/api/play", new { ruleset = "hackenbush", start = "BR", first = "left", moves = Array.Empty<string>(), move = "e2", opponent = "random", computer = "right" });
        Assert.Equal(400, status);
        Assert.Contains("e2 is not a legal move for left", (string)body["error"]!);
        Assert.Contains("legal: e1", (string)body["error"]!);
    }

    [Fact]
    public async Task UnknownOpponentLevelAndSideAreRefused()
    {
        var (s1, b1) = await board.Post("/api/play", new { ruleset = "hackenbush", start = "B + R", first = "left", move = "e1", opponent = "oracle", computer = "right" });
        Assert.Equal((400, "opponent"), (s1, (string?)b1["path"]));
        var (s2, b2) = await board.Post("/api/play", new { ruleset = "hackenbush", start = "B + R", first = "left", move = "e1", opponent = "random", computer = "right", level = "fierce" });
        Assert.Equal((400, "level"), (s2, (string?)b2["path"]));
        var (s3, b3) = await board.Post("/api/play", new { ruleset = "hackenbush", start = "B + R", first = "up", move = "e1" });
        Assert.Equal((400, "first"), (s3, (string?)b3["path"]));
        var (s4, b4) = await board.Post("/api/play", new { ruleset = "hackenbush", start = "B + R", first = "left", move = "e1", opponent = "engine:hedgehog", computer = "right" });
        Assert.Equal(400, s4);
        Assert.Contains("no engine 'hedgehog' was named at start", (string)b4["error"]!);
    }

    [Fact]
    public async Task MalformedJsonNamesThePath()
    {
        var (status, body) = await board.PostRaw("/api/board", """{"ruleset":"hackenbush","start":"BR","moves":[1]}""");
        Assert.Equal(400, status);
        Assert.Contains("not the JSON expected", (string)body["error"]!);
        Assert.Equal("$.moves[0]", (string?)body["path"]);
        var (status2, _) = await board.PostRaw("/api/analyse", "null");
        Assert.Equal(400, status2);
        var (status3, _) = await board.PostRaw("/api/hint", "{not json");
        Assert.Equal(400, status3);
    }

    [Fact]
    public async Task AnalyseRefusesABudgetOutOfRangeAndBadNotation()
    {
        var (s1, b1) = await board.Post("/api/analyse", new { ruleset = "forms", start = "*", first = "left", budget_ms = 0 });
        Assert.Equal((400, "budget_ms"), (s1, (string?)b1["path"]));
        var (s2, b2) = await board.Post("/api/analyse", new { ruleset = "forms", start = "{1|", first = "left" });
        Assert.Equal(400, s2);
        Assert.NotNull(b2["column"]);
        var (s3, _) = await board.Post("/api/hint", new { ruleset = "forms", start = "{1|", first = "left" });
        Assert.Equal(400, s3);
    }

    [Fact]
    public async Task ThermographRefusesBadValueNotationWithItsColumn()
    {
        var (status, body) = await board.Post("/api/thermograph", new { value = "{2||" });
        Assert.Equal(400, status);
        Assert.StartsWith("bad value", (string)body["error"]!);
        Assert.NotNull(body["column"]);
        var (s2, b2) = await board.Post("/api/thermograph", new { ruleset = "hackenbush" });
        Assert.Equal((400, "position"), (s2, (string?)b2["path"]));
    }

    [Fact]
    public async Task DescribeRefusesBadNotation()
    {
        var (status, body) = await board.Post("/api/describe", new { ruleset = "domineering", position = "../.x" });
        Assert.Equal(400, status);
        Assert.NotNull(body["column"]);
    }

    [Fact]
    public async Task JournalWithABrokenLineNamesTheLine()
    {
        var good = """{"game":1,"pair":["a","b"],"left":"a","right":"b","first":"left","ruleset":"hackenbush","position":"B","moves":[{"side":"left","move":"e1","ms":1}],"winner":"left","end":"no-move","blunders":[]}""";
        var (status, body) = await board.Post("/api/journal", new { text = good + "\n{\"game\":2}\n" + good + "\n" });
        Assert.Equal(400, status);
        Assert.Contains("line 2", (string)body["error"]!);
        var (s2, b2) = await board.Post("/api/journal", new { text = good + "\n{\"game\":2,\"pa" });
        Assert.Equal(200, s2);
        Assert.Single(b2["games"]!.AsArray());
        Assert.Contains("incomplete", (string)b2["notice"]!);
        var (s3, b3) = await board.Post("/api/journal", new { });
        Assert.Equal((400, "text"), (s3, (string?)b3["path"]));
    }

    [Fact]
    public async Task ReplayOfAGameWithAnIllegalMoveIsRefused()
    {
        var (status, body) = await board.Post("/api/replay", Game("hackenbush", "BR", "e1", "e1"));
        Assert.Equal(400, status);
        Assert.Equal("moves[1]", (string?)body["path"]);
    }

    [Fact]
    public async Task UnknownApiAndFilesAre404WithAMessage()
    {
        using var r1 = await board.Client.GetAsync("/api/nothing");
        Assert.Equal(404, (int)r1.StatusCode);
        Assert.Contains("no such API", await r1.Content.ReadAsStringAsync());
        using var r2 = await board.Client.GetAsync("/missing.js");
        Assert.Equal(404, (int)r2.StatusCode);
    }

    [Fact]
    public async Task ThePageAndItsModulesAreServedFromTheAssembly()
    {
        var html = await board.Client.GetStringAsync("/");
        Assert.Contains("<script type=\"module\" src=\"main.js\">", html);
        // No file of the page refers to another host: nothing is fetched from the internet.
        foreach (var file in new[] { "main.js", "api.js", "board.js", "play.js", "edit.js", "replay.js", "analysis.js", "app.css" })
        {
            using var r = await board.Client.GetAsync("/" + file);
            Assert.Equal(200, (int)r.StatusCode);
            Assert.DoesNotContain("http", await r.Content.ReadAsStringAsync());
        }
    }
}
