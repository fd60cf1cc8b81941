using System.Diagnostics;
using Bramble.Rules;
using Bramble.Rules.Domineering;
using Bramble.Search.Board;
using Bramble.Values;

namespace Bramble.Search;

/// <summary>
/// Decomposition search. The components' exact values come first (memoised, each within a node
/// cap); the decision is then taken on the sum of canonical values by <see cref="SumSearch"/>, or,
/// when some component is too large for an exact value, by <see cref="LargeSearch"/>, which plays
/// real moves in the large components and canonical options in the rest. Among the real moves the
/// player picks one after which the opponent, moving first, loses.
/// <para>
/// In a lost position it plays the best swindle it finds by exact analysis of every reply
/// (<see cref="SwindleScore"/>: fewest and least obvious winning replies, smallest margin, longest game).
/// Past its budget it answers with Thermostrat's move, chosen within a share of the time kept back
/// for it (estimated thermographs for components without an exact value), and reports
/// <c>Exact = false</c> and, when it read an estimate, <c>Estimated = true</c> (docs/players.md).
/// </para>
/// </summary>
public sealed class PerfectPlayer : IPlayer
{
    private readonly LocalValues _values;
    private readonly SumSearch _sums;
    private readonly LargeSearch _large;
    private readonly TemperatureStrategy _fallback;
    private readonly WholeBoard _board;
    private readonly HeuristicSearch _heuristic = new();

    public PerfectPlayer(PerfectSettings? settings = null, ValueContext? context = null)
    {
        Settings = settings ?? new PerfectSettings();
        Context = context ?? new ValueContext();
        _values = new LocalValues(Context);
        _sums = new SumSearch(Context.Store);
        _large = new LargeSearch(_sums, _values) { PieceCap = Settings.PieceCap, SmallSize = Settings.SmallSize };
        _fallback = new TemperatureStrategy(new ThermalReader(_values) { ExactSize = Settings.SmallSize });
        _board = new WholeBoard(Settings.BoardOptions);
    }

    /// <summary>The whole-board search this player uses for big Domineering boards (its table lives as long as the player).</summary>
    public WholeBoard WholeBoard => _board;

    public string Name => "perfect";

    /// <summary>Local-value attempts that ended at their cap so far (components left large).</summary>
    public long LargeAttempts => _values.Failures;
    public PerfectSettings Settings { get; }

    /// <summary>The player's own value context (a database file may be loaded into it before play).</summary>
    public ValueContext Context { get; }

