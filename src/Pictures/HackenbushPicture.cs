using System.Text;
using Bramble.Rules.Hackenbush;
using Bramble.Values;

namespace Bramble.Pictures;

/// <summary>Hackenbush positions as an SVG drawing on a ground line, and as text for the terminal.</summary>
public static class HackenbushPicture
{
    // Colour is never the only cue: blue is solid, red dashed, green dotted, and every label
    // carries the colour's letter, so a reader who cannot tell red from green can still play.
    private const string Style =
        "text{font-family:sans-serif;font-size:11px;fill:#222}" +
        ".ground{stroke:#6b4f2a;stroke-width:5}.node{fill:#333}.foot{fill:#6b4f2a}" +
        ".blue{stroke:#1f5fbf;stroke-width:4;fill:none}" +
        ".red{stroke:#c0392b;stroke-width:4;fill:none;stroke-dasharray:9,5}" +
        ".green{stroke:#1e8449;stroke-width:5;fill:none;stroke-dasharray:0.1,7;stroke-linecap:round}" +
        ".letter-blue{fill:#1f5fbf;font-weight:bold}.letter-red{fill:#c0392b;font-weight:bold}.letter-green{fill:#1e8449;font-weight:bold}" +
        ".legend{font-size:11px;fill:#444}";

    /// <summary>Width and height assumed for one character of an edge label (11px sans-serif, generous).</summary>
    public const double LabelCharWidth = 7, LabelHeight = 13;

    private const double Unit = 64, Margin = 24, LegendBand = 30, LegendWidth = 430;

    public static string Svg(HackenbushPosition position)
    {
        var layout = new HackenbushLayout(position);
        // World coordinates: x to the right, the ground at y = 0, height upward as negative y.
        Point NodeAt(int n) => new(layout.Nodes[n].X * Unit, -layout.Nodes[n].Y * Unit);
        var feet = layout.Feet.ToDictionary(f => f.Key, f => new Point(f.Value * Unit, 0));
        var vertices = layout.Nodes.Keys.Where(n => n != 0).Select(NodeAt).Concat(feet.Values.Distinct()).ToList();
        var router = new EdgeRouter(vertices, 0);
        var curves = new Dictionary<int, Curve>();
        // Straight edges first (they usually fit as they are), then the ones that must bend.
        foreach (var e in layout.Edges.OrderBy(e => e.From == e.To ? 1 : 0).ThenBy(e => e.Id.Value))
        {
            var a = e.From == 0 ? feet[e.Id.Value] : NodeAt(e.From);
            var b = e.To == 0 ? feet[e.Id.Value] : NodeAt(e.To);
            curves[e.Id.Value] = router.Route(a, b);
        }
        var labels = new Dictionary<int, Box>();
        foreach (var e in layout.Edges)
            labels[e.Id.Value] = router.PlaceLabel(curves[e.Id.Value], LabelText(e).Length * LabelCharWidth, LabelHeight);

        // Frame everything drawn, then shift it so the picture starts at the margin.
        var all = curves.Values.SelectMany(c => c.Samples(24)).Concat(vertices)
            .Concat(labels.Values.SelectMany(b => new[] { new Point(b.Left, b.Top), new Point(b.Right, b.Bottom) }))
            .Append(new Point(0, 0)).ToList();
        double minX = all.Min(p => p.X), maxX = all.Max(p => p.X), minY = all.Min(p => p.Y), maxY = Math.Max(0, all.Max(p => p.Y));
        var shift = new Point(Margin - minX, LegendBand + Margin - minY);
        double width = Math.Max(LegendWidth, maxX - minX + 2 * Margin), height = LegendBand + maxY - minY + 2 * Margin;
        double groundY = shift.Y;

        var svg = new Svg(width, height);
        Legend(svg);
        svg.Line(Margin / 2, groundY, width - Margin / 2, groundY, "ground");
        var pieceOf = PieceOfEdge(position);
        foreach (var e in layout.Edges)
        {
            string colour = ColourWord(e.Colour);
            var c = curves[e.Id.Value];
            var moved = new Curve(c.Start + shift, c.Control1 + shift, c.Control2 + shift, c.End + shift);
            using var group = svg.Group("edge", ("data-move", e.Id.ToString()), ("data-edge", e.Id.Value), ("data-component", pieceOf[e.Id.Value]), ("data-colour", colour));
            string d = moved.PathData();
            svg.Add("path", colour, ("d", d));
            svg.HitPath(d);
            var box = labels[e.Id.Value];
            svg.Label(box.Left + shift.X, box.Bottom + shift.Y - 3, e.Id.ToString() + " ", e.Colour.Letter().ToString(), "label", "letter-" + colour);
        }
        foreach (var f in feet.Values.Distinct()) svg.Add("circle", "foot", ("cx", f.X + shift.X), ("cy", f.Y + shift.Y), ("r", 3.0));
        foreach (var n in layout.Nodes.Keys.Where(n => n != 0))
        {
            var p = NodeAt(n) + shift;
            svg.Add("circle", "node", ("cx", p.X), ("cy", p.Y), ("r", 3.5));
        }
        return svg.Render(Style, "Hackenbush " + position.Text);
    }

