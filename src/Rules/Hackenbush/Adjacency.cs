namespace Bramble.Rules.Hackenbush;

/// <summary>
/// Compressed adjacency lists of an undirected multigraph given by edge endpoint arrays: the
/// incident edges of vertex v are <c>Edge[Start[v]..Start[v+1])</c>. A loop is listed once at its
/// vertex, any other edge once at each end. Built in two linear passes so a million-edge piece
/// costs two int arrays and no per-vertex objects.
/// </summary>
internal sealed class Adjacency
{
    public readonly int[] Start;
    public readonly int[] Edge;

    private Adjacency(int[] start, int[] edge) { Start = start; Edge = edge; }

    /// <summary>All edges 0..from.Length-1.</summary>
    public static Adjacency Build(int vertexCount, int[] from, int[] to) => Build(vertexCount, from, to, null, from.Length);

    /// <summary>Only the edges listed in <paramref name="subset"/> (first <paramref name="count"/> entries), or all when it is null.</summary>
    public static Adjacency Build(int vertexCount, int[] from, int[] to, int[]? subset, int count)
    {
        var start = new int[vertexCount + 1];
        for (int i = 0; i < count; i++)
        {
            int e = subset is null ? i : subset[i];
            start[from[e] + 1]++;
            if (to[e] != from[e]) start[to[e] + 1]++;
        }
        for (int v = 0; v < vertexCount; v++) start[v + 1] += start[v];
        var fill = new int[vertexCount];
        Array.Copy(start, fill, vertexCount);
        var edge = new int[start[vertexCount]];
        for (int i = 0; i < count; i++)
        {
            int e = subset is null ? i : subset[i];
            edge[fill[from[e]]++] = e;
            if (to[e] != from[e]) edge[fill[to[e]]++] = e;
        }
        return new Adjacency(start, edge);
    }

    public static int Other(int[] from, int[] to, int e, int v) => from[e] == v ? to[e] : from[e];

    /// <summary>Which vertices have a path to the ground (vertex 0), leaving out edge <paramref name="skip"/> (or none: -1).</summary>
    public bool[] ReachFromGround(int[] from, int[] to, int skip = -1)
    {
        int n = Start.Length - 1;
        var seen = new bool[n];
        var queue = new int[n];
        int head = 0, tail = 0;
        seen[0] = true;
        queue[tail++] = 0;
        while (head < tail)
        {
            int v = queue[head++];
            for (int i = Start[v]; i < Start[v + 1]; i++)
            {
                int e = Edge[i];
                if (e == skip) continue;
                int w = Other(from, to, e, v);
                if (!seen[w]) { seen[w] = true; queue[tail++] = w; }
            }
        }
        return seen;
    }
}
