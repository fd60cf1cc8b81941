namespace Bramble.Rules.Hackenbush;

/// <summary>
/// Every Hackenbush piece (a component: edges whose nodes other than the ground hang together)
/// of exactly n edges, one of each kind up to the renamings its normal key ignores. Shapes
/// (uncoloured multigraphs rooted at the ground) are grown edge by edge: every piece of n edges
/// comes from one of n − 1 by adding an edge between two nodes it has, or a new node hanging from
/// a node other than the ground (remove an edge outside a spanning tree of the non-ground nodes,
/// or a ground edge when there are two, or else a leaf of that tree: what is left is still one
/// piece). Shapes are told apart by the normal key of their all-blue colouring, which is a
/// canonical encoding of the graph. Loops are left out: a loop at a node is the same game as an
/// edge from that node to a new one. Each shape is then coloured in all 3^n ways, and colourings
/// with equal normal keys (equal games) are listed once.
/// </summary>
internal static class PieceCatalogue
{
    /// <summary>Above this the colourings run to millions.</summary>
    public const int Limit = 8;

    public static IEnumerable<HackenbushPosition> OfSize(HackenbushRuleset ruleset, int edges)
    {
        if (edges < 1) yield break;
        if (edges > Limit) throw new ArgumentOutOfRangeException(nameof(edges), $"at most {Limit} edges");
        var seen = new HashSet<string>(StringComparer.Ordinal);
        var colours = new EdgeColour[edges];
        foreach (var shape in Shapes(ruleset, edges))
        {
            int total = 1;
            for (int i = 0; i < edges; i++) total *= 3;
            for (int code = 0; code < total; code++)
            {
                int c = code;
                for (int i = 0; i < edges; i++) { colours[i] = (EdgeColour)(c % 3); c /= 3; }
                var piece = Build(ruleset, shape, colours);
                if (seen.Add(piece.NormalKey)) yield return piece;
            }
        }
    }

    /// <summary>The shapes of exactly n edges, each as its edge list (node 0 the ground).</summary>
    private static List<Shape> Shapes(HackenbushRuleset ruleset, int edges)
    {
        var level = new List<Shape> { new([0], [1], 2) };
        var blue = new EdgeColour[Limit];
        Array.Fill(blue, EdgeColour.Blue);
        for (int n = 1; n < edges; n++)
        {
            var seen = new HashSet<string>(StringComparer.Ordinal);
            var next = new List<Shape>();
            foreach (var shape in level)
            {
                void Offer(Shape grown)
                {
                    if (seen.Add(Build(ruleset, grown, blue).NormalKey)) next.Add(grown);
                }
                for (int a = 0; a < shape.Nodes; a++)
                    for (int b = Math.Max(a, 1); b < shape.Nodes; b++)
                        if (a != b) Offer(shape.With(a, b, shape.Nodes));
                for (int a = 1; a < shape.Nodes; a++) Offer(shape.With(a, shape.Nodes, shape.Nodes + 1));
            }
            level = next;
        }
        return level;
    }

    private static HackenbushPosition Build(HackenbushRuleset ruleset, Shape shape, EdgeColour[] colours)
    {
        int m = shape.From.Length;
        var ids = new int[m];
        for (int i = 0; i < m; i++) ids[i] = i + 1;
        return new HackenbushPosition(ruleset, ids, colours[..m], (int[])shape.From.Clone(), (int[])shape.To.Clone(), shape.Nodes);
    }

    /// <summary>An uncoloured piece: edge i joins From[i] and To[i]; nodes are 0 (the ground) to Nodes − 1.</summary>
    private sealed record Shape(int[] From, int[] To, int Nodes)
    {
        public Shape With(int a, int b, int nodes) => new([.. From, a], [.. To, b], nodes);
    }
}
