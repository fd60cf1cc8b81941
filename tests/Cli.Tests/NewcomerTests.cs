using System.Text.Json;

namespace Bramble.Cli.Tests;

/// <summary>What a new user meets first: position files, messages, help, and what reaches the terminal.</summary>
[Collection("console")]
public class NewcomerTests
{
    private static string TempFile(string text)
    {
        var path = Path.Combine(Path.GetTempPath(), $"bramble-{Guid.NewGuid():N}.txt");
        File.WriteAllText(path, text);
        return path;
    }

    [Fact]
    public void AtFileWithSpacesAndLineBreaksIsReadWhole()
    {
        var path = TempFile("BRB +\n  G(B,R)\n");
        try
        {
            var (exit, output, err) = ConsoleRunner.Run("value", "hackenbush", "@" + path);
            Assert.True(exit == 0, err);
            var (_, direct, _) = ConsoleRunner.Run("value", "hackenbush", "BRB + G(B,R)");
            Assert.Equal(direct, output);
        }
        finally
        {
            File.Delete(path);
        }
    }

    [Theory]
    [InlineData("solve")]
    [InlineData("draw")]
    public void OtherVerbsReadAtFilesToo(string verb)
    {
        var path = TempFile("{1|0}\n+ *");
        try
        {
            string[] args = verb == "draw" ? [verb, "forms", "@" + path, "--out", "-"] : [verb, "forms", "@" + path];
            var (exit, _, err) = ConsoleRunner.Run(args);
            Assert.True(exit == 0, err);
        }
        finally
        {
            File.Delete(path);
        }
    }

    [Fact]
    public void AMissingFileIsNamed()
    {
        var (exit, _, err) = ConsoleRunner.Run("value", "forms", "@/no/such/bramble-file.txt");
        Assert.Equal(2, exit);
        Assert.Contains("'/no/such/bramble-file.txt' does not exist", err);
    }

    [Fact]
    public void AFolderIsNamedAsAFolder()
    {
        var (exit, _, err) = ConsoleRunner.Run("value", "forms", "@" + Path.GetTempPath());
        Assert.Equal(2, exit);
        Assert.Contains("is a folder", err);
    }

    [Fact]
    public void StdinIsBounded()
    {
        var huge = new StringReader(new string('B', PositionInput.MaxChars + 10));
        var e = Assert.Throws<InputException>(() => PositionInput.Read("-", huge));
        Assert.Contains("more than", e.Message);
    }

    [Fact]
    public void PlusMinusIsTheSwitchNotMinus()
    {
        var (exit, output, _) = ConsoleRunner.Run("value", "forms", "+-1");
        Assert.Equal(0, exit);
        Assert.StartsWith("value        ±1", output);
    }

    [Fact]
    public void ADecimalIsAnsweredWithTheFraction()
    {
        var (exit, _, err) = ConsoleRunner.Run("value", "forms", "1.5");
        Assert.Equal(2, exit);
        Assert.Contains("write 3/2", err);
    }

    [Fact]
    public void AsciiMeansEveryLine()
    {
        var (exit, output, err) = ConsoleRunner.Run("value", "forms", "⇑* + ±1 + {1|0}", "--ascii");
        Assert.True(exit == 0, err);
        Assert.All(output, ch => Assert.True(ch < 128, output));
        Assert.Contains("2up*  =  2up*", output);
    }

    [Fact]
    public void HugeNumbersArePrintedWithTheirBirthday()
    {
        var (exit, output, err) = ConsoleRunner.Run("value", "forms", "99999999999999999999999999", "--json");
        Assert.True(exit == 0, err);
        using var doc = JsonDocument.Parse(output);
        Assert.Equal("99999999999999999999999999", doc.RootElement.GetProperty("birthday").GetRawText());
    }

    [Fact]
    public void NoVerbPrintsTheVerbList()
    {
        var (exit, output, _) = ConsoleRunner.Run();
        Assert.Equal(0, exit);
        foreach (var verb in new[] { "value", "solve", "draw", "play", "match", "engine" })
            Assert.Contains($"\n  {verb} ", output);
    }

    [Fact]
    public void AMistypedVerbGetsTheNearestOne()
    {
        var (exit, _, err) = ConsoleRunner.Run("valeu", "forms", "1");
        Assert.Equal(2, exit);
        Assert.Contains("did you mean value?", err);
        Assert.Contains("  solve ", err);
    }

    [Fact]
    public void AMistypedOptionGetsTheNearestOne()
    {
        var (exit, _, err) = ConsoleRunner.Run("value", "forms", "1", "--jsno");
        Assert.Equal(2, exit);
        Assert.Contains("did you mean --json?", err);
    }

