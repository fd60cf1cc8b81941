using Bramble.Values;

namespace Bramble.Rules.Common;

/// <summary>
/// Exact canonical values by memoised search, for rulesets whose components carry a signed
/// normal key: a component's key is its representative's key, with a leading '-' when the
/// component is the colour-swapped image of the representative (so its value is the negative).
/// The memo holds the representative's value under "ruleset:key", so a component and its
/// negative image are searched once between them, and a database file stores the same entries.
/// </summary>
public sealed class ComponentValues(IRuleset ruleset, ValueContext context)
{
    private readonly GameStore _store = context.Store;

    /// <summary>The value of a position: the sum of its components' values.</summary>
    public Game ValueOf(IPosition position)
    {
        var total = _store.Zero;
        foreach (var component in position.Components()) total = _store.Add(total, ValueOfComponent(component));
        return total;
    }

    /// <summary>The value of one component, from the memo or by search over its options.</summary>
    public Game ValueOfComponent(IPosition component) =>
        Memoised(ruleset, context, component.NormalKey, (left, right) =>
        {
            foreach (var move in component.Moves(Side.Left)) left.Add(ValueOf(component.Play(Side.Left, move)));
            foreach (var move in component.Moves(Side.Right)) right.Add(ValueOf(component.Play(Side.Right, move)));
        });

    /// <summary>
    /// The memo step every keyed search shares: the value under a signed key (negated when the key
    /// starts with '-'), or else <paramref name="options"/> fills Left's and Right's option values,
    /// and the canonical value is stored under the representative's key.
    /// </summary>
    public static Game Memoised(IRuleset ruleset, ValueContext context, string key, Action<List<Game>, List<Game>> options)
    {
        var store = context.Store;
        bool negated = key.Length > 1 && key[0] == '-';
        string representative = negated ? key[1..] : key;
        if (context.TryGetMemo(ruleset, representative, out var known)) return negated ? store.Negate(known) : known;
        context.Tick();
        var left = new List<Game>();
        var right = new List<Game>();
        options(left, right);
        var value = store.Make(left, right);
        context.SetMemo(ruleset, representative, negated ? store.Negate(value) : value);
        return value;
    }

    /// <summary>Joins component keys the way every grid ruleset does: sorted, " + " between, "0" for none.</summary>
    public static string JoinKeys(IEnumerable<string> keys)
    {
        var list = keys.ToList();
        if (list.Count == 0) return "0";
        list.Sort(StringComparer.Ordinal);
        return string.Join(" + ", list);
    }
}
