using System.Numerics;
using Bramble.Values;

namespace Bramble.Rules.Amazons;

/// <summary>
/// Exact canonical values of Amazons regions by memoised search. A region where only one side has
/// amazons is an integer: the most moves that side can make there, since the other side never
/// moves in it and every option is itself such an integer ({0, 1, …, n−1 | } = n); it is found by a
/// search over that side's moves alone. Any other region is searched over both sides' options.
/// Values are memoised under the region's normal key in the context ("amazons:key"), a region and
/// its colour-swapped image sharing one entry (the image's value is the negative).
/// </summary>
internal sealed class AmazonsValues(AmazonsRuleset ruleset, ValueContext context)
{
    private readonly GameStore _store = context.Store;

    public Game ValueOf(IPosition position)
    {
        var total = _store.Zero;
        foreach (var component in position.Components()) total = _store.Add(total, ValueOfComponent((AmazonsPosition)component));
        return total;
    }

    public Game ValueOfComponent(AmazonsPosition component)
    {
        string key = component.NormalKey;
        bool negated = key.Length > 1 && key[0] == '-';
        string representative = negated ? key[1..] : key;
        if (context.TryGetMemo(ruleset, representative, out var known)) return negated ? _store.Negate(known) : known;
        context.Tick();
        Game value;
        if (component.Regions.Length == 1 && component.SoleOwner(component.Regions[0]) is { } owner)
        {
            long most = MostMoves(component, owner);
            value = _store.Integer(owner == Side.Left ? most : -most);
        }
        else
        {
            var left = new List<Game>();
            var right = new List<Game>();
            foreach (var move in component.Moves(Side.Left)) left.Add(ValueOf(component.Play(Side.Left, move)));
            foreach (var move in component.Moves(Side.Right)) right.Add(ValueOf(component.Play(Side.Right, move)));
            value = _store.Make(left, right);
        }
        context.SetMemo(ruleset, representative, negated ? _store.Negate(value) : value);
        return value;
    }

    /// <summary>The most moves <paramref name="owner"/> can make in a region holding only its amazons.</summary>
    private long MostMoves(AmazonsPosition region, Side owner)
    {
        long best = 0;
        foreach (var move in region.Moves(owner))
        {
            long after = 0;
            foreach (var piece in region.Play(owner, move).Components())
            {
                _store.TryGetNumber(ValueOfComponent((AmazonsPosition)piece), out var n);
                after += (long)BigInteger.Abs(n.Numerator);
            }
            best = Math.Max(best, after + 1);
        }
        return best;
    }
}
