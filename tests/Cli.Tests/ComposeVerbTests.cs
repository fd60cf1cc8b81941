using System.Text.Json;

namespace Bramble.Cli.Tests;

[Collection("console")]
public class ComposeVerbTests
{
    [Fact]
    public void AStalkIsPrintedForANumberWithItsSize()
    {
        var (exit, output, err) = ConsoleRunner.Run("compose", "hackenbush", "3/8");
        Assert.True(exit == 0, err);
        // Sign expansion of 3/8 (Winning Ways): + − − +, i.e. blue, red, red, blue from the ground.
        Assert.Contains("BRRB", output);
        Assert.Contains("4 edges", output);
    }

    [Fact]
    public void JsonListsThePositionsAndHowFarTheSearchWent()
    {
        var (exit, output, err) = ConsoleRunner.Run("compose", "domineering", "*", "--json", "--count", "2", "--max-size", "5");
        Assert.True(exit == 0, err);
        using var doc = JsonDocument.Parse(output);
        var root = doc.RootElement;
        Assert.Equal("*", root.GetProperty("target").GetString());
        var positions = root.GetProperty("positions").EnumerateArray().ToList();
        Assert.Equal(2, positions.Count);
        Assert.True(positions[0].GetProperty("size").GetInt32() <= positions[1].GetProperty("size").GetInt32());
        Assert.Equal("enough", root.GetProperty("stopped").GetString());
        // Each one is a board that the value verb agrees is *.
        foreach (var p in positions)
        {
            var (vexit, vout, _) = ConsoleRunner.Run("value", "domineering", p.GetProperty("text").GetString()!, "--json");
            Assert.Equal(0, vexit);
            Assert.Equal("*", JsonDocument.Parse(vout).RootElement.GetProperty("value").GetString());
        }
    }

    [Fact]
    public void KonaneSaysItsListingCoversOnlyOpenBoardGroups()
    {
        var (exit, output, err) = ConsoleRunner.Run("compose", "konane", "2", "--max-size", "4");
        Assert.True(exit == 0, err);
        // Nothing of up to 4 stones is 2 (the first is 5 stones); the listing is restricted, so the answer says "listed" and the note says which.
        Assert.Contains("found      none: no listed position of up to 4 stones has this value (see the note)", output);
        Assert.Contains("every listed position (see the note) of up to 4 stones", output);
        Assert.Contains("open board", output);
        var (_, json, _) = ConsoleRunner.Run("compose", "konane", "2", "--max-size", "4", "--json");
        Assert.True(JsonDocument.Parse(json).RootElement.GetProperty("restricted").GetBoolean());
    }

    [Fact]
    public void NoneWithinTheBoundIsSaidAndExitsZero()
    {
        var (exit, output, err) = ConsoleRunner.Run("compose", "hackenbush", "1/64", "--max-size", "4");
        Assert.True(exit == 0, err);
        Assert.Contains("none", output);
        Assert.Contains("birthday", output);
    }

    [Fact]
    public void ABadValueExitsTwoWithACaret()
    {
        var (exit, _, err) = ConsoleRunner.Run("compose", "hackenbush", "{1|2|");
        Assert.Equal(2, exit);
        Assert.Contains("^", err);
    }

    [Fact]
    public void AValueCanComeFromAFile()
    {
        var path = Path.Combine(Path.GetTempPath(), $"bramble-{Guid.NewGuid():N}.txt");
        try
        {
            File.WriteAllText(path, "*2\n");
            var (exit, output, err) = ConsoleRunner.Run("compose", "hackenbush", "@" + path);
            Assert.True(exit == 0, err);
            Assert.Contains("GG ", output);
        }
        finally
        {
            File.Delete(path);
        }
    }
}
