using System.Text;
using Bramble.Rules.Hackenbush;
using Bramble.Values;

namespace Bramble.Pictures;

/// <summary>Hackenbush positions as an SVG drawing on a ground line, and as text for the terminal.</summary>
public static class HackenbushPicture
{
    private const string Style =
        "text{font-family:sans-serif;font-size:11px;fill:#222;paint-order:stroke;stroke:white;stroke-width:3px}" +
        ".ground{stroke:#6b4f2a;stroke-width:5}.node{fill:#333}" +
        ".blue{stroke:#1f5fbf;stroke-width:4;fill:none}.red{stroke:#c0392b;stroke-width:4;fill:none}" +
        ".green{stroke:#27ae60;stroke-width:4;fill:none}";

    public static string Svg(HackenbushPosition position)
    {
        var layout = new HackenbushLayout(position);
        const double unit = 56, margin = 30;
        double width = layout.Width * unit + 2 * margin, height = (layout.Height + 0.8) * unit + 2 * margin;
        double groundY = height - margin;
        (double, double) P(double x, double y) => (margin + x * unit, groundY - y * unit);
        var svg = new Svg(width, height);
        svg.Line(margin / 2, groundY, width - margin / 2, groundY, "ground");
        // Parallel edges between the same two nodes bend apart so each stays visible.
        var seenPairs = new Dictionary<(int, int), int>();
        var pieceOf = PieceOfEdge(position);
        foreach (var e in layout.Edges)
        {
            using var group = svg.Group("edge", ("data-move", e.Id.ToString()), ("data-edge", e.Id.Value), ("data-component", pieceOf[e.Id.Value]), ("data-colour", ColourWord(e.Colour)));
            string cls = e.Colour switch { EdgeColour.Blue => "blue", EdgeColour.Red => "red", _ => "green" };
            (double X, double Y) a, b;
            if (e.From == 0 && e.To == 0)
            {
                var (fx, fy) = P(layout.Feet[e.Id.Value], 0);
                a = (fx, fy); b = a;
            }
            else
            {
                a = e.From == 0 ? P(layout.Feet[e.Id.Value], 0) : P(layout.Nodes[e.From].X, layout.Nodes[e.From].Y);
                b = e.To == 0 ? P(layout.Feet[e.Id.Value], 0) : P(layout.Nodes[e.To].X, layout.Nodes[e.To].Y);
            }
            (double X, double Y) label;
            if (e.IsLoop)
            {
                // A loop is a small circle above its node.
                double r = 14;
                svg.Add("circle", cls, ("cx", a.X), ("cy", a.Y - r), ("r", r));
                svg.Add("circle", "hit", ("cx", a.X), ("cy", a.Y - r), ("r", r), ("fill", "none"), ("stroke", "transparent"), ("stroke-width", 14.0), ("pointer-events", "stroke"));
                label = (a.X, a.Y - 2 * r - 4);
            }
            else
            {
                var pair = (Math.Min(e.From, e.To), Math.Max(e.From, e.To));
                int k = seenPairs.TryGetValue(pair, out var v) ? v : 0;
                seenPairs[pair] = k + 1;
                double bend = k == 0 || e.From == 0 || e.To == 0 ? 0 : (k % 2 == 1 ? 1 : -1) * 18 * ((k + 1) / 2);
                double mx = (a.X + b.X) / 2, my = (a.Y + b.Y) / 2;
                double dx = b.X - a.X, dy = b.Y - a.Y, len = Math.Max(1, Math.Sqrt(dx * dx + dy * dy));
                double cx = mx - dy / len * bend * 2, cy = my + dx / len * bend * 2;
                string d = $"M {Bramble.Pictures.Svg.Num(a.X)} {Bramble.Pictures.Svg.Num(a.Y)} Q {Bramble.Pictures.Svg.Num(cx)} {Bramble.Pictures.Svg.Num(cy)} {Bramble.Pictures.Svg.Num(b.X)} {Bramble.Pictures.Svg.Num(b.Y)}";
                svg.Add("path", cls, ("d", d));
                svg.HitPath(d);
                label = (0.25 * a.X + 0.5 * cx + 0.25 * b.X + 10, 0.25 * a.Y + 0.5 * cy + 0.25 * b.Y);
            }
            svg.Text(label.X, label.Y + 4, e.Id.ToString(), null, "start");
        }
        foreach (var (node, (x, y)) in layout.Nodes)
        {
            var (px, py) = P(x, y);
            svg.Add("circle", "node", ("cx", px), ("cy", py), ("r", 3.5));
        }
        return svg.Render(Style, "Hackenbush " + position.Text);
    }

    /// <summary>Each piece as an upright outline (trees and stalks read bottom-up), then the edge table.</summary>
    public static string Text(HackenbushPosition position)
    {
        var sb = new StringBuilder();
        var parts = position.Components();
        if (parts.Count == 0) sb.AppendLine("(no edges left)");
        int n = 1;
        foreach (HackenbushPosition part in parts)
        {
            sb.AppendLine($"piece {n++}: {part.Text}");
            var layout = new HackenbushLayout(part);
            var byHeight = layout.Edges.GroupBy(e => Math.Max(Height(layout, e.From), Height(layout, e.To))).OrderByDescending(g => g.Key);
            foreach (var level in byHeight)
                sb.AppendLine($"   {string.Join("  ", level.Select(e => $"{e.Colour.Letter()}:{e.Id}"))}");
            sb.AppendLine("   " + new string('=', 24) + " ground");
        }
        sb.AppendLine("edges:  id   colour  joins   cut by");
        foreach (var e in position.Edges)
        {
            string colour = e.Colour switch { EdgeColour.Blue => "blue", EdgeColour.Red => "red", _ => "green" };
            string by = e.Colour == EdgeColour.Green ? "either" : e.Colour.CutBy(Side.Left) ? "left" : "right";
            sb.AppendLine($"        {e.Id,-4} {colour,-7} {(Node(e.From) + "-" + Node(e.To)),-12} {by}");
        }
        return sb.ToString().TrimEnd();
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

    private static double Height(HackenbushLayout layout, int node) => node == 0 ? 0 : layout.Nodes[node].Y;

    private static string Node(int n) => n == 0 ? "ground" : n.ToString();
}
