using System.Text;

namespace Bramble.Rules.Tests.Hackenbush;

/// <summary>Seeded random drawings of every shape for the property tests, and the tests' own tree-notation writer.</summary>
public static class Shapes
{
    public static char Colour(Random random, string palette) => palette[random.Next(palette.Length)];

    public static Drawing Stalk(Random random, int n, string palette, Drawing? into = null)
    {
        var d = into ?? new Drawing();
        int below = 0;
        int next = NextNode(d);
        for (int i = 0; i < n; i++) { d.Add(Colour(random, palette), below, next); below = next++; }
        return d;
    }

    public static Drawing Tree(Random random, int n, string palette, Drawing? into = null)
    {
        var d = into ?? new Drawing();
        int first = NextNode(d);
        d.Add(Colour(random, palette), 0, first);
        for (int i = 1; i < n; i++)
        {
            int parent = first + random.Next(i);
            d.Add(Colour(random, palette), parent, first + i);
        }
        return d;
    }

    /// <summary>A connected graph: a random tree plus chords between random vertices (ground, loops and parallel edges included).</summary>
    public static Drawing Graph(Random random, int n, string palette, Drawing? into = null)
    {
        var d = into ?? new Drawing();
        int chords = Math.Max(1, n / 3);
        int treeEdges = Math.Max(1, n - chords);
        int first = NextNode(d);
        Tree(random, treeEdges, palette, d);
        var vertices = Enumerable.Range(first, treeEdges).Prepend(0).ToArray();
        for (int i = treeEdges; i < n; i++)
            d.Add(Colour(random, palette), vertices[random.Next(vertices.Length)], vertices[random.Next(vertices.Length)]);
        return d;
    }

    /// <summary>A sum of a few pieces of random shapes, <paramref name="n"/> edges in all.</summary>
    public static Drawing Sum(Random random, int n, string palette)
    {
        var d = new Drawing();
        while (d.Count < n)
        {
            int part = 1 + random.Next(Math.Min(4, n - d.Count));
            switch (random.Next(3))
            {
                case 0: Stalk(random, part, palette, d); break;
                case 1: Tree(random, part, palette, d); break;
                default: Graph(random, part, palette, d); break;
            }
        }
        return d;
    }

    private static int NextNode(Drawing d) => d.Count == 0 ? 1 : d.Edges.Max(e => Math.Max(e.A, e.B)) + 1;

    /// <summary>
    /// Tree notation for a drawing that is a sum of trees (each standing on the ground with one
    /// edge), and the drawing index of each edge in notation order: order[id - 1].
    /// </summary>
    public static string TreeText(Drawing d, out List<int> order)
    {
        var written = new List<int>();
        var used = new bool[d.Count];
        var sb = new StringBuilder();
        for (int i = 0; i < d.Count; i++)
        {
            if (d.Edges[i].A != 0 || used[i]) continue;
            if (sb.Length > 0) sb.Append(" + ");
            Write(i, 0);
        }
        order = written;
        return sb.ToString();

        void Write(int edge, int below)
        {
            used[edge] = true;
            written.Add(edge);
            sb.Append(d.Edges[edge].Colour);
            int top = d.Edges[edge].A == below ? d.Edges[edge].B : d.Edges[edge].A;
            var children = Enumerable.Range(0, d.Count).Where(j => !used[j] && (d.Edges[j].A == top || d.Edges[j].B == top)).ToList();
            if (children.Count == 1) { Write(children[0], top); return; }
            if (children.Count == 0) return;
            sb.Append('(');
            for (int c = 0; c < children.Count; c++)
            {
                if (c > 0) sb.Append(',');
                Write(children[c], top);
            }
            sb.Append(')');
        }
    }
}
