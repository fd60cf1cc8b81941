using System.Numerics;

namespace Bramble.Values.Tests;

/// <summary>
/// The value notation on text a newcomer or an attacker writes: ASCII for ±, decimals, signs,
/// deep nesting and huge numbers. Every bad text gets a located message, never another exception.
/// </summary>
public class HostileNotationTests
{
    private readonly GameStore _store = new();

    private string Value(string text) => _store.Format(_store.Parse(text));

    [Theory]
    [InlineData("+-1", "±1")]
    [InlineData("+- 3/4", "±3/4")]
    public void PlusMinusIsTheAsciiSpellingOfTheSwitch(string text, string expected) => Assert.Equal(expected, Value(text));

    [Fact]
    public void PlusMinusInsideBracesIsAnOption()
    {
        var braces = Assert.IsType<OptionsExpr>(ValueNotation.Parse("{+-1|0}"));
        Assert.Equal(new SwitchExpr(Dyadic.One), braces.Left[0]);
    }

    [Fact]
    public void XPlusMinusYIsXPlusTheSwitch()
    {
        // x ± y = {x + y | x − y} (from memory: the usual reading of ± between two numbers).
        Assert.Equal(Value("{3|1}"), Value("2 +- 1"));
        Assert.Equal(Value("{3|1}"), Value("2 ± 1"));
    }

    [Theory]
    [InlineData("±1")]
    [InlineData("±3/4 + ⇑*")]
    [InlineData("{±2|0}")]
    public void AsciiOutputReadsBackToTheSameValue(string text)
    {
        var g = _store.Parse(text);
        string ascii = _store.Format(g, ascii: true);
        Assert.All(ascii, ch => Assert.True(ch < 128, ascii));
        Assert.Equal(g, _store.Parse(ascii));
    }

    [Theory]
    [InlineData("1.5", "write 3/2 for 1.5")]
    [InlineData("-0.375", "write -3/8 for -0.375")]
    [InlineData("2.0", "write 2 for 2.0")]
    [InlineData("{1|0.25}", "write 1/4 for 0.25")]
    [InlineData("0.1", "0.1 is not one")]
    public void DecimalsAreAnsweredWithTheFraction(string text, string hint)
    {
        var e = Assert.Throws<ValueSyntaxException>(() => ValueNotation.Parse(text));
        Assert.Contains(hint, e.Expected);
    }

    [Theory]
    [InlineData("{1|0} + -{2|1}", "{1|0} - {2|1}")]
    [InlineData("1 + -*", "1*")]
    [InlineData("- -{2|1}", "{2|1}")]
    [InlineData("{0|-(1 + *)}", "{0|-1*}")]
    [InlineData("-↑", "↓")]
    public void ALeadingMinusNegatesAnyTerm(string text, string same) => Assert.Equal(Value(same), Value(text));

    [Fact]
    public void NestingUpToTheLimitIsRead()
    {
        int n = ValueNotation.MaxDepth;
        string text = string.Concat(Enumerable.Repeat("{0|", n)) + "0" + new string('}', n);
        var expr = ValueNotation.Parse(text);
        int depth = 0;
        for (var e = expr; e is OptionsExpr o; e = o.Right[0]) depth++;
        Assert.Equal(n, depth);
    }

    [Theory]
    [InlineData("{0|", "0}")]
    [InlineData("(", "1)")]
    [InlineData("{", "|0}")]
    public void NestingPastTheLimitGetsALocatedMessage(string open, string close)
    {
        foreach (int n in new[] { ValueNotation.MaxDepth + 1, 100_000 })
        {
            string text = string.Concat(Enumerable.Repeat(open, n)) + string.Concat(Enumerable.Repeat(close, n));
            // On a small stack: a reader that recursed once per level would overflow here.
            var e = OnSmallStack(() => Assert.Throws<ValueSyntaxException>(() => ValueNotation.Parse(text)));
            Assert.Contains($"at most {ValueNotation.MaxDepth}", e.Expected);
            Assert.Equal(open.Length * ValueNotation.MaxDepth, e.Column);
        }
    }

    [Fact]
    public void DeepBarLevelsAreBoundedToo()
    {
        // {0|0||0|||…} with ever longer bar runs nests without braces: one level per bar run.
        var sb = new System.Text.StringBuilder("{");
        for (int k = 1; k <= 1500; k++) sb.Append('0').Append(new string('|', k));
        sb.Append("0}");
        var e = OnSmallStack(() => Assert.Throws<ValueSyntaxException>(() => ValueNotation.Parse(sb.ToString())));
        Assert.Contains("levels of nesting", e.Expected);
    }

    [Fact]
    public void RunsOfMinusSignsAreReadWithoutRecursion()
    {
        string text = string.Concat(Enumerable.Repeat("- ", 200_000)) + "{1|0}";
        var expr = OnSmallStack(() => ValueNotation.Parse(text));
        Assert.IsType<OptionsExpr>(expr); // an even number of minus signs
    }

    [Fact]
    public void HugeNumbersWork()
    {
        var big = BigInteger.Parse("99999999999999999999999999");
        var g = _store.Parse("99999999999999999999999999");
        Assert.Equal("99999999999999999999999999", _store.Format(g));
        // The integer n is born on day n (from memory: each integer is born the day after its predecessor).
        Assert.Equal(big, _store.ExactBirthday(g));
        Assert.Equal(int.MaxValue, _store.Birthday(g));
        var sw = _store.Parse("{1000000000000000000000|-1000000000000000000000}");
        Assert.Equal(BigInteger.Parse("1000000000000000000001"), _store.ExactBirthday(sw));
        Assert.Equal("±1000000000000000000000", _store.Format(sw));
    }

