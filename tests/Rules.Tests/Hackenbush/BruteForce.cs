using Bramble.Values;

namespace Bramble.Rules.Tests.Hackenbush;

/// <summary>
/// Plain search straight from the rules of Hackenbush, with no shortcut of any kind: a position
/// is the set of remaining edges, an option cuts one edge and drops what lost the ground, and
/// the value is {left options | right options} put in canonical form by the store. Memoised by
/// edge set only. Written for the tests, independently of the code under test.
/// </summary>
public sealed class BruteForce
{
    private readonly Drawing drawing;
    private readonly GameStore store;
    private readonly Dictionary<ulong, Game> _values = new();
    private readonly Dictionary<(ulong, bool), bool> _wins = new();
    // Each edge's two ends as bits of a node set (nodes renumbered 0..; the ground is bit 0).
    private readonly ulong[] _ends;

    public BruteForce(Drawing drawing, GameStore store)
    {
        this.drawing = drawing;
        this.store = store;
        var index = new Dictionary<int, int> { [0] = 0 };
        _ends = new ulong[drawing.Count];
        for (int i = 0; i < drawing.Count; i++)
        {
            var (_, a, b) = drawing.Edges[i];
            if (!index.ContainsKey(a)) index[a] = index.Count;
            if (!index.ContainsKey(b)) index[b] = index.Count;
            _ends[i] = (1UL << index[a]) | (1UL << index[b]);
        }
    }

    public Game Value() => Value(Grounded(drawing.All));

    /// <summary>The edges of <paramref name="mask"/> still joined to the ground: grow the reached node set until it stops.</summary>
    private ulong Grounded(ulong mask)
    {
        ulong nodes = 1, kept = 0;
        bool grew = true;
        while (grew)
        {
            grew = false;
            for (int i = 0; i < _ends.Length; i++)
            {
                if ((mask >> i & 1) == 0 || (kept >> i & 1) == 1 || (_ends[i] & nodes) == 0) continue;
                kept |= 1UL << i;
                nodes |= _ends[i];
                grew = true;
            }
        }
        return kept;
    }

    private Game Value(ulong mask)
    {
        if (_values.TryGetValue(mask, out var known)) return known;
        var left = new List<Game>();
        var right = new List<Game>();
        for (int i = 0; i < drawing.Count; i++)
        {
            if ((mask >> i & 1) == 0) continue;
            var c = drawing.Edges[i].Colour;
            var rest = Grounded(mask & ~(1UL << i));
            if (Drawing.MayCut(c, left: true)) left.Add(Value(rest));
            if (Drawing.MayCut(c, left: false)) right.Add(Value(rest));
        }
        var g = store.Make(left, right);
        _values[mask] = g;
        return g;
    }

    /// <summary>Does the side to move win, by plain win/lose search (no values at all)?</summary>
    public bool MoverWins(bool leftToMove) => MoverWins(Grounded(drawing.All), leftToMove);

    private bool MoverWins(ulong mask, bool leftToMove)
    {
        if (_wins.TryGetValue((mask, leftToMove), out bool known)) return known;
        bool win = false;
        for (int i = 0; i < drawing.Count && !win; i++)
        {
            if ((mask >> i & 1) == 0 || !Drawing.MayCut(drawing.Edges[i].Colour, leftToMove)) continue;
            if (!MoverWins(Grounded(mask & ~(1UL << i)), !leftToMove)) win = true;
        }
        _wins[(mask, leftToMove)] = win;
        return win;
    }

    public Outcome OutcomeByPlay()
    {
        bool leftFirst = MoverWins(true), rightFirst = MoverWins(false);
        return (leftFirst, rightFirst) switch
        {
            (true, false) => Outcome.L,
            (false, true) => Outcome.R,
            (true, true) => Outcome.N,
            _ => Outcome.P,
        };
    }
}
