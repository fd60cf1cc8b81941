using Bramble.Values;

namespace Bramble.Rules.Hackenbush;

/// <summary>
/// Exact value of a block no shortcut covers — a circuit with blue or red edges, or a green one
/// carrying more than nimbers — by memoised search over the subsets of its edges (a 128-bit set).
/// A state is (remaining edges connected to the root, root, the canonical game hanging at each
/// vertex). Its options are the cuts of its edges and the moves inside the hanging games (a
/// hanging part is represented by its canonical value, which changes nothing by the colon
/// principle). Each state is itself folded by the usual rules first, so after a cut breaks a
/// circuit the rest is valued as a tree, and only what is still biconnected is searched. Every
/// searched state counts one node in the <see cref="ValueContext"/>, so budgets apply.
/// </summary>
public static class Prof { public static long Make, MakeN, Opts, Num, Ord, Add; }
internal sealed class BlockSearch
{
    public const int MaxEdges = 128;

    private readonly PieceEvaluator _evaluator;
    private readonly GameStore _store;
    private readonly int _vertices;
    private readonly EdgeColour[] _colours;
    private readonly int[] _from;
    private readonly int[] _to;
    private readonly UInt128[] _incident;
    private readonly Game[] _hang;
    private readonly Dictionary<StateKey, Game> _memo = new();

    private BlockSearch(PieceEvaluator evaluator, int vertices, EdgeColour[] colours, int[] from, int[] to, Game[] hang)
    {
        _evaluator = evaluator;
        _store = evaluator.Store;
        _vertices = vertices;
        _colours = colours;
        _from = from;
        _to = to;
        _hang = hang;
        _incident = new UInt128[vertices];
        for (int e = 0; e < colours.Length; e++)
        {
            _incident[from[e]] |= UInt128.One << e;
            _incident[to[e]] |= UInt128.One << e;
        }
    }

    /// <summary>
    /// A search over the given edges of a bigger piece, renumbered locally (the root becomes
    /// vertex 0); <paramref name="hanging"/> gives what hangs at each of the piece's vertices.
    /// </summary>
    public static BlockSearch Create(PieceEvaluator evaluator, int[] edges, EdgeColour[] colours, int[] from, int[] to, int root, Func<int, Game> hanging)
    {
        if (edges.Length > MaxEdges)
            throw new BudgetExceededException($"a block of {edges.Length} edges with blue or red edges on its circuits is beyond exact search (at most {MaxEdges})");
        var local = new Dictionary<int, int> { [root] = 0 };
        var c = new EdgeColour[edges.Length];
        var f = new int[edges.Length];
        var t = new int[edges.Length];
        var hang = new List<Game> { evaluator.Store.Zero };
        for (int i = 0; i < edges.Length; i++)
        {
            int e = edges[i];
            c[i] = colours[e];
            f[i] = Local(from[e]);
            t[i] = Local(to[e]);
        }
        return new BlockSearch(evaluator, local.Count, c, f, t, hang.ToArray());

        int Local(int v)
        {
            if (!local.TryGetValue(v, out int l))
            {
                l = local.Count;
                local.Add(v, l);
                hang.Add(hanging(v));
            }
            return l;
        }
    }

    /// <summary>The value of the whole block with what hangs from it.</summary>
    public Game Value()
    {
        UInt128 all = _colours.Length == MaxEdges ? UInt128.MaxValue : (UInt128.One << _colours.Length) - 1;
        return Eval(all, 0, _hang);
    }

    /// <summary>The value of the edges <paramref name="set"/> (all connected to <paramref name="root"/>), with <paramref name="hang"/>.</summary>
    private Game Eval(UInt128 set, int root, Game[] hang)
    {
        if (set == UInt128.Zero) return _store.Zero;
        var key = Key(set, root, hang);
        if (_memo.TryGetValue(key, out var known)) return known;

        int count = (int)UInt128.PopCount(set);
        var list = new int[count];
        int k = 0;
        for (var s = set; s != UInt128.Zero; s &= s - UInt128.One) list[k++] = (int)UInt128.TrailingZeroCount(s);
        var adj = Adjacency.Build(_vertices, _from, _to, list, count);
        var blocks = BlockDecomposition.Build(_vertices, _from, _to, adj, root);

        var local = new LocalValue[_vertices];
        for (int v = 0; v < _vertices; v++)
            if (v != root && (_incident[v] & set) != UInt128.Zero && hang[v] != _store.Zero) local[v] = LocalValue.OfGame(_store, hang[v]);
        _evaluator.Fold(blocks, _colours, _from, _to, local, b =>
        {
            UInt128 sub = UInt128.Zero;
            for (int i = blocks.Start[b]; i < blocks.Start[b + 1]; i++) sub |= UInt128.One << blocks.Edges[i];
            var subHang = new Game[_vertices];
            Array.Fill(subHang, _store.Zero);
            int subRoot = blocks.Root[b];
            for (int v = 0; v < _vertices; v++)
                if (v != subRoot && (_incident[v] & sub) != UInt128.Zero) subHang[v] = local[v].ToGame(_store);
            if (sub == set && subRoot == root) return LocalValue.OfGame(_store, Search(set, root, subHang));
            return LocalValue.OfGame(_store, Eval(sub, subRoot, subHang));
        });
        var result = local[root].ToGame(_store);
        _memo[key] = result;
        return result;
    }

