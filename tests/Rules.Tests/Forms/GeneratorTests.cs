using Bramble.Rules.Forms;
using Bramble.Values;

namespace Bramble.Rules.Tests.Forms;

public class GeneratorTests
{
    private readonly FormsRuleset _rules = new();

    [Theory]
    [InlineData("switches")]
    [InlineData("hot")]
    [InlineData("hot-extra")]
    [InlineData("mixed")]
    public void GeneratorsAreReproducibleAndGiveSizeTerms(string generator)
    {
        var first = _rules.Generate(generator, 10, 5, seed: 9);
        Assert.Equal(first, _rules.Generate(generator, 10, 5, seed: 9));
        Assert.NotEqual(first, _rules.Generate(generator, 10, 5, seed: 10));
        foreach (string text in first)
        {
            var position = _rules.Parse(text);
            Assert.Equal(5, position.Size);
            Assert.Equal(text, position.Text);
        }
    }

    [Fact]
    public void HotTermsHaveThePublishedShape()
    {
        foreach (string text in _rules.Generate("hot", 40, 5, seed: 1))
        {
            foreach (var (_, term) in ((FormsPosition)_rules.Parse(text)).Terms)
            {
                // Müller & Li, CG 2004 (Winning Ways ch. 6; Berlekamp 1996; Hanner 1959): {a|b||c|d}, d = 0, c = d + rand(50), b = c + rand(50), a = b + rand(50).
                var form = Assert.IsType<OptionsExpr>(term.Expression);
                var outer = Assert.IsType<OptionsExpr>(Assert.Single(form.Left));
                var inner = Assert.IsType<OptionsExpr>(Assert.Single(form.Right));
                long a = Number(outer.Left), b = Number(outer.Right), c = Number(inner.Left), d = Number(inner.Right);
                Assert.Equal(0, d);
                Assert.InRange(c - d, 0, 49);
                Assert.InRange(b - c, 0, 49);
                Assert.InRange(a - b, 0, 49);
            }
        }
    }

    [Fact]
    public void HotExtraTermsHaveOneExtraOptionPerSide()
    {
        foreach (string text in _rules.Generate("hot-extra", 20, 3, seed: 2))
        {
            foreach (var (_, term) in ((FormsPosition)_rules.Parse(text)).Terms)
            {
                // Müller & Li, CG 2004 (Winning Ways ch. 6; Berlekamp 1996; Hanner 1959), variant: each option A gains {A + rand(10) | A + rand(10)}.
                var form = Assert.IsType<OptionsExpr>(term.Expression);
                Assert.Equal(2, form.Left.Count);
                Assert.Equal(2, form.Right.Count);
                var a = Assert.IsType<OptionsExpr>(form.Left[0]);
                var extra = Assert.IsType<OptionsExpr>(form.Left[1]);
                foreach (var shifted in extra.Left.Concat(extra.Right).Cast<OptionsExpr>())
                {
                    long r = Number(shifted.Left) - Number(a.Left);
                    Assert.InRange(r, 0, 9);
                    Assert.Equal(r, Number(shifted.Right) - Number(a.Right));
                }
            }
        }
    }

    [Fact]
    public void UnknownGeneratorsAreRefused()
    {
        Assert.Contains("known", Assert.Throws<ArgumentException>(() => _rules.Generate("tulips", 1, 2, 0)).Message);
        Assert.Throws<ArgumentOutOfRangeException>(() => _rules.Generate("hot", 1, 0, 0));
    }

    private static long Number(IReadOnlyList<ValueExpr> side) => (long)Assert.IsType<NumberExpr>(Assert.Single(side)).Value.Numerator;
}
