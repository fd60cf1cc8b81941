using Bramble.Values;

namespace Bramble.Rules.Hackenbush;

/// <summary>
/// The exact value of one piece, by the fastest method that applies to each part of it. The
/// piece is cut into blocks (biconnected components) hanging from one another at single
/// vertices, and folded from the top down to the ground: what hangs from a vertex is a
/// disjunctive sum, valued once and then carried as a value (colon principle in its general
/// form: a part hanging at one vertex may be replaced by anything of equal value).
/// <list type="bullet">
/// <item>all green: <see cref="Fusion"/>, ints only;</item>
/// <item>a single edge carrying a value H (a bridge): the ordinal sum base:H with base 1, −1 or
/// * by colour — colon principle for green (*n → *(n+1)), sign expansion for blue-red chains,
/// the store's ordinal sum for anything mixed;</item>
/// <item>a loop: a twig (cutting it removes only itself);</item>
/// <item>a green block carrying only nimbers: fusion, (edges mod 2) nim-added to what it carries;</item>
/// <item>any other block (a circuit with blue or red edges, or carrying non-nimbers):
/// <see cref="BlockSearch"/>.</item>
/// </list>
/// </summary>
internal sealed class PieceEvaluator
{
    private readonly ValueContext _context;
    private readonly GameStore _store;
    private readonly Game _one;
    private readonly Game _minusOne;

    public PieceEvaluator(ValueContext context)
    {
        _context = context;
        _store = context.Store;
        _one = _store.Integer(1);
        _minusOne = _store.Integer(-1);
    }

    public GameStore Store => _store;
    public ValueContext Context => _context;

    public Game Evaluate(HackenbushPosition piece)
    {
        if (piece.IsEmpty) return _store.Zero;
        if (piece.IsGreen) return _store.Nimber(piece.NimValue);
        int n = piece.NodeCount;
        var blocks = BlockDecomposition.Build(n, piece.From, piece.To, piece.Adjacency, 0);
        var hang = new LocalValue[n];
        Fold(blocks, piece.Colours, piece.From, piece.To, hang, b => SearchBlock(blocks, b, piece.Colours, piece.From, piece.To, hang));
        return hang[0].ToGame(_store);
    }

    /// <summary>
    /// Folds the blocks bottom-up, adding each block's value into what hangs at its root.
    /// <paramref name="hard"/> values a block that needs search, reading what hangs at its
    /// vertices from <paramref name="hang"/>.
    /// </summary>
    internal void Fold(BlockDecomposition blocks, EdgeColour[] colours, int[] from, int[] to, LocalValue[] hang, Func<int, LocalValue> hard)
    {
        int[]? stamp = null;
        for (int b = 0; b < blocks.Count; b++)
        {
            int root = blocks.Root[b];
            int start = blocks.Start[b], end = blocks.Start[b + 1];
            LocalValue value;
            if (end - start == 1)
            {
                int e = blocks.Edges[start];
                var carried = from[e] == to[e] ? LocalValue.Zero : hang[Adjacency.Other(from, to, e, root)];
                value = OnEdge(colours[e], carried);
            }
            else
            {
                stamp ??= new int[hang.Length];
                bool fusible = true;
                int nim = (end - start) & 1;
                for (int i = start; i < end && fusible; i++)
                {
                    int e = blocks.Edges[i];
                    if (colours[e] != EdgeColour.Green) { fusible = false; break; }
                    foreach (int v in (ReadOnlySpan<int>)[from[e], to[e]])
                    {
                        if (v == root || stamp[v] == b + 1) continue;
                        stamp[v] = b + 1;
                        if (!hang[v].IsNimber) { fusible = false; break; }
                        nim ^= hang[v].Nim;
                    }
                }
                value = fusible ? LocalValue.OfNimber(nim) : hard(b);
            }
            hang[root] = LocalValue.Add(_store, hang[root], value);
        }
    }

    /// <summary>An edge of the given colour carrying <paramref name="carried"/>: the ordinal sum base:carried.</summary>
    internal LocalValue OnEdge(EdgeColour colour, LocalValue carried)
    {
        if (colour == EdgeColour.Green)
        {
            if (carried.IsNimber) return LocalValue.OfNimber(carried.Nim + 1);
            return LocalValue.OfGame(_store, _store.OrdinalSum(_store.Star, carried.ToGame(_store)));
        }
        if (carried.Kind == LocalValue.Form.Chain)
        {
            carried.Pending!.Extend(colour);
            return carried;
        }
        if (carried.IsNumberLike)
        {
            var chain = new LocalValue.Chain(carried.AsNumber());
            chain.Extend(colour);
            return LocalValue.OfChain(chain);
        }
        return LocalValue.OfGame(_store, _store.OrdinalSum(colour == EdgeColour.Blue ? _one : _minusOne, carried.ToGame(_store)));
    }

    private LocalValue SearchBlock(BlockDecomposition blocks, int b, EdgeColour[] colours, int[] from, int[] to, LocalValue[] hang)
    {
        int start = blocks.Start[b], end = blocks.Start[b + 1];
        var edges = blocks.Edges.AsSpan(start, end - start).ToArray();
        var search = BlockSearch.Create(this, edges, colours, from, to, blocks.Root[b], v => hang[v].ToGame(_store));
        return LocalValue.OfGame(_store, search.Value());
    }
}
