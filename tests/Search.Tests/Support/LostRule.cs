using Bramble.Rules;
using Bramble.Values;
using Xunit;

namespace Bramble.Search.Tests.Support;

/// <summary>
/// The rule for lost positions (docs/players.md): perfect plays a move with the least chance that
/// the opponent finds a winning reply, ½·W/N + ½·Wo/No (W winning replies among all N, Wo among
/// the No obvious ones: the moves Hotstrat and Thermostrat choose). The replies are decided here
/// by plain search; the obvious ones are asked of the temperature players themselves.
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
        var chances = position.Moves(side).Select(m => Chance(brute, position.Play(side, m), side.Other(), budget)).ToList();
        var best = chances.Aggregate((p, q) => Less(q, p) ? q : p);
        var mine = Chance(brute, position.Play(side, d.Move!.Value), side.Other(), budget);
        Assert.True(!Less(best, mine),
            $"{position.Text}, {side.Word()} to move: {position.FormatMove(d.Move!.Value)} leaves a chance of {mine.Numerator}/{mine.Denominator} that the opponent finds a win; another move leaves {best.Numerator}/{best.Denominator}");
        return true;
    }

    /// <summary>The chance, as a fraction, that <paramref name="toMove"/> finds a winning move in <paramref name="position"/>.</summary>
    public static (long Numerator, long Denominator) Chance(BruteForce brute, IPosition position, Side toMove, TimeSpan budget)
    {
        var moves = position.Moves(toMove);
        var obvious = new HashSet<Move>();
        foreach (var rule in new[] { TemperatureRule.Hotstrat, TemperatureRule.Thermostrat })
            if (new TemperaturePlayer(rule).Choose(position, toMove, budget).Move is { } m) obvious.Add(m);
        if (obvious.Count == 0) obvious.UnionWith(moves);
        bool Wins(Move m) => !brute.Wins(position.Play(toMove, m), toMove.Other());
        long n = moves.Count, w = moves.Count(Wins), no = obvious.Count, wo = obvious.Count(Wins);
        return (w * no + wo * n, 2 * n * no);
    }

    private static bool Less((long N, long D) a, (long N, long D) b) => a.N * b.D < b.N * a.D;
}
