namespace Bramble.Wire.Tests;

public class MoveBudgetTests
{
    [Fact]
    public void WithoutAClockTheBudgetSettingIsTheBudget()
    {
        Assert.Equal(TimeSpan.FromMilliseconds(750), MoveBudget.For(null, null, 750, positionSize: 40));
        Assert.Equal(TimeSpan.FromMilliseconds(750), MoveBudget.For(null, 500, 750, positionSize: 40));
    }

    [Fact]
    public void TheBudgetSettingCapsTheClockShare()
    {
        Assert.Equal(TimeSpan.FromMilliseconds(100), MoveBudget.For(600_000, 1000, 100, positionSize: 10));
    }

    [Theory]
    // Worked by hand from the rule in MoveBudget (derived from the definitions of the rule):
    [InlineData(10_050L, 400L, 20, 1249L)]   // usable 9498, 10 moves to go: 949 + 300
    [InlineData(10_000L, 100L, 2, 2437L)]    // usable 9450, at least 4 moves: 2362 + 75
    [InlineData(10_000L, 100L, 500, 390L)]   // usable 9450, at most 30 moves: 315 + 75
    [InlineData(40L, 0L, 10, 1L)]            // nothing usable: at least 1 ms
    [InlineData(40L, 200L, 10, 88L)]         // usable −12: share 150, capped at −12 + 100
    [InlineData(100L, 200L, 10, 145L)]       // usable 45: share 9 + 150 = 159, capped at 45 + 100
    public void ClockAndIncrementBecomeABudget(long clock, long inc, int size, long expectedMs)
    {
        Assert.Equal(TimeSpan.FromMilliseconds(expectedMs), MoveBudget.For(clock, inc, 60_000, size));
    }

    [Theory]
    [InlineData(10_000L, 100L, 30L, 300)]   // the clock of docs/matches.md's example match
    [InlineData(10_000L, 0L, 5L, 100)]      // no increment: the overhead comes out of the base
    [InlineData(1_000L, 20L, 15L, 300)]
    [InlineData(200L, 10L, 4L, 300)]
    [InlineData(60_000L, 1_000L, 40L, 300)]
    public void ASideNeverRunsOutOfTimeInALongGame(long baseMs, long incMs, long overheadMs, int moves)
    {
        // A side spends its whole budget plus a fixed overhead (pipes, process, formatting) on each
        // move, on a position that shrinks by two per move pair; its clock must stay positive.
        var clock = baseMs;
        for (var move = 0; move < moves; move++)
        {
            var size = Math.Max(1, 2 * moves - 2 * move);
            var spent = (long)MoveBudget.For(clock, incMs, 60_000, size).TotalMilliseconds + overheadMs;
            clock = clock - spent + incMs;
            Assert.True(clock > 0, $"clock ran out at move {move}");
        }
    }
}
