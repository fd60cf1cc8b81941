using Bramble.Rules;
using Bramble.Values;

namespace Bramble.Wire.Tests;

/// <summary>
/// A test-only ruleset so the host can be tested without the real ones: a sum of stalks of
/// <c>L</c> and <c>R</c> pieces, listed bottom-up and joined by <c>+</c> (<c>LRR+L</c>); <c>0</c>
/// is the empty position. Left cuts an <c>L</c>, Right an <c>R</c>, and everything above the cut
/// falls. A move is <c>&lt;stalk&gt;.&lt;height&gt;</c>, 1-based, and stalk numbers stay fixed for
/// the game. Values come from plain recursion over the options, with no shortcut, and tick the
/// context so budgets apply. With <paramref name="endless"/> the values never finish, to test budgets.
/// </summary>
public sealed class StalksRuleset(string name = "stalks", bool endless = false) : IRuleset
{
    public string Name => name;

    public IReadOnlyList<string> Generators => [];

    public IReadOnlyList<string> Generate(string generator, int count, int size, int seed, string? colours = null) =>
        throw new ArgumentException("no generators");

    public IPosition Parse(string text)
    {
        var trimmed = text.Trim();
        if (trimmed == "0") return new StalksPosition(this, []);
        var stalks = new List<string>();
        var current = new System.Text.StringBuilder();
        for (var i = 0; i < text.Length; i++)
        {
            var c = char.ToUpperInvariant(text[i]);
            if (c is 'L' or 'R') current.Append(c);
            else if (c == '+' && current.Length > 0) { stalks.Add(current.ToString()); current.Clear(); }
            else if (c != ' ') throw new PositionSyntaxException(text, i, current.Length > 0 ? "L, R or +" : "L or R");
        }
        if (current.Length == 0) throw new PositionSyntaxException(text, text.Length, "L or R");
        stalks.Add(current.ToString());
        return new StalksPosition(this, stalks);
    }

    public Game Value(IPosition position, ValueContext context)
    {
        var stalks = (StalksPosition)position;
        if (endless)
            while (true) context.Tick();
        return context.Store.Sum(stalks.Stalks.Where(s => s.Length > 0).Select(s => StalkValue(s, context)));
    }

    private Game StalkValue(string stalk, ValueContext context)
    {
        if (context.TryGetMemo(this, stalk, out var known)) return known;
        context.Tick();
        var left = new List<Game>();
        var right = new List<Game>();
        for (var i = 0; i < stalk.Length; i++)
            (stalk[i] == 'L' ? left : right).Add(StalkValue(stalk[..i], context));
        var value = context.Store.Make(left, right);
        context.SetMemo(this, stalk, value);
        return value;
    }
}

public sealed class StalksPosition(StalksRuleset ruleset, IReadOnlyList<string> stalks) : IPosition
{
    public IReadOnlyList<string> Stalks => stalks;

    public IRuleset Ruleset => ruleset;

    public string Text => stalks.Any(s => s.Length > 0) ? string.Join("+", stalks.Where(s => s.Length > 0)) : "0";

    public IReadOnlyList<Move> Moves(Side side)
    {
        var piece = side == Side.Left ? 'L' : 'R';
        var moves = new List<Move>();
        for (var k = 0; k < stalks.Count; k++)
            for (var i = 0; i < stalks[k].Length; i++)
                if (stalks[k][i] == piece) moves.Add(new Move(k + 1, i + 1));
        return moves;
    }

    public IPosition Play(Side side, Move move)
    {
        if (!Moves(side).Contains(move)) throw new IllegalMoveException($"{FormatMove(move)} is not a move for {side.Word()}");
        var next = stalks.ToArray();
        next[move.A - 1] = next[move.A - 1][..(move.B - 1)];
        return new StalksPosition(ruleset, next);
    }

    public string FormatMove(Move move) => $"{move.A}.{move.B}";

    public Move ParseMove(string text)
    {
        var dot = text.IndexOf('.');
        if (dot <= 0 || !int.TryParse(text[..dot], out var k) || !int.TryParse(text[(dot + 1)..], out var i))
            throw new IllegalMoveException($"'{text}' is not <stalk>.<height>");
        return new Move(k, i);
    }

    public IReadOnlyList<IPosition> Components() =>
        Enumerable.Range(0, stalks.Count).Where(k => stalks[k].Length > 0)
            .Select(k => (IPosition)new StalksPosition(ruleset, stalks.Select((s, j) => j == k ? s : "").ToArray()))
            .ToList();

    public string NormalKey => Text;

    public ulong Hash => (ulong)string.Join("+", stalks).GetHashCode();

    public int Size => stalks.Sum(s => s.Length);
}
