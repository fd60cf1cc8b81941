using Bramble.Values;

namespace Bramble.Rules.Tests.Forms;

/// <summary>
/// Plain search for the tests: the value of a whole position from its moves alone,
/// {values after each Left move | values after each Right move}, recursing through
/// <see cref="IPosition.Play"/> and memoised only by the exact position text. It never looks
/// at components, normal keys or expressions.
/// </summary>
public sealed class PlainForms(GameStore store)
{
    private readonly Dictionary<string, Game> _seen = new(StringComparer.Ordinal);

    public Game Value(IPosition position)
    {
        if (_seen.TryGetValue(position.Text, out var known)) return known;
        var left = position.Moves(Side.Left).Select(m => Value(position.Play(Side.Left, m))).ToArray();
        var right = position.Moves(Side.Right).Select(m => Value(position.Play(Side.Right, m))).ToArray();
        var value = store.Make(left, right);
        _seen[position.Text] = value;
        return value;
    }
}
