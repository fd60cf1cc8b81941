using System.Text;

namespace Bramble.Rules.GraphGames;

/// <summary>
/// A canonical text for a small vertex-tinted graph, so that isomorphic Snort and Col parts
/// share one memo entry. The method is the usual individualisation–refinement (common
/// practice in graph isomorphism): colour refinement splits the vertices by tint and by the
/// classes of their neighbours until nothing splits further; while a class still holds several
/// vertices, each of them in turn is singled out and refinement runs again; every way down ends
/// in an order of the vertices, and the least text of the graph read in such an order is the key.
/// Refinement and the choice of the class to split depend only on the graph, never on the
/// numbering, so the least text is the same for every numbering. Parts of up to
/// <see cref="AlwaysExact"/> vertices always try every order the search reaches (7! at most);
/// larger, very symmetric ones have more orders than are worth trying: after
/// <see cref="LeafCap"/> of them the least text so far is taken. Such a key is still exact (it describes the graph completely, so unequal graphs
/// never share one) but two numberings of the same graph may then miss each other's entry.
/// </summary>
public static class CanonicalLabelling
{
    /// <summary>Up to this many vertices the key is always canonical: every order is compared.</summary>
    public const int AlwaysExact = 7;

    /// <summary>How many complete orders are compared at most, beyond <see cref="AlwaysExact"/> vertices.</summary>
    public const int LeafCap = 512;

    /// <summary>
    /// The key text: the tinted graph in canonical order, written in the position notation (so a
    /// database can tell a key's size by reading it): vertices 1..n, and for each tinted vertex a
    /// coloured leaf numbered from n+1, e.g. <c>[1-2,2-3,1-4B]</c>.
    /// </summary>
    public static string Key(int[][] adjacency, byte[] tints)
    {
        int n = tints.Length;
        if (n == 0) return "0";
        var colours = new int[n];
        for (int i = 0; i < n; i++) colours[i] = tints[i];
        Rank(colours, colours.Select(c => (long)c).ToArray());
        Refine(adjacency, colours);
        var search = new Search(adjacency, tints);
        search.Descend(colours);
        return Notation(adjacency, tints, search.BestOrder!);
    }

    private static string Notation(int[][] adjacency, byte[] tints, int[] order)
    {
        int n = order.Length;
        var position = new int[n];
        for (int i = 0; i < n; i++) position[order[i]] = i;
        var items = new List<string>();
        int leaf = n + 1;
        for (int i = 0; i < n; i++)
        {
            int v = order[i];
            bool any = adjacency[v].Length > 0 || tints[v] != 0;
            foreach (int j in adjacency[v].Select(u => position[u]).Where(j => j > i).Order()) items.Add($"{i + 1}-{j + 1}");
            if (tints[v] != 0) items.Add($"{i + 1}-{leaf++}{(tints[v] == ColouringRuleExtensions.NextToBlue ? 'B' : 'R')}");
            if (!any) items.Add($"{i + 1}");
        }
        return "[" + string.Join(",", items) + "]";
    }

    private sealed class Search(int[][] adjacency, byte[] tints)
    {
        public string? Best;
        public int[]? BestOrder;
        private int _leaves;
        private readonly int _cap = tints.Length <= AlwaysExact ? int.MaxValue : LeafCap;

        public void Descend(int[] colours)
        {
            int n = colours.Length;
            // The class to split: the lowest colour held by more than one vertex.
            var counts = new int[n];
            foreach (int c in colours) counts[c]++;
            int target = -1;
            for (int c = 0; c < n; c++) if (counts[c] > 1) { target = c; break; }
            if (target < 0)
            {
                _leaves++;
                string text = Encode(colours);
                if (Best is null || string.CompareOrdinal(text, Best) < 0)
                {
                    Best = text;
                    BestOrder = new int[n];
                    for (int v = 0; v < n; v++) BestOrder[colours[v]] = v;
                }
                return;
            }
            for (int v = 0; v < n; v++)
            {
                if (colours[v] != target) continue;
                if (_leaves >= _cap && Best is not null) return;
                var next = new int[n];
                var keys = new long[n];
                for (int u = 0; u < n; u++) keys[u] = colours[u] * 2L + (u == v ? 0 : 1);
                Rank(next, keys);
                Refine(adjacency, next);
                Descend(next);
            }
        }

        private string Encode(int[] colours)
        {
            int n = colours.Length;
            var order = new int[n];
            for (int v = 0; v < n; v++) order[colours[v]] = v;
            var sb = new StringBuilder(n * 6);
            var later = new List<int>();
            for (int i = 0; i < n; i++)
            {
                int v = order[i];
                if (i > 0) sb.Append('/');
                sb.Append((char)('0' + tints[v]));
                later.Clear();
                foreach (int u in adjacency[v]) if (colours[u] > i) later.Add(colours[u]);
                later.Sort();
                foreach (int j in later) sb.Append('.').Append(j.ToString("x"));
            }
            return sb.ToString();
        }
    }

    /// <summary>Dense ranks 0..k-1 of the keys, in the keys' order.</summary>
    private static void Rank(int[] into, long[] keys)
    {
        var distinct = keys.Distinct().OrderBy(k => k).ToArray();
        for (int i = 0; i < keys.Length; i++) into[i] = Array.BinarySearch(distinct, keys[i]);
    }

    /// <summary>Colour refinement: split classes by the multiset of neighbours' classes until stable.</summary>
    private static void Refine(int[][] adjacency, int[] colours)
    {
        int n = colours.Length;
        int classes = colours.Max() + 1;
        var signatures = new int[n][];
        var order = new int[n];
        while (classes < n)
        {
            for (int v = 0; v < n; v++)
            {
                var sig = new int[adjacency[v].Length + 1];
                sig[0] = colours[v];
                for (int k = 0; k < adjacency[v].Length; k++) sig[k + 1] = colours[adjacency[v][k]];
                Array.Sort(sig, 1, sig.Length - 1);
                signatures[v] = sig;
                order[v] = v;
            }
            Array.Sort(order, (a, b) => Compare(signatures[a], signatures[b]));
            int rank = 0;
            colours[order[0]] = 0;
            for (int i = 1; i < n; i++)
            {
                if (Compare(signatures[order[i - 1]], signatures[order[i]]) != 0) rank++;
                colours[order[i]] = rank;
            }
            if (rank + 1 == classes) return;
            classes = rank + 1;
        }
    }

    private static int Compare(int[] a, int[] b)
    {
        int m = Math.Min(a.Length, b.Length);
        for (int i = 0; i < m; i++) if (a[i] != b[i]) return a[i].CompareTo(b[i]);
        return a.Length.CompareTo(b.Length);
    }
}
