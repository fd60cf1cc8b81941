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
/// <para>
/// Everything works on bit sets: the edges at each vertex are a precomputed mask, a state's
/// blocks come from a depth-first search that walks those masks (no adjacency lists are built),
/// and what is still joined to the root after a cut is grown mask by mask. Before the options go
/// to the store, all number options but the best for each side are dropped (a smaller number is
/// dominated by a larger one for Left, and the other way round for Right), which leaves the store
/// less to compare.
/// </para>
/// </summary>
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
    private readonly Dictionary<StateKey, Game> _memo;

    // Scratch for the block decomposition; it never runs inside itself, so one set is enough.
    private readonly int[] _disc;
    private readonly int[] _low;
    private readonly int[] _edgeStack = new int[MaxEdges];
    private readonly int[] _stamp;
    private int _stampNow;

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
        _memo = new Dictionary<StateKey, Game>(new StateComparer(_incident));
        _disc = new int[vertices];
        _low = new int[vertices];
        _stamp = new int[vertices];
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

        var blocks = Decompose(set, root);
        var local = new LocalValue[_vertices];
        for (int v = 0; v < _vertices; v++)
            if (v != root && (_incident[v] & set) != UInt128.Zero && hang[v] != _store.Zero) local[v] = LocalValue.OfGame(_store, hang[v]);
        // Blocks come bottom-up: everything hanging at a block's vertices is folded before the block.
        foreach (var (sub, subRoot) in blocks)
        {
            LocalValue value;
            if (UInt128.IsPow2(sub))
            {
                int e = (int)UInt128.TrailingZeroCount(sub);
                var carried = _from[e] == _to[e] ? LocalValue.Zero : local[_from[e] == subRoot ? _to[e] : _from[e]];
                value = _evaluator.OnEdge(_colours[e], carried);
            }
            else if (GreenCarryingNimbers(sub, subRoot, local, out int nim)) value = LocalValue.OfNimber(nim);
            else
            {
                var subHang = new Game[_vertices];
                Array.Fill(subHang, _store.Zero);
                for (int v = 0; v < _vertices; v++)
                    if (v != subRoot && (_incident[v] & sub) != UInt128.Zero) subHang[v] = local[v].ToGame(_store);
                var g = sub == set && subRoot == root ? Search(set, root, subHang) : Eval(sub, subRoot, subHang);
                value = LocalValue.OfGame(_store, g);
            }
            local[subRoot] = LocalValue.Add(_store, local[subRoot], value);
        }
        var result = local[root].ToGame(_store);
        _memo[key] = result;
        return result;
    }

    /// <summary>
    /// Fusion inside the search: a green block whose vertices carry only nimbers is worth the
    /// parity of its edges nim-added to what they carry.
    /// </summary>
    private bool GreenCarryingNimbers(UInt128 sub, int subRoot, LocalValue[] local, out int nim)
    {
        nim = (int)(UInt128.PopCount(sub) & 1);
        _stampNow++;
        for (var s = sub; s != UInt128.Zero; s &= s - UInt128.One)
        {
            int e = (int)UInt128.TrailingZeroCount(s);
            if (_colours[e] != EdgeColour.Green) return false;
            foreach (int v in (ReadOnlySpan<int>)[_from[e], _to[e]])
            {
                if (v == subRoot || _stamp[v] == _stampNow) continue;
                _stamp[v] = _stampNow;
                if (!local[v].IsNimber) return false;
                nim ^= local[v].Nim;
            }
        }
        return true;
    }

    /// <summary>
    /// The blocks of <paramref name="set"/> with the vertex each hangs from, bottom-up (Tarjan's
    /// edge-stack method on the edge masks; loops are blocks of their own, parallel edges share one).
    /// The recursion is at most as deep as the block has vertices.
    /// </summary>
    private List<(UInt128 Edges, int Root)> Decompose(UInt128 set, int root)
    {
        var blocks = new List<(UInt128, int)>();
        Array.Fill(_disc, -1);
        int time = 0, top = 0;
        Visit(root, -1);
        return blocks;

        void Visit(int v, int enteredBy)
        {
            _disc[v] = _low[v] = time++;
            var mine = _incident[v] & set;
            for (var s = mine; s != UInt128.Zero; s &= s - UInt128.One)
            {
                int e = (int)UInt128.TrailingZeroCount(s);
                if (_from[e] == _to[e]) blocks.Add((UInt128.One << e, v));
            }
            for (var s = mine; s != UInt128.Zero; s &= s - UInt128.One)
            {
                int e = (int)UInt128.TrailingZeroCount(s);
                if (e == enteredBy || _from[e] == _to[e]) continue;
                int w = _from[e] == v ? _to[e] : _from[e];
                if (_disc[w] < 0)
                {
                    _edgeStack[top++] = e;
                    Visit(w, e);
                    if (_low[w] < _low[v]) _low[v] = _low[w];
                    if (_low[w] >= _disc[v])
                    {
                        UInt128 block = UInt128.Zero;
                        int popped;
                        do
                        {
                            popped = _edgeStack[--top];
                            block |= UInt128.One << popped;
                        } while (popped != e);
                        blocks.Add((block, v));
                    }
                }
                else if (_disc[w] < _disc[v])
                {
                    // A back edge to an ancestor (a parallel edge to the parent counts as one).
                    _edgeStack[top++] = e;
                    if (_disc[w] < _low[v]) _low[v] = _disc[w];
                }
            }
        }
    }

    /// <summary>A biconnected set of edges: its options are generated and put into canonical form.</summary>
    private Game Search(UInt128 set, int root, Game[] hang)
    {
        _evaluator.Context.Tick();
        var left = new Options(_store);
        var right = new Options(_store);
        for (var s = set; s != UInt128.Zero; s &= s - UInt128.One)
        {
            int e = (int)UInt128.TrailingZeroCount(s);
            var colour = _colours[e];
            var option = Eval(Reach(set & ~(UInt128.One << e), root), root, hang);
            if (colour.CutBy(Side.Left)) left.Add(option, Side.Left);
            if (colour.CutBy(Side.Right)) right.Add(option, Side.Right);
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
                    (side == Side.Left ? left : right).Add(Eval(set, root, moved), side);
                }
            }
        }
        return _store.Make(left.Finish(), right.Finish());
    }

    /// <summary>
    /// One side's options on their way to the store: games other than numbers are kept (without
    /// repeats), numbers only the best for that side, since any other number option is dominated by it.
    /// </summary>
    private sealed class Options(GameStore store)
    {
        private readonly List<Game> _games = new();
        private Dyadic? _bestNumber;

        public void Add(Game g, Side side)
        {
            if (store.TryGetNumber(g, out var x))
            {
                if (_bestNumber is not { } best || (side == Side.Left ? x > best : x < best)) _bestNumber = x;
            }
            else if (!_games.Contains(g)) _games.Add(g);
        }

        public List<Game> Finish()
        {
            if (_bestNumber is { } x) _games.Add(store.Number(x));
            return _games;
        }
    }

    /// <summary>The edges of <paramref name="set"/> still connected to <paramref name="root"/>: grow the reached edges vertex by vertex.</summary>
    private UInt128 Reach(UInt128 set, int root)
    {
        UInt128 reached = UInt128.Zero;
        Span<int> stack = _vertices <= 256 ? stackalloc int[_vertices] : new int[_vertices];
        _stampNow++;
        int top = 0;
        stack[top++] = root;
        _stamp[root] = _stampNow;
        while (top > 0)
        {
            int v = stack[--top];
            var fresh = _incident[v] & set & ~reached;
            reached |= fresh;
            for (; fresh != UInt128.Zero; fresh &= fresh - UInt128.One)
            {
                int e = (int)UInt128.TrailingZeroCount(fresh);
                int w = _from[e] == v ? _to[e] : _from[e];
                if (_stamp[w] != _stampNow) { _stamp[w] = _stampNow; stack[top++] = w; }
            }
        }
        return reached;
    }

    private StateKey Key(UInt128 set, int root, Game[] hang)
    {
        var h = new HashCode();
        h.Add(set);
        h.Add(root);
        for (int v = 0; v < _vertices; v++)
            if (v != root && (_incident[v] & set) != UInt128.Zero) h.Add(hang[v].Id);
        return new StateKey(set, root, hang, h.ToHashCode());
    }

    /// <summary>
    /// Memo key: the edge set, the root, and the hang array as it was passed (never changed
    /// afterwards, so it is kept by reference, not copied). Only what hangs at vertices still in
    /// play — touched by the set, other than the root — belongs to the state; the comparer
    /// below looks at those alone.
    /// </summary>
    private readonly record struct StateKey(UInt128 Set, int Root, Game[] Hang, int Hash);

    private sealed class StateComparer(UInt128[] incident) : IEqualityComparer<StateKey>
    {
        public bool Equals(StateKey a, StateKey b)
        {
            if (a.Hash != b.Hash || a.Set != b.Set || a.Root != b.Root) return false;
            if (ReferenceEquals(a.Hang, b.Hang)) return true;
            for (int v = 0; v < incident.Length; v++)
                if (v != a.Root && (incident[v] & a.Set) != UInt128.Zero && a.Hang[v] != b.Hang[v]) return false;
            return true;
        }

        public int GetHashCode(StateKey key) => key.Hash;
    }
}
