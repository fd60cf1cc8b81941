using Bramble.Rules.Forms;
using Bramble.Values;

namespace Bramble.Rules.Tests.Forms;

/// <summary>Forms positions: notation, moves as written, canonical options of atoms, components, values.</summary>
public class FormsTests
{
    private readonly FormsRuleset _rules = new();

    private static string[] Texts(IPosition position, Side side) =>
        position.Moves(side).Select(m => position.Play(side, m).Text).ToArray();

    [Theory]
    [InlineData("{3|-1} + {5|2||0} + * + 1/2")]
    [InlineData("↑ + ⇓* + *3 + ±1 + -2 + 3/8")]
    [InlineData("{1|0} - {2|*} + (1/2 + ↑)")]
    [InlineData("-{1|0} - (-{2|0})")]
    [InlineData("0")]
    public void TextParsesBackToTheSameTerms(string text)
    {
        var position = _rules.Parse(text);
        Assert.Equal(text, position.Text);
        Assert.Equal(position.Text, _rules.Parse(position.Text).Text);
    }

    [Fact]
    public void EachTermIsAComponentUnderItsOwnNumber()
    {
        var position = _rules.Parse("{1|0} + 0 + *");
        Assert.Equal(3, position.Size);
        var components = position.Components();
        // The term 0 has no move for anybody and is dropped.
        Assert.Equal(2, components.Count);
        Assert.Equal([new Move(1, 1)], components[0].Moves(Side.Left));
        Assert.Equal([new Move(3, 1)], components[1].Moves(Side.Left));
        Assert.Equal("*", components[1].Text);
    }

    [Fact]
    public void MovesFollowTheOptionsAsWritten()
    {
        var position = _rules.Parse("{0, -1 | 5} + {3|-1}");
        Assert.Equal(["1.1", "1.2", "2.1"], position.Moves(Side.Left).Select(position.FormatMove));
        // docs/ (position notation): the j-th option as written, dominated ones included.
        Assert.Equal(["0 + {3|-1}", "-1 + {3|-1}", "{0,-1|5} + 3"], Texts(position, Side.Left));
        Assert.Equal(["5 + {3|-1}", "{0,-1|5} + -1"], Texts(position, Side.Right));
    }

    [Fact]
    public void AtomsMoveToTheirCanonicalOptions()
    {
        // Canonical forms (derived from the definitions by exhaustive play, Winning Ways ch. 3): ↑ = {0|*}, ⇑ = {0|↑*}, *2 = {0,*|0,*}; 3/8 = {1/4|1/2}, 3 = {2|}.
        Assert.Equal(["0"], Texts(_rules.Parse("↑"), Side.Left));
        Assert.Equal(["*"], Texts(_rules.Parse("↑"), Side.Right));
        Assert.Equal(["↑*"], Texts(_rules.Parse("⇑"), Side.Right));
        Assert.Equal(["0", "*"], Texts(_rules.Parse("*2"), Side.Right));
        Assert.Equal(["1/4"], Texts(_rules.Parse("3/8"), Side.Left));
        Assert.Equal(["1/2"], Texts(_rules.Parse("3/8"), Side.Right));
        Assert.Equal(["2"], Texts(_rules.Parse("3"), Side.Left));
        Assert.Empty(_rules.Parse("3").Moves(Side.Right));
        Assert.Equal(["1"], Texts(_rules.Parse("±1"), Side.Left));
        Assert.Equal(["-1"], Texts(_rules.Parse("±1"), Side.Right));
    }

    [Fact]
    public void NegatedTermsSwapAndNegateTheOptionsAsWritten()
    {
        var position = _rules.Parse("-{3, {4|2} | 1}");
        // Derived from the definitions: the options of −G are the negatives of G's options, sides swapped.
        Assert.Equal(["-1"], Texts(position, Side.Left));
        Assert.Equal(["-3", "-{4|2}"], Texts(position, Side.Right));
    }

    [Fact]
    public void MoveNamesAreTermDotOption()
    {
        var position = _rules.Parse("{1|0} + *");
        Assert.Equal(new Move(2, 1), position.ParseMove("2.1"));
        Assert.Equal("2.1", position.FormatMove(new Move(2, 1)));
        foreach (string bad in new[] { "2", "a.b", "0.1", "1.0", "", "1.-1" })
            Assert.Throws<IllegalMoveException>(() => position.ParseMove(bad));
        Assert.Contains("no term 3", Assert.Throws<IllegalMoveException>(() => position.Play(Side.Left, new Move(3, 1))).Message);
        Assert.Contains("1 option", Assert.Throws<IllegalMoveException>(() => position.Play(Side.Left, new Move(1, 2))).Message);
    }

    [Fact]
    public void BadTextIsRefusedWithTheColumnOfTheFault()
    {
        var error = Assert.Throws<PositionSyntaxException>(() => _rules.Parse("{3|-1} + {5|2"));
        Assert.Equal(13, error.Column);
        Assert.Contains("^", error.Pointer);
        Assert.Throws<PositionSyntaxException>(() => _rules.Parse(""));
    }

    [Fact]
    public void ValueIsTheSumOfTheTermsCanonicalForms()
    {
        var context = new ValueContext();
        var s = context.Store;
        var value = _rules.Value(_rules.Parse("↑ + ↑ + *"), context);
        // Winning Ways ch. 3 / derived from the definitions by exhaustive play: ↑ + ↑ + * = ⇑*.
        Assert.Equal(s.UpStar(Dyadic.Zero, 2, 1), value);
        // Derived from the definitions: {1|0} + {1|0} = {1|0} + {1|0}; ±1 + ±1 = 0 (a switch plus itself is 0).
        Assert.Equal(s.Zero, _rules.Value(_rules.Parse("±1 + ±1"), context));
    }

    [Fact]
    public void HashAndNormalKeyDependOnTheTerms()
    {
        var a = _rules.Parse("{1|0} + *");
        Assert.Equal(a.Hash, _rules.Parse("{1|0} + *").Hash);
        Assert.NotEqual(a.Hash, _rules.Parse("* + {1|0}").Hash);
        Assert.Equal(a.NormalKey, _rules.Parse("* + {1|0}").NormalKey);
        Assert.Equal("0", _rules.Parse("0 + 0").NormalKey);
    }

    [Fact]
    public void RandomSumsMatchPlainSearchOverTheMoves()
    {
        var context = new ValueContext();
        var plain = new PlainForms(context.Store);
        var cases = _rules.Generate("mixed", 150, 2, seed: 41)
            .Concat(_rules.Generate("mixed", 40, 3, seed: 42))
            .Concat(_rules.Generate("switches", 10, 2, seed: 43));
        foreach (string text in cases)
        {
            var position = _rules.Parse(text);
            // Common practice: the canonical value of the sum must equal plain search over the moves as played.
            Assert.True(plain.Value(position) == _rules.Value(position, context), text);
        }
    }

    [Fact]
    public void HotComponentsMatchPlainSearch()
    {
        var context = new ValueContext();
        var plain = new PlainForms(context.Store);
        foreach (string text in _rules.Generate("hot", 6, 1, seed: 5).Concat(_rules.Generate("hot-extra", 6, 1, seed: 6)))
        {
            var position = _rules.Parse(text);
            Assert.True(plain.Value(position) == _rules.Value(position, context), text);
        }
    }
}
