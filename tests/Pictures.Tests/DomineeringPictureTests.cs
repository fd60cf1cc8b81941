using System.Xml.Linq;
using Bramble.Rules;
using Bramble.Rules.Domineering;

namespace Bramble.Pictures.Tests;

public class DomineeringPictureTests
{
    private static readonly XNamespace Ns = "http://www.w3.org/2000/svg";

    [Theory]
    [InlineData("..#./..../...#", 12, 2)]
    [InlineData("3x5", 15, 0)]
    public void OneMarkPerCell(string board, int cells, int filled)
    {
        var position = (DomineeringPosition)Rulesets.Get("domineering").Parse(board);
        var doc = XDocument.Parse(PositionPicture.Draw(position));
        var rects = doc.Descendants(Ns + "rect").Where(r => r.Attribute("data-cell") is not null).ToList();
        Assert.Equal(cells, rects.Count);
        Assert.Equal(filled, rects.Count(r => (string?)r.Attribute("data-hole") == "1"));
        Assert.Equal(cells, rects.Select(r => (string)r.Attribute("data-cell")!).Distinct().Count());
    }

    [Fact]
    public void TextGridHasCoordinates()
    {
        var text = TextPicture.Draw(Rulesets.Get("domineering").Parse("..#/..."));
        Assert.Contains("a b c", text);
        Assert.Contains("  1 . . # ", text);
        Assert.Contains("  2 . . . ", text);
    }
}
