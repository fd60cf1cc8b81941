using System.Diagnostics;
using Bramble.Values;

namespace Bramble.Search;

/// <summary>
/// The global decision on a sum of canonical component values: who wins G1 + … + Gn + x with a
/// given side to move, where x is a number and the Gi are canonical non-numbers.
/// <para>
/// Play is searched only in the non-number components, through their canonical options (dominated
/// options are already gone and reversible ones bypassed): by number avoidance a winning move, if
/// there is one, can be found there; when the non-number part happens to add up to a number, a
/// component's best move still keeps Right's stop at that number (R(G^L + H) ≥ L(G) + R(H)), so
/// the restriction never loses a win (docs/players.md gives the argument). Numbers reached are
/// added into x. The result of such play is a <see cref="StopScore"/> — the number reached and who
/// is to move then — and it does not depend on x, so the memo is keyed on the multiset of
/// component ids alone and one entry serves every x.
/// </para>
/// <para>
/// The search is alpha-beta on scores with a transposition table of bounds. Before any move is
/// tried, a node's score is bracketed by the published stop and thermograph inequalities:
/// Σ mean ≤ L(ΣG) ≤ min(Σ L(G), Σ mean + max temperature), L(ΣG) ≥ L(Gi) + Σ_{j≠i} R(Gj), and the
/// mirror images for Right. A win/loss question is a null window at −x, so most nodes of a hot sum
/// are settled by the bracket alone. Components are folded together whenever the exact sum stays
/// small: numbers into x, x + n·↑ + *m parts into one, G with −G into 0, and pairs of early-born games.
/// </para>
/// Not thread-safe (it owns memo tables over one <see cref="GameStore"/>).
/// </summary>
public sealed class SumSearch(GameStore store)
{
    /// <summary>Two components whose birthdays add up to at most this are replaced by their (small) exact sum.</summary>
    public const int FoldBirthday = 4;

    private readonly Dictionary<SumKey, Entry>[] _tables = [new(), new()];
    private readonly Dictionary<int, Stats> _stats = new();
    private readonly Dictionary<int, bool> _upStar = new();

    public GameStore Store => store;

    /// <summary>The budget searches tick; set per decision by the owner.</summary>
    public SearchBudget Budget { get; set; } = SearchBudget.Unlimited();

    /// <summary>Memo entries held (both sides), for reports.</summary>
    public int MemoSize => _tables[0].Count + _tables[1].Count;

    // ------------------------------------------------------------------ building sums

    /// <summary>The normal form of a sum of canonical values: its non-number part (folded) and its number part.</summary>
    public (SumKey Key, Dyadic Offset) Normalise(IEnumerable<Game> values)
    {
        var ids = new List<int>();
        var offset = Dyadic.Zero;
        foreach (var g in values) Insert(ids, g, ref offset);
        return (SumKey.Of(ids.Select(i => new Game(i))), offset);
    }

    /// <summary>Adds more values to a normalised sum.</summary>
    public (SumKey Key, Dyadic Offset) Extend(SumKey key, Dyadic offset, IEnumerable<Game> values)
    {
        var ids = key.Ids.ToArray().ToList();
        foreach (var g in values) Insert(ids, g, ref offset);
        return (SumKey.Of(ids.Select(i => new Game(i))), offset);
    }

    /// <summary>The sum after component <paramref name="index"/> of <paramref name="key"/> is replaced by <paramref name="option"/>.</summary>
    public (SumKey Key, Dyadic Offset) Child(SumKey key, int index, Game option)
    {
        var ids = new List<int>(key.Count);
        for (int i = 0; i < key.Count; i++) if (i != index) ids.Add(key.Ids[i]);
        var offset = Dyadic.Zero;
        Insert(ids, option, ref offset);
        return (SumKey.Of(ids.Select(i => new Game(i))), offset);
    }

    private void Insert(List<int> ids, Game g, ref Dyadic offset)
    {
        while (true)
        {
            if (store.TryGetNumber(g, out var x))
            {
                offset += x;
                return;
            }
            int partner = -1;
            for (int j = 0; j < ids.Count && partner < 0; j++) if (Foldable(g, new Game(ids[j]))) partner = j;
            if (partner < 0)
            {
                ids.Add(g.Id);
                return;
            }
            g = store.Add(g, new Game(ids[partner]));
            ids.RemoveAt(partner);
        }
    }

    private bool Foldable(Game a, Game b)
    {
        if (store.Negate(a) == b) return true;
        if (IsUpStar(a) && IsUpStar(b)) return true;
        return store.Birthday(a) + store.Birthday(b) <= FoldBirthday;
    }

    private bool IsUpStar(Game g)
    {
        if (_upStar.TryGetValue(g.Id, out bool known)) return known;
        bool result = store.TryGetUpStar(g, out _, out _, out _);
        _upStar[g.Id] = result;
        return result;
    }

    // ------------------------------------------------------------------ win/loss

    /// <summary>Whether <paramref name="toMove"/>, moving first, wins the sum key + offset.</summary>
    public bool Wins(SumKey key, Dyadic offset, Side toMove)
    {
        var low = StopScore.Lowest(-offset);
        var high = StopScore.Highest(-offset);
        var s = Score(key, toMove, low, high);
        return toMove == Side.Left ? s >= high : s <= low;
    }

