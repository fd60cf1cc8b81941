using Bramble.Rules;
using Bramble.Search.Tests.Support;
using Bramble.Values;

namespace Bramble.Search.Tests;

/// <summary>
/// Perfect play on sums of random explicit game trees, checked against plain brute-force search
/// (tests/Search.Tests/Support/BruteForce.cs) — common practice: every shortcut against plain search.
/// </summary>
public class PerfectOnTreesTests
{
    private static readonly TimeSpan Plenty = TimeSpan.FromMinutes(1);

    private static IEnumerable<TreePosition> RandomSums(int seed, int count, int maxParts, int maxDepth)
    {
        var rnd = new Random(seed);
        for (int i = 0; i < count; i++)
        {
            var trees = new Trees();
            int parts = rnd.Next(1, maxParts + 1);
            yield return trees.Sum(Enumerable.Range(0, parts).Select(_ => trees.Random(rnd, rnd.Next(1, maxDepth + 1))).ToArray());
        }
    }

    private static void CheckAgainstBruteForce(IPlayer player, TreePosition position)
    {
        var brute = new BruteForce();
        foreach (var side in new[] { Side.Left, Side.Right })
        {
            var d = player.Choose(position, side, Plenty);
            bool wins = brute.Wins(position, side);
            Assert.True(d.Exact, $"{player.Name} did not finish on {position.Text}");
            Assert.True(d.Winning == wins, $"{player.Name} says {side.Word()} first {(d.Winning == true ? "wins" : "loses")} {position.Text}; brute force disagrees");
            if (position.Moves(side).Count == 0)
            {
                Assert.Null(d.Move);
                continue;
            }
            Assert.NotNull(d.Move);
            if (wins)
                Assert.False(brute.Wins(position.Play(side, d.Move!.Value), side.Other()), $"{player.Name}'s move {position.FormatMove(d.Move!.Value)} in {position.Text} does not win");
        }
    }

    [Fact]
    public void PerfectAgreesWithBruteForceOnRandomTreeSums()
    {
        var perfect = new PerfectPlayer();
        foreach (var position in RandomSums(seed: 501, count: 1000, maxParts: 4, maxDepth: 3))
            CheckAgainstBruteForce(perfect, position);
    }

    [Fact]
    public void AlphaBetaAgreesWithBruteForceOnRandomTreeSums()
    {
        // A fresh player per position: tree node ids (and so hashes) repeat between test positions.
        foreach (var position in RandomSums(seed: 502, count: 500, maxParts: 4, maxDepth: 3))
            CheckAgainstBruteForce(new AlphaBetaPlayer(log2TableSize: 14), position);
    }

    [Theory]
    [InlineData(1, 1)]
    [InlineData(3, 2)]
    [InlineData(12, 6)]
    public void PerfectWithLargeComponentsAgreesWithBruteForce(long componentCap, long pieceCap)
    {
        // Tiny node caps make most components "too large", so the search of large components
        // (real moves there, canonical options in the rest) decides instead of the sum alone.
        foreach (var position in RandomSums(seed: 503 + (int)componentCap, count: 150, maxParts: 3, maxDepth: 3))
            CheckAgainstBruteForce(new PerfectPlayer(new PerfectSettings { ComponentCap = componentCap, PieceCap = pieceCap }), position);
    }

    [Fact]
    public void InALostPositionPerfectLeavesTheLeastChanceOfAWinningReply()
    {
        var perfect = new PerfectPlayer();
        int lost = 0;
        foreach (var position in RandomSums(seed: 504, count: 400, maxParts: 3, maxDepth: 3))
        {
            var brute = new BruteForce();
            // docs/players.md: the rule for lost positions (derived from the definitions of the rule itself).
            foreach (var side in new[] { Side.Left, Side.Right })
                if (LostRule.Check(perfect, brute, position, side, Plenty)) lost++;
        }
        Assert.True(lost > 50, $"only {lost} lost positions were generated");
    }

