using Bramble.Rules;
using Bramble.Values;
using Bramble.Rules.Domineering;
using Bramble.Search.Board;

namespace Bramble.Search;

/// <summary>
/// <see cref="Solver"/> with the published theorems on empty Domineering rectangles tried first
/// (<see cref="KnownRectangles"/>): a first player the theorems cover is answered at once, with the
/// theorem and no move (the theorems say who wins, not how); the others are searched as usual.
/// </summary>
public static class TheoremsFirst
{
    public static SolveReport Solve(IPosition position, IReadOnlyCollection<Side> firsts, IPlayer player, TimeSpan budget, CancellationToken halt = default)
    {
        var known = new Dictionary<Side, SolveAnswer>();
        if (position is DomineeringPosition board)
            foreach (var first in firsts)
                if (KnownRectangles.Winner(board, first) is { } k)
                    known[first] = new SolveAnswer(first, k.Winner, null, 0, 0, true, null, k.Theorem);
        if (known.Count == 0) return Solver.Solve(position, firsts, player, budget, halt);
        var rest = firsts.Where(f => !known.ContainsKey(f)).ToList();
        var searched = rest.Count > 0 ? Solver.Solve(position, rest, player, budget, halt) : null;
        SolveAnswer? Answer(Side side) => !firsts.Contains(side) ? null
            : known.TryGetValue(side, out var a) ? a
            : side == Side.Left ? searched?.LeftFirst : searched?.RightFirst;
        return Solver.Report(Answer(Side.Left), Answer(Side.Right), player.Name);
    }
}
