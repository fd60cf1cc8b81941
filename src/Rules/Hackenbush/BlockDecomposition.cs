namespace Bramble.Rules.Hackenbush;

/// <summary>
/// The blocks (biconnected components) of the part of a multigraph connected to a root vertex,
/// found by one iterative depth-first search (Tarjan's edge-stack method, so a 10^6-edge stalk
/// needs no deep call stack). Each block hangs from one vertex, its <see cref="Root"/>: the
/// vertex of the block nearest the root of the whole graph. Blocks are listed bottom-up — every
/// block comes after all blocks that hang from its other vertices — which is the order in which
/// values can be folded down to the root. A loop is a block of its own; parallel edges fall
/// into one block, as the circuit they form requires. Edges not connected to the root appear in
/// no block.
/// </summary>
internal sealed class BlockDecomposition
{
    /// <summary>Number of blocks.</summary>
    public int Count { get; private set; }

    /// <summary>Block b consists of the edges <c>Edges[Start[b]..Start[b+1])</c>.</summary>
    public int[] Start { get; private set; } = [];

    public int[] Edges { get; private set; } = [];

    /// <summary>The vertex block b hangs from.</summary>
    public int[] Root { get; private set; } = [];

    /// <summary>Whether each vertex was reached from the root.</summary>
    public bool[] Reached { get; private set; } = [];

    public int Size(int block) => Start[block + 1] - Start[block];

    public static BlockDecomposition Build(int vertexCount, int[] from, int[] to, Adjacency adjacency, int root)
    {
        var result = new BlockDecomposition();
        result.Run(vertexCount, from, to, adjacency, root);
        return result;
    }

    private void Run(int vertexCount, int[] from, int[] to, Adjacency adj, int root)
    {
        var disc = new int[vertexCount];
        var low = new int[vertexCount];
        Array.Fill(disc, -1);
        var reached = new bool[vertexCount];

        // Explicit DFS stack: vertex, the edge it was entered by, and how far its adjacency list has been read.
        var stackVertex = new int[vertexCount];
        var stackEdge = new int[vertexCount];
        var stackNext = new int[vertexCount];
        int depth = 0;

        var edgeStack = new int[Math.Max(1, from.Length)];
        int edgeTop = 0;

        var blockRoot = new List<int>();
        var blockStart = new List<int> { 0 };
        var blockEdges = new int[Math.Max(1, from.Length)];
        int written = 0;

        int time = 0;
        void Discover(int v, int enteredBy)
        {
            disc[v] = low[v] = time++;
            reached[v] = true;
            stackVertex[depth] = v;
            stackEdge[depth] = enteredBy;
            stackNext[depth] = adj.Start[v];
            depth++;
            // Loops hang from v alone; emitting them now puts them before v's own block.
            for (int i = adj.Start[v]; i < adj.Start[v + 1]; i++)
            {
                int e = adj.Edge[i];
                if (from[e] == to[e])
                {
                    blockEdges[written++] = e;
                    blockRoot.Add(v);
                    blockStart.Add(written);
                }
            }
        }

        Discover(root, -1);
        while (depth > 0)
        {
            int top = depth - 1;
            int v = stackVertex[top];
            if (stackNext[top] < adj.Start[v + 1])
            {
                int e = adj.Edge[stackNext[top]++];
                if (e == stackEdge[top] || from[e] == to[e]) continue;
                int w = Adjacency.Other(from, to, e, v);
                if (disc[w] < 0)
                {
                    edgeStack[edgeTop++] = e;
                    Discover(w, e);
                }
                else if (disc[w] < disc[v])
                {
                    // A back edge to an ancestor (a parallel edge to the parent counts as one).
                    edgeStack[edgeTop++] = e;
                    if (disc[w] < low[v]) low[v] = disc[w];
                }
                continue;
            }
            depth--;
            int entered = stackEdge[top];
            if (entered < 0) continue;
            int parent = Adjacency.Other(from, to, entered, v);
            if (low[v] < low[parent]) low[parent] = low[v];
            if (low[v] >= disc[parent])
            {
                // Everything pushed since the tree edge into v forms the block hanging from parent.
                int e;
                do
                {
                    e = edgeStack[--edgeTop];
                    blockEdges[written++] = e;
                } while (e != entered);
                blockRoot.Add(parent);
                blockStart.Add(written);
            }
        }

        Count = blockRoot.Count;
        Root = blockRoot.ToArray();
        Start = blockStart.ToArray();
        Edges = blockEdges;
        Reached = reached;
    }
}
