using System.Xml.Linq;
using Bramble.Rules;
using Bramble.Values;

namespace Bramble.Pictures.Tests;

public class GraphGamePictureTests
{
    private static List<XElement> Circles(string svg) =>
        XDocument.Parse(svg).Descendants().Where(e => e.Name.LocalName == "circle").ToList();

    [Fact]
    public void ColouredVerticesAreFilledAndRingsSayWhoMayColour()
    {
        // Snort: 1 is next to blue 2 (Left only), 3 next to blue 2 and red 4 (nobody), 5 free (either).
        var position = Rulesets.Get("snort").Parse("[1-2B-3-4R,5]");
        var circles = Circles(PositionPicture.Draw(position));
        Assert.Equal(5, circles.Count);
        var doc = XDocument.Parse(PositionPicture.Draw(position));
        string ClassOf(string label)
        {
            // A vertex someone may colour is a group (the click target) holding its circle.
            var element = doc.Descendants().First(e => (string?)e.Attribute("data-vertex") == label);
            var circle = element.Name.LocalName == "circle" ? element : element.Elements().First(e => e.Name.LocalName == "circle");
            return (string)circle.Attribute("class")!;
        }
        Assert.Equal("left-only", ClassOf("1"));
        Assert.Equal("blue", ClassOf("2"));
        Assert.Equal("nobody", ClassOf("3"));
        Assert.Equal("red", ClassOf("4"));
        Assert.Equal("either", ClassOf("5"));
    }

    [Fact]
    public void APathIsDrawnInAStraightLine()
    {
        var svg = PositionPicture.Draw(Rulesets.Get("col").Parse("P6"));
        var ys = Circles(svg).Select(c => (string)c.Attribute("cy")!).Distinct().ToList();
        Assert.Single(ys);
    }

    [Fact]
    public void TextPictureListsWhoMayColourEachVertex()
    {
        var position = Rulesets.Get("col").Parse("[1-2B-3,4]");
        var text = TextPicture.Draw(position);
        // Col: 1 and 3 are next to blue, so only Right may colour them; 4 is free.
        Assert.Contains("right only", text.Split('\n').First(l => l.TrimStart().StartsWith("1 ")));
        Assert.Contains("either", text.Split('\n').First(l => l.TrimStart().StartsWith("4 ")));
        Assert.Contains("type its number", text);
        Assert.Equal(2, position.Moves(Side.Right).Count(m => m.A is 1 or 3));
    }
}
