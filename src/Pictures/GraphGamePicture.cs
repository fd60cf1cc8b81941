using System.Text;
using Bramble.Rules.GraphGames;
using Bramble.Values;

namespace Bramble.Pictures;

/// <summary>
/// Snort and Col positions as text and as SVG. Coloured vertices are filled blue (Left) or red
/// (Right); an uncoloured vertex is white with a ring saying who may still colour it (blue ring:
/// Left only, red ring: Right only, black: both, grey and faded: nobody). Every vertex someone
/// may colour is a group carrying <c>data-move</c> (its number), so a board in the browser can
/// be clicked.
/// </summary>
public static class GraphGamePicture
{
    public static string Text(ColouringPosition position)
    {
        var graph = position.Graph;
        var sb = new StringBuilder();
        sb.Append(position.Text).Append('\n');
        if (graph.Count <= 60)
            for (int v = 0; v < graph.Count; v++)
            {
                sb.Append($"{graph.Label(v),6}{Letter(graph.Colour(v))}  ");
                if (graph.Colour(v) == VertexColour.Uncoloured) sb.Append($"{Who(position, v),-12}");
                else sb.Append(new string(' ', 12));
                if (graph.Neighbours(v).Count > 0)
                    sb.Append("next to ").Append(string.Join(", ", graph.Neighbours(v).Select(u => graph.Label(u) + Letter(graph.Colour(u)).Trim())));
                sb.Append('\n');
            }
        sb.Append(position.Rule == ColouringRule.Col
            ? "A move colours a vertex: type its number. Left colours blue (B), Right red (R); no one colours next to their own colour."
            : "A move colours a vertex: type its number. Left colours blue (B), Right red (R); no one colours next to the other's colour.");
        return sb.ToString();
    }

    private static string Letter(VertexColour colour) => colour switch { VertexColour.Blue => "B", VertexColour.Red => "R", _ => " " };

    private static string Who(ColouringPosition position, int v) =>
        (position.MayColour(Side.Left, v), position.MayColour(Side.Right, v)) switch
        {
            (true, true) => "either",
            (true, false) => "left only",
            (false, true) => "right only",
            _ => "nobody",
        };

    private const string Style =
        "text{font-family:sans-serif;font-size:13px;fill:#222;text-anchor:middle;pointer-events:none}" +
        ".edge{stroke:#777;stroke-width:2;fill:none}" +
        ".blue{fill:#2f6fd0;stroke:#1d4a8f;stroke-width:2}.red{fill:#d5473a;stroke:#8f2a1f;stroke-width:2}" +
        ".either{fill:#fff;stroke:#222;stroke-width:2}.left-only{fill:#fff;stroke:#2f6fd0;stroke-width:4}" +
        ".right-only{fill:#fff;stroke:#d5473a;stroke-width:4}.nobody{fill:#eee;stroke:#bbb;stroke-width:1.5}" +
        ".on-colour{fill:#fff}.faded{fill:#aaa}";

    public static string Svg(ColouringPosition position)
    {
        var graph = position.Graph;
        var layout = GraphLayout.Of(graph);
        const double margin = 10, radius = 15;
        var svg = new Svg(layout.Width + 2 * margin, layout.Height + 2 * margin);
        for (int v = 0; v < graph.Count; v++)
            foreach (int u in graph.Neighbours(v))
            {
                if (u < v) continue;
                double x1 = margin + layout.X[v], y1 = margin + layout.Y[v], x2 = margin + layout.X[u], y2 = margin + layout.Y[u];
                if (x1 == x2 && Math.Abs(y1 - y2) > GraphLayout.Step * 1.5)
                {
                    // Within one layer and not neighbours there: bow out, so the edge does not run through vertices.
                    double bow = x1 + GraphLayout.Step * 0.45;
                    svg.Add("path", "edge", ("d", $"M{Num(x1)},{Num(y1)} Q{Num(bow)},{Num((y1 + y2) / 2)} {Num(x2)},{Num(y2)}"));
                }
                else svg.Line(x1, y1, x2, y2, "edge");
            }
        for (int v = 0; v < graph.Count; v++)
        {
            double cx = margin + layout.X[v], cy = margin + layout.Y[v];
            string label = graph.Label(v).ToString(System.Globalization.CultureInfo.InvariantCulture);
            var colour = graph.Colour(v);
            if (colour != VertexColour.Uncoloured)
            {
                svg.Add("circle", colour == VertexColour.Blue ? "blue" : "red", ("cx", cx), ("cy", cy), ("r", radius), ("data-vertex", label));
                svg.Text(cx, cy + 4.5, label, "on-colour");
                continue;
            }
            string who = Who(position, v).Replace(' ', '-');
            if (who == "nobody")
            {
                svg.Add("circle", "nobody", ("cx", cx), ("cy", cy), ("r", radius), ("data-vertex", label));
                svg.Text(cx, cy + 4.5, label, "faded");
                continue;
            }
            using (svg.Group("vertex", ("data-move", label), ("data-vertex", label)))
            {
                svg.Add("circle", who, ("cx", cx), ("cy", cy), ("r", radius));
                svg.Text(cx, cy + 4.5, label);
            }
        }
        return svg.Render(Style, (position.Rule == ColouringRule.Col ? "Col " : "Snort ") + position.Text);
    }

    private static string Num(double v) => Bramble.Pictures.Svg.Num(v);
}