    [Theory]
    [InlineData("99999999999up", 0)]
    [InlineData("1 + 100001up", 4)]
    [InlineData("*99999999999", 1)]
    public void TooManyUpsOrTooLargeANimberGetALocatedMessage(string text, int column)
    {
        var e = Assert.Throws<ValueSyntaxException>(() => ValueNotation.Parse(text));
        Assert.Equal(column, e.Column);
    }

    [Fact]
    public void ThePointerShowsAWindowAroundTheFaultEscaped()
    {
        string text = new string('1', 100_000) + " \u001b[2J x";
        var e = Assert.Throws<ValueSyntaxException>(() => ValueNotation.Parse(text));
        string[] lines = e.Pointer.Split('\n');
        Assert.Equal(2, lines.Length);
        Assert.True(lines[0].Length < PrintableText.Before + PrintableText.After + 20, lines[0]);
        Assert.DoesNotContain('\u001b', e.Pointer);
        Assert.Contains("\\x1B[2J", lines[0]);
        // The caret sits under the fault: the ESC, shown as its escape.
        Assert.Equal(lines[0].IndexOf("\\x1B", StringComparison.Ordinal), lines[1].IndexOf('^'));
    }

    [Fact]
    public void ThePointerNamesTheLineOfAManyLineText()
    {
        var e = Assert.Throws<ValueSyntaxException>(() => ValueNotation.Parse("{1|0}\n+ {2|1}\n+ q"));
        Assert.Contains("line 3, column 3", e.Pointer);
        Assert.StartsWith("+ q\n", e.Pointer);
    }

    [Theory]
    [InlineData("abc\u001b[31m", "abc\\x1B[31m")]
    [InlineData("a\u0000b\u0007", "a\\x00b\\x07")]
    [InlineData("\u202Eevil", "\\u202Eevil")]
    [InlineData("x\u2066y\u2069\u200F", "x\\u2066y\\u2069\\u200F")]
    [InlineData("\u009b1m", "\\x9B1m")]
    [InlineData("tab\tand\nline ↑ ±", "tab\tand\nline ↑ ±")]
    public void ControlAndBidiCharactersAreEscaped(string text, string shown) => Assert.Equal(shown, PrintableText.Escape(text));

    /// <summary>Runs on a 256 KiB stack, far below the default, so deep recursion shows as a crash.</summary>
    internal static T OnSmallStack<T>(Func<T> work) => BigStack.Run(work, 256 * 1024);
}

/// <summary>Writing deep expressions back: linear in the depth, and read back to the same expression.</summary>
public class DeepWritingTests
{
    [Fact]
    public void ADeepFormIsWrittenInTextLinearInItsDepth()
    {
        int n = ValueNotation.MaxDepth;
        string text = string.Concat(Enumerable.Repeat("{0|", n)) + "0" + new string('}', n);
        var expr = ValueNotation.Parse(text);
        string written = ValueExprWriter.Write(expr);
        // With unbounded bar runs the text would hold 1 + 2 + … + n bars; braces every few levels keep it near 4n.
        Assert.True(written.Length <= 5 * n, $"{written.Length} characters for depth {n}");
        Assert.Equal(written, ValueExprWriter.Write(ValueNotation.Parse(written)));
        Assert.Equal(expr, ValueNotation.Parse(written), new StructuralComparer());
    }

    [Fact]
    public void ShortBarRunsStayAsTheyWere()
    {
        Assert.Equal("{4|2||-2|-4}", ValueExprWriter.Write(ValueNotation.Parse("{{4|2}|{-2|-4}}")));
        Assert.Equal("{0||||0|||0||0|0}", ValueExprWriter.Write(ValueNotation.Parse("{0|{0|{0|{0|0}}}}")));
        Assert.Equal("{0|{0||||0|||0||0|0}}", ValueExprWriter.Write(ValueNotation.Parse("{0|{0|{0|{0|{0|0}}}}}")));
    }

    /// <summary>Compares expression trees by shape and contents, without recursion on their depth.</summary>
    private sealed class StructuralComparer : IEqualityComparer<ValueExpr>
    {
        public bool Equals(ValueExpr? a, ValueExpr? b)
        {
            var pending = new Stack<(ValueExpr?, ValueExpr?)>([(a, b)]);
            while (pending.Count > 0)
            {
                var (x, y) = pending.Pop();
                if (x is OptionsExpr ox && y is OptionsExpr oy)
                {
                    if (ox.Left.Count != oy.Left.Count || ox.Right.Count != oy.Right.Count) return false;
                    for (int i = 0; i < ox.Left.Count; i++) pending.Push((ox.Left[i], oy.Left[i]));
                    for (int i = 0; i < ox.Right.Count; i++) pending.Push((ox.Right[i], oy.Right[i]));
                }
                else if (x is OptionsExpr || y is OptionsExpr || !Equals2(x, y)) return false;
            }
            return true;
        }

        private static bool Equals2(ValueExpr? x, ValueExpr? y) => EqualityComparer<ValueExpr>.Default.Equals(x, y);

        public int GetHashCode(ValueExpr obj) => 0;
    }
}
