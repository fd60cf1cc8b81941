using Bramble.Rules;
using Bramble.Values;

namespace Bramble.Search;

/// <summary>
/// Reads components' thermographs for the temperature strategies: from the exact value when it can
/// be found within <see cref="ExactCap"/> nodes, otherwise from an estimate made by a bounded local
/// search — the component's game tree to depth one or two, with exact values wherever a piece is
/// small enough and, at the horizon, the number (Left's moves − Right's moves) / 2 as a guess.
/// Estimated readings say so (<see cref="HeatReading.Estimated"/>).
/// </summary>
public sealed class ThermalReader(LocalValues values)
{
    /// <summary>Node cap for an exact value before the reader settles for an estimate.</summary>
    public long ExactCap { get; set; } = 20_000;

    /// <summary>
    /// Components (and pieces inside an estimate) larger than this (<see cref="IPosition.Size"/>)
    /// get only <see cref="ProbeCap"/> nodes for an exact value (enough for a value that is cheap
    /// whatever the size, such as a long chain of numbers); the rest are estimated at once.
    /// </summary>
    public int ExactSize { get; set; } = 20;

    /// <summary>Node cap of the exact attempt for a component over <see cref="ExactSize"/> (pieces inside an estimate get none).</summary>
    public long ProbeCap { get; set; } = 256;

    /// <summary>Node cap for the exact value of a piece inside an estimate.</summary>
    public long PieceCap { get; set; } = 2_000;

    /// <summary>An estimate searches two plies deep when the component has at most this many moves (both sides), else one.</summary>
    public int DeepEstimateMoves { get; set; } = 12;

    public GameStore Store => values.Store;

    public HeatReading Read(IPosition component, SearchBudget budget)
    {
        // An exact attempt may take half the time left, so that an estimate still fits after a failure.
        long cap = component.Size <= ExactSize ? ExactCap : Math.Min(ProbeCap, ExactCap);
        long maxMs = budget.RemainingMs == long.MaxValue ? long.MaxValue : budget.RemainingMs / 2;
        if (values.TryValue(component, cap, budget, maxMs) is { } exact)
            return new HeatReading(component, exact, Store.Thermograph(exact), Estimated: false);
        var estimate = Estimate(component, budget);
        return new HeatReading(component, estimate, Store.Thermograph(estimate), Estimated: true);
    }

    /// <summary>The value of a set of pieces (exact where small, else estimated) and whether any was estimated.</summary>
    public (Game Value, bool Estimated) ValueOfPieces(IEnumerable<IPosition> pieces, SearchBudget budget)
    {
        var total = Store.Zero;
        bool estimated = false;
        foreach (var piece in pieces)
        {
            var r = Read(piece, budget);
            total = Store.Add(total, r.Value);
            estimated |= r.Estimated;
        }
        return (total, estimated);
    }

    private Game Estimate(IPosition component, SearchBudget budget)
    {
        int moves = component.Moves(Side.Left).Count + component.Moves(Side.Right).Count;
        return Tree(component, moves <= DeepEstimateMoves ? 2 : 1, budget);
    }

    private Game Tree(IPosition position, int depth, SearchBudget budget)
    {
        var left = position.Moves(Side.Left);
        var right = position.Moves(Side.Right);
        if (depth == 0) return Store.Number(Dyadic.Create(left.Count - right.Count, 1));
        budget.Tick();
        var l = left.Select(m => Pieces(position.Play(Side.Left, m), depth - 1, budget)).ToList();
        var r = right.Select(m => Pieces(position.Play(Side.Right, m), depth - 1, budget)).ToList();
        return Store.Make(l, r);
    }

    private Game Pieces(IPosition after, int depth, SearchBudget budget)
    {
        var total = Store.Zero;
        foreach (var piece in after.Components())
        {
            // Inside an estimate a big piece gets no probe: there are many of them, and most are not cheap.
            long cap = piece.Size <= ExactSize ? PieceCap : 0;
            total = Store.Add(total, values.TryValue(piece, cap, budget) ?? Tree(piece, depth, budget));
        }
        return total;
    }
}
