using System.Xml.Linq;
using Bramble.Rules;

namespace Bramble.Pictures.Tests;

public class FormsPictureTests
{
    private static readonly XNamespace Ns = "http://www.w3.org/2000/svg";

    [Fact]
    public void EachTermIsATreeWithColouredOptionEdges()
    {
        // {3|-1}: one Left edge to 3 and one Right edge to -1; 3 = {2|} and -1 = {|0} continue (canonical options of numbers).
        var doc = XDocument.Parse(PositionPicture.Draw(Rulesets.Get("forms").Parse("{3|-1} + *")));
        var titles = doc.Descendants(Ns + "text").Select(t => t.Value).ToList();
        Assert.Contains("term 1", titles);
        Assert.Contains("term 2", titles);
        var edges = doc.Descendants(Ns + "line").Where(l => l.Attribute("data-side") is not null).ToList();
        Assert.Contains(edges, e => (string?)e.Attribute("data-side") == "left");
        Assert.Contains(edges, e => (string?)e.Attribute("data-side") == "right");
        Assert.Contains("{3|-1}", titles);
        // * = {0|0}: one Left and one Right edge to 0 (derived from the definitions).
        var star = XDocument.Parse(PositionPicture.Draw(Rulesets.Get("forms").Parse("*")));
        Assert.Equal(2, star.Descendants(Ns + "text").Count(t => t.Value == "0"));
        Assert.Equal(2, star.Descendants(Ns + "line").Count(l => l.Attribute("data-side") is not null));
    }

    [Fact]
    public void HugeTermsAreCutOff()
    {
        var doc = XDocument.Parse(PositionPicture.Draw(Rulesets.Get("forms").Parse("*40")));
        Assert.Contains(doc.Descendants(Ns + "text"), t => t.Value == "…");
    }
}