    public Decision Choose(IPosition position, Side side, TimeSpan budget, CancellationToken halt = default)
    {
        var clock = Stopwatch.StartNew();
        long totalMs = SearchBudget.Milliseconds(budget);
        // Part of the time is kept back so that the fallback, when it is needed, still ends inside the budget.
        long reserveMs = totalMs == long.MaxValue || Settings.ProofOnly ? 0 : (long)Math.Min(Settings.FallbackMaxMs, totalMs * Settings.FallbackShare);
        var b = new SearchBudget(totalMs == long.MaxValue ? budget : TimeSpan.FromMilliseconds(totalMs - reserveMs), halt, Settings.NodeCap);
        _sums.Budget = b;
        _large.Budget = b;
        if (position.Moves(side).Count == 0)
            return new Decision(null, 0, b.ElapsedMs, Exact: true, Value: TryValueText(position, b), Winning: false);

        // A big component of a ruleset with a static estimate (an Amazons opening or midgame): the
        // heuristic whole-board search. Exact values take over once every region is small.
        if (position is IEstimable && position.Components().Any(c => c.Size > Settings.HeuristicSize))
        {
            var choice = _heuristic.Choose(position, side, b);
            return new Decision(choice.Move, choice.Nodes, clock.ElapsedMilliseconds, Exact: false,
                Line: [position.FormatMove(choice.Move)]);
        }

        // The whole-board search counts its own nodes, so a decision with a node cap keeps to the decomposition search.
        if (Settings.WholeBoard && Settings.NodeCap == long.MaxValue && position is DomineeringPosition board && WholeBoard.Fits(board.Board)
            && position.Components().Any(c => c.Size > Settings.ExactSize))
        {
            // Half the time for the exact search, the rest for the depth-limited one if that fails
            // (all of it when only a proof is wanted).
            long exactMs = totalMs == long.MaxValue ? long.MaxValue : Settings.ProofOnly ? totalMs : totalMs / 2;
            var answer = _board.Solve(board, side, () => b.Spent || clock.ElapsedMilliseconds >= exactMs);
            if (answer.Win is { } win)
                return new Decision(answer.Move, answer.Nodes, b.ElapsedMs, Exact: true, Winning: win,
                    Line: answer.Line.Select(position.FormatMove).ToList());
            if (Settings.ProofOnly) return Unproved(position, side, answer.Nodes, clock);
            // Out of budget: the depth-limited search on the same counts, in the time kept back.
            long deadline = totalMs == long.MaxValue ? long.MaxValue : totalMs;
            var play = _board.Play(board, side, () => halt.IsCancellationRequested || clock.ElapsedMilliseconds >= deadline);
            return new Decision(play.Move, answer.Nodes + play.Nodes, clock.ElapsedMilliseconds, Exact: false,
                Line: [position.FormatMove(play.Move)]);
        }

        IReadOnlyList<ValuedComponent> components;
        List<Candidate> candidates;
        try
        {
            components = ValueRoot(position, b);
            candidates = Candidates(components, side);
            foreach (var c in candidates)
            {
                var child = _large.Split(c.After(_large, side));
                if (!_large.Wins(child, side.Other()))
                    return Exact(position, c.Move, b, components, winning: true);
            }
        }
        catch (BudgetExceededException)
        {
            if (Settings.ProofOnly) return Unproved(position, side, b.Nodes, clock);
            long leftMs = totalMs == long.MaxValue ? long.MaxValue : Math.Max(0, totalMs - clock.ElapsedMilliseconds);
            return Fallback(position, side, b, leftMs, halt, clock);
        }
        return Lost(position, side, b, components, candidates);
    }

    /// <summary>
    /// The components of the position with their exact values where they can be had: components
    /// up to <see cref="PerfectSettings.ExactSize"/> within the component cap and half the time
    /// left (the search of large components needs the rest), bigger ones within the probe cap.
    /// </summary>
    private IReadOnlyList<ValuedComponent> ValueRoot(IPosition position, SearchBudget b)
    {
        var result = new List<ValuedComponent>();
        foreach (var c in position.Components())
        {
            long cap = c.Size <= Settings.ExactSize ? Settings.ComponentCap : Math.Min(Settings.ProbeCap, Settings.ComponentCap);
            long maxMs = b.RemainingMs == long.MaxValue ? long.MaxValue : b.RemainingMs / 2;
            result.Add(new ValuedComponent(c, _values.TryValue(c, cap, b, maxMs)));
        }
        return result;
    }

    /// <summary>
    /// In a lost position: the best swindle (<see cref="SwindleScore"/>): the move after which the
    /// opponent's winning replies are fewest among many and least obvious, then the smallest
    /// margin, then the longest game, then Thermostrat's order. When the count itself runs out of
    /// budget, Thermostrat's move; the loss is exact either way.
    /// </summary>
    private Decision Lost(IPosition position, Side side, SearchBudget b, IReadOnlyList<ValuedComponent> components, List<Candidate> candidates)
    {
        IReadOnlyList<Move> ranking;
        try
        {
            ranking = _fallback.Rank(position, side, b);
        }
        catch (BudgetExceededException)
        {
            ranking = [];
        }
        Move? best = null;
        SwindleScore bestScore = default;
        try
        {
            foreach (var c in candidates)
            {
                var score = Swindle(position, c, side, IndexOf(ranking, c.Move), b);
                if (best is null || score.IsBetterThan(bestScore))
                {
                    bestScore = score;
                    best = c.Move;
                }
            }
        }
        catch (BudgetExceededException)
        {
            best = ranking.Count > 0 ? ranking[0] : candidates[0].Move;
        }
        return Exact(position, best!.Value, b, components, winning: false);
    }

