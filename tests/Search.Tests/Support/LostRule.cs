using Bramble.Rules;
using Bramble.Values;
using Xunit;

namespace Bramble.Search.Tests.Support;

/// <summary>
/// The rule for lost positions (docs/players.md): perfect plays a move that leaves the opponent
/// the fewest winning replies, the replies counted here by plain search.
/// </summary>
public static class LostRule
{
    /// <summary>Checks perfect's move when <paramref name="side"/> has moves and loses; false when the position is not lost.</summary>
    public static bool Check(PerfectPlayer perfect, BruteForce brute, IPosition position, Side side, TimeSpan budget)
    {
        if (position.Moves(side).Count == 0 || brute.Wins(position, side)) return false;
        var d = perfect.Choose(position, side, budget);
        Assert.True(d.Exact);
        Assert.False(d.Winning);
        int fewest = position.Moves(side).Min(m => brute.WinningMoves(position.Play(side, m), side.Other()));
        Assert.True(fewest == brute.WinningMoves(position.Play(side, d.Move!.Value), side.Other()),
            $"{position.Text}, {side.Word()} to move: {position.FormatMove(d.Move!.Value)} leaves more than {fewest} winning replies");
        return true;
    }
}
