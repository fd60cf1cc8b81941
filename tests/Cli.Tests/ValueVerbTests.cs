using System.Text.Json;

namespace Bramble.Cli.Tests;

[Collection("console")]
public class ValueVerbTests
{
    [Fact]
    public void ThermographDrawingWritesAFile()
    {
        var path = Path.Combine(Path.GetTempPath(), $"bramble-{Guid.NewGuid():N}.svg");
        try
        {
            var (exit, _, err) = ConsoleRunner.Run("draw", "thermograph", "{8||4|0}", "--out", path);
            Assert.True(exit == 0, err);
            Assert.Contains("<svg", File.ReadAllText(path));
        }
        finally
        {
            File.Delete(path);
        }
    }

    [Fact]
    public void BadValueTextExitsTwoWithACaret()
    {
        var (exit, _, err) = ConsoleRunner.Run("draw", "thermograph", "{1|2|3}", "--out", "/dev/null");
        Assert.Equal(2, exit);
        Assert.Contains("^", err);
    }

    [Fact]
    public void UnknownRulesetExitsTwo()
    {
        var (exit, _, err) = ConsoleRunner.Run("value", "chess", "e4");
        Assert.Equal(2, exit);
        Assert.Contains("unknown ruleset", err);
    }
}
