using System.Text;

namespace Bramble.Rules.Tests.Hackenbush;

/// <summary>
/// The tests' own model of a Hackenbush position, independent of the code under test: a list of
/// edges (colour letter, two node numbers, node 0 the ground). Edge i of the list is edge id i+1
/// of the notation <see cref="Bracket"/> writes.
/// </summary>
public sealed class Drawing
{
    public List<(char Colour, int A, int B)> Edges { get; } = new();

    public Drawing Add(char colour, int a, int b) { Edges.Add((colour, a, b)); return this; }

    public int Count => Edges.Count;

    /// <summary>Bracket notation, edges in list order (so ids are list positions + 1).</summary>
    public string Bracket()
    {
        if (Edges.Count == 0) return "0";
        var sb = new StringBuilder("[");
        for (int i = 0; i < Edges.Count; i++)
        {
            if (i > 0) sb.Append(',');
            sb.Append(Edges[i].Colour).Append(Edges[i].A).Append('-').Append(Edges[i].B);
        }
        return sb.Append(']').ToString();
    }

    public ulong All => Edges.Count == 64 ? ulong.MaxValue : (1UL << Edges.Count) - 1;

    public static bool MayCut(char colour, bool left) => colour == 'G' || colour == (left ? 'B' : 'R');

    /// <summary>The same drawing with node labels permuted (ground kept), edges shuffled and ends swapped at random.</summary>
    public Drawing Relabelled(Random random, out int[] order)
    {
        int maxNode = Edges.Count == 0 ? 0 : Edges.Max(e => Math.Max(e.A, e.B));
        var labels = Enumerable.Range(1, maxNode).OrderBy(_ => random.Next()).Select(x => x * 3 + 7).ToArray();
        int Map(int v) => v == 0 ? 0 : labels[v - 1];
        order = Enumerable.Range(0, Edges.Count).OrderBy(_ => random.Next()).ToArray();
        var copy = new Drawing();
        foreach (int i in order)
        {
            var (c, a, b) = Edges[i];
            if (random.Next(2) == 0) (a, b) = (b, a);
            copy.Add(c, Map(a), Map(b));
        }
        return copy;
    }
}
