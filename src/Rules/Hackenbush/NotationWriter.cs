using System.Text;

namespace Bramble.Rules.Hackenbush;

/// <summary>
/// Writes a position in the notation of docs/hackenbush.md so that reading it back gives the same edges
/// in the same id order: pieces in order of their edges, trees as stalks with branches when
/// their pre-order visits the edges in increasing id order, any other piece as a bracket graph
/// listing its edges by id. When the pieces' ids interleave, the whole position becomes one
/// bracket graph. A position with gaps in its ids (after cuts) is therefore renumbered 1, 2, …
/// keeping the order — see docs/hackenbush.md.
/// </summary>
internal static class NotationWriter
{
    public static string Write(HackenbushPosition position)
    {
        if (position.IsEmpty) return "0";
        var parts = position.Components();
        var sb = new StringBuilder(position.EdgeCount * 2 + 8);
        int previousMax = 0;
        foreach (var part in parts)
        {
            var p = (HackenbushPosition)part;
            if (p.Ids[0] < previousMax)
            {
                // Interleaved ids: only one graph listing every edge keeps them all in order.
                sb.Clear();
                WriteGraph(position, sb);
                return sb.ToString();
            }
            previousMax = p.Ids[^1];
            if (sb.Length > 0) sb.Append(" + ");
            int mark = sb.Length;
            if (!TryWriteTree(p, sb))
            {
                sb.Length = mark;
                WriteGraph(p, sb);
            }
        }
        return sb.ToString();
    }

    /// <summary>Edges in id order; nodes other than the ground numbered 1, 2, … by first appearance.</summary>
    private static void WriteGraph(HackenbushPosition p, StringBuilder sb)
    {
        var label = new int[p.NodeCount];
        int next = 1;
        sb.Append('[');
        for (int e = 0; e < p.EdgeCount; e++)
        {
            if (e > 0) sb.Append(',');
            sb.Append(p.Colours[e].Letter());
            sb.Append(Label(p.From[e]));
            sb.Append('-');
            sb.Append(Label(p.To[e]));
        }
        sb.Append(']');

        int Label(int v)
        {
            if (v == 0) return 0;
            if (label[v] == 0) label[v] = next++;
            return label[v];
        }
    }

    /// <summary>A tree piece (one edge at the ground, no circuit) whose pre-order is in id order.</summary>
    private static bool TryWriteTree(HackenbushPosition p, StringBuilder sb)
    {
        int n = p.NodeCount, m = p.EdgeCount;
        if (m != n - 1) return false;
        var adj = p.Adjacency;
        if (adj.Start[1] - adj.Start[0] != 1) return false;
        // Orient every edge away from the ground; children lists keep adjacency order, which is id order.
        var parentEdge = new int[n];
        Array.Fill(parentEdge, -1);
        var order = new int[n];
        var seen = new bool[n];
        int head = 0, tail = 0;
        order[tail++] = 0;
        seen[0] = true;
        var upper = new int[m];
        while (head < tail)
        {
            int v = order[head++];
            for (int i = adj.Start[v]; i < adj.Start[v + 1]; i++)
            {
                int e = adj.Edge[i];
                if (e == parentEdge[v]) continue;
                int w = Adjacency.Other(p.From, p.To, e, v);
                if (seen[w]) return false;
                seen[w] = true;
                parentEdge[w] = e;
                upper[e] = w;
                order[tail++] = w;
            }
        }
        // Where each vertex's edge towards the ground sits in its adjacency list, to skip it.
        var parentSlot = new int[n];
        parentSlot[0] = int.MaxValue;
        for (int v = 1; v < n; v++)
        {
            int slot = adj.Start[v];
            while (adj.Edge[slot] != parentEdge[v]) slot++;
            parentSlot[v] = slot;
        }
        int ChildCount(int v) => adj.Start[v + 1] - adj.Start[v] - (v == 0 ? 0 : 1);
        int Child(int v, int j)
        {
            int i = adj.Start[v] + j;
            if (i >= parentSlot[v]) i++;
            return adj.Edge[i];
        }

        int lastId = 0;
        var open = new Stack<(int Vertex, int Next)>();
        int edge = adj.Edge[adj.Start[0]];
        while (true)
        {
            // A stalk: follow single children upwards.
            int v;
            while (true)
            {
                if (p.Ids[edge] <= lastId) return false;
                lastId = p.Ids[edge];
                sb.Append(p.Colours[edge].Letter());
                v = upper[edge];
                if (ChildCount(v) != 1) break;
                edge = Child(v, 0);
            }
            if (ChildCount(v) >= 2)
            {
                sb.Append('(');
                open.Push((v, 1));
                edge = Child(v, 0);
                continue;
            }
            bool more = false;
            while (open.Count > 0)
            {
                var (w, next) = open.Pop();
                if (next < ChildCount(w))
                {
                    sb.Append(',');
                    open.Push((w, next + 1));
                    edge = Child(w, next);
                    more = true;
                    break;
                }
                sb.Append(')');
            }
            if (!more) return true;
        }
    }
}
