using Bramble.Values;

namespace Bramble.Values.Tests;

/// <summary>
/// The shared form (docs/values.md): games whose full text would be longer than
/// <see cref="ValueNotation.PlainLimit"/> are written with named parts, and read back to the
/// same game. The names and the 'where' clause are this project's own notation (common
/// practice for writing DAGs; no published source).
/// </summary>
public class SharedFormTests
{
    private readonly GameStore _store = new();

    /// <summary>G(k+1) = (* : G(k)) + {1/2 | ↑}: the full text grows about twofold per level.</summary>
    private Game Growing(int levels)
    {
        var g = _store.Parse("{1|*}");
        var extra = _store.Parse("{1/2|↑}");
        for (int i = 0; i < levels; i++) g = _store.Add(_store.OrdinalSum(_store.Star, g), extra);
        return g;
    }

    [Fact]
    public void LargeFormsAreWrittenSharedAndReadBack()
    {
        int shared = 0;
        for (int levels = 0; levels <= 8; levels++)
        {
            var g = Growing(levels);
            string text = _store.Format(g);
            if (text.Contains(" where ")) shared++;
            // Each distinct subgame is written at most once, its options as names or short atoms.
            long bound = 70 * (OptionLinks(g) + 1);
            Assert.True(text.Length <= bound, $"text of {text.Length} characters at {levels} levels, bound {bound}");
            Assert.Equal(g, _store.Parse(text));
            Assert.Equal(g, _store.Parse(_store.Format(g, ascii: true)));
            // A fresh store reads the same value (so nothing depends on this store's ids).
            var other = new GameStore();
            Assert.Equal(text, other.Format(other.Parse(text)));
        }
        Assert.True(shared >= 3, $"only {shared} of the games were large enough for the shared form");
    }

    /// <summary>Options summed over the distinct subgames of g.</summary>
    private long OptionLinks(Game g)
    {
        var seen = new HashSet<Game>();
        var stack = new Stack<Game>([g]);
        long links = 0;
        while (stack.Count > 0)
        {
            var x = stack.Pop();
            if (!seen.Add(x) || _store.IsNumber(x)) continue;
            foreach (var o in _store.LeftOptions(x).Concat(_store.RightOptions(x))) { links++; stack.Push(o); }
        }
        return links;
    }

    [Fact]
    public void SmallFormsStayPlain()
    {
        var rng = new Random(5);
        for (int i = 0; i < 200; i++)
        {
            var g = TreeGame.Random(rng, 3).ToStore(_store);
            Assert.DoesNotContain("where", _store.Format(g));
        }
    }

    [Fact]
    public void WrittenSharedFormParsesToTheSameGame()
    {
        // Hand-written: #1 = {1|0}, and {#1, ↑ | #1 - 1} equals {{1|0}, ↑ | {0|-1}}.
        var viaParts = _store.Parse("{#1,↑|#1 - 1} where #1 = {1|0}");
        var direct = _store.Parse("{{1|0},↑|{0|-1}}");
        Assert.Equal(direct, viaParts);
        Assert.Equal(_store.Parse("{#2|#1} where #2 = {#1|0}; #1 = -1"), _store.Parse("{{-1|0}|-1}"));
    }

    [Theory]
    [InlineData("{#1|0}", 1, "no 'where'")]
    [InlineData("{#1|#2} where #1 = 1", 4, "#2 is not defined")]
    [InlineData("{#1|0} where #1 = {#1|0}", 19, "refers to itself")]
    [InlineData("{#1|0} where #1 = 1; #1 = 2", 21, "defined twice")]
    [InlineData("{#1|0} where 1", 13, "named part")]
    [InlineData("{#1|0} where #1 1", 16, "'='")]
    public void BadSharedFormsPointAtTheProblem(string text, int column, string said)
    {
        var e = Assert.Throws<ValueSyntaxException>(() => _store.Parse(text));
        Assert.Equal(column, e.Column);
        Assert.Contains(said, e.Expected);
    }
}

public class ScopedSharedFormTests
{
    private readonly GameStore _store = new();

    [Fact]
    public void ParenthesisedSharedFormsHaveTheirOwnNames()
    {
        // Each bracketed 'where' names its own parts; #1 means different games in the two terms.
        var sum = _store.Parse("({#1|0} where #1 = {1|0}) + ({#1|#1} where #1 = ↑)");
        Assert.Equal(_store.Parse("{{1|0}|0} + {↑|↑}"), sum);
        var e = Assert.Throws<ValueSyntaxException>(() => _store.Parse("({#1|0} where #1 = 1) + #1"));
        Assert.Equal(24, e.Column);
        Assert.Contains("no 'where'", e.Expected);
    }

    [Fact]
    public void WrittenExpressionsOfSharedFormsReadBack()
    {
        var expr = ValueNotation.Parse("{#1,↑|#2} where #1 = {1|0}; #2 = -#1");
        string written = ValueExprWriter.Write(expr);
        Assert.Equal(_store.Evaluate(expr), _store.Parse(written));
    }
}
