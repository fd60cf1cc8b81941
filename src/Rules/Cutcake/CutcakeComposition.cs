using Bramble.Values;

namespace Bramble.Rules.Cutcake;

/// <summary>
/// What <c>bramble compose</c> needs from Cutcake: every value is an integer (Winning Ways,
/// ch. 2), so anything else is ruled out; an integer n is a strip of n + 1 cells that only its
/// owner can cut (n cuts); and the rectangles of each area, both ways round, for the search.
/// </summary>
internal static class CutcakeComposition
{
    public static IEnumerable<IPosition> ComponentsOfSize(CutcakeRuleset ruleset, int cells)
    {
        // A single cell cannot be cut: it is 0.
        if (cells < 2) yield break;
        for (int rows = 1; rows <= cells; rows++)
            if (cells % rows == 0 && rows <= CakeNotation.MaxSide && cells / rows <= CakeNotation.MaxSide)
                yield return ruleset.Parse($"{rows}x{cells / rows}");
    }

    public static IPosition SumOf(CutcakeRuleset ruleset, IReadOnlyList<IPosition> components) =>
        ruleset.Parse(components.Count == 0 ? "0" : string.Join(" + ", components.Select(c => c.Text)));

    /// <summary>
    /// Each cut makes one more piece, and a piece of c cells ends as c pieces of one cell: a cake
    /// of C cells lasts at most C − 1 moves, so a value of birthday b needs b + 1 cells.
    /// </summary>
    public static int LeastSize(Game target, GameStore store) => target == store.Zero ? 0 : store.Birthday(target) + 1;

    /// <summary>n &gt; 0: one row of n + 1 cells, which Left cuts between columns n times and Right never; n &lt; 0 the column.</summary>
    public static IEnumerable<IPosition> Construct(CutcakeRuleset ruleset, Game target, GameStore store)
    {
        if (!store.TryGetNumber(target, out var x) || !x.IsInteger || x.IsZero) yield break;
        var n = x.Floor();
        if (n > CakeNotation.MaxSide - 1 || n < 1 - CakeNotation.MaxSide) yield break;
        yield return ruleset.Parse(n > 0 ? $"1x{n + 1}" : $"{1 - n}x1");
    }

    public static TargetFacts Facts(Game target, GameStore store) =>
        store.TryGetNumber(target, out var x) && x.IsInteger
            ? TargetFacts.None
            : TargetFacts.Impossible("every Cutcake position is an integer (Winning Ways, ch. 2)");
}
