namespace Bramble.Rules.GraphGames;

/// <summary>
/// Every connected tinted part of up to a few vertices, one per normal key, for
/// <c>bramble db build snort|col</c>. A tinted vertex is written as an uncoloured vertex with a
/// coloured leaf of its own, so each part is an ordinary position of the notation.
/// </summary>
internal static class TintedCatalogue
{
    /// <summary>Connected graphs times 3^n tintings: five vertices are thousands, six already tens of thousands.</summary>
    public const int MaxVertices = 6;

    public static IEnumerable<ColouredGraph> UpTo(int size)
    {
        if (size < 1 || size > MaxVertices) throw new ArgumentOutOfRangeException(nameof(size), $"size must be between 1 and {MaxVertices} vertices");
        var seen = new HashSet<string>(StringComparer.Ordinal);
        for (int n = 1; n <= size; n++)
            foreach (var adjacency in ConnectedGraphs(n))
            {
                var tints = new byte[n];
                int tintings = (int)Math.Pow(3, n);
                for (int code = 0; code < tintings; code++)
                {
                    for (int i = 0, c = code; i < n; i++, c /= 3) tints[i] = (byte)(c % 3);
                    var part = new TintedPart(adjacency, (byte[])tints.Clone(), Enumerable.Range(0, n).ToArray());
                    string key = part.SignedKey;
                    if (key[0] == '-' || !seen.Add(key)) continue;
                    yield return Realise(part);
                }
            }
    }

    /// <summary>One graph of each shape (untinted canonical key) on n vertices, connected.</summary>
    private static IEnumerable<int[][]> ConnectedGraphs(int n)
    {
        var pairs = new List<(int, int)>();
        for (int i = 0; i < n; i++) for (int j = i + 1; j < n; j++) pairs.Add((i, j));
        var shapes = new HashSet<string>(StringComparer.Ordinal);
        for (long mask = 0; mask < 1L << pairs.Count; mask++)
        {
            var lists = Enumerable.Range(0, n).Select(_ => new List<int>()).ToArray();
            for (int k = 0; k < pairs.Count; k++)
                if ((mask >> k & 1) != 0)
                {
                    lists[pairs[k].Item1].Add(pairs[k].Item2);
                    lists[pairs[k].Item2].Add(pairs[k].Item1);
                }
            var adjacency = lists.Select(l => l.ToArray()).ToArray();
            if (!Connected(adjacency)) continue;
            if (shapes.Add(CanonicalLabelling.Key(adjacency, new byte[n]))) yield return adjacency;
        }
    }

    private static bool Connected(int[][] adjacency)
    {
        var seen = new bool[adjacency.Length];
        var stack = new Stack<int>([0]);
        seen[0] = true;
        int count = 1;
        while (stack.Count > 0)
            foreach (int u in adjacency[stack.Pop()])
                if (!seen[u]) { seen[u] = true; count++; stack.Push(u); }
        return count == adjacency.Length;
    }

    /// <summary>The part as a graph: vertices 1..n, and a coloured leaf n+1, n+2, … for each tinted vertex.</summary>
    private static ColouredGraph Realise(TintedPart part)
    {
        int n = part.Count;
        var vertices = new Dictionary<int, VertexColour>();
        var edges = new List<(int, int)>();
        for (int i = 0; i < n; i++)
        {
            vertices[i + 1] = VertexColour.Uncoloured;
            foreach (int j in part.Adjacency[i]) if (j > i) edges.Add((i + 1, j + 1));
        }
        int next = n + 1;
        for (int i = 0; i < n; i++)
        {
            if (part.Tints[i] == 0) continue;
            vertices[next] = part.Tints[i] == ColouringRuleExtensions.NextToBlue ? VertexColour.Blue : VertexColour.Red;
            edges.Add((i + 1, next++));
        }
        return ColouredGraph.Build(vertices, edges);
    }
}
