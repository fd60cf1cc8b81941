using Bramble.Rules;
using Bramble.Values;

namespace Bramble.Search;

/// <summary>
/// The whole-board player for positions too big for exact values whose ruleset offers a static
/// estimate (<see cref="IEstimable"/>, e.g. Amazons' territory evaluation): iterative-deepening
/// alpha-beta (negamax) over real moves, each leaf scored by the estimate. It is selective, as
/// Amazons programs must be with hundreds of moves a ply: every move of a node is played and
/// estimated once (which orders them), and only the best <see cref="Width"/> are searched deeper.
/// A side with no move has lost, which outranks any estimate. Depths are completed whole: the move
/// reported is the best of the deepest finished depth, so with a node cap the choice is the same on
/// any machine.
/// </summary>
public sealed class HeuristicSearch
{
    private const double Lost = -1e9;

    /// <summary>How many of a node's moves, best estimated first, are searched below the first ply.</summary>
    public int Width { get; init; } = 12;

    /// <summary>The deepest search when the budget has no limit at all (a <c>solve</c> without a budget).</summary>
    public int UnlimitedDepth { get; init; } = 2;

    public sealed record Result(Move Move, double Score, int Depth, long Nodes);

    public Result Choose(IPosition position, Side side, SearchBudget budget)
    {
        var moves = position.Moves(side);
        if (moves.Count == 0) throw new ArgumentException("the side to move has no move", nameof(position));
        // Depth 1: every move estimated; this is also the order for deeper searches.
        var scored = new List<(Move Move, IPosition After, double Score)>(moves.Count);
        try
        {
            foreach (var m in moves)
            {
                budget.Tick();
                var after = position.Play(side, m);
                scored.Add((m, after, Score(after, side.Other(), side)));
            }
        }
        catch (BudgetExceededException)
        {
            // Out of budget inside the first ply: the best of the moves estimated so far.
            if (scored.Count == 0) return new Result(moves[0], 0, 0, budget.Nodes);
            scored.Sort((a, b) => b.Score.CompareTo(a.Score));
            return new Result(scored[0].Move, scored[0].Score, 0, budget.Nodes);
        }
        scored.Sort((a, b) => b.Score.CompareTo(a.Score));
        var best = new Result(scored[0].Move, scored[0].Score, 1, budget.Nodes);
        int maxDepth = budget.RemainingMs == long.MaxValue ? UnlimitedDepth : 64;
        long depthStartMs = budget.ElapsedMs;
        for (int depth = 2; depth <= maxDepth; depth++)
        {
            // A depth costs a good deal more than the one before: do not start one that cannot finish.
            long lastMs = budget.ElapsedMs - depthStartMs;
            if (budget.RemainingMs != long.MaxValue && lastMs * 4 > budget.RemainingMs) break;
            depthStartMs = budget.ElapsedMs;
            try
            {
                double alpha = Lost - 1;
                Move bestMove = scored[0].Move;
                var rescored = new List<(Move, IPosition, double)>();
                foreach (var (m, after, _) in scored.Take(Width))
                {
                    double v = -Negamax(after, side.Other(), depth - 1, Lost - 1, -alpha, budget);
                    rescored.Add((m, after, v));
                    if (v > alpha)
                    {
                        alpha = v;
                        bestMove = m;
                    }
                    if (alpha >= -Lost) break;
                }
                best = new Result(bestMove, alpha, depth, budget.Nodes);
                // The next depth starts with this depth's best move.
                var order = rescored.OrderByDescending(x => x.Item3).Select(x => (x.Item1, x.Item2, x.Item3)).ToList();
                scored = order.Concat(scored.Skip(rescored.Count)).ToList();
                if (alpha >= -Lost || alpha <= Lost) break; // a forced win or loss: deeper search changes nothing
            }
            catch (BudgetExceededException)
            {
                break;
            }
        }
        return best with { Nodes = budget.Nodes };
    }

    /// <summary>
    /// The estimate of <paramref name="position"/> from <paramref name="viewer"/>'s side, <paramref name="toMove"/>
    /// to move. Listing the moves of every leaf would cost more than estimating it, so a leaf where the
    /// side to move is stuck is left to the estimate to see (Amazons' charges a stuck side heavily).
    /// </summary>
    private static double Score(IPosition position, Side toMove, Side viewer)
    {
        double e = ((IEstimable)position).Estimate(toMove);
        return viewer == Side.Left ? e : -e;
    }

    private double Negamax(IPosition position, Side toMove, int depth, double alpha, double beta, SearchBudget budget)
    {
        var moves = position.Moves(toMove);
        if (moves.Count == 0) return Lost;
        var children = new List<(IPosition After, double Score)>(moves.Count);
        foreach (var m in moves)
        {
            budget.Tick();
            var after = position.Play(toMove, m);
            children.Add((after, Score(after, toMove.Other(), toMove)));
        }
        children.Sort((a, b) => b.Score.CompareTo(a.Score));
        if (depth <= 1) return children[0].Score;
        double best = Lost - 1;
        foreach (var (after, _) in children.Take(Width))
        {
            double v = -Negamax(after, toMove.Other(), depth - 1, -beta, -alpha, budget);
            if (v > best) best = v;
            if (v > alpha) alpha = v;
            if (alpha >= beta) break;
        }
        return best;
    }
}
