using Bramble.Rules.Forms;
using Bramble.Values;

namespace Bramble.Pictures;

/// <summary>
/// Each term of a Forms position as its game tree, as written: Left options hang down to the
/// left on blue edges, Right options down to the right on red ones. Deep trees are cut off at a
/// fixed depth and node count, with the cut marked, so huge terms still give a readable picture.
/// </summary>
public static class FormsPicture
{
    private const int MaxDepth = 4;
    private const int MaxNodes = 80;

    private const string Style =
        "text{font-family:sans-serif;font-size:12px;fill:#222;paint-order:stroke;stroke:white;stroke-width:3px}" +
        ".more{stroke:#999;stroke-width:1.5;stroke-dasharray:3,3}.left{stroke:#1f5fbf;stroke-width:2}.right{stroke:#c0392b;stroke-width:2;stroke-dasharray:6,3}.node{fill:#333}" +
        ".plus{font-size:20px;font-weight:bold}.title{font-size:13px;font-weight:bold}";

    private sealed class Node(string label, Side? via)
    {
        public string Label { get; } = label;
        public Side? Via { get; } = via;
        public List<Node> Children { get; } = new();
        public double X;
        public int Depth;
        public int Option; // 1-based index among its parent's options for the same side
    }

    public static string Svg(FormsPosition position)
    {
        var trees = new List<(int Number, Node Root)>();
        foreach (var (number, term) in position.Terms)
        {
            int budget = MaxNodes;
            trees.Add((number, Build(term.Expression, null, 0, ref budget)));
        }
        double next = 0.5;
        var placed = new List<(int Number, Node Root, double From, double To)>();
        foreach (var (number, root) in trees)
        {
            double from = next;
            Place(root, ref next);
            placed.Add((number, root, from, next));
            next += 1.2; // room for the '+'
        }
        int depth = trees.Count == 0 ? 0 : trees.Max(t => Depth(t.Root));
        const double unitX = 64, unitY = 70, margin = 36;
        double width = Math.Max(200, next * unitX + margin), height = (depth + 1) * unitY + 2 * margin + 10;
        var svg = new Svg(width, height);
        (double, double) P(Node n) => (margin + n.X * unitX, margin + 30 + n.Depth * unitY);
        for (int i = 0; i < placed.Count; i++)
        {
            var (number, root, from, to) = placed[i];
            var (rx, _) = P(root);
            using (svg.Group("term", ("data-term", number)))
            {
                svg.Text(rx, margin, $"term {number}", "title");
                Draw(svg, root, P, number);
            }
            if (i + 1 < placed.Count) svg.Text(margin + (to + 0.1) * unitX, margin + 36, "+", "plus");
        }
        if (placed.Count == 0) svg.Text(width / 2, height / 2, "0 (no terms left)");
        return svg.Render(Style, "Forms " + position.Text);
    }

    private static Node Build(ValueExpr e, Side? via, int depth, ref int budget)
    {
        var term = new FormsTerm(e);
        var node = new Node(term.Text, via) { Depth = depth };
        budget--;
        if (depth >= MaxDepth) { if (term.HasMoves) node.Children.Add(new Node("…", null) { Depth = depth + 1 }); return node; }
        foreach (var side in new[] { Side.Left, Side.Right })
        {
            int j = 0;
            foreach (var o in term.Options(side))
            {
                j++;
                // A term's own options are the moves a player clicks, so they are always drawn;
                // only deeper levels are cut when the node budget runs out.
                if (budget <= 0 && depth > 0) { node.Children.Add(new Node("…", side) { Depth = depth + 1 }); break; }
                var child = Build(o, side, depth + 1, ref budget);
                child.Option = j;
                node.Children.Add(child);
            }
        }
        return node;
    }

    private static void Place(Node n, ref double next)
    {
        if (n.Children.Count == 0) { n.X = next; next += 1; return; }
        foreach (var c in n.Children) Place(c, ref next);
        n.X = (n.Children[0].X + n.Children[^1].X) / 2;
    }

    private static int Depth(Node n) => n.Children.Count == 0 ? n.Depth : n.Children.Max(Depth);

    /// <summary>
    /// Draws a node and what hangs below it. The term's own options (<paramref name="term"/> given)
    /// are wrapped in a group with <c>data-move="k.j"</c> and <c>data-side</c>, with a wide
    /// invisible hit line, so a web page can offer them as moves.
    /// </summary>
    private static void Draw(Svg svg, Node n, Func<Node, (double X, double Y)> at, int? term = null)
    {
        var (x, y) = at(n);
        foreach (var c in n.Children)
        {
            var (cx, cy) = at(c);
            string cls = c.Via switch { Side.Left => "left", Side.Right => "right", _ => "more" };
            IDisposable? group = term is { } k && c.Via is { } side && c.Option > 0
                ? svg.Group("option", ("data-move", $"{k}.{c.Option}"), ("data-side", side.Word()))
                : null;
            svg.Add("line", cls, ("x1", x), ("y1", y), ("x2", cx), ("y2", cy), ("data-side", c.Via?.Word() ?? "more"));
            if (group is not null) svg.HitPath($"M {Bramble.Pictures.Svg.Num(x)} {Bramble.Pictures.Svg.Num(y)} L {Bramble.Pictures.Svg.Num(cx)} {Bramble.Pictures.Svg.Num(cy)}");
            Draw(svg, c, at);
            group?.Dispose();
        }
        svg.Add("circle", "node", ("cx", x), ("cy", y), ("r", 3));
        svg.Text(x, y - 8, n.Label);
    }
}
