using Bramble.Rules;
using Bramble.Values;

namespace Bramble.Search;

/// <summary>
/// Win/loss search for sums with components too large for an exact value (an empty 6×6 Domineering
/// board is one). The state is (the large components, the normalised sum of all the small ones);
/// a move is a real move in a large component — after which that component is split into its
/// pieces, and each piece small enough for an exact value joins the small part — or a canonical
/// option of a small component. When no large component is left, the outcome is read off the
/// small part by <see cref="SumSearch"/>. A transposition table on the state (large components by
/// normal key, so mirror images meet) keeps the outcomes.
/// <para>
/// Which pieces are small: a piece of at most <see cref="SmallSize"/> (by <see cref="IPosition.Size"/>)
/// gets an exact value within <see cref="PieceCap"/> nodes; a bigger piece only when its value costs
/// no search (memoised, or a closed form such as a green Hackenbush tree). Trying every big piece
/// within a node cap would cost the cap at every new state, which is where the time went before.
/// </para>
/// <para>
/// Move order: the hottest small component first; then the real moves in the large components,
/// by a history of which moves refuted earlier positions, then by the mobility they leave (own
/// moves in the component minus the opponent's); then the other small options. Ordering needs
/// only the position after each move and its move counts; the child state (splitting into
/// pieces, valuing the small ones, the table key) is built only for the children actually
/// searched. Building every child up front, to look each one up in the table before searching
/// any, took three times as long on 6×6 and counted twice the nodes, most of them spent valuing
/// pieces of children that were never searched.
/// </para>
/// <para>
/// Moves in the number part are searched too, but only while the small part has no non-number:
/// then the large components might all be numbers in disguise, and number avoidance no longer
/// promises a winning move among theirs (docs/players.md).
/// </para>
/// </summary>
public sealed class LargeSearch(SumSearch sums, LocalValues values)
{
    /// <summary>Most entries the transposition table may hold before it is cleared.</summary>
    public const int TableLimit = 4_000_000;

    private readonly Dictionary<StateKey, bool> _table = new();
    private readonly Dictionary<(Move Move, Side Side), int> _history = new();

    /// <summary>The node cap for valuing a piece created by a move inside the search.</summary>
    public long PieceCap { get; set; } = 20_000;

    /// <summary>Pieces of at most this size are valued within <see cref="PieceCap"/>; bigger ones only when free.</summary>
    public int SmallSize { get; set; } = 14;

    public SearchBudget Budget { get; set; } = SearchBudget.Unlimited();

    public GameStore Store => sums.Store;

    /// <summary>Entries in the transposition table, for reports.</summary>
    public int TableSize => _table.Count;

    // ------------------------------------------------------------------ building states

    /// <summary>Values the components (each within <paramref name="cap"/> nodes) and splits them.</summary>
    public IReadOnlyList<ValuedComponent> Value(IEnumerable<IPosition> components, long cap) =>
        components.Select(c => new ValuedComponent(c, values.TryValue(c, cap, Budget))).ToList();

    /// <summary>A piece's exact value when it counts as small (see the class remarks), else null.</summary>
    public Game? ValuePiece(IPosition piece) => values.TryValue(piece, piece.Size <= SmallSize ? PieceCap : 0, Budget);

    /// <summary>Values pieces made by a move, as <see cref="ValuePiece"/> does.</summary>
    public IReadOnlyList<ValuedComponent> ValuePieces(IEnumerable<IPosition> pieces) =>
        pieces.Select(c => new ValuedComponent(c, ValuePiece(c))).ToList();

    public SplitSum Split(IReadOnlyList<ValuedComponent> components)
    {
        var large = components.Where(c => c.Value is null).Select(c => c.Position).ToList();
        var (key, offset) = sums.Normalise(components.Where(c => c.Value is not null).Select(c => c.Value!.Value));
        return new SplitSum(large, key, offset);
    }

    /// <summary>The state after a real move in large component <paramref name="index"/>.</summary>
    public SplitSum AfterLargeMove(SplitSum state, int index, Side side, Move move) =>
        AfterLargeMove(state, index, state.Large[index].Play(side, move));

    private SplitSum AfterLargeMove(SplitSum state, int index, IPosition after)
    {
        var pieces = after.Components();
        var large = new List<IPosition>(state.Large.Count + pieces.Count);
        for (int i = 0; i < state.Large.Count; i++) if (i != index) large.Add(state.Large[i]);
        List<Game>? small = null;
        foreach (var piece in pieces)
        {
            if (ValuePiece(piece) is { } v) (small ??= []).Add(v);
            else large.Add(piece);
        }
        if (small is null) return new SplitSum(large, state.Small, state.Offset);
        var (key, offset) = sums.Extend(state.Small, state.Offset, small);
        return new SplitSum(large, key, offset);
    }

