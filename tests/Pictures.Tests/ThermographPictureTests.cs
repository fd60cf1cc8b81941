using System.Xml.Linq;
using Bramble.Values;

namespace Bramble.Pictures.Tests;

public class ThermographPictureTests
{
    private static readonly XNamespace Ns = "http://www.w3.org/2000/svg";

    [Theory]
    [InlineData("{{6|2}|-1}")]
    [InlineData("{8||4|0}")]
    [InlineData("3/4")]
    [InlineData("↑*")]
    public void DrawsBothWallsTheMastAndTheTemperature(string value)
    {
        var store = new GameStore();
        var g = store.Parse(value);
        var th = store.Thermograph(g);
        var doc = XDocument.Parse(ThermographPicture.Draw(th, store.Format(g)));
        Assert.Equal(Ns + "svg", doc.Root!.Name);
        var lines = doc.Descendants(Ns + "polyline").ToList();
        Assert.Single(lines, l => (string?)l.Attribute("class") == "left");
        Assert.Single(lines, l => (string?)l.Attribute("class") == "right");
        Assert.Single(doc.Descendants(Ns + "line"), l => (string?)l.Attribute("class") == "mast");
        var texts = doc.Descendants(Ns + "text").Select(t => t.Value).ToList();
        Assert.Contains($"temperature {th.Temperature}", texts);
        Assert.Contains($"mean {th.Mast}", texts);
    }

    [Fact]
    public void WallsMeetAtTheTopOfTheirPolylines()
    {
        // The two walls end at the same point: the foot of the mast at (mean, temperature) — the thermograph's definition.
        var store = new GameStore();
        var th = store.Thermograph(store.Parse("{{6|2}|-1}"));
        var doc = XDocument.Parse(ThermographPicture.Draw(th, "g"));
        var ends = doc.Descendants(Ns + "polyline").Select(l => ((string)l.Attribute("points")!).Split(' ')[^1]).ToList();
        Assert.Equal(ends[0], ends[1]);
    }
}
