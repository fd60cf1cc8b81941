using System.Globalization;
using System.Text;
using System.Xml.Linq;

namespace Bramble.Pictures;

/// <summary>A tiny SVG writer: elements are built as XML so text is always escaped correctly.</summary>
public sealed class Svg(double width, double height)
{
    private static readonly XNamespace Ns = "http://www.w3.org/2000/svg";
    private readonly List<XElement> _items = new();

    public static string Num(double v) => Math.Round(v, 2).ToString(CultureInfo.InvariantCulture);

    public void Add(string name, string? cssClass, params (string Key, object Value)[] attributes) => _items.Add(Element(name, cssClass, null, attributes));

    public void Text(double x, double y, string text, string? cssClass = null, string anchor = "middle") =>
        _items.Add(Element("text", cssClass, text, [("x", x), ("y", y), ("text-anchor", anchor)]));

    public void Line(double x1, double y1, double x2, double y2, string? cssClass = null) =>
        Add("line", cssClass, ("x1", x1), ("y1", y1), ("x2", x2), ("y2", y2));

    public void Polyline(IEnumerable<(double X, double Y)> points, string? cssClass = null) =>
        Add("polyline", cssClass, ("points", string.Join(" ", points.Select(p => Num(p.X) + "," + Num(p.Y)))), ("fill", "none"));

    private static XElement Element(string name, string? cssClass, string? text, (string Key, object Value)[] attributes)
    {
        var e = new XElement(Ns + name);
        if (cssClass is not null) e.SetAttributeValue("class", cssClass);
        foreach (var (k, v) in attributes) e.SetAttributeValue(k, v is double d ? Num(d) : Convert.ToString(v, CultureInfo.InvariantCulture));
        if (text is not null) e.Value = text;
        return e;
    }

    public string Render(string style, string title)
    {
        var root = new XElement(Ns + "svg",
            new XAttribute("width", Num(width)), new XAttribute("height", Num(height)),
            new XAttribute("viewBox", $"0 0 {Num(width)} {Num(height)}"),
            new XElement(Ns + "title", title),
            new XElement(Ns + "style", style),
            new XElement(Ns + "rect", new XAttribute("width", "100%"), new XAttribute("height", "100%"), new XAttribute("fill", "white")));
        foreach (var item in _items) root.Add(item);
        var sb = new StringBuilder();
        sb.Append("<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n");
        sb.Append(root.ToString());
        sb.Append('\n');
        return sb.ToString();
    }
}