    private static string LabelText(HackenbushEdge e) => $"{e.Id} {e.Colour.Letter()}";

    private static void Legend(Svg svg)
    {
        double x = Margin, y = 18;
        foreach (var (cls, letter, words) in new[] { ("blue", 'B', "blue: Left cuts"), ("red", 'R', "red: Right cuts"), ("green", 'G', "green: either") })
        {
            svg.Add("path", cls, ("d", $"M {Bramble.Pictures.Svg.Num(x)} {Bramble.Pictures.Svg.Num(y - 4)} L {Bramble.Pictures.Svg.Num(x + 26)} {Bramble.Pictures.Svg.Num(y - 4)}"));
            svg.Text(x + 31, y, letter.ToString(), "letter-" + cls, "start");
            svg.Text(x + 42, y, words, "legend", "start");
            x += 40 + (words.Length + 2) * 6.2;
        }
    }

    /// <summary>
    /// Each piece as a graph a reader can follow in the terminal: a table of its edges (id,
    /// colour, who may cut it, the two nodes it joins) and, under it, every node with the edges
    /// that meet there, so circuits show as nodes reached more than one way. Node names come from
    /// <paramref name="names"/> (stable for a whole game) or from the position itself.
    /// </summary>
    public static string Text(HackenbushPosition position, NodeNames? names = null)
    {
        names ??= new NodeNames(position);
        var sb = new StringBuilder();
        var parts = position.Components();
        if (parts.Count == 0) sb.AppendLine("(no edges left)");
        for (int n = 0; n < parts.Count; n++)
        {
            var part = (HackenbushPosition)parts[n];
            var edges = part.Edges;
            sb.AppendLine($"piece {n + 1} of {parts.Count} ({edges.Count} edge{(edges.Count == 1 ? "" : "s")})");
            var rows = new List<string[]> { new[] { "edge", "colour", "cut by", "joins" } };
            foreach (var e in edges)
            {
                var (a, b) = names.Ends(e);
                string by = e.Colour == EdgeColour.Green ? "either" : e.Colour.CutBy(Side.Left) ? "left" : "right";
                rows.Add([e.Id.ToString(), $"{e.Colour.Letter()} {ColourWord(e.Colour)}", by, a == b ? $"{a} (a loop)" : $"{a} - {b}"]);
            }
            foreach (var line in TextColumns.Lay(rows)) sb.Append("   ").AppendLine(line);
            // The same piece seen from its nodes, ground first, then in name order.
            var at = new SortedDictionary<string, List<string>>(Comparer<string>.Create(NodeOrder));
            foreach (var e in edges)
            {
                var (a, b) = names.Ends(e);
                foreach (var (here, there) in a == b ? new[] { (a, b) } : new[] { (a, b), (b, a) })
                {
                    if (!at.TryGetValue(here, out var list)) at[here] = list = new();
                    list.Add($"{e.Id}>{there}");
                }
            }
            var nodeRows = at.Select(kv => new[] { kv.Key + ":", string.Join("  ", kv.Value) }).ToList();
            sb.AppendLine("   at each node (edge>other end):");
            foreach (var line in TextColumns.Lay(nodeRows)) sb.Append("     ").AppendLine(line);
        }
        return sb.ToString().TrimEnd();
    }

    private static int NodeOrder(string a, string b)
    {
        static (int, int, string) Key(string s) => s == "ground" ? (0, 0, s) : s.Length > 1 && s[0] == 'n' && int.TryParse(s[1..], out int k) ? (1, k, s) : (2, 0, s);
        return Key(a).CompareTo(Key(b));
    }

    /// <summary>The 1-based piece number (as in <see cref="HackenbushPosition.Components"/>) of every edge id.</summary>
    private static Dictionary<int, int> PieceOfEdge(HackenbushPosition position)
    {
        var map = new Dictionary<int, int>();
        var parts = position.Components();
        for (int i = 0; i < parts.Count; i++)
            foreach (var e in ((HackenbushPosition)parts[i]).Edges) map[e.Id.Value] = i + 1;
        return map;
    }

    private static string ColourWord(EdgeColour c) => c switch { EdgeColour.Blue => "blue", EdgeColour.Red => "red", _ => "green" };

}