    [Fact]
    public void AmongLosingMovesPerfectLeavesOneWinningReplyAmongManyRatherThanOneAlone()
    {
        // Worked by hand from the definitions: S = { Qb, Qa | } with Qb = {| 0} and Qa = {| 0, 1, 1}.
        // Both are -1 (Right's options 1 are dominated by 0), so S = {-1 |} = 0 and Left, moving
        // first, loses. After either move Right has exactly one winning reply (to 0: Left, to move
        // at 0, loses; at 1 Left moves to 0 and wins), so "fewest winning replies" cannot tell the
        // moves apart and Thermostrat's order (equal values: the first option) would pick Qb. The
        // chance that Right finds the win is 1 after Qb (one reply, and it is the obvious one) but
        // ½·1/3 + ½·1 = 2/3 after Qa: perfect moves to Qa.
        var trees = new Trees();
        var qb = trees.Node([], [trees.Zero()]);
        var qa = trees.Node([], [trees.Zero(), trees.Integer(1), trees.Integer(1)]);
        var s = trees.Node([qb, qa], []);
        var position = trees.Sum(s);
        var brute = new BruteForce();
        Assert.False(brute.Wins(position, Side.Left));
        Assert.Equal(1, brute.WinningMoves(position.Play(Side.Left, new Move(s.Id, 1)), Side.Right));
        Assert.Equal(1, brute.WinningMoves(position.Play(Side.Left, new Move(s.Id, 2)), Side.Right));
        var d = new PerfectPlayer().Choose(position, Side.Left, Plenty);
        Assert.True(d.Exact);
        Assert.False(d.Winning);
        Assert.Equal(new Move(s.Id, 2), d.Move);
    }

    [Fact]
    public void AtEqualChancesPerfectKeepsTheMarginSmallest()
    {
        // Worked by hand: S = { -2, -1 | } = {-1 |} = 0 (the -2 is dominated), a loss for Left moving
        // first. Right has one reply either way and it wins (from -1 to 0; from -2 to -1, where Left
        // has no move), so the chances are equal (1); the margin decides: the mean left is -1
        // after the move to -1 and -2 after the move to -2. Perfect moves to -1.
        var trees = new Trees();
        var s = trees.Node([trees.Integer(-2), trees.Integer(-1)], []);
        var d = new PerfectPlayer().Choose(trees.Sum(s), Side.Left, Plenty);
        Assert.False(d.Winning);
        Assert.Equal(new Move(s.Id, 2), d.Move);
    }

    [Fact]
    public void PerfectReportsTheValueOfASumOfSwitches()
    {
        var trees = new Trees();
        var position = trees.Sum(trees.Switch(4, 0), trees.Switch(1, 0), trees.Integer(2));
        var d = new PerfectPlayer().Choose(position, Side.Left, Plenty);
        Assert.True(d.Exact);
        Assert.True(d.Winning);
        // {4|0} + {1|0} + 2 is kept as its hot parts plus the number: derived from the definitions.
        var store = new GameStore();
        var expected = store.Sum([store.Parse("{4|0}"), store.Parse("{1|0}"), store.Integer(2)]);
        Assert.Equal(expected, store.Sum(d.Value!.Split(" + ").Select(store.Parse)));
        // Left's winning move is in the hotter switch {4|0}: derived from the definitions (4 + 0 + 2 wins, 1 + ... is met by Right's 0).
        Assert.Equal(position.Nodes[0].Id, d.Move!.Value.A);
    }

    [Fact]
    public void AsideWithNoMoveGetsNoMoveAndLoses()
    {
        var trees = new Trees();
        var position = trees.Sum(trees.Integer(3));
        var d = new PerfectPlayer().Choose(position, Side.Right, Plenty);
        Assert.Null(d.Move);
        Assert.False(d.Winning);
        Assert.True(d.Exact);
    }

    [Fact]
    public void PastItsBudgetPerfectFallsBackAndSaysSo()
    {
        var trees = new Trees();
        var rnd = new Random(7);
        var position = trees.Sum(Enumerable.Range(0, 6).Select(_ => trees.Random(rnd, 4)).ToArray());
        var player = new PerfectPlayer(new PerfectSettings { NodeCap = 3 });
        var d = player.Choose(position, Side.Left, Plenty);
        Assert.False(d.Exact);
        Assert.NotNull(d.Move);
        Assert.Contains(d.Move!.Value, position.Moves(Side.Left));
    }
}
