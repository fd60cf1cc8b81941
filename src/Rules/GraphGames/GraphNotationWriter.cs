using System.Text;

namespace Bramble.Rules.GraphGames;

/// <summary>
/// Writes a coloured graph in the Snort and Col notation: one bracket graph listing its edges
/// as chains (<c>1-2-3</c>) and its lone vertices by themselves, every mention of a coloured
/// vertex with its colour letter. Reading the text back gives the same graph with the same
/// labels; the empty graph is <c>0</c>.
/// </summary>
internal static class GraphNotationWriter
{
    public static string Write(ColouredGraph graph)
    {
        if (graph.Count == 0) return "0";
        var sb = new StringBuilder("[");
        var used = new HashSet<(int, int)>();
        bool firstItem = true;
        for (int v = 0; v < graph.Count; v++)
        {
            bool lone = graph.Neighbours(v).Count == 0;
            while (lone || Unused(graph, v, used) >= 0)
            {
                if (!firstItem) sb.Append(',');
                firstItem = false;
                Vertex(sb, graph, v);
                if (lone) break;
                // Follow unused edges, always to the lowest-numbered neighbour, as far as they go.
                int at = v;
                for (int next = Unused(graph, at, used); next >= 0; next = Unused(graph, at, used))
                {
                    used.Add((Math.Min(at, next), Math.Max(at, next)));
                    sb.Append('-');
                    Vertex(sb, graph, next);
                    at = next;
                }
            }
        }
        return sb.Append(']').ToString();
    }

    private static int Unused(ColouredGraph graph, int v, HashSet<(int, int)> used)
    {
        foreach (int u in graph.Neighbours(v))
            if (!used.Contains((Math.Min(u, v), Math.Max(u, v)))) return u;
        return -1;
    }

    private static void Vertex(StringBuilder sb, ColouredGraph graph, int v)
    {
        sb.Append(graph.Label(v));
        if (graph.Colour(v) == VertexColour.Blue) sb.Append('B');
        else if (graph.Colour(v) == VertexColour.Red) sb.Append('R');
    }
}
