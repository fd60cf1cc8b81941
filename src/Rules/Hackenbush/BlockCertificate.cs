namespace Bramble.Rules.Hackenbush;

/// <summary>
/// A canonical labelling of one block (a small biconnected multigraph with coloured edges, a
/// root, and a label per vertex standing for what hangs there), by colour refinement and
/// individualisation: refine the vertex partition until it is stable, then try each vertex of
/// the first non-singleton cell as "first", and keep the labelling whose edge list is least.
/// Swapping twin vertices (same neighbours, same label) changes nothing, so only one twin of a
/// cell is tried. Past a cap on leaves the best labelling so far is kept: the result is then
/// still an exact description of the block, merely not guaranteed the same for every
/// relabelling, which costs memo sharing but never correctness.
/// </summary>
internal static class BlockCertificate
{
    private const int LeafCap = 4096;

    /// <summary>The vertices in canonical order (root first), and the sorted edge codes under that order.</summary>
    public readonly record struct Result(int[] Order, long[] Edges);

    public static Result Find(int vertices, EdgeColour[] colours, int[] from, int[] to, ulong[] labels)
    {
        var state = new Search(vertices, colours, from, to);
        // The root (vertex 0) has a class of its own; the others are first told apart by label.
        var keys = new (int, ulong)[vertices];
        for (int v = 0; v < vertices; v++) keys[v] = (v == 0 ? 0 : 1, v == 0 ? 0UL : labels[v]);
        var initial = RankBy(vertices, (a, b) => keys[a].CompareTo(keys[b]));
        state.Run(initial);
        var order = new int[vertices];
        for (int v = 0; v < vertices; v++) order[state.BestColouring![v]] = v;
        return new Result(order, state.BestEdges!);
    }

    /// <summary>Colours 0, 1, … by the order <paramref name="compare"/> puts the vertices in (equal ones share a colour).</summary>
    private static int[] RankBy(int vertices, Comparison<int> compare)
    {
        var sorted = Enumerable.Range(0, vertices).ToArray();
        Array.Sort(sorted, compare);
        var colour = new int[vertices];
        int c = 0;
        for (int i = 0; i < vertices; i++)
        {
            if (i > 0 && compare(sorted[i - 1], sorted[i]) != 0) c++;
            colour[sorted[i]] = c;
        }
        return colour;
    }

    private sealed class Search
    {
        private readonly int _n;
        private readonly EdgeColour[] _colours;
        private readonly int[] _from;
        private readonly int[] _to;
        private readonly List<(int Colour, int Other)>[] _incident;
        private readonly int[,,] _multiplicity;
        private int _leaves;

        public int[]? BestColouring;
        public long[]? BestEdges;

        public Search(int n, EdgeColour[] colours, int[] from, int[] to)
        {
            _n = n;
            _colours = colours;
            _from = from;
            _to = to;
            _incident = new List<(int, int)>[n];
            for (int v = 0; v < n; v++) _incident[v] = new();
            _multiplicity = new int[3, n, n];
            for (int e = 0; e < colours.Length; e++)
            {
                _incident[from[e]].Add(((int)colours[e], to[e]));
                if (from[e] != to[e]) _incident[to[e]].Add(((int)colours[e], from[e]));
                _multiplicity[(int)colours[e], from[e], to[e]]++;
                if (from[e] != to[e]) _multiplicity[(int)colours[e], to[e], from[e]]++;
            }
        }

        public void Run(int[] colouring)
        {
            var c = Refine(colouring);
            int cells = c.Max() + 1;
            if (cells == _n)
            {
                Leaf(c);
                return;
            }
            if (_leaves >= LeafCap) return;
            // The first non-singleton cell, by colour: a choice every relabelling makes alike.
            var size = new int[cells];
            foreach (int x in c) size[x]++;
            int target = Array.FindIndex(size, s => s > 1);
            var tried = new List<int>();
            for (int v = 0; v < _n; v++)
            {
                if (c[v] != target || tried.Any(u => Twins(u, v))) continue;
                tried.Add(v);
                var next = new int[_n];
                for (int u = 0; u < _n; u++) next[u] = 2 * c[u] + 1;
                next[v] = 2 * c[v];
                Run(next);
                if (_leaves >= LeafCap) return;
            }
        }

        private bool Twins(int u, int v)
        {
            for (int col = 0; col < 3; col++)
                for (int w = 0; w < _n; w++)
                    if (w != u && w != v && _multiplicity[col, u, w] != _multiplicity[col, v, w]) return false;
            return true;
        }

        private int[] Refine(int[] colouring)
        {
            var c = RankBy(_n, (a, b) => colouring[a].CompareTo(colouring[b]));
            int cells = c.Max() + 1;
            while (true)
            {
                var signature = new long[_n][];
                for (int v = 0; v < _n; v++)
                {
                    var list = _incident[v];
                    var sig = new long[list.Count + 1];
                    sig[0] = c[v];
                    for (int i = 0; i < list.Count; i++) sig[i + 1] = (long)c[list[i].Other] * 3 + list[i].Colour;
                    Array.Sort(sig, 1, list.Count);
                    signature[v] = sig;
                }
                var next = RankBy(_n, (a, b) => Compare(signature[a], signature[b]));
                int nextCells = next.Max() + 1;
                c = next;
                if (nextCells == cells) return c;
                cells = nextCells;
            }
        }

        private void Leaf(int[] c)
        {
            _leaves++;
            var edges = new long[_colours.Length];
            for (int e = 0; e < edges.Length; e++)
            {
                int a = c[_from[e]], b = c[_to[e]];
                if (a > b) (a, b) = (b, a);
                edges[e] = ((long)a * _n + b) * 3 + (int)_colours[e];
            }
            Array.Sort(edges);
            if (BestEdges is null || Compare(edges, BestEdges) < 0)
            {
                BestEdges = edges;
                BestColouring = c;
            }
        }

        private static int Compare(long[] a, long[] b)
        {
            int n = Math.Min(a.Length, b.Length);
            for (int i = 0; i < n; i++) if (a[i] != b[i]) return a[i].CompareTo(b[i]);
            return a.Length.CompareTo(b.Length);
        }
    }
}
