using Bramble.Values;

namespace Bramble.Rules.ToadsAndFrogs;

/// <summary>
/// What <c>bramble compose</c> needs from Toads and Frogs: every strip of n squares that is one
/// live stretch (one per normal key, so a strip and its negating mirror image both appear),
/// strips set apart by walls, and a lower bound on the squares a value needs. In a strip of n
/// squares with p pieces every move takes a piece at least one square on, in its one direction,
/// so no play lasts more than p(n − 1) moves; a piece needs an empty square to move into, so
/// p ≤ n − 1, and a game's birthday is at most its longest play: birthday b needs (n − 1)² ≥ b.
/// </summary>
internal static class ToadsAndFrogsComposition
{
    public static IEnumerable<IPosition> ComponentsOfSize(ToadsAndFrogsRuleset ruleset, int squares)
    {
        if (squares < 2) yield break;
        var seen = new HashSet<string>(StringComparer.Ordinal);
        int total = 1;
        for (int k = 0; k < squares; k++) total *= 3;
        for (int code = 0; code < total; code++)
        {
            var strip = new Square[squares];
            int c = code;
            for (int k = 0; k < squares; k++) { strip[k] = (Square)(c % 3); c /= 3; }
            var position = new ToadsAndFrogsPosition(ruleset, strip);
            if (position.Stretches.Count != 1 || position.Stretches[0] != (0, squares)) continue;
            if (seen.Add(position.NormalKey)) yield return position;
        }
    }

    /// <summary>The strips one after another, a wall between neighbours.</summary>
    public static IPosition SumOf(ToadsAndFrogsRuleset ruleset, IReadOnlyList<IPosition> components)
    {
        if (components.Count == 0) return ruleset.Parse(".");
        if (components.Count == 1) return components[0];
        var squares = new List<Square>();
        foreach (var component in components)
        {
            if (squares.Count > 0) squares.Add(Square.Wall);
            squares.AddRange(((ToadsAndFrogsPosition)component).Squares);
        }
        return new ToadsAndFrogsPosition(ruleset, squares.ToArray());
    }

    public static int LeastSize(Game target, GameStore store)
    {
        if (target == store.Zero) return 0;
        int birthday = store.Birthday(target);
        int n = 2;
        while ((n - 1) * (n - 1) < birthday) n++;
        return n;
    }
}
