namespace Bramble.Rules.Hackenbush;

/// <summary>
/// Random positions for `bramble generate hackenbush`, reproducible from the seed:
/// <list type="bullet">
/// <item><c>stalks</c>: a sum of stalks;</item>
/// <item><c>trees</c>: a sum of one to three trees;</item>
/// <item><c>graphs</c>: one connected graph with circuits (a random tree plus chords to nearby
/// ancestors, some of them parallel edges or loops);</item>
/// <item><c>mixed</c>: a sum of stalks, trees and graphs.</item>
/// </list>
/// <c>size</c> is the number of edges of each position, <c>colours</c> the letters to draw from
/// (default BRG). Random trees grow by attaching each edge either to the newest vertex or to a
/// uniformly chosen one, so they have both long chains and bushy parts.
/// </summary>
internal static class PositionGenerator
{
    public static readonly IReadOnlyList<string> Names = ["stalks", "trees", "graphs", "mixed"];

    public static IReadOnlyList<string> Generate(string generator, int count, int size, int seed, string? colours)
    {
        if (count < 0) throw new ArgumentException("--count must be 0 or more");
        if (size < 1) throw new ArgumentException("--size must be at least 1 (it is the number of edges)");
        var palette = Palette(colours);
        var name = generator.ToLowerInvariant();
        if (!Names.Contains(name)) throw new ArgumentException($"unknown Hackenbush generator '{generator}'; known: {string.Join(", ", Names)}");
        var random = new RepeatableRandom(seed);
        var result = new List<string>(count);
        var ruleset = new HackenbushRuleset();
        for (int i = 0; i < count; i++)
        {
            var sketch = new Sketch();
            switch (name)
            {
                case "stalks": Stalks(sketch, random, size, palette); break;
                case "trees": Trees(sketch, random, size, palette); break;
                case "graphs": Graph(sketch, random, size, palette); break;
                default: Mixed(sketch, random, size, palette); break;
            }
            result.Add(sketch.Build(ruleset).Text);
        }
        return result;
    }

    private static EdgeColour[] Palette(string? colours)
    {
        if (string.IsNullOrWhiteSpace(colours)) return [EdgeColour.Blue, EdgeColour.Red, EdgeColour.Green];
        var set = new List<EdgeColour>();
        foreach (char c in colours.Trim())
        {
            if (!EdgeColourExtensions.TryParse(c, out var colour))
                throw new ArgumentException($"--colours takes letters from BRG (blue, red, green), not '{c}'");
            if (!set.Contains(colour)) set.Add(colour);
        }
        return set.ToArray();
    }

    /// <summary>Splits <paramref name="total"/> into parts of 1..<paramref name="most"/>.</summary>
    private static List<int> Split(RepeatableRandom random, int total, int most)
    {
        var parts = new List<int>();
        while (total > 0)
        {
            int part = 1 + random.Next(Math.Min(total, Math.Max(1, most)));
            parts.Add(part);
            total -= part;
        }
        return parts;
    }

    private static int Typical(int size) => Math.Max(2, (int)Math.Ceiling(2 * Math.Sqrt(size)));

    private static void Stalks(Sketch s, RepeatableRandom random, int size, EdgeColour[] palette)
    {
        foreach (int part in Split(random, size, Typical(size))) s.AddTree(Chain(part), random, palette);
    }

    private static void Trees(Sketch s, RepeatableRandom random, int size, EdgeColour[] palette)
    {
        int trees = 1 + random.Next(Math.Min(3, size));
        var cuts = Enumerable.Range(0, trees - 1).Select(_ => 1 + random.Next(size - 1)).Distinct().OrderBy(x => x).ToList();
        int previous = 0;
        foreach (int cut in cuts.Append(size))
        {
            s.AddTree(RandomTree(random, cut - previous), random, palette);
            previous = cut;
        }
    }

    private static void Graph(Sketch s, RepeatableRandom random, int size, EdgeColour[] palette)
    {
        if (size == 1)
        {
            s.AddLoopAtGround(palette[random.Next(palette.Length)]);
            return;
        }
        int chords = Math.Max(1, size / 8);
        var parent = RandomTree(random, size - chords);
        s.AddGraph(parent, chords, random, palette);
    }

