using Bramble.Rules;
using Bramble.Values;

namespace Bramble.Search.Tests.Support;

/// <summary>
/// Left and Right stops of sums of game trees from their definition — L(G) = G for a number, else
/// the largest R(G^L); R mirrored — playing only in non-number components until every component
/// is a number (number translation L(G + x) = L(G) + x; and when the whole equals a number h,
/// every R(G^L) ≤ h while the best move in a non-number component reaches h, since
/// R(Gi^L + H) ≥ L(Gi) + R(H)). Memoised on the multiset of tree shapes. Component values come
/// from the ruleset, only to tell numbers apart; the players under test are not used.
/// </summary>
public sealed class Stops(ValueContext context)
{
    private readonly Dictionary<(string, Side), Dyadic> _memo = new();
    private readonly Dictionary<TreeNode, Game> _values = new(ReferenceEqualityComparer.Instance);

    public GameStore Store => context.Store;

    public Game ValueOf(TreeNode node)
    {
        if (_values.TryGetValue(node, out var v)) return v;
        var ruleset = new TreeRuleset();
        return _values[node] = ruleset.Value(new TreePosition(ruleset, [node]), context);
    }

    public Game ValueOf(IPosition component) => context.Store.Sum(((TreePosition)component).Nodes.Select(ValueOf).ToList());

    private bool IsNumber(TreeNode node) => Store.IsNumber(ValueOf(node));

    public bool AllNumbers(TreePosition position) => position.Nodes.All(IsNumber);

    /// <summary>The sum of the components' values when they are all numbers.</summary>
    public Dyadic Score(TreePosition position)
    {
        var total = Dyadic.Zero;
        foreach (var n in position.Nodes)
        {
            if (!Store.TryGetNumber(ValueOf(n), out var x)) throw new InvalidOperationException("the game is not over yet");
            total += x;
        }
        return total;
    }

    public Dyadic Stop(TreePosition position, Side toMove) => Stop(position.Nodes.ToList(), toMove);

    private Dyadic Stop(List<TreeNode> nodes, Side toMove)
    {
        var key = (string.Join("+", nodes.Select(n => n.Key).Order(StringComparer.Ordinal)), toMove);
        if (_memo.TryGetValue(key, out var known)) return known;
        Dyadic? best = null;
        for (int i = 0; i < nodes.Count; i++)
        {
            if (IsNumber(nodes[i])) continue;
            foreach (var option in nodes[i].Options(toMove))
            {
                var s = Stop(After(nodes, i, option), toMove.Other());
                if (best is null || (toMove == Side.Left ? s > best.Value : s < best.Value)) best = s;
            }
        }
        var result = best ?? nodes.Aggregate(Dyadic.Zero, (sum, n) => { Store.TryGetNumber(ValueOf(n), out var x); return sum + x; });
        _memo[key] = result;
        return result;
    }

    private static List<TreeNode> After(List<TreeNode> nodes, int i, TreeNode option)
    {
        var next = new List<TreeNode>(nodes.Count + 1);
        for (int j = 0; j < nodes.Count; j++) if (j != i) next.Add(nodes[j]);
        next.AddRange(option.Flatten());
        return next;
    }

    /// <summary>A move of a stop-optimal player: best stop after the move, among moves in non-numbers.</summary>
    public Move BestMove(TreePosition position, Side side)
    {
        Move? best = null;
        Dyadic bestStop = default;
        var nodes = position.Nodes.ToList();
        for (int i = 0; i < nodes.Count; i++)
        {
            if (IsNumber(nodes[i])) continue;
            var options = nodes[i].Options(side);
            for (int j = 0; j < options.Length; j++)
            {
                var s = Stop(After(nodes, i, options[j]), side.Other());
                if (best is null || (side == Side.Left ? s > bestStop : s < bestStop)) { best = new Move(nodes[i].Id, j + 1); bestStop = s; }
            }
        }
        return best!.Value;
    }
}
