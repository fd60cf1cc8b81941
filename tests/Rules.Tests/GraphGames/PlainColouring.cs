using Bramble.Values;

namespace Bramble.Rules.Tests.GraphGames;

/// <summary>
/// A small Snort or Col position written out for the tests, and its value by plain recursive
/// search with the rules written here from their statement (Winning Ways, ch. 2 and 6): colour
/// one uncoloured vertex; in Col not next to the mover's own colour, in Snort not next to the
/// opponent's. No split into parts, no tints, no symmetry; memo on the whole colouring only.
/// </summary>
public sealed class PlainColouring
{
    public PlainColouring(int[] labels, List<(int A, int B)> edges, char[] colours)
    {
        Labels = labels;
        Edges = edges;
        Colours = colours;
    }

    /// <summary>Vertex labels, by vertex index.</summary>
    public int[] Labels { get; }

    /// <summary>Edges between vertex indices.</summary>
    public List<(int A, int B)> Edges { get; }

    /// <summary>'.' uncoloured, 'B' blue (Left), 'R' red (Right).</summary>
    public char[] Colours { get; }

    /// <summary>The notation: every edge and lone vertex listed, each vertex with its colour letter.</summary>
    public string Text(Random? shuffle = null)
    {
        string V(int v) => Labels[v] + (Colours[v] == '.' ? "" : Colours[v].ToString());
        var items = Edges.Select(e => shuffle is not null && shuffle.Next(2) == 0 ? $"{V(e.B)}-{V(e.A)}" : $"{V(e.A)}-{V(e.B)}").ToList();
        for (int v = 0; v < Labels.Length; v++)
            if (!Edges.Any(e => e.A == v || e.B == v)) items.Add(V(v));
        if (shuffle is not null) items = items.OrderBy(_ => shuffle.Next()).ToList();
        return "[" + string.Join(",", items) + "]";
    }

    /// <summary>A random graph of 1..maxVertices vertices with random labels, edges and colours.</summary>
    public static PlainColouring Random(Random random, int maxVertices, double edgeChance, double colouredChance)
    {
        int n = random.Next(1, maxVertices + 1);
        var labels = Enumerable.Range(0, 1000).OrderBy(_ => random.Next()).Take(n).ToArray();
        var edges = new List<(int, int)>();
        for (int a = 0; a < n; a++)
            for (int b = a + 1; b < n; b++)
                if (random.NextDouble() < edgeChance) edges.Add((a, b));
        var colours = new char[n];
        for (int v = 0; v < n; v++)
            colours[v] = random.NextDouble() < colouredChance ? (random.Next(2) == 0 ? 'B' : 'R') : '.';
        return new PlainColouring(labels, edges, colours);
    }

    /// <summary>The same position with new labels (a random injective renaming).</summary>
    public PlainColouring Relabelled(Random random)
    {
        var labels = Enumerable.Range(0, 5000).OrderBy(_ => random.Next()).Take(Labels.Length).ToArray();
        return new PlainColouring(labels, Edges, Colours);
    }

    /// <summary>The same graph with blue and red exchanged.</summary>
    public PlainColouring Swapped() =>
        new(Labels, Edges, Colours.Select(c => c == 'B' ? 'R' : c == 'R' ? 'B' : c).ToArray());

    public Game Value(GameStore store, bool snort)
    {
        var neighbours = Enumerable.Range(0, Labels.Length).Select(_ => new List<int>()).ToArray();
        foreach (var (a, b) in Edges)
        {
            neighbours[a].Add(b);
            neighbours[b].Add(a);
        }
        var memo = new Dictionary<string, Game>(StringComparer.Ordinal);
        Game Search(char[] colours)
        {
            string key = new(colours);
            if (memo.TryGetValue(key, out var known)) return known;
            var left = new List<Game>();
            var right = new List<Game>();
            foreach (var (mine, list) in new[] { ('B', left), ('R', right) })
            {
                char theirs = mine == 'B' ? 'R' : 'B';
                char forbidding = snort ? theirs : mine;
                for (int v = 0; v < colours.Length; v++)
                {
                    if (colours[v] != '.' || neighbours[v].Any(u => colours[u] == forbidding)) continue;
                    var next = (char[])colours.Clone();
                    next[v] = mine;
                    list.Add(Search(next));
                }
            }
            var value = store.Make(left, right);
            memo[key] = value;
            return value;
        }
        return Search((char[])Colours.Clone());
    }

    /// <summary>Reads the bracket form written by the engine (<c>[1-2B-3,4]</c>) with a reader written here.</summary>
    public static PlainColouring Read(string text)
    {
        var labels = new List<int>();
        var colours = new List<char>();
        var edges = new List<(int, int)>();
        int IndexOf(string token)
        {
            char last = char.ToUpperInvariant(token[^1]);
            char colour = last is 'B' or 'R' ? last : '.';
            int label = int.Parse(colour == '.' ? token : token[..^1]);
            int at = labels.IndexOf(label);
            if (at < 0) { labels.Add(label); colours.Add(colour); return labels.Count - 1; }
            if (colour != '.') colours[at] = colour;
            return at;
        }
        if (text.Trim() != "0")
            foreach (var item in text.Trim().TrimStart('[').TrimEnd(']').Split(','))
            {
                var chain = item.Split('-').Select(t => IndexOf(t.Trim())).ToArray();
                for (int k = 0; k + 1 < chain.Length; k++) edges.Add((chain[k], chain[k + 1]));
            }
        return new PlainColouring(labels.ToArray(), edges, colours.ToArray());
    }

    public override string ToString() => Text();
}
