using Bramble.Rules.Common;
using Bramble.Values;

namespace Bramble.Rules.Konane;

/// <summary>
/// What <c>bramble compose</c> needs from Konane. A component is a group of n stones standing on
/// an open board: its stones fill a rectangle, and ⌊n/2⌋ empty squares surround it on every side,
/// so no edge of the board is within the group's reach (no stone of a group of n stones ever
/// leaves its bounding box widened by ⌊n/2⌋, see <see cref="KonanePosition.Clusters"/>). Listed are the groups whose
/// stones fit a rectangle of at most <see cref="LargestBox"/> squares and at most twice as many
/// squares as stones; a position that needs a board's edge or a sparser group is not looked at.
/// Each move removes at least one stone, so a value of birthday b needs b + 1 stones.
/// </summary>
internal static class KonaneComposition
{
    public const int LargestBox = 12;

    public static IEnumerable<IPosition> ComponentsOfSize(KonaneRuleset ruleset, int stones)
    {
        // One stone, or stones that nobody can jump, are worth 0 and never listed.
        if (stones < 2) yield break;
        var seen = new HashSet<string>(StringComparer.Ordinal);
        int largest = Math.Min(LargestBox, 2 * stones);
        for (int area = stones; area <= largest; area++)
            for (int rows = 1; rows * rows <= area; rows++)
            {
                if (area % rows != 0) continue;
                int columns = area / rows;
                int margin = KonanePosition.Reach(stones);
                if (columns + 2 * margin > StoneGrid.MaxColumns) continue;
                foreach (var filling in Fillings(area, stones))
                {
                    var position = OnOpenBoard(ruleset, rows, columns, filling, margin);
                    if (position.Clusters.Count != 1 || position.Clusters[0].Length != stones) continue;
                    if (seen.Add(position.NormalKey)) yield return position;
                }
            }
    }

    /// <summary>Every way to put exactly <paramref name="stones"/> stones of either colour on <paramref name="area"/> squares (0 empty, 1 Left, 2 Right).</summary>
    private static IEnumerable<Stone[]> Fillings(int area, int stones)
    {
        for (int mask = 0; mask < 1 << area; mask++)
        {
            if (int.PopCount(mask) != stones) continue;
            var cells = new List<int>();
            for (int k = 0; k < area; k++) if ((mask >> k & 1) != 0) cells.Add(k);
            for (int colouring = 0; colouring < 1 << stones; colouring++)
            {
                var filling = new Stone[area];
                for (int k = 0; k < stones; k++) filling[cells[k]] = (colouring >> k & 1) == 0 ? Stone.Left : Stone.Right;
                yield return filling;
            }
        }
    }

    private static KonanePosition OnOpenBoard(KonaneRuleset ruleset, int rows, int columns, Stone[] filling, int margin)
    {
        int height = rows + 2 * margin, width = columns + 2 * margin;
        var cells = new Stone[height * width];
        for (int r = 0; r < rows; r++)
            for (int c = 0; c < columns; c++)
                cells[(r + margin) * width + c + margin] = filling[r * columns + c];
        return new KonanePosition(ruleset, new StoneGrid(height, width, cells));
    }

    /// <summary>
    /// The groups side by side with one more empty column or row between them: each stands in
    /// its own margin, so the empty lines between the boxes of two groups of a and b stones
    /// number more than ⌊a/2⌋ + ⌊b/2⌋, and no stone of one ever comes next to the other.
    /// </summary>
    public static IPosition SumOf(KonaneRuleset ruleset, IReadOnlyList<IPosition> components) => components.Count == 1
        ? components[0]
        : new KonanePosition(ruleset, StoneLayout.SideBySide(components.Select(c => ((KonanePosition)c).Grid).ToList()));

    public static int LeastSize(Game target, GameStore store) => target == store.Zero ? 0 : store.Birthday(target) + 1;

    public static TargetFacts Facts() => TargetFacts.Remarks(
    [
        $"Konane components are listed as groups of stones on an open board (no edge within reach) whose stones fit a rectangle of at most {LargestBox} squares, at least half of them stones; positions using a board's edge are not looked at",
        "every short game is the value of some Konane position (\"A nontrivial surjective map onto the short Conway group\", Games of No Chance 5, 2025), so no target is out of reach, only perhaps beyond this listing",
    ]);
}
