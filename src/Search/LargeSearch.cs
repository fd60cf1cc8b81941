using Bramble.Rules;
using Bramble.Values;

namespace Bramble.Search;

/// <summary>
/// Win/loss search for sums with components too large for an exact value (an empty 6×6 Domineering
/// board is one). The state is (the large components, the normalised sum of all the small ones);
/// a move is a real move in a large component — whose pieces are valued again, and join the small
/// part as soon as they are small enough — or a canonical option of a small component. When no
/// large component is left, the outcome is read off the small part by <see cref="SumSearch"/>.
/// A transposition table on the state (large components by normal key) keeps the outcomes.
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

    /// <summary>The node cap for valuing a piece created by a move inside the search.</summary>
    public long PieceCap { get; set; } = 20_000;

    public SearchBudget Budget { get; set; } = SearchBudget.Unlimited();

    public GameStore Store => sums.Store;

    // ------------------------------------------------------------------ building states

    /// <summary>Values the components (each within <paramref name="cap"/> nodes) and splits them.</summary>
    public IReadOnlyList<ValuedComponent> Value(IEnumerable<IPosition> components, long cap) =>
        components.Select(c => new ValuedComponent(c, values.TryValue(c, cap, Budget))).ToList();

    public SplitSum Split(IReadOnlyList<ValuedComponent> components)
    {
        var large = components.Where(c => c.Value is null).Select(c => c.Position).ToList();
        var (key, offset) = sums.Normalise(components.Where(c => c.Value is not null).Select(c => c.Value!.Value));
        return new SplitSum(large, key, offset);
    }

    /// <summary>The state after a real move in large component <paramref name="index"/>.</summary>
    public SplitSum AfterLargeMove(SplitSum state, int index, Side side, Move move)
    {
        var pieces = state.Large[index].Play(side, move).Components();
        var large = new List<IPosition>(state.Large.Count + pieces.Count);
        for (int i = 0; i < state.Large.Count; i++) if (i != index) large.Add(state.Large[i]);
        var small = new List<Game>();
        foreach (var piece in pieces)
        {
            if (values.TryValue(piece, PieceCap, Budget) is { } v) small.Add(v);
            else large.Add(piece);
        }
        var (key, offset) = sums.Extend(state.Small, state.Offset, small);
        return new SplitSum(large, key, offset);
    }

    // ------------------------------------------------------------------ search

    /// <summary>Whether <paramref name="toMove"/>, moving first, wins the state.</summary>
    public bool Wins(SplitSum state, Side toMove)
    {
        if (state.AllSmall) return sums.Wins(state.Small, state.Offset, toMove);
        Budget.Tick();
        var key = new StateKey(LargeKey(state.Large), state.Small, state.Offset, toMove);
        if (_table.TryGetValue(key, out bool known)) return known;
        bool result = Search(state, toMove);
        if (_table.Count >= TableLimit) _table.Clear();
        _table[key] = result;
        return result;
    }

    private bool Search(SplitSum state, Side toMove)
    {
        var other = toMove.Other();
        var store = sums.Store;

        // The hottest small component is tried first: a hot canonical option is cheap to look at and often decisive.
        var smallMoves = SmallMoves(state.Small, toMove);
        int tried = 0;
        if (smallMoves.Count > 0 && smallMoves[0].Heat > Dyadic.Zero)
        {
            if (!Wins(AfterSmallMove(state, smallMoves[0]), other)) return true;
            tried = 1;
        }

        foreach (var (index, move) in LargeMoves(state, toMove))
            if (!Wins(AfterLargeMove(state, index, toMove, move), other)) return true;

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
    /// Real moves of the large components (equal components once), those that leave the opponent
    /// fewest replies in that component first: a cheap, ruleset-blind guess at the strongest moves.
    /// </summary>
    private static List<(int Index, Move Move)> LargeMoves(SplitSum state, Side toMove)
    {
        var seen = new HashSet<string>(StringComparer.Ordinal);
        var moves = new List<(int Index, Move Move, int Replies, int Own)>();
        for (int i = 0; i < state.Large.Count; i++)
        {
            var c = state.Large[i];
            if (!seen.Add(c.NormalKey)) continue;
            foreach (var m in c.Moves(toMove))
            {
                var after = c.Play(toMove, m);
                moves.Add((i, m, after.Moves(toMove.Other()).Count, after.Moves(toMove).Count));
            }
        }
        moves.Sort((p, q) => p.Replies != q.Replies ? p.Replies.CompareTo(q.Replies) : q.Own.CompareTo(p.Own));
        return moves.ConvertAll(m => (m.Index, m.Move));
    }

    private static string LargeKey(IReadOnlyList<IPosition> large)
    {
        if (large.Count == 1) return large[0].NormalKey;
        var keys = large.Select(p => p.NormalKey).ToArray();
        Array.Sort(keys, StringComparer.Ordinal);
        return string.Join("\n", keys);
    }

    private readonly record struct SmallMove(int Index, Game Option, Dyadic Heat);

    private readonly record struct StateKey(string Large, SumKey Small, Dyadic Offset, Side ToMove);
}
