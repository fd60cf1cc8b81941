using Bramble.Rules;
using Bramble.Values;

namespace Bramble.Search.Tests.Support;

/// <summary>
/// Plain win/loss search over the whole position by the normal-play rule (no move: you lose),
/// memoised on the position's text: written here, independently of the players under test.
/// </summary>
public sealed class BruteForce
{
    private readonly Dictionary<(string, Side), bool> _memo = new();

    public long Nodes { get; private set; }

    public bool Wins(IPosition position, Side toMove)
    {
        var key = (position.Text, toMove);
        if (_memo.TryGetValue(key, out bool known)) return known;
        Nodes++;
        bool win = false;
        foreach (var m in position.Moves(toMove))
        {
            if (!Wins(position.Play(toMove, m), toMove.Other())) { win = true; break; }
        }
        _memo[key] = win;
        return win;
    }

    /// <summary>How many of <paramref name="toMove"/>'s moves win.</summary>
    public int WinningMoves(IPosition position, Side toMove) =>
        position.Moves(toMove).Count(m => !Wins(position.Play(toMove, m), toMove.Other()));
}
