using System.Text.Json;

namespace Bramble.Cli.Tests;

/// <summary><c>solve</c> on empty Domineering rectangles: answered by a published theorem, or searched with <c>--search</c>.</summary>
[Collection("console")]
public class SolveTheoremTests
{
    private static JsonElement Solve(params string[] args)
    {
        var (exit, output, err) = ConsoleRunner.Run(["solve", "domineering", .. args, "--json"]);
        Assert.True(exit == 0, err);
        return JsonDocument.Parse(output).RootElement;
    }

    [Fact]
    public void NineByTwoIsAnsweredByTheTheoremsAndTheSearchAgrees()
    {
        var known = Solve("9x2");
        var searched = Solve("9x2", "--search");
        foreach (var first in new[] { "left_first", "right_first" })
        {
            Assert.Equal("theorem", known.GetProperty(first).GetProperty("by").GetString());
            Assert.Contains("Uiterwijk", known.GetProperty(first).GetProperty("theorem").GetProperty("source").GetString());
            Assert.Equal("search", searched.GetProperty(first).GetProperty("by").GetString());
            // m×2k (m = 9) won by Horizontal with Vertical first, and 2k×9 won by Vertical: Uiterwijk, CGW 2013.
            Assert.Equal(known.GetProperty(first).GetProperty("winner").GetString(), searched.GetProperty(first).GetProperty("winner").GetString());
        }
        // Horizontal (Right) wins 9×2 whoever starts, by the same two theorems.
        Assert.Equal("R", known.GetProperty("outcome").GetString());
        Assert.Equal(0, known.GetProperty("nodes").GetInt64());
    }

    [Fact]
    public void ABoardNoTheoremCoversIsSearched()
    {
        // 4×4: no theorem of CGW 2013 covers it (first-player win, Breuker et al. 2000 tabulate it — from memory).
        var r = Solve("4x4");
        Assert.Equal("search", r.GetProperty("left_first").GetProperty("by").GetString());
        Assert.Equal(JsonValueKind.Null, r.GetProperty("left_first").GetProperty("theorem").ValueKind);
    }
}