    /// <summary>
    /// Scores the position a losing move of <paramref name="side"/> leaves: every real reply of the
    /// opponent (including those in components equal to one already looked at) decided by the same
    /// exact search; the obvious replies are the moves Hotstrat and Thermostrat would choose there.
    /// </summary>
    private SwindleScore Swindle(IPosition position, Candidate move, Side side, int rank, SearchBudget b)
    {
        var store = Context.Store;
        var other = side.Other();
        var after = move.After(_large, side);
        var margin = Dyadic.Zero;
        long length = 0;
        foreach (var comp in after)
        {
            if (comp.Value is not { } v)
            {
                length += comp.Position.Size;
                continue;
            }
            var mean = store.Mean(v);
            margin += side == Side.Left ? mean : -mean;
            length += store.Birthday(v);
        }
        var left = position.Play(side, move.Move);
        var plain = new HashSet<Move>();
        foreach (var rule in new[] { TemperatureRule.Hotstrat, TemperatureRule.Thermostrat })
            if (_fallback.Choose(left, other, rule, b).Move is { } m) plain.Add(m);
        int replies = 0, winning = 0, obvious = 0, obviousWinning = 0;
        foreach (var reply in Candidates(after, other, distinct: false))
        {
            bool wins = !_large.Wins(_large.Split(reply.After(_large, other)), side);
            bool seen = plain.Count == 0 || plain.Contains(reply.Move);
            replies++;
            if (wins) winning++;
            if (seen) obvious++;
            if (seen && wins) obviousWinning++;
        }
        return new SwindleScore(winning, replies, obviousWinning, obvious, margin, length, rank);
    }

    private static int IndexOf(IReadOnlyList<Move> ranking, Move move)
    {
        for (int i = 0; i < ranking.Count; i++) if (ranking[i] == move) return i;
        return int.MaxValue - 1;
    }

    private Decision Exact(IPosition position, Move move, SearchBudget b, IReadOnlyList<ValuedComponent> components, bool winning) =>
        new(move, b.Nodes, b.ElapsedMs, Exact: true, Value: ValueText(components), Winning: winning, Line: [position.FormatMove(move)]);

    /// <summary>
    /// Past the budget: Thermostrat's move, within the time kept back for it (and the halt signal),
    /// reading thermographs from the values already found and estimating the rest by bounded local
    /// search. If even that runs out, the move that leaves the mover the most mobility.
    /// </summary>
    private Decision Fallback(IPosition position, Side side, SearchBudget spent, long leftMs, CancellationToken halt, Stopwatch clock)
    {
        var b = new SearchBudget(leftMs == long.MaxValue ? Timeout.InfiniteTimeSpan : TimeSpan.FromMilliseconds(leftMs), halt);
        Move? move = null;
        bool estimated = true;
        try
        {
            var choice = _fallback.Choose(position, side, TemperatureRule.Thermostrat, b);
            move = choice.Move;
            estimated = choice.Estimated;
        }
        catch (BudgetExceededException)
        {
        }
        move ??= MostMobile(position, side);
        return new Decision(move, spent.Nodes + b.Nodes, clock.ElapsedMilliseconds, Exact: false,
            Line: [position.FormatMove(move.Value)], Estimated: estimated);
    }

    /// <summary>Out of budget when only a proof was wanted: no fallback search, just a legal move (the most mobile).</summary>
    private static Decision Unproved(IPosition position, Side side, long nodes, Stopwatch clock)
    {
        var move = MostMobile(position, side);
        return new Decision(move, nodes, clock.ElapsedMilliseconds, Exact: false, Line: [position.FormatMove(move)]);
    }

