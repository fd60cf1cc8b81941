using BenchmarkDotNet.Attributes;
using Bramble.Values;

namespace Bramble.Bench;

/// <summary>The value algebra: the day-3 count, and sums and comparisons of a fixed set of random canonical games.</summary>
[MemoryDiagnoser]
public class ValuesBenchmarks
{
    private Game[] _pool = [];
    private GameStore _store = new();

    [GlobalSetup]
    public void Setup()
    {
        _store = new GameStore();
        var rng = new Random(42);
        _pool = Enumerable.Range(0, 64).Select(_ => RandomGame(_store, rng, 4)).ToArray();
    }

    private static Game RandomGame(GameStore store, Random rng, int depth)
    {
        if (depth == 0) return store.Integer(rng.Next(-2, 3));
        var l = Enumerable.Range(0, rng.Next(1, 3)).Select(_ => RandomGame(store, rng, depth - 1)).ToArray();
        var r = Enumerable.Range(0, rng.Next(1, 3)).Select(_ => RandomGame(store, rng, depth - 1)).ToArray();
        return store.Make(l, r);
    }

    /// <summary>Builds every game born by day 3 (1474 values) in a fresh store.</summary>
    [Benchmark]
    public int DayThreeCount()
    {
        return GamesByDay.BornBy(new GameStore(), 3).Count;
    }

    /// <summary>All pairwise sums of the pool in a fresh store (no cached sums).</summary>
    [Benchmark]
    public int PairwiseSumsFresh()
    {
        var store = new GameStore();
        var rng = new Random(42);
        var pool = Enumerable.Range(0, 24).Select(_ => RandomGame(store, rng, 3)).ToArray();
        int acc = 0;
        foreach (var a in pool) foreach (var b in pool) acc ^= store.Add(a, b).Id;
        return acc;
    }

    /// <summary>All pairwise comparisons of the pool, caches warm after the first run.</summary>
    [Benchmark]
    public int PairwiseComparisons()
    {
        int acc = 0;
        foreach (var a in _pool) foreach (var b in _pool) acc += (int)_store.Compare(a, b);
        return acc;
    }
}
