using Bramble.Rules.GraphGames;

namespace Bramble.Pictures;

/// <summary>
/// Places the vertices of a Snort or Col graph for drawing. Each connected piece is laid out in
/// layers by distance from a vertex at its rim (found by two breadth-first sweeps), layers
/// running left to right, each layer ordered by where its neighbours in the layer before sit, so
/// paths come out straight and trees fan out. Pieces are stacked top to bottom.
/// </summary>
public sealed class GraphLayout
{
    public const double Step = 58;

    private GraphLayout(double[] x, double[] y, double width, double height)
    {
        X = x;
        Y = y;
        Width = width;
        Height = height;
    }

    /// <summary>Vertex centres by vertex index, from the top-left of the drawing area.</summary>
    public double[] X { get; }
    public double[] Y { get; }

    public double Width { get; }
    public double Height { get; }

    public static GraphLayout Of(ColouredGraph graph)
    {
        int n = graph.Count;
        var x = new double[n];
        var y = new double[n];
        var placed = new bool[n];
        double top = 0, width = Step;
        for (int start = 0; start < n; start++)
        {
            if (placed[start]) continue;
            var (_, far) = Sweep(graph, start);
            var (layers, _) = Sweep(graph, far);
            // Rank within a layer: by the mean rank of neighbours one layer back, then by label.
            var rank = new Dictionary<int, double>();
            int tallest = 0;
            for (int d = 0; d < layers.Count; d++)
            {
                var layer = layers[d];
                double Key(int v)
                {
                    var back = graph.Neighbours(v).Where(rank.ContainsKey).Select(u => rank[u]).ToList();
                    return back.Count == 0 ? 0 : back.Average();
                }
                var ordered = layer.OrderBy(Key).ThenBy(graph.Label).ToList();
                for (int i = 0; i < ordered.Count; i++)
                {
                    int v = ordered[i];
                    rank[v] = i;
                    x[v] = Step / 2 + d * Step;
                    y[v] = top + Step / 2 + i * Step;
                    placed[v] = true;
                }
                tallest = Math.Max(tallest, ordered.Count);
            }
            width = Math.Max(width, layers.Count * Step);
            top += tallest * Step;
        }
        return new GraphLayout(x, y, width, Math.Max(top, Step));
    }

    /// <summary>Breadth-first layers from a vertex, and the last vertex reached (one farthest away).</summary>
    private static (List<List<int>> Layers, int Far) Sweep(ColouredGraph graph, int from)
    {
        var layers = new List<List<int>> { new() { from } };
        var seen = new HashSet<int> { from };
        int far = from;
        while (true)
        {
            var next = new List<int>();
            foreach (int v in layers[^1])
                foreach (int u in graph.Neighbours(v))
                    if (seen.Add(u)) next.Add(u);
            if (next.Count == 0) return (layers, far);
            next.Sort();
            far = next[^1];
            layers.Add(next);
        }
    }
}