    /// <summary>The move after which the mover has the most moves left over the opponent: the last resort, costing one play per move.</summary>
    internal static Move MostMobile(IPosition position, Side side)
    {
        var moves = position.Moves(side);
        Move best = moves[0];
        int bestScore = int.MinValue;
        foreach (var m in moves)
        {
            var after = position.Play(side, m);
            int score = after.Moves(side).Count - after.Moves(side.Other()).Count;
            if (score > bestScore)
            {
                bestScore = score;
                best = m;
            }
        }
        return best;
    }

    /// <summary>The value as notation: the canonical values of the components, summed where the sum is small.</summary>
    private string? ValueText(IReadOnlyList<ValuedComponent> components)
    {
        if (components.Any(c => c.Value is null)) return null;
        var store = Context.Store;
        var (key, offset) = _sums.Normalise(components.Select(c => c.Value!.Value));
        // One writer for one value: a sum of at most one game and a number (3/4 + * is 3/4*)
        // is written as that value is everywhere else; a longer sum keeps its terms, as
        // 'value' lists components.
        var games = key.Games.ToList();
        if (games.Count <= 1)
            return store.Format(games.Count == 0 ? store.Number(offset) : store.Add(games[0], store.Number(offset)));
        var terms = games.Select(g => store.Format(g)).ToList();
        if (!offset.IsZero) terms.Add(store.Format(store.Number(offset)));
        return string.Join(" + ", terms);
    }

    private string? TryValueText(IPosition position, SearchBudget b)
    {
        try
        {
            return ValueText(_large.Value(position.Components(), Settings.ComponentCap));
        }
        catch (BudgetExceededException)
        {
            return null;
        }
    }

    /// <summary>
    /// The real moves of a side (equal components once unless <paramref name="distinct"/> is
    /// false): those in small components first, hottest component first; then those in large
    /// components, the move that leaves the mover the most mobility in its component (own moves
    /// minus the opponent's) first.
    /// </summary>
    private List<Candidate> Candidates(IReadOnlyList<ValuedComponent> components, Side side, bool distinct = true)
    {
        var store = Context.Store;
        var seen = new HashSet<string>(StringComparer.Ordinal);
        var list = new List<(Candidate C, int Group, Dyadic Heat, int Mobility, int Order)>();
        for (int i = 0; i < components.Count; i++)
        {
            var comp = components[i];
            if (!seen.Add(comp.Position.NormalKey) && distinct) continue;
            var heat = comp.Value is { } v ? store.Temperature(v) : Dyadic.Zero;
            foreach (var m in comp.Position.Moves(side))
            {
                int mobility = 0;
                if (comp.Value is null)
                {
                    var after = comp.Position.Play(side, m);
                    mobility = after.Moves(side).Count - after.Moves(side.Other()).Count;
                }
                list.Add((new Candidate(components, i, m), comp.Value is null ? 1 : 0, heat, mobility, list.Count));
            }
        }
        list.Sort((p, q) =>
        {
            if (p.Group != q.Group) return p.Group.CompareTo(q.Group);
            int c = q.Heat.CompareTo(p.Heat);
            if (c == 0) c = q.Mobility.CompareTo(p.Mobility);
            return c != 0 ? c : p.Order.CompareTo(q.Order);
        });
        return list.ConvertAll(x => x.C);
    }

    /// <summary>A real move in one component of a valued position.</summary>
    private sealed record Candidate(IReadOnlyList<ValuedComponent> Components, int Index, Move Move)
    {
        /// <summary>The valued components after the move: the moved-in one replaced by its pieces.</summary>
        public IReadOnlyList<ValuedComponent> After(LargeSearch large, Side side)
        {
            var pieces = Components[Index].Position.Play(side, Move).Components();
            var result = new List<ValuedComponent>(Components.Count + pieces.Count);
            for (int i = 0; i < Components.Count; i++) if (i != Index) result.Add(Components[i]);
            result.AddRange(large.ValuePieces(pieces));
            return result;
        }
    }
}
