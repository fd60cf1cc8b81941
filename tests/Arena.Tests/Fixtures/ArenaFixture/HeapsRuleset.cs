using Bramble.Rules;
using Bramble.Values;

namespace Bramble.Arena.Fixture;

/// <summary>
/// A tiny partizan ruleset for the harness tests, so they need none of the real rulesets: a sum of
/// heaps, each owned by Left (<c>L3</c>), by Right (<c>R2</c>) or by both (<c>N4</c>). A side may
/// shrink a heap it may move in to any smaller size; a move is <c>k.n</c> (heap k, 1-based, down
/// to n). By the definitions a Left heap of n is the integer n, a Right heap −n, a shared heap the
/// nimber *n (it is a Nim heap), so a position is a number plus a nimber.
/// </summary>
public sealed class HeapsRuleset : IRuleset
{
    public string Name => "heaps";

    public IReadOnlyList<string> Generators => ["random"];

    public IPosition Parse(string text)
    {
        var trimmed = text.Trim();
        if (trimmed == "0") return new HeapsPosition(this, []);
        var heaps = new List<Heap>();
        var column = 0;
        foreach (var part in text.Split('+'))
        {
            var token = part.Trim();
            var at = column + part.IndexOf(token, StringComparison.Ordinal);
            if (token.Length < 2 || "LRN".IndexOf(char.ToUpperInvariant(token[0])) < 0)
                throw new PositionSyntaxException(text, Math.Max(0, at), "a heap such as L3, R2 or N4");
            if (!int.TryParse(token.AsSpan(1), out var size) || size < 0 || size > 64)
                throw new PositionSyntaxException(text, at + 1, "a heap size from 0 to 64");
            heaps.Add(new Heap(char.ToUpperInvariant(token[0]), size, heaps.Count + 1));
            column += part.Length + 1;
        }
        return new HeapsPosition(this, heaps);
    }

    public Game Value(IPosition position, ValueContext context)
    {
        var store = context.Store;
        var sum = store.Zero;
        foreach (var heap in ((HeapsPosition)position).Heaps)
        {
            context.Tick();
            var value = heap.Owner switch
            {
                'L' => store.Integer(heap.Size),
                'R' => store.Integer(-heap.Size),
                _ => store.Nimber(heap.Size),
            };
            sum = store.Add(sum, value);
        }
        return sum;
    }

    public IReadOnlyList<string> Generate(string generator, int count, int size, int seed, string? colours = null)
    {
        var random = new Random(seed);
        return Enumerable.Range(0, count)
            .Select(_ => string.Join(" + ", Enumerable.Range(0, 1 + random.Next(3)).Select(_ => $"{"LRN"[random.Next(3)]}{1 + random.Next(size)}")))
            .ToList();
    }
}

/// <summary>One heap: its owner (L, R or N), its size and its fixed number in the position.</summary>
public readonly record struct Heap(char Owner, int Size, int Number)
{
    public bool Allows(Side side) => Owner == 'N' || Owner == (side == Side.Left ? 'L' : 'R');
}

public sealed class HeapsPosition(IRuleset ruleset, IReadOnlyList<Heap> heaps) : IPosition
{
    public IReadOnlyList<Heap> Heaps { get; } = heaps;

    public IRuleset Ruleset => ruleset;

    public string Text => Heaps.Count == 0 ? "0" : string.Join(" + ", Heaps.Select(h => $"{h.Owner}{h.Size}"));

    public IReadOnlyList<Move> Moves(Side side) =>
        Heaps.Where(h => h.Allows(side)).SelectMany(h => Enumerable.Range(0, h.Size).Select(n => new Move(h.Number, n))).ToList();

    public IPosition Play(Side side, Move move)
    {
        var index = Heaps.ToList().FindIndex(h => h.Number == move.A);
        if (index < 0 || !Heaps[index].Allows(side) || move.B < 0 || move.B >= Heaps[index].Size)
            throw new IllegalMoveException($"{FormatMove(move)} is not a move for {side.Word()} in {Text}");
        var next = Heaps.ToList();
        next[index] = next[index] with { Size = move.B };
        return new HeapsPosition(ruleset, next);
    }

    public string FormatMove(Move move) => $"{move.A}.{move.B}";

    public Move ParseMove(string text)
    {
        var parts = text.Split('.');
        if (parts.Length != 2 || !int.TryParse(parts[0], out var heap) || !int.TryParse(parts[1], out var size))
            throw new IllegalMoveException($"'{text}' is not a heaps move (k.n)");
        return new Move(heap, size);
    }

    public IReadOnlyList<IPosition> Components() =>
        Heaps.Where(h => h.Size > 0).Select(h => (IPosition)new HeapsPosition(ruleset, [h])).ToList();

    public string NormalKey => string.Join("+", Heaps.Where(h => h.Size > 0).Select(h => $"{h.Owner}{h.Size}").Order());

    public ulong Hash => (ulong)NormalKey.GetHashCode();

    public int Size => Heaps.Sum(h => h.Size);
}
