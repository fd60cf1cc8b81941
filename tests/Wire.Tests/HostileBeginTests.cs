namespace Bramble.Wire.Tests;

/// <summary>
/// <c>begin</c> with the real rulesets on text that used to crash or stall the engine: huge
/// numbers, too many ups, and forms nested past the reader's depth limit. Each gets
/// <c>err bad-position</c> with the column, or plays; the session goes on.
/// </summary>
public class HostileBeginTests
{
    private static List<string> Session(params string[] lines)
    {
        var (exit, output) = Script.Run(new EngineSetup { Version = "9.9.9" }, lines.Prepend("hello twine 1").Append("bye").ToArray());
        Assert.Equal(0, exit);
        var finals = Script.Finals(output);
        Assert.StartsWith("welcome ", finals[0]);
        Assert.Equal("bye", finals[^1]);
        return finals.Skip(1).SkipLast(1).ToList();
    }

    [Fact]
    public void TooManyUpsIsABadPosition()
    {
        var replies = Session("begin forms 99999999999up");
        Assert.StartsWith("err bad-position column 1: expected at most", replies[0]);
    }

    [Fact]
    public void HugeNumbersArePlayable()
    {
        var replies = Session("begin forms {1000000000000000000000|-1000000000000000000000} + 99999999999999999999999999", "assess");
        Assert.Equal("ok components=2", replies[0]);
        Assert.StartsWith("value ", replies[1]);
    }

    [Fact]
    public void NestingPastTheLimitIsABadPositionAndTheSessionGoesOn()
    {
        int n = Bramble.Values.ValueNotation.MaxDepth + 1;
        string deep = string.Concat(Enumerable.Repeat("{0|", n)) + "0" + new string('}', n);
        var replies = Session("begin forms " + deep, "begin forms {1|0}");
        Assert.StartsWith($"err bad-position column {3 * (n - 1) + 1}: expected at most", replies[0]);
        Assert.Equal("ok components=1", replies[1]);
    }
}