    // ------------------------------------------------------------------ search

    /// <summary>Whether <paramref name="toMove"/>, moving first, wins the state.</summary>
    public bool Wins(SplitSum state, Side toMove)
    {
        if (state.AllSmall) return sums.Wins(state.Small, state.Offset, toMove);
        Budget.Tick();
        var key = KeyOf(state, toMove);
        if (_table.TryGetValue(key, out bool known)) return known;
        bool result = Search(state, toMove);
        if (_table.Count >= TableLimit) _table.Clear();
        _table[key] = result;
        return result;
    }

    private static StateKey KeyOf(SplitSum state, Side toMove) => new(LargeKey(state.Large), state.Small, state.Offset, toMove);

    private bool Search(SplitSum state, Side toMove)
    {
        var other = toMove.Other();
        var store = sums.Store;

        var smallMoves = SmallMoves(state.Small, toMove);
        var largeMoves = LargeChildren(state, toMove);

        // The hottest small component is tried first: a hot canonical option is cheap to look at and often decisive.
        int tried = 0;
        if (smallMoves.Count > 0 && smallMoves[0].Heat > Dyadic.Zero)
        {
            if (!Wins(AfterSmallMove(state, smallMoves[0]), other)) return true;
            tried = 1;
        }

        foreach (var c in largeMoves)
            if (!Wins(AfterLargeMove(state, c.Index, c.After), other)) return Refuted(c.Move, toMove);

        for (int i = tried; i < smallMoves.Count; i++)
            if (!Wins(AfterSmallMove(state, smallMoves[i]), other)) return true;

        if (state.Small.IsEmpty)
        {
            var number = store.Number(state.Offset);
            foreach (var option in store.Options(number, toMove))
            {
                store.TryGetNumber(option, out var x);
                if (!Wins(state with { Offset = x }, other)) return true;
            }
        }
        return false;
    }

    /// <summary>Records a move that won (for the history order) and reports the win.</summary>
    private bool Refuted(Move move, Side side)
    {
        _history.TryGetValue((move, side), out int n);
        _history[(move, side)] = n + 1;
        return true;
    }

    private SplitSum AfterSmallMove(SplitSum state, SmallMove m)
    {
        var (child, y) = sums.Child(state.Small, m.Index, m.Option);
        return state with { Small = child, Offset = state.Offset + y };
    }

    private List<SmallMove> SmallMoves(SumKey small, Side toMove)
    {
        var store = sums.Store;
        var moves = new List<SmallMove>();
        for (int i = 0; i < small.Count; i++)
        {
            if (i > 0 && small.Ids[i] == small.Ids[i - 1]) continue;
            var heat = store.Temperature(small[i]);
            foreach (var option in store.Options(small[i], toMove)) moves.Add(new SmallMove(i, option, heat));
        }
        moves.Sort((p, q) => q.Heat.CompareTo(p.Heat));
        return moves;
    }

    /// <summary>
    /// The real moves of the large components (equal components once) with the component after
    /// each, in search order: most refutations in the history first, then the most mobility left
    /// to the mover in that component (own moves minus the opponent's), then fewest replies.
    /// </summary>
    private List<LargeChild> LargeChildren(SplitSum state, Side toMove)
    {
        var other = toMove.Other();
        var seen = new HashSet<string>(StringComparer.Ordinal);
        var children = new List<LargeChild>();
        for (int i = 0; i < state.Large.Count; i++)
        {
            var c = state.Large[i];
            if (state.Large.Count > 1 && !seen.Add(c.NormalKey)) continue;
            foreach (var m in c.Moves(toMove))
            {
                var after = c.Play(toMove, m);
                int replies = after.Moves(other).Count;
                int own = after.Moves(toMove).Count;
                _history.TryGetValue((m, toMove), out int h);
                children.Add(new LargeChild(m, i, after, h, own - replies, replies));
            }
        }
        children.Sort((p, q) =>
        {
            if (p.History != q.History) return q.History.CompareTo(p.History);
            if (p.Mobility != q.Mobility) return q.Mobility.CompareTo(p.Mobility);
            return p.Replies.CompareTo(q.Replies);
        });
        return children;
    }

    private static string LargeKey(IReadOnlyList<IPosition> large)
    {
        if (large.Count == 1) return large[0].NormalKey;
        var keys = large.Select(p => p.NormalKey).ToArray();
        Array.Sort(keys, StringComparer.Ordinal);
        return string.Join("\n", keys);
    }

    private readonly record struct SmallMove(int Index, Game Option, Dyadic Heat);

    private readonly record struct LargeChild(Move Move, int Index, IPosition After, int History, int Mobility, int Replies);

    private readonly record struct StateKey(string Large, SumKey Small, Dyadic Offset, Side ToMove);
}
