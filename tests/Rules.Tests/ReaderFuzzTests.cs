namespace Bramble.Rules.Tests;

/// <summary>
/// Every registered ruleset's reader on nested, huge and binary text (see <see cref="ReaderFuzz"/>):
/// a small count here, a large one in bench/ReaderFuzzBenchmarks.cs.
/// </summary>
public class ReaderFuzzTests
{
    public static TheoryData<string> Names() => new(Rulesets.All.Select(r => r.Name));

    [Theory]
    [MemberData(nameof(Names))]
    public void HostileTextIsReadOrRefusedWithALocatedMessage(string name)
    {
        var failures = ReaderFuzz.Run(Rulesets.Get(name), count: 60, seed: 20261202);
        Assert.True(failures.Count == 0, string.Join("\n", failures.Take(10)));
    }

    [Theory]
    [InlineData("BRX", 2, "a colour B, R or G")]
    [InlineData("BR ; B", 3, "'+' or the end of the text")]
    public void HackenbushNamesTheColoursAfterAStalk(string text, int column, string expected)
    {
        var e = Assert.Throws<PositionSyntaxException>(() => Rulesets.Get("hackenbush").Parse(text));
        Assert.Equal(column, e.Column);
        Assert.Equal(expected, e.Expected);
    }
}
