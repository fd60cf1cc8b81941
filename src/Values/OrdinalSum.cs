namespace Bramble.Values;

public sealed partial class GameStore
{
    private readonly Dictionary<long, int> _ordinal = new(PairHash.Instance);

    /// <summary>
    /// The ordinal sum G:H = {G^L, G:H^L | G^R, G:H^R}, with G taken in canonical form (the ordinal
    /// sum depends on G's form, not only its value; H's value is enough).
    /// </summary>
    public Game OrdinalSum(Game g, Game h)
    {
        if (h == Zero) return g;
        long key = ((long)g.Id << 32) | (uint)h.Id;
        if (_ordinal.TryGetValue(key, out int id)) return new Game(id);
        var left = LeftOptions(g).Concat(LeftOptions(h).Select(o => OrdinalSum(g, o))).ToArray();
        var right = RightOptions(g).Concat(RightOptions(h).Select(o => OrdinalSum(g, o))).ToArray();
        var result = Make(left, right);
        _ordinal[key] = result.Id;
        return result;
    }
}
