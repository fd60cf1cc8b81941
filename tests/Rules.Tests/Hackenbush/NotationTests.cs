using Bramble.Rules.Hackenbush;
using Bramble.Values;

namespace Bramble.Rules.Tests.Hackenbush;

/// <summary>Reading and writing the notation of docs/ (position notation): edge ids, errors with carets, round trips.</summary>
public sealed class NotationTests
{
    private readonly HackenbushRuleset _rules = new();

    private static string Describe(HackenbushPosition p) =>
        string.Join(" ", p.Edges.Select(e => $"{e.Id}:{e.Colour.Letter()}"));

    [Fact]
    public void SpecExampleParsesWithIdsInOrderOfAppearance()
    {
        var p = _rules.ParsePosition("BR + G(B,R) + [B0-1,R1-2,G2-0,B1-3]");
        // docs/ (position notation): ids 1, 2, 3, … in the order the edges appear in the text (common practice check of the spec).
        Assert.Equal("e1:B e2:R e3:G e4:B e5:R e6:B e7:R e8:G e9:B", Describe(p));
        Assert.Equal(3, p.Components().Count);
    }

    [Theory]
    [InlineData("BR + G(B,R) + [B0-1,R1-2,G2-0,B1-3]")]
    [InlineData("BRR")]
    [InlineData("G(B,R)")]
    [InlineData("BR(G,B(R,R),GG) + RRB")]
    [InlineData("[G0-0]")]
    [InlineData("[B0-1,R0-1]")]
    [InlineData("[G0-1,G1-1,B1-2,R2-1]")]
    [InlineData("0")]
    public void TextGivesBackTheSameText(string text) => Assert.Equal(text, _rules.Parse(text).Text);

    [Fact]
    public void WhitespaceAndLowerCaseAreAccepted()
    {
        var a = _rules.Parse(" b r ( g , b ) +\t[ g0 - 1 , r 1-1 ] ");
        var b = _rules.Parse("BR(G,B) + [G0-1,R1-1]");
        Assert.Equal(b.Text, a.Text);
    }

    [Fact]
    public void NodeLabelsAreAnyDigitsAndLocalToTheirGraph()
    {
        var p = _rules.ParsePosition("[B0-17,R17-4000,G4000-17] + [G0-17]");
        Assert.Equal("[B0-1,R1-2,G2-1] + G", p.Text);
        Assert.Equal(2, p.Components().Count);
    }

    [Fact]
    public void ZeroIsTheEmptyPosition()
    {
        var p = _rules.ParsePosition("0");
        Assert.True(p.IsEmpty);
        Assert.Empty(p.Moves(Side.Left));
        Assert.Empty(p.Components());
        Assert.Equal(new ValueContext().Store.Zero, _rules.Value(p, new ValueContext()));
    }

    [Theory]
    [InlineData("", 0, "a stalk such as BRG")]
    [InlineData("BX", 1, "a colour B, R or G")] // a letter where a colour could stand is named as such
    [InlineData("B +", 3, "another part after '+'")]
    [InlineData("B + + R", 4, "a stalk (B, R or G) or a graph")]
    [InlineData("G(B,R", 5, "',' or ')'")]
    [InlineData("G(B,)", 4, "a colour B, R or G")]
    [InlineData("G()", 2, "a colour B, R or G")]
    [InlineData("G(B)R", 4, "'+' or the end")] // a colour cannot follow a closed branch list
    [InlineData("[]", 1, "an edge such as B0-1")]
    [InlineData("[B0 1]", 4, "'-' between the two nodes")]
    [InlineData("[B0-]", 4, "a node number")]
    [InlineData("[B0-1 R1-2]", 6, "',' or ']'")]
    [InlineData("[B0-1", 5, "',' or ']'")]
    [InlineData("0 + B", 2, "the end of the text")]
    [InlineData("X", 0, "a stalk such as BRG")]
    public void SyntaxErrorsPointAtTheCharacter(string text, int column, string expected)
    {
        var e = Assert.Throws<PositionSyntaxException>(() => _rules.Parse(text));
        Assert.Equal(column, e.Column);
        Assert.Contains(expected, e.Expected);
        // The caret sits under the offending column.
        var lines = e.Pointer.Split('\n');
        Assert.Equal(column, lines[1].IndexOf('^'));
    }

    [Fact]
    public void AnEdgeWithNoPathToTheGroundIsAnErrorNamingIt()
    {
        var e = Assert.Throws<PositionSyntaxException>(() => _rules.Parse("BR + [B0-1,R1-2,G3-4,B4-5]"));
        Assert.Contains("e5", e.Expected);
        Assert.Contains("G3-4", e.Expected);
        Assert.Equal(16, e.Column);
    }

    [Fact]
    public void LoopsAndParallelEdgesAreFine()
    {
        var p = _rules.ParsePosition("[G0-1,G0-1,B1-1,R1-1,G1-2,G2-1]");
        Assert.Equal(6, p.Size);
        Assert.Single(p.Components());
    }

    [Fact]
    public void TextAfterCutsKeepsTheOrderOfIds()
    {
        var random = new Random(4);
        for (int i = 0; i < 200; i++)
        {
            var d = Shapes.Sum(random, 2 + random.Next(12), "BRG");
            IPosition p = _rules.Parse(d.Bracket());
            for (int k = random.Next(4); k > 0; k--)
            {
                var moves = p.Moves(Side.Left);
                if (moves.Count == 0) break;
                p = p.Play(Side.Left, moves[random.Next(moves.Count)]);
            }
            var again = (HackenbushPosition)_rules.Parse(p.Text);
            var before = ((HackenbushPosition)p).Edges;
            var after = again.Edges;
            Assert.Equal(before.Count, after.Count);
            // Same colours in the same id order, and ids renumbered 1..k.
            Assert.Equal(before.Select(e => e.Colour), after.Select(e => e.Colour));
            Assert.Equal(Enumerable.Range(1, after.Count), after.Select(e => e.Id.Value));
            Assert.Equal(p.NormalKey, again.NormalKey);
            Assert.Equal(again.Text, again.Text.Length > 0 ? _rules.Parse(again.Text).Text : "");
        }
    }

    [Fact]
    public void TreesPrintAsTreesWhenTheirOrderAllows()
    {
        IPosition p = _rules.Parse("BR(G,B) + [B0-1,R1-2,G2-0,B1-3]");
        // Cutting G2-0 (e7) leaves a tree B(R,B) whose pre-order is still in id order.
        p = p.Play(Side.Left, p.ParseMove("e7"));
        Assert.Equal("BR(G,B) + B(R,B)", p.Text);
        // A tree listed out of pre-order stays a graph.
        Assert.Equal("[R1-2,B0-1]", _rules.Parse("[R1-2,B0-1]").Text);
    }

    [Fact]
    public void InterleavedPiecesBecomeOneGraph()
    {
        var p = _rules.Parse("[B0-1,R0-2,G1-3,B2-4]");
        Assert.Equal(2, p.Components().Count);
        Assert.Equal("[B0-1,R0-2,G1-3,B2-4]", p.Text);
    }

    [Fact]
    public void DeepTreesAndLongStalksParseWithoutRecursion()
    {
        int depth = 100_000;
        var nested = string.Concat(Enumerable.Repeat("B(R,", depth)) + "G" + new string(')', depth);
        var p = _rules.ParsePosition(nested);
        Assert.Equal(2 * depth + 1, p.Size);
        Assert.Equal(nested, p.Text);
        var stalk = _rules.ParsePosition(new string('G', 200_000));
        Assert.Equal(200_000, Fusion.NimValue(stalk));
    }
}
