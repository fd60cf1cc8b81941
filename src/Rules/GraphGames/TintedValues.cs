using Bramble.Values;

namespace Bramble.Rules.GraphGames;

/// <summary>
/// Exact canonical values of Snort and Col parts by memoised search over their tinted forms.
/// The memo is the context's, under "ruleset:key" with the representative's value (see
/// <see cref="TintedPart.SignedKey"/>): a part and its colour-swapped image, and every
/// relabelling of either, are searched once between them, and a database file holds the same
/// entries. After a move only the parts the move touched are new; the rest are memo hits.
/// </summary>
public sealed class TintedValues(IRuleset ruleset, ColouringRule rule, ValueContext context)
{
    private readonly GameStore _store = context.Store;

    // Parts met in this search by their traces: move orders that transpose reach the same part
    // again and again, and this finds it without working out its canonical key.
    private readonly Dictionary<(ulong, ulong, ulong), Game> _seen = new();

    public Game ValueOf(IEnumerable<TintedPart> parts)
    {
        var total = _store.Zero;
        foreach (var part in parts) total = _store.Add(total, ValueOf(part));
        return total;
    }

    public Game ValueOf(TintedPart part)
    {
        var trace = part.Trace;
        if (trace is { } t && _seen.TryGetValue(t, out var again)) return again;
        var value = Search(part);
        if (trace is { } t2) _seen[t2] = value;
        return value;
    }

    private Game Search(TintedPart part) =>
        Common.ComponentValues.Memoised(ruleset, context, part.SignedKey, (left, right) =>
        {
            for (int v = 0; v < part.Count; v++)
            {
                if (rule.Allows(Side.Left, part.Tints[v])) left.Add(ValueOf(part.After(v, Side.Left)));
                if (rule.Allows(Side.Right, part.Tints[v])) right.Add(ValueOf(part.After(v, Side.Right)));
            }
        });
}
