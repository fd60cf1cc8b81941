using Bramble.Rules;
using Bramble.Values;

namespace Bramble.Search;

/// <summary>
/// Whole-position win/loss search: alpha-beta on a two-valued game (a win cuts off at once), with a
/// transposition table keyed by the position's incremental hash and the side to move, moves
/// ordered by the table's remembered best move and then by how few replies they leave, iterative
/// deepening, and a node cap. It knows nothing of components or values: the baseline a
/// programmer would otherwise write, and the yardstick in the bench.
/// </summary>
public sealed class AlphaBetaPlayer(long nodeCap = AlphaBetaPlayer.DefaultNodeCap, int log2TableSize = 20) : IPlayer
{
    public const long DefaultNodeCap = 20_000_000;

    // Mixed into the key for Right to move, so the two sides' results of one position never meet.
    private const ulong RightToMoveKey = 0x9E3779B97F4A7C15UL;

    private readonly TranspositionTable _table = new(log2TableSize);
    private SearchBudget _budget = SearchBudget.Unlimited();
    private bool _horizon;
    private string? _lastRoot;

    public string Name => "alphabeta";
    public long NodeCap => nodeCap;

    /// <summary>Whether the last decision stopped at the node cap (rather than at the time budget or with a proof).</summary>
    public bool LastHitCap { get; private set; }

    public Decision Choose(IPosition position, Side side, TimeSpan budget, CancellationToken halt = default)
    {
        _budget = new SearchBudget(budget, halt, nodeCap);
        LastHitCap = false;
        // Position hashes are only promised to tell positions of one game apart (a Hackenbush hash
        // covers edge ids and colours, not where the edges are), so the table is kept only while
        // the same root is searched again (both first players of one position), never across roots.
        if (position.Text != _lastRoot) _table.Clear();
        _lastRoot = position.Text;
        var moves = position.Moves(side);
        if (moves.Count == 0) return new Decision(null, 0, _budget.ElapsedMs, Exact: true, Winning: false);
        Move best = moves[0];
        try
        {
            for (int depth = 1; ; depth++)
            {
                _horizon = false;
                var result = Search(position, side, depth);
                if (_table.TryGet(Key(position, side), out var e) && e.Best >= 0 && e.Best < moves.Count) best = moves[e.Best];
                if (result is SearchResult.Win or SearchResult.Loss)
                    return new Decision(best, _budget.Nodes, _budget.ElapsedMs, Exact: true,
                        Winning: result == SearchResult.Win, Line: [position.FormatMove(best)]);
                // An iteration that met no horizon has seen the whole tree, so it proved something.
                if (!_horizon) throw new InvalidOperationException("search ended without a proof or a horizon");
            }
        }
        catch (BudgetExceededException)
        {
            LastHitCap = _budget.NodeCapReached;
            return new Decision(best, _budget.Nodes, _budget.ElapsedMs, Exact: false, Line: [position.FormatMove(best)]);
        }
    }

    private static ulong Key(IPosition position, Side side) => side == Side.Left ? position.Hash : position.Hash ^ RightToMoveKey;

    private SearchResult Search(IPosition position, Side side, int depth)
    {
        _budget.Tick();
        ulong key = Key(position, side);
        int hint = -1;
        if (_table.TryGet(key, out var entry))
        {
            if (entry.Result is SearchResult.Win or SearchResult.Loss) return entry.Result;
            if (entry.Depth >= depth) { _horizon = true; return SearchResult.Unknown; }
            hint = entry.Best;
        }
        var moves = position.Moves(side);
        if (moves.Count == 0)
        {
            _table.Store(key, int.MaxValue, SearchResult.Loss, -1);
            return SearchResult.Loss;
        }
        if (depth == 0)
        {
            _horizon = true;
            return SearchResult.Unknown;
        }
        var other = side.Other();
        var order = Order(position, side, moves, hint, depth);
        int firstUnknown = -1;
        foreach (var (index, child) in order)
        {
            var r = Search(child, other, depth - 1);
            if (r == SearchResult.Loss)
            {
                _table.Store(key, int.MaxValue, SearchResult.Win, index);
                return SearchResult.Win;
            }
            if (r == SearchResult.Unknown && firstUnknown < 0) firstUnknown = index;
        }
        if (firstUnknown < 0)
        {
            _table.Store(key, int.MaxValue, SearchResult.Loss, order[0].Index);
            return SearchResult.Loss;
        }
        _table.Store(key, depth, SearchResult.Unknown, firstUnknown);
        return SearchResult.Unknown;
    }

    /// <summary>The remembered best move first; then, away from the horizon, the moves that leave the opponent fewest replies.</summary>
    private static List<(int Index, IPosition Child)> Order(IPosition position, Side side, IReadOnlyList<Move> moves, int hint, int depth)
    {
        var list = new List<(int Index, IPosition Child, int Key)>(moves.Count);
        for (int i = 0; i < moves.Count; i++)
        {
            var child = position.Play(side, moves[i]);
            int key = i == hint ? int.MinValue : depth > 1 ? child.Moves(side.Other()).Count : 0;
            list.Add((i, child, key));
        }
        list.Sort((p, q) => p.Key != q.Key ? p.Key.CompareTo(q.Key) : p.Index.CompareTo(q.Index));
        return list.ConvertAll(x => (x.Index, x.Child));
    }
}
