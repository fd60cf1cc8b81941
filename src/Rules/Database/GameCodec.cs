using System.Numerics;
using Bramble.Values;

namespace Bramble.Rules.Database;

/// <summary>
/// Store-independent serialisation of canonical games, through <see cref="GameStore"/>'s public
/// API only. A set of games is written as the DAG of their canonical forms in topological order
/// (every option before the games that use it), each node one of:
/// <code>
///   0  number   numerator (length-prefixed two's-complement bytes), exponent (7-bit varint): n / 2^e
///   1  nimber   m (varint): *m, written compactly because *m has m options on each side
///   2  options  left count, left node indices…, right count, right node indices… (varints)
/// </code>
/// Numbers and nimbers are leaves, so their option chains are never written. Reading rebuilds
/// each node with <see cref="GameStore.Make(IEnumerable{Game}, IEnumerable{Game})"/>: options
/// that are canonical make a game that is already canonical, so the games come back equal.
/// </summary>
public static class GameCodec
{
    private const byte NumberNode = 0, NimberNode = 1, OptionsNode = 2;

    // Bounds that no real database reaches; a damaged count must not make the reader build absurd games.
    private const int MaxExponent = 1 << 20;
    private const int MaxNimber = 1 << 12;

    /// <summary>Collects games and the options they need, numbering the nodes in topological order.</summary>
    public sealed class Writer(GameStore store)
    {
        private readonly Dictionary<Game, int> _index = new();
        private readonly List<Game> _order = new();

        public int Count => _order.Count;

        /// <summary>The node index of <paramref name="game"/>, adding it and its options first if needed.</summary>
        public int Add(Game game)
        {
            if (_index.TryGetValue(game, out int known)) return known;
            // Iterative post-order walk: canonical forms of big positions can be deep.
            var stack = new Stack<(Game Game, bool Expanded)>();
            stack.Push((game, false));
            while (stack.Count > 0)
            {
                var (g, expanded) = stack.Pop();
                if (_index.ContainsKey(g)) continue;
                if (expanded || IsLeaf(g))
                {
                    _index[g] = _order.Count;
                    _order.Add(g);
                    continue;
                }
                stack.Push((g, true));
                foreach (var o in store.RightOptions(g)) if (!_index.ContainsKey(o)) stack.Push((o, false));
                foreach (var o in store.LeftOptions(g)) if (!_index.ContainsKey(o)) stack.Push((o, false));
            }
            return _index[game];
        }

        private bool IsLeaf(Game g) => store.IsNumber(g) || store.IsNimber(g);

        public void WriteNodes(BinaryWriter output)
        {
            output.Write7BitEncodedInt(_order.Count);
            foreach (var g in _order)
            {
                if (store.TryGetNumber(g, out var x))
                {
                    output.Write(NumberNode);
                    var bytes = x.Numerator.ToByteArray();
                    output.Write7BitEncodedInt(bytes.Length);
                    output.Write(bytes);
                    output.Write7BitEncodedInt(x.Exponent);
                }
                else if (store.TryGetNimber(g, out int m))
                {
                    output.Write(NimberNode);
                    output.Write7BitEncodedInt(m);
                }
                else
                {
                    output.Write(OptionsNode);
                    WriteIndices(output, store.LeftOptions(g));
                    WriteIndices(output, store.RightOptions(g));
                }
            }
        }

        private void WriteIndices(BinaryWriter output, IReadOnlyList<Game> options)
        {
            output.Write7BitEncodedInt(options.Count);
            foreach (var o in options) output.Write7BitEncodedInt(_index[o]);
        }
    }

    /// <summary>
    /// Reads the nodes written by <see cref="Writer.WriteNodes"/> into <paramref name="store"/>.
    /// Throws <see cref="InvalidDataException"/> on anything that is not a well-formed node list.
    /// </summary>
    public static Game[] ReadNodes(BinaryReader input, GameStore store)
    {
        int count = input.Read7BitEncodedInt();
        long remaining = input.BaseStream.Length - input.BaseStream.Position;
        if (count < 0 || count > remaining) throw new InvalidDataException($"a node count of {count} does not fit the data");
        var nodes = new Game[count];
        var left = new List<Game>();
        var right = new List<Game>();
        for (int i = 0; i < count; i++)
        {
            byte kind = input.ReadByte();
            switch (kind)
            {
                case NumberNode:
                {
                    int length = input.Read7BitEncodedInt();
                    if (length < 1 || length > 1 << 16) throw new InvalidDataException($"node {i}: a numerator of {length} bytes");
                    var numerator = new BigInteger(input.ReadBytes(length));
                    int exponent = input.Read7BitEncodedInt();
                    if (exponent < 0 || exponent > MaxExponent) throw new InvalidDataException($"node {i}: exponent {exponent}");
                    nodes[i] = store.Number(Dyadic.FromInteger(numerator).Shift(exponent));
                    break;
                }
                case NimberNode:
                {
                    int m = input.Read7BitEncodedInt();
                    if (m < 1 || m > MaxNimber) throw new InvalidDataException($"node {i}: nimber *{m}");
                    nodes[i] = store.Nimber(m);
                    break;
                }
                case OptionsNode:
                    ReadIndices(input, nodes, i, left);
                    ReadIndices(input, nodes, i, right);
                    nodes[i] = store.Make(left, right);
                    break;
                default:
                    throw new InvalidDataException($"node {i}: unknown kind {kind}");
            }
        }
        return nodes;
    }

    private static void ReadIndices(BinaryReader input, Game[] nodes, int current, List<Game> into)
    {
        into.Clear();
        int n = input.Read7BitEncodedInt();
        if (n < 0 || n > current) throw new InvalidDataException($"node {current}: {n} options, but only {current} nodes come before it");
        for (int k = 0; k < n; k++)
        {
            int index = input.Read7BitEncodedInt();
            // Topological order: an option is always an earlier node.
            if (index < 0 || index >= current) throw new InvalidDataException($"node {current}: option index {index} is not an earlier node");
            into.Add(nodes[index]);
        }
    }
}
