using Bramble.Values;

namespace Bramble.Rules.Hackenbush;

/// <summary>
/// An immutable blue-red-green Hackenbush position: edges with fixed ids, each joining two nodes,
/// node 0 being the ground, every edge connected to the ground. Kept as parallel arrays sorted by
/// edge id (a million-edge position is four arrays, not a million objects). Node numbers are
/// private to one position and renumbered after every cut; edge ids are what stays.
/// </summary>
public sealed class HackenbushPosition : IPosition
{
    private readonly HackenbushRuleset _ruleset;
    private readonly int[] _ids;
    private readonly EdgeColour[] _colours;
    private readonly int[] _from;
    private readonly int[] _to;
    private readonly int _nodeCount;
    private readonly ulong _hash;

    // Derived data, computed on first use. Races only recompute equal values, so no locks.
    private Adjacency? _adjacency;
    private string? _text;
    private string? _key;
    private IReadOnlyList<IPosition>? _components;
    private int _nimValue = -1;

    internal HackenbushPosition(HackenbushRuleset ruleset, int[] ids, EdgeColour[] colours, int[] from, int[] to, int nodeCount, ulong? hash = null)
    {
        _ruleset = ruleset;
        _ids = ids;
        _colours = colours;
        _from = from;
        _to = to;
        _nodeCount = nodeCount;
        _hash = hash ?? HashOf(ids, colours);
    }

    private static ulong HashOf(int[] ids, EdgeColour[] colours)
    {
        ulong h = 0;
        for (int i = 0; i < ids.Length; i++) h ^= Mix.EdgeKey(ids[i], colours[i]);
        return h;
    }

    public IRuleset Ruleset => _ruleset;

    // ------------------------------------------------------------------ raw access for the algorithms

    internal int EdgeCount => _ids.Length;
    internal int NodeCount => _nodeCount;
    internal int[] Ids => _ids;
    internal EdgeColour[] Colours => _colours;
    internal int[] From => _from;
    internal int[] To => _to;
    internal Adjacency Adjacency => _adjacency ??= Adjacency.Build(_nodeCount, _from, _to);

    /// <summary>The edges in id order.</summary>
    public IReadOnlyList<HackenbushEdge> Edges =>
        Enumerable.Range(0, _ids.Length).Select(i => new HackenbushEdge(new EdgeId(_ids[i]), _colours[i], _from[i], _to[i])).ToArray();

    public bool IsEmpty => _ids.Length == 0;

    /// <summary>True when no edge is green, so every component is a number.</summary>
    public bool IsBlueRed => _colours.AsSpan().IndexOf(EdgeColour.Green) < 0;

    /// <summary>True when every edge is green, so the value is a nimber.</summary>
    public bool IsGreen => _colours.AsSpan().IndexOfAnyExcept(EdgeColour.Green) < 0;

    /// <summary>The nim-value of an all-green position (fusion and colon principles), computed once.</summary>
    internal int NimValue
    {
        get
        {
            if (_nimValue < 0) _nimValue = Fusion.NimValue(_nodeCount, _from, _to, Adjacency);
            return _nimValue;
        }
    }

    // ------------------------------------------------------------------ IPosition

    public string Text => _text ??= NotationWriter.Write(this);

    public override string ToString() => Text;

    public int Size => _ids.Length;

    public ulong Hash => _hash;

    public IReadOnlyList<Move> Moves(Side side)
    {
        var moves = new List<Move>(_ids.Length);
        for (int i = 0; i < _ids.Length; i++)
            if (_colours[i].CutBy(side)) moves.Add(new Move(_ids[i]));
        return moves;
    }

    public IPosition Play(Side side, Move move) => Cut(side, new EdgeId(move.A));

    /// <summary>Cuts an edge: it and everything no longer connected to the ground disappear.</summary>
    public HackenbushPosition Cut(Side side, EdgeId edge)
    {
        int index = Array.BinarySearch(_ids, edge.Value);
        if (index < 0) throw new IllegalMoveException($"there is no edge {edge} in this position");
        var colour = _colours[index];
        if (!colour.CutBy(side))
            throw new IllegalMoveException($"{edge} is {(colour == EdgeColour.Blue ? "blue" : "red")}: {side.Word()} cuts only {(side == Side.Left ? "blue" : "red")} and green edges");
        return Without(index);
    }

