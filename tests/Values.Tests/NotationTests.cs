namespace Bramble.Values.Tests;

public class NotationTests
{
    private readonly GameStore _store = new();

    [Theory]
    [InlineData("up", "↑")]
    [InlineData("2up", "⇑")]
    [InlineData("3down*2", "3↓*2")]
    [InlineData("1/2 + up*", "1/2 + ↑*")]
    [InlineData("1/2 + ↑*", "1/2 + ↑*")]
    [InlineData("1*", "1*")]
    [InlineData("*2 + *3", "*")]
    [InlineData("(1 + 1/2) - 1/4", "5/4")]
    [InlineData("{1|-1}", "±1")]
    [InlineData("±3/4", "±3/4")]
    [InlineData("-{2|1}", "{-1|-2}")]
    [InlineData("{ 1 | 0 , * }", "{1|0,*}")]
    [InlineData("{{4|2}|{-2|-4}}", "{4|2||-2|-4}")]
    [InlineData("{4|2||-2|-4}", "{4|2||-2|-4}")]
    [InlineData("{5|2||0}", "{5|2||0}")]
    public void ReadsBothFormsAndWritesTheSymbols(string text, string expected) =>
        Assert.Equal(expected, _store.Format(_store.Parse(text)));

    [Theory]
    [InlineData("⇑*3", "2up*3")]
    [InlineData("±1", "+-1")] // the ASCII spelling of ± reads back (docs/values.md)
    [InlineData("1/2 + ↓", "1/2 + down")]
    [InlineData("{2||1|0}", "{2||1|0}")]
    public void AsciiOutput(string text, string ascii) => Assert.Equal(ascii, _store.Format(_store.Parse(text), ascii: true));

    [Theory]
    [InlineData("{1|", 3)]
    [InlineData("1/3", 0)]
    [InlineData("{1,2}", 1)]
    [InlineData("1 + ", 4)]
    [InlineData("{1|2|3}", 4)]
    [InlineData("q", 0)]
    [InlineData("{1|0} 2", 6)]
    public void ErrorsPointAtTheColumn(string text, int column)
    {
        var e = Assert.Throws<ValueSyntaxException>(() => ValueNotation.Parse(text));
        Assert.Equal(column, e.Column);
        Assert.Contains("^", e.Pointer);
    }

    [Fact]
    public void TermsKeepTheirColumnsAndSigns()
    {
        var terms = ValueNotation.ParseTerms("{3|-1} + {5|2||0} - * + 1/2");
        Assert.Equal(4, terms.Count);
        Assert.Equal([0, 7, 18, 22], terms.Select(t => t.Column));
        Assert.IsType<NegateExpr>(terms[2].Term);
        Assert.Equal("{5|2||0}", ValueExprWriter.Write(terms[1].Term));
    }

    [Fact]
    public void RandomGamesRoundTripThroughNotation()
    {
        var rng = new Random(9);
        for (int i = 0; i < 500; i++)
        {
            var g = TreeGame.Random(rng, 4).ToStore(_store);
            Assert.Equal(g, _store.Parse(_store.Format(g)));
            Assert.Equal(g, _store.Parse(_store.Format(g, ascii: true)));
        }
    }
}

public class ExpressionWriterTests
{
    [Theory]
    [InlineData("-(1/2 + ↑)")]
    [InlineData("-↑*")]
    [InlineData("-{2|1}")]
    [InlineData("{5|2||0} + -3/4")]
    public void WrittenExpressionsParseBackToTheSameValue(string text)
    {
        var store = new GameStore();
        var expr = ValueNotation.Parse(text);
        var again = ValueNotation.Parse(ValueExprWriter.Write(expr));
        Assert.Equal(store.Evaluate(expr), store.Evaluate(again));
    }
}
