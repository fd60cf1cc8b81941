using Bramble.Values;

namespace Bramble.Rules.Hackenbush;

/// <summary>
/// What the field knows about building Hackenbush positions of a given value. A number is the
/// blue-red stalk of its sign expansion; *m is a green stalk of m edges; a green edge carrying a
/// blue one is {0, * | 0} = ↑*, and carrying a red one is ↓*. So x + n·↑ + *m is the stalk of x,
/// |n| such two-edge stalks, and a green stalk for whatever nimber is still missing.
/// </summary>
internal static class HackenbushComposition
{
    public static IEnumerable<IPosition> Construct(HackenbushRuleset ruleset, Game target, GameStore store)
    {
        if (!store.TryGetUpStar(target, out var x, out int ups, out int nim)) yield break;
        var parts = new List<string>();
        if (!x.IsZero) parts.Add(Stalk(x));
        for (int i = 0; i < Math.Abs(ups); i++) parts.Add(ups > 0 ? "GB" : "GR");
        // Each ↑* or ↓* stalk brings a * of its own.
        int green = nim ^ (Math.Abs(ups) & 1);
        if (green > 0) parts.Add(new string('G', green));
        yield return ruleset.ParsePosition(parts.Count == 0 ? "0" : string.Join(" + ", parts));
    }

    /// <summary>The blue-red stalk of a number: its sign expansion read from the ground up.</summary>
    public static string Stalk(Dyadic x)
    {
        var text = new System.Text.StringBuilder();
        foreach (var (sign, length) in SignExpansion.Of(x)) text.Append(sign > 0 ? 'B' : 'R', checked((int)length));
        return text.ToString();
    }

    /// <summary>A game of birthday b lasts b moves at least, and every Hackenbush move cuts an edge.</summary>
    public static int LeastSize(Game target, GameStore store) => store.Birthday(target);

    public static TargetFacts Facts(Game target, GameStore store)
    {
        var notes = new List<string>();
        if (!store.IsNumber(target))
            notes.Add("not a number, so every position of this value has a green edge: blue-red Hackenbush positions are numbers (Winning Ways; On Numbers and Games)");
        if (!store.IsNimber(target))
            notes.Add("not a nimber, so every position of this value has a blue or red edge: green Hackenbush positions are nimbers (Winning Ways, the colon and fusion principles)");
        return TargetFacts.Remarks(notes);
    }
}
