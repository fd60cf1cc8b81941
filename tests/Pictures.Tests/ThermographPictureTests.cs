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
        Assert.Contains(texts, t => t.StartsWith($"temperature {th.Temperature}"));
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

public class ThermographTextTests
{
    private static readonly XNamespace Ns = "http://www.w3.org/2000/svg";

    private static XDocument Picture(string value, out Thermograph th)
    {
        var store = new GameStore();
        var g = store.Parse(value);
        th = store.Thermograph(g);
        return XDocument.Parse(ThermographPicture.Draw(th, store.Format(g), value));
    }

    private static double N(XElement e, string a) => double.Parse((string)e.Attribute(a)!, System.Globalization.CultureInfo.InvariantCulture);

    [Theory]
    [InlineData("{7/8|1/8}")]
    [InlineData("3/4")]
    [InlineData("{1/16|-1/16}")]
    [InlineData("{{6|2}|-1}")]
    public void TickLabelsAreExactFractions(string value)
    {
        var doc = Picture(value, out _);
        // Tick labels are the texts under the t = 0 axis and left of the temperature axis: all must read as dyadic rationals.
        var numbers = doc.Descendants(Ns + "text").Select(t => t.Value)
            .Where(s => s.Length > 0 && (char.IsDigit(s[0]) || s[0] == '-') && s.All(c => char.IsDigit(c) || c is '/' or '-' or '.')).ToList();
        Assert.NotEmpty(numbers);
        Assert.All(numbers, s => Assert.True(Dyadic.TryParse(s, out _), $"tick label '{s}' is not an exact fraction"));
    }

    [Fact]
    public void SevenEighthsIsWrittenAsAFraction()
    {
        // {7/8|1/8}: Left stop 7/8 (from the definition of the stops), so the value axis reaches 7/8 and ticks fall on eighths.
        var texts = Picture("{7/8|1/8}", out _).Descendants(Ns + "text").Select(t => t.Value).ToList();
        Assert.Contains("3/4", texts);
        Assert.DoesNotContain(texts, t => t.Contains('.'));
    }

    [Fact]
    public void LongTitlesWrapAndShowTypedAndCanonical()
    {
        const string typed = "{{{12|9}|{7|5}}|{{3|1}|{-1|-9/4}}} + {5|2||0} + *";
        var doc = Picture(typed, out _);
        var store = new GameStore();
        string canonical = store.Format(store.Parse(typed));
        var titles = doc.Descendants(Ns + "text").Where(t => ((string?)t.Attribute("class"))?.StartsWith("title") == true).ToList();
        Assert.True(titles.Count >= 2);
        double width = N(doc.Root!, "width");
        foreach (var t in titles)
        {
            double size = (string?)t.Attribute("class") == "title" ? 8.5 : 6.8;
            Assert.True(t.Value.Length * size <= width - 20, $"title line '{t.Value}' is wider than the picture");
        }
        string all = string.Concat(titles.Select(t => t.Value)).Replace(" ", "");
        Assert.Contains(typed.Replace(" ", ""), all);
        Assert.Contains(canonical.Replace(" ", ""), all);
    }

    [Theory]
    [InlineData("{1/16|-1/16}")]
    [InlineData("↑*")]
    [InlineData("{1|0}")]
    [InlineData("3/4")]
    public void WallLabelsAndTemperatureKeepClear(string value)
    {
        var doc = Picture(value, out var th);
        var texts = doc.Descendants(Ns + "text").ToList();
        (double L, double R, double Top, double Bottom) Box(XElement t)
        {
            double x = N(t, "x"), y = N(t, "y"), w = t.Value.Length * ThermographPicture.CharWidth;
            string anchor = (string?)t.Attribute("text-anchor") ?? "middle";
            double left = anchor == "end" ? x - w : anchor == "start" ? x : x - w / 2;
            return (left, left + w, y - 11, y + 3);
        }
        var left = Box(texts.Single(t => t.Value == "Left wall"));
        var right = Box(texts.Single(t => t.Value == "Right wall"));
        Assert.True(left.R <= right.L || right.R <= left.L, "the wall labels overlap");
        double zeroLine = N(doc.Descendants(Ns + "line").First(l => (string?)l.Attribute("class") == "axis"), "y1");
        var temperature = Box(texts.Single(t => t.Value.StartsWith("temperature")));
        Assert.True(temperature.Bottom < zeroLine - 3, "the temperature label sits on the t = 0 line");
        Assert.False(temperature.L < left.R && left.L < temperature.R && temperature.Top < left.Bottom && left.Top < temperature.Bottom);
        Assert.False(temperature.L < right.R && right.L < temperature.R && temperature.Top < right.Bottom && right.Top < temperature.Bottom);
        Assert.Contains(th.Temperature.ToString(), texts.Single(t => t.Value.StartsWith("temperature")).Value);
    }
}