    [Fact]
    public void ControlCharactersInInputAreEscapedInMessages()
    {
        var (exit, _, err) = ConsoleRunner.Run("value", "forms", "x\u001b[31mRED\u0007\u202Eabc");
        Assert.Equal(2, exit);
        Assert.DoesNotContain('\u001b', err);
        Assert.DoesNotContain('\u0007', err);
        Assert.DoesNotContain('\u202E', err);
        Assert.Contains("\\x1B[31m", err);
    }

    [Fact]
    public void TheSafeWriterEscapesEveryWayOfWriting()
    {
        var inner = new StringWriter();
        var safe = new SafeWriter(inner);
        safe.Write('\u001b');
        safe.Write("a\u0000");
        safe.Write("b\u202Ec".ToCharArray(), 0, 3);
        safe.WriteLine("\u0007");
        SafeWriter.CarriageReturn(safe);
        Assert.Equal("\\x1Ba\\x00b\\u202Ec\\x07" + inner.NewLine + "\r", inner.ToString());
    }

    [Fact]
    public void AFolderAsDatabaseIsReportedAndTheValueStillPrinted()
    {
        var (exit, output, err) = ConsoleRunner.Run("value", "forms", "{1|0}", "--db", Path.GetTempPath());
        Assert.Equal(1, exit);
        Assert.StartsWith("value        {1|0}", output);
        Assert.Contains("is a folder", err);
    }

    [Fact]
    public void ADatabaseInAMissingFolderIsNotCreated()
    {
        var folder = Path.Combine(Path.GetTempPath(), $"bramble-{Guid.NewGuid():N}");
        var (exit, output, err) = ConsoleRunner.Run("value", "forms", "{1|0}", "--db", Path.Combine(folder, "x.db"));
        Assert.Equal(1, exit);
        Assert.StartsWith("value        {1|0}", output);
        Assert.Contains("does not exist", err);
        Assert.False(Directory.Exists(folder));
    }

    [Fact]
    public void ANewDatabaseIsCreatedAndSaidSo()
    {
        var path = Path.Combine(Path.GetTempPath(), $"bramble-{Guid.NewGuid():N}.db");
        try
        {
            var (exit, _, err) = ConsoleRunner.Run("value", "forms", "{1|0}", "--db", path);
            Assert.Equal(0, exit);
            Assert.Contains("created the database", err);
            Assert.True(File.Exists(path));
        }
        finally
        {
            File.Delete(path);
        }
    }

    [Fact]
    public void ValueWithinABudgetSaysWhenItIsNotExact()
    {
        // An empty 11x11 Domineering board is far beyond 50 ms (common practice: its value is an open problem).
        var (exit, output, _) = ConsoleRunner.Run("value", "domineering", "11x11", "--budget-ms", "50");
        Assert.Equal(1, exit);
        Assert.Contains("not exact within the budget", output);
        var (jsonExit, json, _) = ConsoleRunner.Run("value", "domineering", "11x11", "--budget-ms", "50", "--json");
        Assert.Equal(1, jsonExit);
        using var doc = JsonDocument.Parse(json);
        Assert.False(doc.RootElement.GetProperty("exact").GetBoolean());
    }

    [Fact]
    public void ValueWithinABudgetIsExactWhenItFinishes()
    {
        var (exit, output, err) = ConsoleRunner.Run("value", "forms", "{1|0} + *", "--budget-ms", "60000", "--json");
        Assert.True(exit == 0, err);
        using var doc = JsonDocument.Parse(output);
        Assert.True(doc.RootElement.GetProperty("exact").GetBoolean());
    }

    [Fact]
    public void DrawToStdout()
    {
        var (exit, output, err) = ConsoleRunner.Run("draw", "thermograph", "{3|-1}", "--out", "-");
        Assert.True(exit == 0, err);
        Assert.Contains("<svg", output);
        Assert.EndsWith("</svg>", output.TrimEnd());
        Assert.False(File.Exists("-"));
    }

    [Theory]
    [InlineData("engine", "additional arguments")]
    [InlineData("value", "SPEC")]
    [InlineData("solve", "SPEC")]
    public void HelpTextsHaveNoOddities(string verb, string unwanted)
    {
        var (_, output, _) = ConsoleRunner.Run(verb, "--help");
        Assert.DoesNotContain(unwanted, output);
    }

    [Fact]
    public void ShardHelpShowsItsForm()
    {
        var (_, output, _) = ConsoleRunner.Run("match", "--help");
        Assert.Contains("--shard <K/N>", output);
    }

    [Fact]
    public void AnUnknownEngineOptionIsBadInputOnStderr()
    {
        var (exit, output, err) = ConsoleRunner.Run("engine", "--hashes", "64");
        Assert.Equal(2, exit);
        Assert.Equal("", output);
        Assert.Contains("--hashes", err);
    }
}