    private HackenbushPosition Without(int cut)
    {
        var seen = Adjacency.ReachFromGround(_from, _to, skip: cut);
        // Renumber the surviving nodes in their old order, so the result does not depend on the search order.
        var renumber = new int[_nodeCount];
        int nodes = 0;
        for (int v = 0; v < _nodeCount; v++) renumber[v] = seen[v] ? nodes++ : -1;
        int kept = 0;
        for (int e = 0; e < _ids.Length; e++) if (e != cut && seen[_from[e]]) kept++;
        var ids = new int[kept];
        var colours = new EdgeColour[kept];
        var from = new int[kept];
        var to = new int[kept];
        ulong hash = _hash;
        int k = 0;
        for (int e = 0; e < _ids.Length; e++)
        {
            if (e != cut && seen[_from[e]])
            {
                ids[k] = _ids[e];
                colours[k] = _colours[e];
                from[k] = renumber[_from[e]];
                to[k] = renumber[_to[e]];
                k++;
            }
            else hash ^= Mix.EdgeKey(_ids[e], _colours[e]);
        }
        return new HackenbushPosition(_ruleset, ids, colours, from, to, nodes, hash);
    }

    public string FormatMove(Move move) => new EdgeId(move.A).ToString();

    public Move ParseMove(string text)
    {
        var t = text.AsSpan().Trim();
        if (t.Length >= 2 && (t[0] == 'e' || t[0] == 'E') && int.TryParse(t[1..], System.Globalization.NumberStyles.None, null, out int id) && id > 0)
            return new Move(id);
        throw new IllegalMoveException($"'{text}' is not a Hackenbush move: expected e and an edge id, such as e7");
    }

    /// <summary>
    /// The pieces that meet only at the ground, each a position holding just that piece's edges
    /// with their original ids, in the order of their smallest edge id.
    /// </summary>
    public IReadOnlyList<IPosition> Components() => _components ??= Split();

    private IReadOnlyList<IPosition> Split()
    {
        int m = _ids.Length;
        if (m == 0) return [];
        var adj = Adjacency;
        // Flood each piece without passing through the ground.
        var piece = new int[_nodeCount];
        Array.Fill(piece, -1);
        var stack = new int[_nodeCount];
        int pieces = 0;
        var edgePiece = new int[m];
        for (int e = 0; e < m; e++)
        {
            int a = _from[e] != 0 ? _from[e] : _to[e];
            if (a == 0) { edgePiece[e] = pieces++; continue; } // a loop at the ground is a piece of its own
            if (piece[a] < 0)
            {
                int label = pieces++;
                int top = 0;
                piece[a] = label;
                stack[top++] = a;
                while (top > 0)
                {
                    int v = stack[--top];
                    for (int i = adj.Start[v]; i < adj.Start[v + 1]; i++)
                    {
                        int w = Adjacency.Other(_from, _to, adj.Edge[i], v);
                        if (w != 0 && piece[w] < 0) { piece[w] = label; stack[top++] = w; }
                    }
                }
            }
            edgePiece[e] = piece[a];
        }
        if (pieces == 1) return [this];
        // Pieces are labelled in order of their first (smallest-id) edge, because edges are scanned in id order.
        var counts = new int[pieces];
        foreach (int p in edgePiece) counts[p]++;
        var ids = new int[pieces][];
        var colours = new EdgeColour[pieces][];
        var from = new int[pieces][];
        var to = new int[pieces][];
        for (int p = 0; p < pieces; p++)
        {
            ids[p] = new int[counts[p]];
            colours[p] = new EdgeColour[counts[p]];
            from[p] = new int[counts[p]];
            to[p] = new int[counts[p]];
        }
        var fill = new int[pieces];
        var nodeCounts = new int[pieces];
        Array.Fill(nodeCounts, 1);
        var renumber = new int[_nodeCount];
        for (int e = 0; e < m; e++)
        {
            int p = edgePiece[e];
            int k = fill[p]++;
            ids[p][k] = _ids[e];
            colours[p][k] = _colours[e];
            from[p][k] = Local(_from[e], p);
            to[p][k] = Local(_to[e], p);
        }
        var result = new IPosition[pieces];
        for (int p = 0; p < pieces; p++)
            result[p] = new HackenbushPosition(_ruleset, ids[p], colours[p], from[p], to[p], nodeCounts[p]);
        return result;

        int Local(int v, int p)
        {
            if (v == 0) return 0;
            if (renumber[v] == 0) renumber[v] = nodeCounts[p]++;
            return renumber[v];
        }
    }

    /// <summary>
    /// A key shared by every piece with the same game up to renaming (see docs/hackenbush.md);
    /// for a position of several pieces, the pieces' keys sorted and joined by " + ".
    /// </summary>
    public string NormalKey => _key ??= ComputeKey();

    private string ComputeKey()
    {
        var parts = Components();
        if (parts.Count == 0) return "0";
        if (parts.Count == 1) return NormalForm.Key((HackenbushPosition)parts[0]);
        var keys = parts.Select(p => p.NormalKey).ToArray();
        Array.Sort(keys, StringComparer.Ordinal);
        return string.Join(" + ", keys);
    }
}
