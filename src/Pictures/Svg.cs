using System.Globalization;
using System.Text;
using System.Xml.Linq;

namespace Bramble.Pictures;

/// <summary>A tiny SVG writer: elements are built as XML so text is always escaped correctly.</summary>
public sealed class Svg(double width, double height)
{
    private static readonly XNamespace Ns = "http://www.w3.org/2000/svg";
    private readonly List<XElement> _items = new();

    // Elements go into the innermost open group, else to the top level (see Group).
    private readonly Stack<XElement> _open = new();

    public static string Num(double v) => Math.Round(v, 2).ToString(CultureInfo.InvariantCulture);

    public void Add(string name, string? cssClass, params (string Key, object Value)[] attributes) => Put(Element(name, cssClass, null, attributes));

    public void Text(double x, double y, string text, string? cssClass = null, string anchor = "middle") =>
        Put(Element("text", cssClass, text, [("x", x), ("y", y), ("text-anchor", anchor)]));

    /// <summary>Text in two parts, the second in its own style (a coloured letter after an edge label).</summary>
    public void Label(double x, double y, string first, string second, string? cssClass, string secondClass)
    {
        var t = Element("text", cssClass, null, [("x", x), ("y", y), ("text-anchor", "start")]);
        t.Add(new XText(first));
        t.Add(Element("tspan", secondClass, second, []));
        Put(t);
    }

    /// <summary>
    /// Opens a &lt;g&gt; carrying the given attributes (the data-* names a web page reads); every
    /// element added until the returned handle is disposed goes inside it.
    /// </summary>
    public IDisposable Group(string? cssClass, params (string Key, object Value)[] attributes)
    {
        var g = Element("g", cssClass, null, attributes);
        Put(g);
        _open.Push(g);
        return new Closer(this, g);
    }

    /// <summary>
    /// A wide invisible copy of a stroke that catches pointer events, so a thin edge is easy to
    /// click on a web page without drawing anything twice.
    /// </summary>
    public void HitPath(string d) =>
        Add("path", "hit", ("d", d), ("fill", "none"), ("stroke", "transparent"), ("stroke-width", 14.0), ("pointer-events", "stroke"));

    private void Put(XElement e)
    {
        if (_open.Count > 0) _open.Peek().Add(e);
        else _items.Add(e);
    }

    private sealed class Closer(Svg owner, XElement group) : IDisposable
    {
        public void Dispose()
        {
            if (owner._open.Count > 0 && owner._open.Peek() == group) owner._open.Pop();
        }
    }

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
