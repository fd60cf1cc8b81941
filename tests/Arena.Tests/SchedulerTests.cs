using Bramble.Arena.Schedule;
using Bramble.Arena.Spec;
using Bramble.Values;

namespace Bramble.Arena.Tests;

public class SchedulerTests
{
    private static MatchSpec Spec(int players, int positions, SeatPlan seats, TournamentFormat format = TournamentFormat.RoundRobin, string? focus = null) => new()
    {
        Title = "t",
        Folder = "/tmp",
        JournalPath = "/tmp/j.jsonl",
        Players = Enumerable.Range(1, players).Select(i => new PlayerSpec($"p{i}", ["x"], [])).ToList(),
        Positions = Enumerable.Range(1, positions).Select(i => new StartPosition("heaps", $"L{i}", $"line {i}")).ToList(),
        Seats = seats,
        Format = format,
        Focus = focus,
    };

    [Theory]
    [InlineData(4, 24, SeatPlan.Swap, 6 * 24 * 2)]
    [InlineData(4, 24, SeatPlan.AllFour, 6 * 24 * 4)]
    [InlineData(2, 5, SeatPlan.AllFour, 20)]
    [InlineData(5, 3, SeatPlan.Swap, 10 * 3 * 2)]
    public void RoundRobinPlaysEveryPairOnEveryPosition(int players, int positions, SeatPlan seats, int games)
    {
        // Derived from the definitions: n(n−1)/2 pairs × positions × seatings (4 or 2).
        var schedule = Scheduler.Build(Spec(players, positions, seats));
        Assert.Equal(games, schedule.Count);
        Assert.Equal(Enumerable.Range(1, games), schedule.Select(g => g.Id));
    }

    [Fact]
    public void ChallengerPairsTheFocusWithEveryOtherPlayer()
    {
        var schedule = Scheduler.Build(Spec(4, 2, SeatPlan.Swap, TournamentFormat.Challenger, "p3"));
        // Derived from the definitions: 3 opponents × 2 positions × 2 seatings, all involving p3.
        Assert.Equal(12, schedule.Count);
        Assert.All(schedule, g => Assert.Contains("p3", g.Pair));
        Assert.Equal(["p1", "p2", "p4"], schedule.Select(g => g.Pair[1]).Distinct().Order());
    }

    [Fact]
    public void AllFourSeatsEachPlayerOnEachSideWithEachSideFirst()
    {
        var schedule = Scheduler.Build(Spec(2, 1, SeatPlan.AllFour));
        // docs/matches.md: each player as Left and as Right, each side moving first.
        Assert.Equal(4, schedule.Select(g => (g.Left, g.First)).Distinct().Count());
        Assert.All(schedule, g => Assert.NotEqual(g.Left, g.Right));
    }

    [Fact]
    public void SwapSwapsSeatsWithTheSameSideFirstAndAlternatesItOverPositions()
    {
        var schedule = Scheduler.Build(Spec(2, 4, SeatPlan.Swap));
        foreach (var pair in schedule.Chunk(2))
        {
            // docs/matches.md: two games, seats swapped, same side first.
            Assert.Equal(pair[0].Left, pair[1].Right);
            Assert.Equal(pair[0].First, pair[1].First);
            Assert.Equal(pair[0].Position, pair[1].Position);
        }
        Assert.Equal([Side.Left, Side.Right, Side.Left, Side.Right], schedule.Chunk(2).Select(p => p[0].First));
    }

    [Fact]
    public void IdsDependOnlyOnTheSpec()
    {
        var a = Scheduler.Build(Spec(3, 5, SeatPlan.AllFour));
        var b = Scheduler.Build(Spec(3, 5, SeatPlan.AllFour));
        Assert.Equal(a, b, (x, y) => x.Id == y.Id && x.Left == y.Left && x.Right == y.Right && x.First == y.First && x.Position == y.Position);
    }

    [Theory]
    [InlineData(4)]
    [InlineData(7)]
    public void ShardsPartitionTheGames(int n)
    {
        var schedule = Scheduler.Build(Spec(3, 5, SeatPlan.AllFour));
        var shards = Enumerable.Range(1, n).Select(k => new Shard(k, n)).ToList();
        // Derived from the definitions: every id is ≡ K (mod N) for exactly one K in 1..N.
        Assert.All(schedule, g => Assert.Single(shards, s => s.Contains(g.Id)));
        Assert.True(new Shard(0, n).Contains(n * 2) && new Shard(n, n).Contains(n * 2));
    }

    [Theory]
    [InlineData("3/8", true)]
    [InlineData("0/4", true)]
    [InlineData("4/4", true)]
    [InlineData("5/4", false)]
    [InlineData("1/0", false)]
    [InlineData("two/4", false)]
    [InlineData("3", false)]
    public void ShardTextIsKOverN(string text, bool ok) => Assert.Equal(ok, Shard.TryParse(text, out _, out _));

    [Fact]
    public void ShardJournalsGetTheirOwnNames()
    {
        Assert.Equal(Path.Combine("results", "orchard.shard-3-of-8.jsonl"), new Shard(3, 8).JournalPath(Path.Combine("results", "orchard.jsonl")));
        Assert.Equal("x.jsonl", Shard.Whole.JournalPath("x.jsonl"));
    }
}
