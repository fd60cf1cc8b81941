using Bramble.Rules;
using Bramble.Values;

namespace Bramble.Search.Tests;

/// <summary>
/// Every player keeps to its budget and the halt signal: with next to no time, a node cap, or a
/// halt already given, it still answers with a legal move and says the answer is not exact. No
/// times are asserted (that is bench/ work): only the report's flags and the move's legality.
/// </summary>
public class BudgetTests
{
    private static readonly IRuleset Domineering = Rulesets.Get("domineering");

    // Boards far beyond a millisecond's work for every player: perfect's whole-board search needs
    // about 120,000 nodes for 7×7 and tens of millions for 8×8 (bench/README.md), alphabeta far
    // more. (6×6 takes perfect a few thousand nodes now, under its first look at the clock.)
    public static TheoryData<string, string> PlayersAndBoards()
    {
        var data = new TheoryData<string, string>();
        foreach (var name in Players.Names)
            foreach (var board in new[] { "7x7", "8x8" })
                data.Add(name, board);
        return data;
    }

    private static void AssertLegalAndNotExact(IPosition position, Side side, Decision d, string what)
    {
        Assert.False(d.Exact, $"{what}: claims an exact answer");
        Assert.Null(d.Winning);
        Assert.NotNull(d.Move);
        Assert.Contains(d.Move!.Value, position.Moves(side));
    }

    [Theory]
    [MemberData(nameof(PlayersAndBoards))]
    public void WithAOneMillisecondBudgetEveryPlayerReturnsALegalMoveMarkedNotExact(string name, string board)
    {
        var position = Domineering.Parse(board);
        foreach (var side in new[] { Side.Left, Side.Right })
        {
            var d = Players.Create(name).Choose(position, side, TimeSpan.FromMilliseconds(1));
            AssertLegalAndNotExact(position, side, d, $"{name} on {board}, {side.Word()} first");
        }
    }

    [Theory]
    [MemberData(nameof(PlayersAndBoards))]
    public void AHaltedPlayerStillReturnsALegalMoveMarkedNotExact(string name, string board)
    {
        var position = Domineering.Parse(board);
        using var halt = new CancellationTokenSource();
        halt.Cancel();
        var d = Players.Create(name).Choose(position, Side.Left, TimeSpan.FromMinutes(10), halt.Token);
        AssertLegalAndNotExact(position, Side.Left, d, $"{name} on {board}, halted");
    }

    [Fact]
    public void PastItsNodeCapPerfectFallsBackOnEstimatedThermographsAndSaysSo()
    {
        // 6×6 is bigger than any size perfect values exactly, so the fallback has to estimate its thermograph.
        var position = Domineering.Parse("6x6");
        var player = new PerfectPlayer(new PerfectSettings { NodeCap = 100 });
        var d = player.Choose(position, Side.Left, TimeSpan.FromMinutes(2));
        AssertLegalAndNotExact(position, Side.Left, d, "perfect capped at 100 nodes");
        Assert.True(d.Estimated, "the fallback read an estimated thermograph but did not say so");
    }

    [Fact]
    public void TemperaturePlayersSayWhenTheyReadAnEstimate()
    {
        // A 6×6 board is over the reader's exact size: its thermograph is an estimate. Two 2×2
        // squares (±1 each, published Domineering results (Lachmann, Moore, Rapaport; Bullock)) are valued exactly.
        foreach (var rule in new[] { TemperatureRule.Hotstrat, TemperatureRule.Thermostrat, TemperatureRule.Sentestrat })
        {
            var large = Domineering.Parse("6x6");
            var d = new TemperaturePlayer(rule).Choose(large, Side.Left, TimeSpan.FromMinutes(2));
            Assert.True(d.Estimated, $"{rule} on 6x6");
            Assert.Contains(d.Move!.Value, large.Moves(Side.Left));

            var small = Domineering.Parse("2x2");
            Assert.False(new TemperaturePlayer(rule).Choose(small, Side.Left, TimeSpan.FromMinutes(2)).Estimated, $"{rule} on 2x2");
        }
    }

    [Fact]
    public void AlphaBetaAtItsNodeCapSaysSo()
    {
        var position = Domineering.Parse("6x6");
        var player = new AlphaBetaPlayer(nodeCap: 1_000, log2TableSize: 12);
        var d = player.Choose(position, Side.Left, TimeSpan.FromMinutes(2));
        AssertLegalAndNotExact(position, Side.Left, d, "alphabeta capped at 1,000 nodes");
        Assert.True(player.LastHitCap);
    }

    [Fact]
    public void TheSolverReportsABudgetedAnswerAsNotExact()
    {
        // docs/cli.md: `exact` is false when the search ran out of budget; then no winner is claimed.
        var report = Solver.Solve(Domineering.Parse("7x7"), [Side.Left, Side.Right], new PerfectPlayer(), TimeSpan.FromMilliseconds(5));
        Assert.False(report.Exact);
        Assert.Null(report.Outcome);
        Assert.Null(report.LeftFirst!.Winner);
        Assert.Null(report.LeftFirst.Move);
    }
}
