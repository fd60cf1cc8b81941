using System.Text;

namespace Bramble.Rules.GraphGames;

/// <summary>
/// Reproducible graphs for <c>bramble generate snort|col …</c> and match suites; size is the
/// number of vertices. <c>paths</c>, <c>cycles</c> and <c>grids</c> are the plain shapes (the
/// same every time: the shortcuts P, C and RxC, the grid the most nearly square one with exactly
/// size vertices); <c>trees</c> are random trees; <c>random</c> are random sparse graphs with
/// about one vertex in six already coloured; <c>sums</c> are several small random trees with a
/// few coloured vertices, side by side — many small hot or cold parts, as in a game's endgame.
/// </summary>
public static class GraphGenerators
{
    public static readonly IReadOnlyList<string> Names = ["paths", "cycles", "grids", "trees", "random", "sums"];

    public static IReadOnlyList<string> Generate(string ruleset, string generator, int count, int size, int seed)
    {
        if (count < 0) throw new ArgumentOutOfRangeException(nameof(count), "count must not be negative");
        string name = generator.ToLowerInvariant();
        if (!Names.Contains(name))
            throw new ArgumentException($"unknown {ruleset} generator '{generator}'; known: {string.Join(", ", Names)}");
        int least = name == "cycles" ? 3 : name == "sums" ? 2 : 1;
        if (size < least || size > GraphNotationReader.MaxShortcut)
            throw new ArgumentOutOfRangeException(nameof(size), $"size for {name} must be between {least} and {GraphNotationReader.MaxShortcut} (vertices)");
        var random = new Random(seed);
        var result = new List<string>(count);
        for (int i = 0; i < count; i++)
        {
            result.Add(name switch
            {
                "paths" => $"P{size}",
                "cycles" => $"C{size}",
                "grids" => Grid(size),
                "trees" => Write(Tree(random, size, 1), colouredShare: 0, random),
                "random" => Write(Sparse(random, size), colouredShare: 6, random),
                _ => Sums(random, size),
            });
        }
        return result;
    }

    private static string Grid(int size)
    {
        int rows = (int)Math.Sqrt(size);
        while (size % rows != 0) rows--;
        return $"{rows}x{size / rows}";
    }

    /// <summary>A random recursive tree on vertices first..first+n-1: each new vertex joins an earlier one.</summary>
    private static List<(int, int)> Tree(Random random, int n, int first)
    {
        var edges = new List<(int, int)>();
        for (int v = 1; v < n; v++) edges.Add((first + random.Next(v), first + v));
        return edges;
    }

    /// <summary>A random tree plus about n/4 extra edges: sparse, connected, with cycles.</summary>
    private static List<(int, int)> Sparse(Random random, int n)
    {
        var edges = Tree(random, n, 1);
        var present = new HashSet<(int, int)>(edges);
        for (int k = 0; k < n / 4; k++)
        {
            int a = 1 + random.Next(n), b = 1 + random.Next(n);
            if (a == b) continue;
            var e = (Math.Min(a, b), Math.Max(a, b));
            if (present.Add(e)) edges.Add(e);
        }
        return edges;
    }

    private static string Sums(Random random, int size)
    {
        var parts = new List<string>();
        int first = 1;
        while (first <= size)
        {
            int n = Math.Min(size - first + 1, 2 + random.Next(6));
            parts.Add(Write(Tree(random, n, first), colouredShare: 5, random, first, n));
            first += n;
        }
        return string.Join(" + ", parts);
    }

    /// <summary>Writes vertices first..first+n-1 and the edges; 1 in colouredShare vertices is coloured at random (0: none).</summary>
    private static string Write(List<(int A, int B)> edges, int colouredShare, Random random, int first = 1, int n = -1)
    {
        if (n < 0) n = edges.Count == 0 ? 1 : edges.Max(e => Math.Max(e.A, e.B)) - first + 1;
        var mark = new string[n];
        for (int i = 0; i < n; i++)
            mark[i] = colouredShare > 0 && random.Next(colouredShare) == 0 ? (random.Next(2) == 0 ? "B" : "R") : "";
        string V(int v) => v.ToString(System.Globalization.CultureInfo.InvariantCulture) + mark[v - first];
        var sb = new StringBuilder("[");
        var touched = new HashSet<int>();
        foreach (var (a, b) in edges)
        {
            if (sb.Length > 1) sb.Append(',');
            sb.Append(V(a)).Append('-').Append(V(b));
            touched.Add(a);
            touched.Add(b);
        }
        for (int v = first; v < first + n; v++)
        {
            if (touched.Contains(v)) continue;
            if (sb.Length > 1) sb.Append(',');
            sb.Append(V(v));
        }
        return sb.Append(']').ToString();
    }
}
