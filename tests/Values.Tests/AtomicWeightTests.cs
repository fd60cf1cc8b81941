namespace Bramble.Values.Tests;

/// <summary>
/// The atomic weight calculus on random all-small games, against the properties the literature
/// states for atomic weights (Winning Ways ch. 8; Siegel, Combinatorial Game Theory, 2013,
/// ch. II.7 — from memory, not checked against the texts).
/// </summary>
public class AtomicWeightTests
{
    private readonly GameStore _store = new();

    private Game RandomAllSmall(Random rng, int depth)
    {
        if (depth == 0 || rng.Next(4) == 0) return _store.Zero;
        var l = Enumerable.Range(0, rng.Next(1, 3)).Select(_ => RandomAllSmall(rng, depth - 1)).ToArray();
        var r = Enumerable.Range(0, rng.Next(1, 3)).Select(_ => RandomAllSmall(rng, depth - 1)).ToArray();
        return _store.Make(l, r);
    }

    [Fact]
    public void AtomicWeightAddsOverSumsAndNegates()
    {
        var rng = new Random(8);
        int nonInteger = 0;
        for (int i = 0; i < 1500; i++)
        {
            var g = RandomAllSmall(rng, 4);
            var h = RandomAllSmall(rng, 3);
            var awG = _store.AtomicWeight(g);
            var awH = _store.AtomicWeight(h);
            var awSum = _store.AtomicWeight(_store.Add(g, h));
            Assert.NotNull(awG);
            Assert.NotNull(awH);
            Assert.NotNull(awSum);
            if (!_store.TryGetNumber(awG!.Value, out _)) nonInteger++;
            // aw(G + H) = aw(G) + aw(H) (Winning Ways ch. 8; Siegel 2013 II.7) — from memory.
            Assert.True(_store.Add(awG.Value, awH!.Value) == awSum!.Value, $"aw({_store.Format(g)} + {_store.Format(h)})");
            // aw(−G) = −aw(G): the calculus is symmetric in Left and Right (derived from the definition).
            Assert.Equal(_store.Negate(awG.Value), _store.AtomicWeight(_store.Negate(g)));
            // aw(G + *) = aw(G): aw(*) = 0 (Winning Ways ch. 8) — from memory.
            Assert.Equal(awG.Value, _store.AtomicWeight(_store.Add(g, _store.Star)));
        }
        // The sample must reach weights that are games, not only integers.
        Assert.True(nonInteger > 0, "every weight was a number");
    }
}