    /// <summary>
    /// The score of the sum with <paramref name="toMove"/> to move, fail-soft within (alpha, beta):
    /// exact when strictly inside, otherwise a bound on the side of the window it fell.
    /// </summary>
    public StopScore Score(SumKey key, Side toMove, StopScore alpha, StopScore beta)
    {
        if (key.IsEmpty) return StopScore.Of(Dyadic.Zero, toMove);
        Budget.Tick();
        var table = _tables[(int)toMove];
        if (!table.TryGetValue(key, out var entry)) entry = Bracket(key, toMove);
        if (entry.Low >= beta) return entry.Low;
        if (entry.High <= alpha) return entry.High;
        if (entry.Low == entry.High) return entry.Low;
        var a = StopScore.Max(alpha, entry.Low);
        var b = StopScore.Min(beta, entry.High);
        var a0 = a;
        var b0 = b;
        bool left = toMove == Side.Left;
        var best = left ? StopScore.MinusInfinity : StopScore.PlusInfinity;
        var bestMove = entry.Best;
        foreach (var (index, option) in OrderedMoves(key, toMove, entry.Best))
        {
            var (child, y) = Child(key, index, store.Options(key[index], toMove)[option]);
            var s = Score(child, toMove.Other(), a - y, b - y) + y;
            if (left ? s > best : s < best)
            {
                best = s;
                bestMove = new MoveRef(key[index].Id, option);
            }
            if (left) { if (best > a) a = best; }
            else if (best < b) b = best;
            if (a >= b) break;
        }
        // A canonical non-number has options on both sides, so some move was tried.
        Debug.Assert(best.IsFinite);
        if (best <= a0) entry.High = StopScore.Min(entry.High, best);
        else if (best >= b0) entry.Low = StopScore.Max(entry.Low, best);
        else entry.Low = entry.High = best;
        entry.Best = bestMove;
        table[key] = entry;
        return best;
    }

    /// <summary>The moves of a node: the remembered best move first, then hottest component first and,
    /// within a component, the option whose stop is best for the mover; equal components once.</summary>
    private List<(int Index, int Option)> OrderedMoves(SumKey key, Side toMove, MoveRef hint)
    {
        var moves = new List<(int Index, int Option, bool Hinted, Dyadic Heat, Dyadic Stop)>();
        for (int i = 0; i < key.Count; i++)
        {
            if (i > 0 && key.Ids[i] == key.Ids[i - 1]) continue;
            var heat = StatsOf(key[i]).Temperature;
            var options = store.Options(key[i], toMove);
            for (int j = 0; j < options.Count; j++)
            {
                var stop = toMove == Side.Left ? store.RightStop(options[j]) : -store.LeftStop(options[j]);
                moves.Add((i, j, key.Ids[i] == hint.GameId && j == hint.Option, heat, stop));
            }
        }
        moves.Sort((p, q) =>
        {
            if (p.Hinted != q.Hinted) return p.Hinted ? -1 : 1;
            int c = q.Heat.CompareTo(p.Heat);
            return c != 0 ? c : q.Stop.CompareTo(p.Stop);
        });
        return moves.ConvertAll(m => (m.Index, m.Option));
    }

    // ------------------------------------------------------------------ bounds from theory

    private Entry Bracket(SumKey key, Side toMove)
    {
        Dyadic sumL = Dyadic.Zero, sumR = Dyadic.Zero, sumMean = Dyadic.Zero, hottest = Dyadic.Zero;
        Dyadic? bestLeftGain = null, bestRightGain = null;
        foreach (var g in key.Games)
        {
            var s = StatsOf(g);
            sumL += s.LeftStop;
            sumR += s.RightStop;
            sumMean += s.Mean;
            if (s.Temperature > hottest) hottest = s.Temperature;
            var gain = s.LeftStop - s.RightStop;
            if (bestLeftGain is null || gain > bestLeftGain.Value) bestLeftGain = gain;
            if (bestRightGain is null || -gain < bestRightGain.Value) bestRightGain = -gain;
        }
        Dyadic low, high;
        if (toMove == Side.Left)
        {
            low = Dyadic.Max(sumMean, sumR + bestLeftGain!.Value);
            high = Dyadic.Min(sumL, sumMean + hottest);
        }
        else
        {
            low = Dyadic.Max(sumR, sumMean - hottest);
            high = Dyadic.Min(sumMean, sumL + bestRightGain!.Value);
        }
        Debug.Assert(low <= high, "stop bounds crossed");
        return new Entry { Low = StopScore.Lowest(low), High = StopScore.Highest(high), Best = MoveRef.None };
    }

    private Stats StatsOf(Game g)
    {
        if (_stats.TryGetValue(g.Id, out var s)) return s;
        var thermograph = store.Thermograph(g);
        s = new Stats(store.LeftStop(g), store.RightStop(g), thermograph.Mast, Dyadic.Max(Dyadic.Zero, thermograph.Temperature));
        _stats[g.Id] = s;
        return s;
    }

    private readonly record struct Stats(Dyadic LeftStop, Dyadic RightStop, Dyadic Mean, Dyadic Temperature);

    /// <summary>A move in the sum: a component (by game id, so it survives re-sorting) and its option index.</summary>
    private readonly record struct MoveRef(int GameId, int Option)
    {
        public static readonly MoveRef None = new(-1, -1);
    }

    /// <summary>Memo entry: the score lies in [Low, High]; Best is the move that decided it last time.</summary>
    private struct Entry
    {
        public StopScore Low;
        public StopScore High;
        public MoveRef Best;
    }
}
