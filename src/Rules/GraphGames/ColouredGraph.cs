namespace Bramble.Rules.GraphGames;

/// <summary>
/// A simple graph whose vertices carry a user's label (a number, the name moves use) and a
/// colour. Vertices are stored in increasing label order, index 0..n-1; neighbour lists hold
/// indices in increasing order. Immutable: a move makes a new graph sharing the edges.
/// </summary>
public sealed class ColouredGraph
{
    private readonly int[] _labels;
    private readonly VertexColour[] _colours;
    private readonly int[][] _neighbours;

    /// <summary>Takes the arrays as they are: labels strictly increasing, neighbour lists sorted, symmetric, without loops.</summary>
    public ColouredGraph(int[] labels, VertexColour[] colours, int[][] neighbours)
    {
        _labels = labels;
        _colours = colours;
        _neighbours = neighbours;
    }

    public static readonly ColouredGraph Empty = new([], [], []);

    public int Count => _labels.Length;

    public int Label(int vertex) => _labels[vertex];

    public VertexColour Colour(int vertex) => _colours[vertex];

    public IReadOnlyList<int> Neighbours(int vertex) => _neighbours[vertex];

    public int EdgeCount => _neighbours.Sum(n => n.Length) / 2;

    /// <summary>The index of the vertex with this label, or -1.</summary>
    public int IndexOf(int label) => Array.BinarySearch(_labels, label) is var i && i >= 0 ? i : -1;

    /// <summary>The tint bits of a vertex: which colours sit next to it (see <see cref="ColouringRuleExtensions"/>).</summary>
    public byte Tint(int vertex)
    {
        byte tint = 0;
        foreach (int u in _neighbours[vertex]) tint |= ColouringRuleExtensions.TintOf(_colours[u]);
        return tint;
    }

    /// <summary>The same graph with one vertex coloured.</summary>
    public ColouredGraph WithColour(int vertex, VertexColour colour)
    {
        var colours = (VertexColour[])_colours.Clone();
        colours[vertex] = colour;
        return new ColouredGraph(_labels, colours, _neighbours);
    }

    /// <summary>
    /// The graph on a subset of the vertices (given by index, in increasing order), with the
    /// edges among them except those joining two coloured vertices, which no longer matter.
    /// </summary>
    public ColouredGraph Induced(IReadOnlyList<int> vertices)
    {
        var index = new Dictionary<int, int>(vertices.Count);
        for (int i = 0; i < vertices.Count; i++) index[vertices[i]] = i;
        var labels = new int[vertices.Count];
        var colours = new VertexColour[vertices.Count];
        var neighbours = new int[vertices.Count][];
        for (int i = 0; i < vertices.Count; i++)
        {
            int v = vertices[i];
            labels[i] = _labels[v];
            colours[i] = _colours[v];
            var list = new List<int>();
            foreach (int u in _neighbours[v])
                if (index.TryGetValue(u, out int j) && (colours[i] == VertexColour.Uncoloured || _colours[u] == VertexColour.Uncoloured))
                    list.Add(j);
            list.Sort();
            neighbours[i] = list.ToArray();
        }
        return new ColouredGraph(labels, colours, neighbours);
    }

    /// <summary>Builds a graph from labelled vertices and label pairs (duplicates of an edge are merged).</summary>
    public static ColouredGraph Build(IReadOnlyDictionary<int, VertexColour> vertices, IEnumerable<(int A, int B)> edges)
    {
        var labels = vertices.Keys.OrderBy(l => l).ToArray();
        var colours = labels.Select(l => vertices[l]).ToArray();
        var sets = labels.Select(_ => new SortedSet<int>()).ToArray();
        foreach (var (a, b) in edges)
        {
            int i = Array.BinarySearch(labels, a), j = Array.BinarySearch(labels, b);
            if (i < 0 || j < 0) throw new ArgumentException($"edge {a}-{b} names a vertex that is not in the graph");
            if (i == j) throw new ArgumentException($"vertex {a} cannot be joined to itself");
            sets[i].Add(j);
            sets[j].Add(i);
        }
        return new ColouredGraph(labels, colours, sets.Select(s => s.ToArray()).ToArray());
    }
}
