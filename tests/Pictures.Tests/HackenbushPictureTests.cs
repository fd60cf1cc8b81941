using System.Xml.Linq;
using Bramble.Rules;
using Bramble.Rules.Hackenbush;

namespace Bramble.Pictures.Tests;

public class HackenbushPictureTests
{
    private static readonly XNamespace Ns = "http://www.w3.org/2000/svg";

    [Theory]
    [InlineData("BRB", 3)]
    [InlineData("G(B,R) + GG", 5)]
    [InlineData("[B0-1,R1-2,G2-0,B1-3,G3-3]", 5)]
    [InlineData("[G0-1,G0-1,R1-2,B2-0,G2-1]", 5)]
    public void OneMarkPerEdgeLabelledWithItsId(string text, int edges)
    {
        var position = (HackenbushPosition)Rulesets.Get("hackenbush").Parse(text);
        var doc = XDocument.Parse(PositionPicture.Draw(position));
        var marks = doc.Descendants().Where(e => e.Attribute("data-edge") is not null).ToList();
        Assert.Equal(edges, marks.Count);
        var ids = marks.Select(m => (string)m.Attribute("data-move")!).ToHashSet();
        Assert.Equal(position.Edges.Select(e => e.Id.ToString()).ToHashSet(), ids);
        // Each label is the edge id followed by its colour letter, e.g. "e3 R".
        var labels = doc.Descendants(Ns + "text").Select(t => t.Value.Split(' ')[0]).ToHashSet();
        Assert.Superset(ids, labels);
        var letters = doc.Descendants(Ns + "g").Where(g => g.Attribute("data-edge") is not null)
            .Select(g => g.Element(Ns + "text")!.Value).ToList();
        Assert.Equal(position.Edges.Select(e => $"{e.Id} {e.Colour.Letter()}"), letters);
    }

    [Fact]
    public void EdgeColoursAreDrawnInTheirColourClass()
    {
        var position = (HackenbushPosition)Rulesets.Get("hackenbush").Parse("BRG");
        var doc = XDocument.Parse(PositionPicture.Draw(position));
        var classes = doc.Descendants().Where(e => e.Attribute("data-edge") is not null).Select(e => (string)e.Attribute("data-colour")!).ToList();
        Assert.Equal(["blue", "red", "green"], classes);
    }

    [Fact]
    public void TreesStandUpright()
    {
        // A stalk's nodes rise one level per edge above the ground.
        var position = (HackenbushPosition)Rulesets.Get("hackenbush").Parse("BRBG");
        var layout = new HackenbushLayout(position);
        Assert.Equal([1.0, 2.0, 3.0, 4.0], layout.Nodes.Where(n => n.Key != 0).Select(n => n.Value.Y).Order());
        Assert.Single(layout.Nodes.Where(n => n.Key != 0).Select(n => n.Value.X).Distinct());
    }

    [Fact]
    public void TextPictureListsEveryEdge()
    {
        var text = TextPicture.Draw(Rulesets.Get("hackenbush").Parse("BR + G(B,R)"));
        foreach (var id in new[] { "e1", "e2", "e3", "e4", "e5" }) Assert.Contains(id, text);
        Assert.Contains("ground", text);
    }
}
