using Bramble.Rules.Hackenbush;

namespace Bramble.Pictures;

/// <summary>
/// Names for the nodes of a Hackenbush game that never change while it is played. A position
/// renumbers its nodes after every cut, but an edge keeps its id and its two ends, so the names
/// are fixed once from the start position and looked up through the edge ids ever after:
/// <c>ground</c>, then <c>n1</c>, <c>n2</c>, … in the start position's node order.
/// </summary>
public sealed class NodeNames
{
    private readonly Dictionary<int, (string From, string To)> _ends = new();

    public NodeNames(HackenbushPosition start)
    {
        foreach (var e in start.Edges) _ends[e.Id.Value] = (Name(e.From), Name(e.To));
    }

    private static string Name(int node) => node == 0 ? "ground" : "n" + node;

    /// <summary>The names of the two ends of an edge of the start position (or of any position reached from it).</summary>
    public (string From, string To) Ends(HackenbushEdge edge) =>
        _ends.TryGetValue(edge.Id.Value, out var ends) ? ends : (Name(edge.From), Name(edge.To));
}
