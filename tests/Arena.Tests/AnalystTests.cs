using Bramble.Arena.Fixture;
using Bramble.Arena.Games;
using Bramble.Rules;
using Bramble.Values;

namespace Bramble.Arena.Tests;

public class AnalystTests
{
    private static readonly HeapsRuleset s_rules = new();

    /// <summary>
    /// Plain game-tree search, written here independently of the code under test: the side to move
    /// wins when some move leads to a position the other side, moving, loses (normal play).
    /// </summary>
    private static bool MoverWins(int[] sizes, char[] owners, Side mover, Dictionary<string, bool> memo)
    {
        var key = $"{string.Join(',', sizes)}|{mover}";
        if (memo.TryGetValue(key, out var known)) return known;
        var wins = false;
        for (var h = 0; h < sizes.Length && !wins; h++)
        {
            if (!(owners[h] == 'N' || owners[h] == (mover == Side.Left ? 'L' : 'R'))) continue;
            for (var n = 0; n < sizes[h] && !wins; n++)
            {
                var next = (int[])sizes.Clone();
                next[h] = n;
                wins = !MoverWins(next, owners, mover.Other(), memo);
            }
        }
        return memo[key] = wins;
    }

    private static (string Text, int[] Sizes, char[] Owners) RandomPosition(Random random)
    {
        var count = 1 + random.Next(4);
        var owners = Enumerable.Range(0, count).Select(_ => "LRN"[random.Next(3)]).ToArray();
        var sizes = Enumerable.Range(0, count).Select(_ => random.Next(5)).ToArray();
        return (string.Join(" + ", owners.Zip(sizes, (o, s) => $"{o}{s}")), sizes, owners);
    }

    [Fact]
    public void TheWinnerMatchesPlainSearchOnRandomPositions()
    {
        // Derived from the definitions: exact values (number + nimber) and their outcome classes
        // against brute-force search, 300 seeded random positions, both sides to move.
        var analyst = new Analyst(Serilog.Core.Logger.None);
        var random = new Random(42);
        for (var i = 0; i < 300; i++)
        {
            var (text, sizes, owners) = RandomPosition(random);
            var memo = new Dictionary<string, bool>();
            foreach (var mover in new[] { Side.Left, Side.Right })
            {
                var expected = MoverWins(sizes, owners, mover, memo) ? mover : mover.Other();
                Assert.Equal(expected, analyst.Winner(s_rules.Parse(text), mover, 1000));
            }
        }
    }

    [Fact]
    public void BlundersAreTheMovesFromWonToLostPositions()
    {
        // Derived from the definitions: random games; a ply is a blunder when plain search says the
        // mover could win before it and cannot after it.
        var analyst = new Analyst(Serilog.Core.Logger.None);
        var random = new Random(5);
        for (var game = 0; game < 100; game++)
        {
            var (text, sizes, owners) = RandomPosition(random);
            var first = random.Next(2) == 0 ? Side.Left : Side.Right;
            IPosition position = s_rules.Parse(text);
            var positions = new List<IPosition> { position };
            var expected = new List<int>();
            var mover = first;
            var memo = new Dictionary<string, bool>();
            while (position.Moves(mover) is { Count: > 0 } moves)
            {
                var move = moves[random.Next(moves.Count)];
                var before = MoverWins(sizes, owners, mover, memo);
                sizes[move.A - 1] = move.B;
                var after = !MoverWins(sizes, owners, mover.Other(), memo);
                if (before && !after) expected.Add(positions.Count);
                position = position.Play(mover, move);
                positions.Add(position);
                mover = mover.Other();
            }
            var review = analyst.Review(positions, first, "blue", "red", 5000);
            Assert.Equal(expected, review.Blunders.Select(b => b.Ply));
            // Limited by nodes instead of time (in a fresh context), the review says the same.
            Assert.Equal(review, analyst.Review(positions, first, "blue", "red", 0, nodes: 10_000_000) with { Blunders = review.Blunders });
            Assert.Equal(expected, analyst.Review(positions, first, "blue", "red", 0, nodes: 10_000_000).Blunders.Select(b => b.Ply));
            Assert.All(review.Blunders, b => Assert.Equal((b.Ply % 2 == 1) == (first == Side.Left) ? "blue" : "red", b.By));
            Assert.Equal(positions.Count - 1, review.Analysed);
        }
    }

    [Fact]
    public void NumbersAdjudicationWaitsForEveryComponentToBeANumber()
    {
        var analyst = new Analyst(Serilog.Core.Logger.None);
        // Derived from the definitions: L3 + R1 = 2 > 0, Left wins whoever moves; a shared heap of 2 is *2, not a number.
        Assert.Equal(Side.Left, analyst.NumbersWinner(s_rules.Parse("L3 + R1"), Side.Right, 1000));
        Assert.Null(analyst.NumbersWinner(s_rules.Parse("L3 + N2"), Side.Right, 1000));
        // L1 + R1 = 0: the side to move loses.
        Assert.Equal(Side.Left, analyst.NumbersWinner(s_rules.Parse("L1 + R1"), Side.Right, 1000));
    }

    [Fact]
    public void NoBudgetMeansNoVerdict()
    {
        var analyst = new Analyst(Serilog.Core.Logger.None);
        Assert.Null(analyst.Winner(s_rules.Parse("L3"), Side.Left, 0));
        Assert.Equal(new GameReview(null, [], 0), analyst.Review([s_rules.Parse("L3")], Side.Left, "a", "b", 0));
    }

    /// <summary>A seeded random blue-red-green stalk: its canonical form grows fast with its length (mixed ordinal sums).</summary>
    private static IPosition MixedStalk(int edges, int seed)
    {
        var random = new Random(seed);
        return Rulesets.Get("hackenbush").Parse(new string(Enumerable.Range(0, edges).Select(_ => "BRG"[random.Next(3)]).ToArray()));
    }

    [Fact]
    public async Task TheBudgetHoldsOnALongMixedStalk()
    {
        // The value of a 1,000-edge mixed stalk takes minutes: before the store answered to the budget,
        // this call did not come back. Generous time-out; the assertion is that it comes back at all.
        var analyst = new Analyst(Serilog.Core.Logger.None);
        var position = MixedStalk(1000, 7);
        var call = DeepWork.RunAsync(() => analyst.Winner(position, Side.Left, 200));
        // WaitAsync throws TimeoutException when the call does not come back.
        await call.WaitAsync(TimeSpan.FromSeconds(60));
        var review = DeepWork.RunAsync(() => analyst.Review([position, position], Side.Left, "a", "b", 200));
        await review.WaitAsync(TimeSpan.FromSeconds(60));
        // Afterwards the store is whole: small positions get the values plain search gives.
        Assert.Equal(Side.Left, analyst.Winner(Rulesets.Get("hackenbush").Parse("BR + G"), Side.Left, 5000)); // BR + G = 1/2 + *, positive: Left wins (derived from the definitions)
        Assert.Equal(Side.Right, analyst.Winner(Rulesets.Get("hackenbush").Parse("G + G"), Side.Left, 5000)); // * + * = 0: the mover loses (derived from the definitions)
    }

    [Fact]
    public async Task ACancelStopsAnalysisAtOnce()
    {
        using var cancel = new CancellationTokenSource();
        var analyst = new Analyst(Serilog.Core.Logger.None, cancel.Token);
        var call = DeepWork.RunAsync(() => analyst.Winner(MixedStalk(1000, 11), Side.Left, long.MaxValue / 4));
        await Task.Delay(100);
        cancel.Cancel();
        Assert.Null(await call.WaitAsync(TimeSpan.FromSeconds(30)));
    }
}