    /// <summary>A biconnected set of edges: its options are generated and put into canonical form.</summary>
    private Game Search(UInt128 set, int root, Game[] hang)
    {
        _evaluator.Context.Tick();
        var left = new List<Game>();
        var right = new List<Game>();
        for (var s = set; s != UInt128.Zero; s &= s - UInt128.One)
        {
            int e = (int)UInt128.TrailingZeroCount(s);
            var colour = _colours[e];
            var rest = Reach(set & ~(UInt128.One << e), root);
            var option = Eval(rest, root, hang);
            if (colour.CutBy(Side.Left)) left.Add(option);
            if (colour.CutBy(Side.Right)) right.Add(option);
        }
        for (int v = 0; v < _vertices; v++)
        {
            if (v == root || (_incident[v] & set) == UInt128.Zero || hang[v] == _store.Zero) continue;
            foreach (var side in (ReadOnlySpan<Side>)[Side.Left, Side.Right])
            {
                foreach (var o in _store.Options(hang[v], side))
                {
                    var moved = (Game[])hang.Clone();
                    moved[v] = o;
                    (side == Side.Left ? left : right).Add(Eval(set, root, moved));
                }
            }
        }
        var sw = System.Diagnostics.Stopwatch.StartNew(); var r = _store.Make(left, right); Prof.Make += sw.ElapsedTicks; Prof.MakeN++; Prof.Opts += left.Count + right.Count; if (_store.IsNumber(r)) Prof.Num++; return r;
    }

    /// <summary>The edges of <paramref name="set"/> still connected to <paramref name="root"/>.</summary>
    private UInt128 Reach(UInt128 set, int root)
    {
        UInt128 reached = UInt128.Zero;
        Span<int> stack = _vertices <= 256 ? stackalloc int[_vertices] : new int[_vertices];
        Span<bool> seen = _vertices <= 256 ? stackalloc bool[_vertices] : new bool[_vertices];
        int top = 0;
        stack[top++] = root;
        seen[root] = true;
        while (top > 0)
        {
            int v = stack[--top];
            var fresh = _incident[v] & set & ~reached;
            reached |= fresh;
            for (; fresh != UInt128.Zero; fresh &= fresh - UInt128.One)
            {
                int e = (int)UInt128.TrailingZeroCount(fresh);
                int w = _from[e] == v ? _to[e] : _from[e];
                if (!seen[w]) { seen[w] = true; stack[top++] = w; }
            }
        }
        return reached;
    }

    private StateKey Key(UInt128 set, int root, Game[] hang)
    {
        // Only what hangs at vertices still in play (other than the root) belongs to the state.
        int[]? ids = null;
        for (int v = 0; v < _vertices; v++)
        {
            if (v == root || hang[v] == _store.Zero || (_incident[v] & set) == UInt128.Zero) continue;
            ids ??= new int[_vertices];
            ids[v] = hang[v].Id + 1;
        }
        return new StateKey(set, root, ids);
    }

    /// <summary>Memo key: the edge set, the root, and the hanging game ids (+1, 0 for nothing) per local vertex; null when nothing hangs.</summary>
    private readonly struct StateKey : IEquatable<StateKey>
    {
        private readonly UInt128 _set;
        private readonly int _root;
        private readonly int[]? _hang;
        private readonly int _hash;

        public StateKey(UInt128 set, int root, int[]? hang)
        {
            _set = set;
            _root = root;
            _hang = hang;
            var h = new HashCode();
            h.Add(set);
            h.Add(root);
            if (hang is not null) foreach (int id in hang) h.Add(id);
            _hash = h.ToHashCode();
        }

        public bool Equals(StateKey other) =>
            _hash == other._hash && _set == other._set && _root == other._root &&
            (_hang is null ? other._hang is null : other._hang is not null && _hang.AsSpan().SequenceEqual(other._hang));

        public override bool Equals(object? obj) => obj is StateKey k && Equals(k);
        public override int GetHashCode() => _hash;
    }
}
