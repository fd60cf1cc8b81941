namespace Bramble.Values;

public sealed partial class GameStore
{
    private readonly Dictionary<int, int> _atomicWeight = new();
    private readonly Dictionary<int, bool> _allSmall = new();

    /// <summary>
    /// The atomic weight of an all-small game (null for others), by the atomic weight calculus of
    /// Winning Ways ch. 8: G° = {aw(G^L) − 2 | aw(G^R) + 2}; when G° is an integer the eccentric
    /// cases compare G with a far star ☆ (a nimber larger than any in G's game tree): if G &gt; ☆
    /// the weight is the largest integer n with n ⧏ every Right option of G°, if G &lt; ☆ the least
    /// integer n with n ⧐ every Left option of G°, otherwise G° itself.
    /// </summary>
    public Game? AtomicWeight(Game g)
    {
        if (!IsAllSmall(g)) return null;
        return AtomicWeightOfAllSmall(g);
    }

    private Game AtomicWeightOfAllSmall(Game g)
    {
        if (g == Zero) return Zero;
        // aw(n·↑ + *m) = n: atomic weight is additive, aw(↑) = 1 and aw(*m) = 0.
        if (_tag[g.Id] is { X.IsZero: true } t) return Integer(t.N);
        if (_atomicWeight.TryGetValue(g.Id, out int id)) return new Game(id);
        var two = Integer(2);
        var minusTwo = Integer(-2);
        var left = LeftOptions(g).Select(o => Add(AtomicWeightOfAllSmall(o), minusTwo)).ToArray();
        var right = RightOptions(g).Select(o => Add(AtomicWeightOfAllSmall(o), two)).ToArray();
        var candidate = Make(left, right);
        var result = candidate;
        if (TryGetNumber(candidate, out var n) && n.IsInteger)
        {
            var farStar = Nimber(FarStarSize(g));
            var relation = Compare(g, farStar);
            if (relation == Relation.Greater)
            {
                // Largest integer below-or-confused with every Right option of G°.
                long k = (long)n.Numerator + right.Length + 2;
                foreach (var r in right) k = Math.Max(k, (long)Dyadic.Max(LeftStop(r), RightStop(r)).Ceiling() + 2);
                while (right.Any(r => Leq(r, Integer(k)))) k--;
                result = Integer(k);
            }
            else if (relation == Relation.Less)
            {
                long k = (long)n.Numerator - left.Length - 2;
                foreach (var l in left) k = Math.Min(k, (long)Dyadic.Min(LeftStop(l), RightStop(l)).Floor() - 2);
                while (left.Any(l => Leq(Integer(k), l))) k++;
                result = Integer(k);
            }
        }
        _atomicWeight[g.Id] = result.Id;
        return result;
    }

    /// <summary>A power of two larger than every nimber in g's game tree: a far star for g.</summary>
    private int FarStarSize(Game g)
    {
        int largest = 0;
        var seen = new HashSet<int>();
        var stack = new Stack<Game>();
        stack.Push(g);
        while (stack.Count > 0)
        {
            var x = stack.Pop();
            if (!seen.Add(x.Id)) continue;
            if (TryGetNimber(x, out int m)) { largest = Math.Max(largest, m); continue; }
            foreach (var o in LeftOptions(x)) stack.Push(o);
            foreach (var o in RightOptions(x)) stack.Push(o);
        }
        int size = 1;
        while (size <= largest) size <<= 1;
        return size;
    }
}
