using Bramble.Values;

namespace Bramble.Values.Tests;

/// <summary>
/// A plain game tree for brute force, independent of the code under test: outcomes come from
/// exhaustive play on the tree itself, never from the store's comparisons.
/// </summary>
public sealed class TreeGame(IReadOnlyList<TreeGame> left, IReadOnlyList<TreeGame> right)
{
    public IReadOnlyList<TreeGame> Left { get; } = left;
    public IReadOnlyList<TreeGame> Right { get; } = right;

    public static readonly TreeGame Zero = new([], []);

    public static TreeGame Negate(TreeGame g) => new(g.Right.Select(Negate).ToArray(), g.Left.Select(Negate).ToArray());

    /// <summary>Copies a canonical game out of the store into a tree.</summary>
    public static TreeGame FromStore(GameStore store, Game g) =>
        new(store.LeftOptions(g).Select(o => FromStore(store, o)).ToArray(), store.RightOptions(g).Select(o => FromStore(store, o)).ToArray());

    /// <summary>Evaluates the tree through the store (the code under test), option by option.</summary>
    public Game ToStore(GameStore store) => store.Make(Left.Select(o => o.ToStore(store)).ToArray(), Right.Select(o => o.ToStore(store)).ToArray());

    public static TreeGame Random(Random rng, int depth, int maxOptions = 3)
    {
        if (depth == 0) return Zero;
        var l = Enumerable.Range(0, rng.Next(maxOptions + 1)).Select(_ => Random(rng, rng.Next(depth), maxOptions)).ToArray();
        var r = Enumerable.Range(0, rng.Next(maxOptions + 1)).Select(_ => Random(rng, rng.Next(depth), maxOptions)).ToArray();
        return new TreeGame(l, r);
    }
}

/// <summary>Exhaustive play on sums of trees: who wins moving first.</summary>
public sealed class BruteForce
{
    private readonly Dictionary<string, bool> _memo = new();
    private readonly Dictionary<TreeGame, int> _ids = new(ReferenceEqualityComparer.Instance);

    private int Id(TreeGame g)
    {
        if (!_ids.TryGetValue(g, out int id)) { id = _ids.Count; _ids[g] = id; }
        return id;
    }

    /// <summary>Does <paramref name="mover"/> win moving first in the sum of <paramref name="parts"/>?</summary>
    public bool MoverWins(IReadOnlyList<TreeGame> parts, Side mover)
    {
        var key = (mover == Side.Left ? "L" : "R") + string.Join(",", parts.Select(Id).OrderBy(i => i));
        if (_memo.TryGetValue(key, out bool known)) return known;
        bool wins = false;
        for (int i = 0; i < parts.Count && !wins; i++)
        {
            var options = mover == Side.Left ? parts[i].Left : parts[i].Right;
            foreach (var o in options)
            {
                var next = parts.ToArray();
                next[i] = o;
                if (!MoverWins(next, mover.Other())) { wins = true; break; }
            }
        }
        _memo[key] = wins;
        return wins;
    }

    public Outcome OutcomeOf(params TreeGame[] parts) =>
        OutcomeExtensions.FromWinners(MoverWins(parts, Side.Left) ? Side.Left : Side.Right, MoverWins(parts, Side.Right) ? Side.Right : Side.Left);
}
