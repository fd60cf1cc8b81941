using Bramble.Values;

namespace Bramble.Search.Tests.Support;

/// <summary>Builds game trees with fresh node ids: numbers, switches, random trees and sums of them.</summary>
public sealed class Trees
{
    private int _next = 1;

    public TreeRuleset Ruleset { get; } = new();

    public TreeNode Node(TreeNode[] left, TreeNode[] right) => new(_next++, left, right);

    public TreeNode SumNode(params TreeNode[] parts) => new(_next++, [], [], parts);

    public TreeNode Zero() => Node([], []);

    /// <summary>The integer n as its canonical tree: {n−1 |} or {| n+1}.</summary>
    public TreeNode Integer(int n) => n == 0 ? Zero() : n > 0 ? Node([Integer(n - 1)], []) : Node([], [Integer(n + 1)]);

    /// <summary>The number m / 2^k as its canonical tree.</summary>
    public TreeNode Number(Dyadic x)
    {
        if (x.IsInteger) return Integer((int)x.Numerator);
        var step = Dyadic.PowerOfHalf(x.Exponent);
        return Node([Number(x - step)], [Number(x + step)]);
    }

    /// <summary>{a | b} with integers.</summary>
    public TreeNode Switch(int a, int b) => Node([Integer(a)], [Integer(b)]);

    /// <summary>{a | b || c | d}: the random test components of Müller &amp; Li (CG 2004).</summary>
    public TreeNode TwoStep(int a, int b, int c, int d) => Node([Switch(a, b)], [Switch(c, d)]);

    public TreePosition Sum(params TreeNode[] parts) => new(Ruleset, parts.SelectMany(p => p.Flatten()).ToList());

    /// <summary>
    /// A random tree of the given depth: up to two options a side, some of them sums of two
    /// smaller trees (so moves split components), leaves that are 0 or small integers.
    /// </summary>
    public TreeNode Random(Random rnd, int depth)
    {
        if (depth == 0) return rnd.Next(4) == 0 ? Integer(rnd.Next(-1, 2)) : Zero();
        TreeNode Option()
        {
            if (depth >= 2 && rnd.Next(6) == 0) return SumNode(Random(rnd, depth - 2), Random(rnd, depth - 1));
            return Random(rnd, rnd.Next(depth));
        }
        int nl = rnd.Next(3), nr = rnd.Next(3);
        return Node(Enumerable.Range(0, nl).Select(_ => Option()).ToArray(), Enumerable.Range(0, nr).Select(_ => Option()).ToArray());
    }
}
