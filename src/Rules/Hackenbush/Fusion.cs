namespace Bramble.Rules.Hackenbush;

/// <summary>
/// Green Hackenbush on any graph in linear time. Fusion principle: the vertices of a circuit may
/// be fused into one, its edges becoming loops, and a loop is worth *1 — so every 2-edge-connected
/// class of vertices fuses to a single vertex carrying one loop per non-bridge edge. What is left
/// is a tree of bridges, valued by the colon principle: a vertex is worth the nim-sum over its
/// bridges upwards of (value above + 1), nim-added to its loops. Bridges come from one iterative
/// depth-first search (low links), so a million-edge graph needs neither recursion nor a game store.
/// </summary>
public static class Fusion
{
    /// <summary>The nim-value of the all-green piece(s) of a position.</summary>
    public static int NimValue(HackenbushPosition position)
    {
        if (!position.IsGreen) throw new ArgumentException("the fusion principle applies to green edges only");
        return position.NimValue;
    }

    internal static int NimValue(int nodeCount, int[] from, int[] to, Adjacency adj)
    {
        int m = from.Length;
        if (m == 0) return 0;
        var disc = new int[nodeCount];
        var low = new int[nodeCount];
        var parentEdge = new int[nodeCount];
        var parent = new int[nodeCount];
        Array.Fill(disc, -1);
        var preorder = new int[nodeCount];
        int visited = 0;

        var stackVertex = new int[nodeCount];
        var stackNext = new int[nodeCount];
        int depth = 0;
        disc[0] = low[0] = 0;
        parentEdge[0] = -1;
        preorder[visited++] = 0;
        stackVertex[depth] = 0;
        stackNext[depth++] = adj.Start[0];
        while (depth > 0)
        {
            int top = depth - 1;
            int v = stackVertex[top];
            if (stackNext[top] < adj.Start[v + 1])
            {
                int e = adj.Edge[stackNext[top]++];
                if (e == parentEdge[v] || from[e] == to[e]) continue;
                int w = Adjacency.Other(from, to, e, v);
                if (disc[w] < 0)
                {
                    disc[w] = low[w] = visited;
                    preorder[visited++] = w;
                    parentEdge[w] = e;
                    parent[w] = v;
                    stackVertex[depth] = w;
                    stackNext[depth++] = adj.Start[w];
                }
                else if (disc[w] < low[v]) low[v] = disc[w];
                continue;
            }
            depth--;
            if (v != 0 && low[v] < low[parent[v]]) low[parent[v]] = low[v];
        }

        // Classes in pre-order: a vertex starts a new class exactly when the edge into it is a bridge.
        var cls = new int[nodeCount];
        var classParent = new List<int> { -1 };
        var isBridge = new bool[m];
        for (int i = 1; i < visited; i++)
        {
            int v = preorder[i];
            int p = parent[v];
            if (low[v] > disc[p])
            {
                isBridge[parentEdge[v]] = true;
                cls[v] = classParent.Count;
                classParent.Add(cls[p]);
            }
            else cls[v] = cls[p];
        }
        int classes = classParent.Count;
        var acc = new int[classes];
        for (int e = 0; e < m; e++)
            if (!isBridge[e]) acc[cls[from[e]]] ^= 1; // each fused edge is a loop, worth *1
        // Children classes were numbered after their parents, so a reverse sweep is bottom-up.
        for (int c = classes - 1; c > 0; c--) acc[classParent[c]] ^= acc[c] + 1;
        return acc[0];
    }
}
