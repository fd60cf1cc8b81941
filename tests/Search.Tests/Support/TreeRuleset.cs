using Bramble.Rules;
using Bramble.Values;

namespace Bramble.Search.Tests.Support;

/// <summary>
/// A test-only ruleset of explicit game trees: a position is a sum of trees, an option may itself
/// be a sum (so moves can split a component in two), and every node carries an id unique in its
/// position, so a move "node id . option number" names the same move in a component and in the
/// whole. Values come from plain memoised search over the trees.
/// </summary>
public sealed class TreeRuleset : IRuleset
{
    public string Name => "trees";

    public IPosition Parse(string text) => throw new NotSupportedException("tree positions are built in code");

    public Game Value(IPosition position, ValueContext context)
    {
        var store = context.Store;
        var total = store.Zero;
        foreach (var node in ((TreePosition)position).Nodes) total = store.Add(total, NodeValue(node, context));
        return total;
    }

    private Game NodeValue(TreeNode node, ValueContext context)
    {
        if (node.Parts is { } parts)
            return context.Store.Sum(parts.Select(p => NodeValue(p, context)).ToList());
        if (context.TryGetMemo(this, node.Key, out var known)) return known;
        context.Tick();
        var v = context.Store.Make(node.Left.Select(o => NodeValue(o, context)).ToList(), node.Right.Select(o => NodeValue(o, context)).ToList());
        context.SetMemo(this, node.Key, v);
        return v;
    }

    public IReadOnlyList<string> Generators => [];

    public IReadOnlyList<string> Generate(string generator, int count, int size, int seed, string? colours = null) => [];
}

/// <summary>A node of a game tree: options for each side, or (for a sum node) its parts.</summary>
public sealed class TreeNode
{
    private string? _key;

    public TreeNode(int id, TreeNode[] left, TreeNode[] right, TreeNode[]? parts = null)
    {
        Id = id;
        Left = left;
        Right = right;
        Parts = parts;
    }

    public int Id { get; }
    public TreeNode[] Left { get; }
    public TreeNode[] Right { get; }
    public TreeNode[]? Parts { get; }

    public TreeNode[] Options(Side side) => side == Side.Left ? Left : Right;

    /// <summary>Structure only (no ids): equal keys, equal game trees.</summary>
    public string Key => _key ??= Parts is { } parts
        ? "(" + string.Join("+", parts.Select(p => p.Key).Order(StringComparer.Ordinal)) + ")"
        : "{" + string.Join(",", Left.Select(o => o.Key).Order(StringComparer.Ordinal)) + "|"
              + string.Join(",", Right.Select(o => o.Key).Order(StringComparer.Ordinal)) + "}";

    public int Count => 1 + (Parts ?? []).Sum(p => p.Count) + Left.Sum(o => o.Count) + Right.Sum(o => o.Count);

    /// <summary>The summands this node stands for, those where nobody can move left out.</summary>
    public IEnumerable<TreeNode> Flatten()
    {
        if (Parts is { } parts)
        {
            foreach (var p in parts) foreach (var q in p.Flatten()) yield return q;
        }
        else if (Left.Length > 0 || Right.Length > 0) yield return this;
    }
}

/// <summary>A sum of game trees.</summary>
public sealed class TreePosition(TreeRuleset ruleset, IReadOnlyList<TreeNode> nodes) : IPosition
{
    public IReadOnlyList<TreeNode> Nodes { get; } = nodes;

    public IRuleset Ruleset => ruleset;

    public string Text => Nodes.Count == 0 ? "0" : string.Join(" + ", Nodes.Select(n => n.Key).Order(StringComparer.Ordinal));

    public IReadOnlyList<Move> Moves(Side side)
    {
        var moves = new List<Move>();
        foreach (var n in Nodes)
            for (int j = 1; j <= n.Options(side).Length; j++) moves.Add(new Move(n.Id, j));
        return moves;
    }

    public IPosition Play(Side side, Move move)
    {
        int at = -1;
        for (int i = 0; i < Nodes.Count; i++) if (Nodes[i].Id == move.A) at = i;
        if (at < 0 || move.B < 1 || move.B > Nodes[at].Options(side).Length)
            throw new IllegalMoveException($"{FormatMove(move)} is not a move for {side.Word()}");
        var next = new List<TreeNode>();
        for (int i = 0; i < Nodes.Count; i++) if (i != at) next.Add(Nodes[i]);
        next.AddRange(Nodes[at].Options(side)[move.B - 1].Flatten());
        return new TreePosition(ruleset, next);
    }

    public string FormatMove(Move move) => $"{move.A}.{move.B}";

    public Move ParseMove(string text)
    {
        var parts = text.Split('.');
        if (parts.Length != 2 || !int.TryParse(parts[0], out int a) || !int.TryParse(parts[1], out int b))
            throw new IllegalMoveException($"'{text}' is not a tree move");
        return new Move(a, b);
    }

    public IReadOnlyList<IPosition> Components() =>
        Nodes.Count == 1 ? [this] : Nodes.Select(n => (IPosition)new TreePosition(ruleset, [n])).ToList();

    public string NormalKey => Text;

    public ulong Hash
    {
        get
        {
            // Additive, so it does not depend on the order of the components.
            ulong h = 0;
            foreach (var n in Nodes) h += Mix((ulong)n.Id);
            return h;
        }
    }

    public int Size => Nodes.Sum(n => n.Count);

    private static ulong Mix(ulong x)
    {
        x += 0x9E3779B97F4A7C15UL;
        x = (x ^ (x >> 30)) * 0xBF58476D1CE4E5B9UL;
        x = (x ^ (x >> 27)) * 0x94D049BB133111EBUL;
        return x ^ (x >> 31);
    }
}