    private static void Mixed(Sketch s, RepeatableRandom random, int size, EdgeColour[] palette)
    {
        foreach (int part in Split(random, size, Typical(size)))
        {
            switch (part >= 3 ? random.Next(3) : random.Next(2))
            {
                case 0: s.AddTree(Chain(part), random, palette); break;
                case 1: s.AddTree(RandomTree(random, part), random, palette); break;
                default: s.AddGraph(RandomTree(random, part - Math.Max(1, part / 4)), Math.Max(1, part / 4), random, palette); break;
            }
        }
    }

    /// <summary>Parent of each vertex 1..n of a stalk (vertex 0 is the ground).</summary>
    private static int[] Chain(int n)
    {
        var parent = new int[n + 1];
        for (int v = 1; v <= n; v++) parent[v] = v - 1;
        return parent;
    }

    /// <summary>Parent of each vertex 1..n of a random tree standing on the ground with one edge.</summary>
    private static int[] RandomTree(RepeatableRandom random, int n)
    {
        var parent = new int[n + 1];
        for (int v = 2; v <= n; v++) parent[v] = random.Chance(1, 2) ? v - 1 : 1 + random.Next(v - 1);
        return parent;
    }

    /// <summary>Edges in the order they will be written, so that ids follow the text.</summary>
    private sealed class Sketch
    {
        private readonly List<EdgeColour> _colours = new();
        private readonly List<int> _from = new();
        private readonly List<int> _to = new();
        private int _nodes = 1;

        public void AddLoopAtGround(EdgeColour colour) => Add(colour, 0, 0);

        /// <summary>A tree given by parents, written in pre-order (the order the notation lists edges).</summary>
        public void AddTree(int[] parent, RepeatableRandom random, EdgeColour[] palette) => AddTreeEdges(parent, random, palette);

        /// <summary>A tree plus chords from random vertices to ancestors 1-4 steps down (parallel edges when 1), some loops.</summary>
        public void AddGraph(int[] parent, int chords, RepeatableRandom random, EdgeColour[] palette)
        {
            var node = AddTreeEdges(parent, random, palette);
            int n = parent.Length - 1;
            for (int i = 0; i < chords; i++)
            {
                int v = 1 + random.Next(n);
                if (random.Chance(1, 12))
                {
                    Add(palette[random.Next(palette.Length)], node[v], node[v]);
                    continue;
                }
                int u = v;
                for (int d = 1 + random.Next(4); d > 0 && u != 0; d--) u = parent[u];
                Add(palette[random.Next(palette.Length)], node[u], node[v]);
            }
        }

        private int[] AddTreeEdges(int[] parent, RepeatableRandom random, EdgeColour[] palette)
        {
            int n = parent.Length - 1;
            var node = new int[n + 1];
            var colour = new EdgeColour[n + 1];
            var childCount = new int[n + 2];
            for (int v = 1; v <= n; v++) { colour[v] = palette[random.Next(palette.Length)]; childCount[parent[v] + 1]++; }
            for (int v = 0; v <= n; v++) childCount[v + 1] += childCount[v];
            var children = new int[n];
            var fill = (int[])childCount.Clone();
            for (int v = 1; v <= n; v++) children[fill[parent[v]]++] = v;
            // Pre-order, children in the order they were made, iteratively.
            var stack = new Stack<int>();
            stack.Push(0);
            while (stack.Count > 0)
            {
                int v = stack.Pop();
                if (v != 0)
                {
                    node[v] = _nodes++;
                    Add(colour[v], node[parent[v]], node[v]);
                }
                for (int i = childCount[v + 1] - 1; i >= childCount[v]; i--) stack.Push(children[i]);
            }
            return node;
        }

        private void Add(EdgeColour colour, int from, int to)
        {
            _colours.Add(colour);
            _from.Add(from);
            _to.Add(to);
        }

        public HackenbushPosition Build(HackenbushRuleset ruleset)
        {
            var ids = Enumerable.Range(1, _colours.Count).ToArray();
            return new HackenbushPosition(ruleset, ids, _colours.ToArray(), _from.ToArray(), _to.ToArray(), _nodes);
        }
    }
}
