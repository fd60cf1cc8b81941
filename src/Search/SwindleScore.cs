using Bramble.Values;

namespace Bramble.Search;

/// <summary>
/// How good a losing move is as a swindle, by exact analysis of the position it leaves (the
/// opponent to move), for the rule of lost positions in docs/players.md. Compared in order:
/// <list type="number">
/// <item>the <b>chance</b> that the opponent finds a winning reply, under a simple model of a
/// fallible opponent: half the time it picks one of its replies at random, half the time one of
/// its <i>obvious</i> replies (the moves the temperature strategies Hotstrat and Thermostrat
/// choose there: where a reading of the thermographs points). The chance is ½·W/N + ½·Wo/No with W winning replies among N, and Wo among the No
/// obvious ones. Lower is better: few winning replies among many, and none where the eye goes.</item>
/// <item>the <b>margin</b>: the mean of the position left, from the mover's side (the sum of the
/// components' means; closer to zero, or even past it, is better — a small slip turns it).</item>
/// <item>the <b>length</b>: how long the game can still last (the components' birthdays, a large
/// component's size), longer is better — more moves, more chances for a slip.</item>
/// <item>Thermostrat's ranking of the move (<see cref="Rank"/>, lower is better).</item>
/// </list>
/// </summary>
internal readonly record struct SwindleScore(int Winning, int Replies, int ObviousWinning, int Obvious, Dyadic Margin, long Length, int Rank)
{
    /// <summary>Whether this move is a better swindle than <paramref name="other"/>.</summary>
    public bool IsBetterThan(SwindleScore other)
    {
        int c = CompareChance(other);
        if (c != 0) return c < 0;
        c = Margin.CompareTo(other.Margin);
        if (c != 0) return c > 0;
        if (Length != other.Length) return Length > other.Length;
        return Rank < other.Rank;
    }

    /// <summary>
    /// Compares the chances exactly: W/N + Wo/No = (W·No + Wo·N) / (N·No), cross-multiplied in
    /// integers, so that the choice is the same on every machine.
    /// </summary>
    private int CompareChance(SwindleScore other)
    {
        long mine = ((long)Winning * Obvious + (long)ObviousWinning * Replies) * ((long)other.Replies * other.Obvious);
        long theirs = ((long)other.Winning * other.Obvious + (long)other.ObviousWinning * other.Replies) * ((long)Replies * Obvious);
        return mine.CompareTo(theirs);
    }
}
