using System.Text.Json.Nodes;
using Bramble.Rules;
using Bramble.Values;

namespace Bramble.Web.Tests;

/// <summary>The compose endpoint: positions of a value, checked by the value path; and its answers to bad requests.</summary>
public sealed class ComposeApiTests(BoardServer board) : IClassFixture<BoardServer>
{
    [Fact]
    public async Task ANumberComesBackAsItsSignExpansionStalk()
    {
        var (status, r) = await board.Post("/api/compose", new { ruleset = "hackenbush", value = "3/4", count = 1 });
        Assert.Equal(200, status);
        var p = Assert.Single(r["positions"]!.AsArray())!;
        // 3/4 is the stalk BRB: sign expansion + - + (Winning Ways vol. 1 ch. 2; On Numbers and Games).
        Assert.Equal("BRB", (string?)p["text"]);
        Assert.Equal(3, (int)p["size"]!);
        Assert.Equal("construction", (string?)p["route"]);
        Assert.Equal("enough", (string?)r["stop"]);
        Assert.Null((string?)r["none"]);
    }

    [Theory]
    [InlineData("domineering", "*")]
    [InlineData("clobber", "↑")]
    [InlineData("toads-and-frogs", "1/2")]
    public async Task EveryPositionFoundHasTheTargetValue(string ruleset, string value)
    {
        var (status, r) = await board.Post("/api/compose", new { ruleset, value, count = 3, budget_ms = 20_000 });
        Assert.Equal(200, status);
        var positions = r["positions"]!.AsArray();
        Assert.NotEmpty(positions);
        var rules = Rulesets.Get(ruleset);
        var store = new GameStore();
        // Each answer valued afresh by the ordinary value path.
        foreach (var p in positions)
            Assert.Equal(store.Parse(value), rules.Value(rules.Parse((string)p!["text"]!), new ValueContext(store)));
        var sizes = positions.Select(p => (int)p!["size"]!).ToList();
        Assert.Equal(sizes.Order(), sizes);
    }

    [Fact]
    public async Task AnImpossibleTargetSaysWhyWithItsSource()
    {
        var (status, r) = await board.Post("/api/compose", new { ruleset = "cutcake", value = "1/2" });
        Assert.Equal(200, status);
        Assert.Empty(r["positions"]!.AsArray());
        Assert.Equal("ruledout", (string?)r["stop"]);
        Assert.StartsWith("none", (string?)r["none"]);
        // Every Cutcake position is an integer (Winning Ways, ch. 2).
        Assert.Contains(r["notes"]!.AsArray(), n => ((string)n!).Contains("Winning Ways"));
    }

    [Fact]
    public async Task BadRequestsAreRefusedWithThePlaceAtFault()
    {
        var (status, body) = await board.Post("/api/compose", new { ruleset = "hackenbush", value = "{1|" });
        Assert.Equal(400, status);
        Assert.StartsWith("bad value: column", (string)body["error"]!);
        Assert.NotNull(body["column"]);

        (status, body) = await board.Post("/api/compose", new { ruleset = "hackenbush", value = "" });
        Assert.Equal(400, status);
        Assert.Equal("value", (string?)body["path"]);

        (status, body) = await board.Post("/api/compose", new { ruleset = "hackenbush", value = "*", count = 11 });
        Assert.Equal(400, status);
        Assert.Equal("count", (string?)body["path"]);

        (status, body) = await board.Post("/api/compose", new { ruleset = "hackenbush", value = "*", budget_ms = 0 });
        Assert.Equal(400, status);
        Assert.Equal("budget_ms", (string?)body["path"]);

        (status, body) = await board.Post("/api/compose", new { ruleset = "hackenbush", value = "*", max_size = 1000 });
        Assert.Equal(400, status);
        Assert.Equal("max_size", (string?)body["path"]);

        (status, body) = await board.Post("/api/compose", new { ruleset = "checkers", value = "*" });
        Assert.Equal(400, status);
        Assert.Equal("ruleset", (string?)body["path"]);
    }
}
