using Bramble.Values;

namespace Bramble.Values.Tests;

/// <summary>
/// Nimbers are made without their options (a green Hackenbush graph can have a nim-value in the
/// millions). Facts of the field (Winning Ways ch. 4, from memory): *m + *m = 0, -*m = *m,
/// *m is fuzzy with 0 (m ≥ 1), born on day m, temperature 0, atomic weight 0.
/// </summary>
public class LargeNimberTests
{
    [Fact]
    public void AHugeNimberCostsOnlyItsOwnRecord()
    {
        var store = new GameStore();
        int before = store.Count;
        var g = store.Nimber(1_000_000);
        Assert.Equal("*1000000", store.Format(g));
        Assert.Equal(Outcome.N, store.OutcomeOf(g));
        Assert.Equal(1_000_000, store.Birthday(g));
        Assert.Equal(Dyadic.Zero, store.Temperature(g));
        Assert.Equal(Dyadic.Zero, store.Mean(g));
        Assert.Equal(store.Zero, store.AtomicWeight(g));
        Assert.Equal(g, store.Negate(g));
        Assert.Equal(store.Zero, store.Add(g, g));
        Assert.Equal(store.Nimber(1_000_000 ^ 12345), store.Add(g, store.Nimber(12345)));
        Assert.True(store.Count - before < 20, $"{store.Count - before} records made");
    }

    [Fact]
    public void NimbersMadeFromOptionsGetTheSameId()
    {
        var store = new GameStore();
        var three = store.Nimber(3);
        // {0, *, *2 | 0, *, *2} built by hand, and through a dominated and a reversible option.
        Assert.Equal(three, store.Parse("{0,*,*2|0,*,*2}"));
        Assert.Equal(three, store.Parse("{0,*,*2,-1|0,*,*2}"));
        Assert.Equal(store.Nimber(2), store.Parse("{0,*|0,*}"));
        // Options made on request are the smaller nimbers.
        Assert.Equal(new[] { 0, 1, 2 }, store.LeftOptions(three).Select(o => store.TryGetNimber(o, out int m) ? m : -1).OrderBy(m => m));
        // A brute-force check against trees: *4 equals the tree {0,*,*2,*3 | same} built from scratch.
        TreeGame Nim(int m) => new(Enumerable.Range(0, m).Select(Nim).ToArray(), Enumerable.Range(0, m).Select(Nim).ToArray());
        Assert.Equal(store.Nimber(4), Nim(4).ToStore(store));
    }
}
