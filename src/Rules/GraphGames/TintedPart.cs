using Bramble.Values;

namespace Bramble.Rules.GraphGames;

/// <summary>
/// One summand of a Snort or Col position in the form Winning Ways analyses it: a connected set
/// of uncoloured vertices, each tinted by the colours next to it, with the coloured vertices
/// themselves gone. A vertex next to both colours can never be coloured by anyone, so it is
/// dropped (and may split the part). Vertices are numbered 0..n-1; <see cref="Origin"/> maps
/// them back to the indices of the graph they came from.
/// </summary>
public sealed class TintedPart
{
    private string? _key;

    public TintedPart(int[][] adjacency, byte[] tints, int[] origin)
    {
        Adjacency = adjacency;
        Tints = tints;
        Origin = origin;
    }

    /// <summary>Neighbour lists, sorted.</summary>
    public int[][] Adjacency { get; }

    /// <summary>Per vertex, <see cref="ColouringRuleExtensions.NextToBlue"/> and/or <see cref="ColouringRuleExtensions.NextToRed"/> (never both).</summary>
    public byte[] Tints { get; }

    /// <summary>Per vertex, its index in the coloured graph the first part was cut from (kept through moves).</summary>
    public int[] Origin { get; }

    /// <summary>
    /// The part as three masks over the original graph's vertex indices (its vertices, those next
    /// to blue, those next to red), or null when an index is 64 or more. Within one graph equal
    /// traces are equal parts, so a search can recognise a part reached by another move order
    /// without computing its key.
    /// </summary>
    public (ulong Vertices, ulong NextToBlue, ulong NextToRed)? Trace
    {
        get
        {
            ulong vertices = 0, blue = 0, red = 0;
            for (int i = 0; i < Origin.Length; i++)
            {
                if (Origin[i] >= 64) return null;
                ulong bit = 1UL << Origin[i];
                vertices |= bit;
                if ((Tints[i] & ColouringRuleExtensions.NextToBlue) != 0) blue |= bit;
                if ((Tints[i] & ColouringRuleExtensions.NextToRed) != 0) red |= bit;
            }
            return (vertices, blue, red);
        }
    }

    public int Count => Tints.Length;

    /// <summary>
    /// The normal key: the canonical labelling of the part or of its colour-swapped image,
    /// whichever reads first, with a leading '-' when it is the swapped image's (the part's value
    /// is then the negative of the key's). Isomorphic parts get equal keys (up to the limit
    /// described in <see cref="CanonicalLabelling"/>).
    /// </summary>
    public string SignedKey => _key ??= MakeKey();

    private string MakeKey()
    {
        string plain = CanonicalLabelling.Key(Adjacency, Tints);
        var swapped = new byte[Tints.Length];
        for (int i = 0; i < swapped.Length; i++) swapped[i] = Swap(Tints[i]);
        string image = CanonicalLabelling.Key(Adjacency, swapped);
        return string.CompareOrdinal(image, plain) < 0 ? "-" + image : plain;
    }

    private static byte Swap(byte tint) => (byte)(((tint & ColouringRuleExtensions.NextToBlue) << 1) | ((tint & ColouringRuleExtensions.NextToRed) >> 1));

    /// <summary>The parts left after <paramref name="side"/> colours vertex <paramref name="v"/> (legality is the caller's).</summary>
    public List<TintedPart> After(int v, Side side)
    {
        byte mark = ColouringRuleExtensions.TintOf(ColouringRuleExtensions.ColourOf(side));
        var tints = (byte[])Tints.Clone();
        foreach (int u in Adjacency[v]) tints[u] |= mark;
        var alive = new bool[Count];
        for (int i = 0; i < Count; i++) alive[i] = i != v && tints[i] != ColouringRuleExtensions.Dead;
        var parts = Split(Adjacency, tints, alive);
        // Split numbers the new parts by this part's vertices; keep the original graph's indices instead.
        foreach (var part in parts)
            for (int i = 0; i < part.Origin.Length; i++) part.Origin[i] = Origin[part.Origin[i]];
        return parts;
    }

    /// <summary>The connected parts of the live vertices, each renumbered in increasing order.</summary>
    public static List<TintedPart> Split(int[][] adjacency, byte[] tints, bool[] alive)
    {
        int n = tints.Length;
        var result = new List<TintedPart>();
        var seen = new bool[n];
        var newIndex = new int[n];
        var members = new List<int>();
        var stack = new Stack<int>();
        for (int start = 0; start < n; start++)
        {
            if (!alive[start] || seen[start]) continue;
            members.Clear();
            seen[start] = true;
            stack.Push(start);
            while (stack.Count > 0)
            {
                int x = stack.Pop();
                members.Add(x);
                foreach (int y in adjacency[x])
                    if (alive[y] && !seen[y])
                    {
                        seen[y] = true;
                        stack.Push(y);
                    }
            }
            members.Sort();
            for (int i = 0; i < members.Count; i++) newIndex[members[i]] = i;
            var adj = new int[members.Count][];
            var t = new byte[members.Count];
            for (int i = 0; i < members.Count; i++)
            {
                int x = members[i];
                t[i] = tints[x];
                int count = 0;
                foreach (int y in adjacency[x]) if (alive[y]) count++;
                var list = new int[count];
                int k = 0;
                foreach (int y in adjacency[x]) if (alive[y]) list[k++] = newIndex[y];
                Array.Sort(list);
                adj[i] = list;
            }
            result.Add(new TintedPart(adj, t, members.ToArray()));
        }
        return result;
    }

    /// <summary>The tinted parts of a coloured graph: its uncoloured vertices that someone may still colour, by connection.</summary>
    public static List<TintedPart> Of(ColouredGraph graph)
    {
        int n = graph.Count;
        var tints = new byte[n];
        var alive = new bool[n];
        var adjacency = new int[n][];
        for (int v = 0; v < n; v++)
        {
            adjacency[v] = graph.Neighbours(v).ToArray();
            if (graph.Colour(v) != VertexColour.Uncoloured) continue;
            tints[v] = graph.Tint(v);
            alive[v] = tints[v] != ColouringRuleExtensions.Dead;
        }
        return Split(adjacency, tints, alive);
    }
}
