using Bramble.Rules.Common;
using Bramble.Rules.Domineering;
using Bramble.Values;

namespace Bramble.Rules.Clobber;

/// <summary>
/// What <c>bramble compose</c> needs from Clobber: every group of n stones (each polyomino with
/// each colouring, one per normal key, so a group and its colour swap both appear), groups set
/// apart on one board, and the facts: every Clobber position is all-small, so any other value
/// is ruled out; each move removes a stone, so a value of birthday b needs b + 1 stones.
/// </summary>
internal static class ClobberComposition
{
    public static IEnumerable<IPosition> ComponentsOfSize(ClobberRuleset ruleset, int stones)
    {
        // A lone stone has no move: it is 0.
        if (stones < 2) yield break;
        var seen = new HashSet<string>(StringComparer.Ordinal);
        foreach (var shape in Polyominoes.UpTo(stones))
        {
            if (shape.CellCount != stones) continue;
            var cells = new List<int>();
            for (int r = 0; r < shape.Height; r++)
                for (int c = 0; c < shape.Width; c++)
                    if (shape.Contains(r, c)) cells.Add(r * shape.Width + c);
            for (int colouring = 0; colouring < 1 << cells.Count; colouring++)
            {
                var grid = new Stone[shape.Height * shape.Width];
                for (int k = 0; k < cells.Count; k++) grid[cells[k]] = (colouring >> k & 1) == 0 ? Stone.Left : Stone.Right;
                var position = new ClobberPosition(ruleset, new StoneGrid(shape.Height, shape.Width, grid));
                if (seen.Add(position.NormalKey)) yield return position;
            }
        }
    }

    /// <summary>The groups side by side, an empty column or row between neighbours (a stone never moves onto an empty square).</summary>
    public static IPosition SumOf(ClobberRuleset ruleset, IReadOnlyList<IPosition> components) => components.Count == 1
        ? components[0]
        : new ClobberPosition(ruleset, StoneLayout.SideBySide(components.Select(c => ((ClobberPosition)c).Grid).ToList()));

    public static int LeastSize(Game target, GameStore store) => target == store.Zero ? 0 : store.Birthday(target) + 1;

    public static TargetFacts Facts(Game target, GameStore store) =>
        store.IsAllSmall(target)
            ? TargetFacts.None
            : TargetFacts.Impossible("every Clobber position is all-small: wherever one player can move, so can the other (Albert, Grossman, Nowakowski and Wolfe, \"An introduction to Clobber\", INTEGERS 5, 2005)");
}
