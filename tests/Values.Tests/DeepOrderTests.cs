namespace Bramble.Values.Tests;

/// <summary>
/// The store's order test takes shortcuts (closed forms of numbers and x + n·↑ + *m, stops, a
/// first pass for refutations already settled, a memo shared by every comparison). Here it is
/// checked against the definition of ≤ applied plainly to the same canonical forms, on values
/// like those of mixed Hackenbush trees: sums of ordinal sums with all stops equal, where no
/// stop filter settles anything and the search goes deep.
/// </summary>
public class DeepOrderTests
{
    [Fact]
    public void OrderOnDeepTreeLikeValuesAgreesWithThePlainDefinition()
    {
        var rng = new Random(909);
        var store = new GameStore();
        var bases = new[] { store.Integer(1), store.Integer(-1), store.Star };
        var pool = new List<Game> { store.Zero, store.Star, store.Integer(1), store.Integer(-1) };
        // Grow values the way a tree is folded to its ground: an edge under a branch set is an
        // ordinal sum, a vertex adds its branches.
        for (int i = 0; i < 120; i++)
        {
            var a = pool[rng.Next(pool.Count)];
            var b = pool[rng.Next(pool.Count)];
            var grown = rng.Next(3) == 0
                ? store.Add(a, b)
                : store.OrdinalSum(bases[rng.Next(bases.Length)], store.Add(a, b));
            pool.Add(grown);
        }
        var plain = new PlainOrder(store);
        int comparedDeep = 0;
        for (int i = 0; i < 1500; i++)
        {
            var a = pool[rng.Next(pool.Count)];
            var b = pool[rng.Next(pool.Count)];
            bool expected = plain.Leq(a, b);
            Assert.Equal(expected, store.Leq(a, b));
            if (store.LeftStop(a) == store.LeftStop(b) && store.RightStop(a) == store.RightStop(b)) comparedDeep++;
        }
        // The check is only worth something if many pairs have equal stops.
        Assert.True(comparedDeep > 100, $"only {comparedDeep} pairs had equal stops");
    }

    /// <summary>
    /// G ≤ H iff no G^L ≥ H and no H^R ≤ G (the definition of ≤, common practice), memoised on
    /// the pair and nothing else.
    /// </summary>
    private sealed class PlainOrder(GameStore store)
    {
        private readonly Dictionary<(Game, Game), bool> _memo = new();

        public bool Leq(Game g, Game h)
        {
            if (_memo.TryGetValue((g, h), out bool known)) return known;
            bool result = true;
            foreach (var gl in store.LeftOptions(g)) if (Leq(h, gl)) { result = false; break; }
            if (result) foreach (var hr in store.RightOptions(h)) if (Leq(hr, g)) { result = false; break; }
            _memo[(g, h)] = result;
            return result;
        }
    }
}
