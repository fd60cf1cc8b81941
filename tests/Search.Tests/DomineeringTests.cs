using Bramble.Rules;
using Bramble.Search.Tests.Support;
using Bramble.Values;

namespace Bramble.Search.Tests;

/// <summary>Players on Domineering: published outcome classes through the solver, and brute force on random boards.</summary>
public class DomineeringTests
{
    private static readonly IRuleset Rules = Rulesets.Get("domineering");
    private static readonly TimeSpan Plenty = TimeSpan.FromMinutes(2);

    /// <summary>
    /// Empty rectangles (rows × columns) with the winner when Left (vertical) moves first and when
    /// Right does. Right moving first on m×n is Vertical moving first on n×m with the roles
    /// swapped (published Domineering results (Lachmann, Moore, Rapaport; Bullock)), so each row cites the result for both boards.
    /// </summary>
    public static TheoryData<string, Outcome, string> Rectangles => new()
    {
        // ±1, a first-player win: Lachmann, Moore, Rapaport, MSRI Publ. 42 (2002).
        { "2x2", Outcome.N, "Lachmann-Moore-Rapaport 2002" },
        // 2×3 is {2|−1/2} and 3×2 is {1/2|−2}: Wikipedia, "Domineering"; m×3 won by Vertical: Uiterwijk, CGW 2013 (CCIS 408, 2014).
        { "2x3", Outcome.N, "Wikipedia; Uiterwijk 2014" },
        { "3x2", Outcome.N, "Wikipedia; Uiterwijk 2014" },
        // m×3 won by Vertical (Uiterwijk 2014), for 3×3 and its transpose alike.
        { "3x3", Outcome.N, "Uiterwijk 2014" },
        // 4×3 won by Vertical (m×3); 3×4 won by Horizontal (3×n, n > 3): Uiterwijk 2014.
        { "4x3", Outcome.L, "Uiterwijk 2014" },
        { "3x4", Outcome.R, "Uiterwijk 2014" },
        // 5×3 won by Vertical (m×3); 3×5 won by Horizontal (3×n): Uiterwijk 2014.
        { "5x3", Outcome.L, "Uiterwijk 2014" },
        { "3x5", Outcome.R, "Uiterwijk 2014" },
        // 2×5 won by Vertical (2k×n, n = 5); 5×2 won by Horizontal (m×2k, m = 5): Uiterwijk 2014.
        { "2x5", Outcome.L, "Uiterwijk 2014" },
        { "5x2", Outcome.R, "Uiterwijk 2014" },
        // 4×5 won by Vertical (2k×5); 5×4 won by Horizontal (5×2k): Uiterwijk 2014.
        { "4x5", Outcome.L, "Uiterwijk 2014" },
        { "5x4", Outcome.R, "Uiterwijk 2014" },
        // 6×3 won by Vertical (m×3 and 2k×3); 3×6 won by Horizontal (3×n and 3×2k, k > 1): Uiterwijk 2014.
        { "6x3", Outcome.L, "Uiterwijk 2014" },
        { "3x6", Outcome.R, "Uiterwijk 2014" },
        // 5×6 won by Horizontal (m×2k, m = 5); 6×5 won by Vertical (2k×n, n = 5): Uiterwijk 2014.
        // With Right first, 5×6 is Vertical first on 6×5 and so on (published Domineering results (Lachmann, Moore, Rapaport; Bullock)).
        { "5x6", Outcome.R, "Uiterwijk 2014" },
        { "6x5", Outcome.L, "Uiterwijk 2014" },
        // 5×5 is a second-player win and 6×6 a first-player win: from memory, the m×n table of
        // Breuker, Uiterwijk, van den Herik, TCS 230 (2000) (published Domineering results (Lachmann, Moore, Rapaport; Bullock) cites the table).
        { "5x5", Outcome.P, "from memory: Breuker et al. 2000" },
        { "6x6", Outcome.N, "from memory: Breuker et al. 2000" },
        // A vertical strip of n cells is ⌊n/2⌋ > 0 and a horizontal one −⌊n/2⌋: Wikipedia, "Domineering".
        { "7x1", Outcome.L, "Wikipedia" },
        { "1x6", Outcome.R, "Wikipedia" },
    };

    [Theory]
    [MemberData(nameof(Rectangles))]
    public void EmptyRectanglesHaveTheirPublishedOutcomeClass(string board, Outcome published, string source)
    {
        var report = Solver.Solve(Rules.Parse(board), [Side.Left, Side.Right], new PerfectPlayer(), Plenty);
        Assert.True(report.Exact);
        // The published outcome class (source in the table above).
        Assert.True(published == report.Outcome, $"{board}: solve says {report.Outcome}, {source} says {published}");
        var position = Rules.Parse(board);
        var brute = new BruteForce();
        foreach (var answer in new[] { report.LeftFirst!, report.RightFirst! })
        {
            if (answer.Winner != answer.First)
            {
                Assert.Null(answer.Move);
                continue;
            }
            var after = position.Play(answer.First, position.ParseMove(answer.Move!));
            // The reported move wins: checked by plain search where the board is small enough for it.
            if (position.Size <= 16) Assert.False(brute.Wins(after, answer.First.Other()), $"{board}: {answer.Move} does not win");
        }
    }

    [Fact]
    public void AlphaBetaFindsThePublishedOutcomesToo()
    {
        // The same table through the whole-board search (sources as in Rectangles).
        foreach (var row in Rectangles)
        {
            var (board, published) = ((string)row[0], (Outcome)row[1]);
            if (Rules.Parse(board).Size > 15) continue;
            var report = Solver.Solve(Rules.Parse(board), [Side.Left, Side.Right], new AlphaBetaPlayer(log2TableSize: 18), Plenty);
            Assert.True(report.Exact);
            Assert.True(published == report.Outcome, $"{board}: alphabeta says {report.Outcome}, published {published}");
        }
    }

    private static IEnumerable<IPosition> RandomBoards(int seed, int count, int maxRegions = 4)
    {
        var rnd = new Random(seed);
        for (int i = 0; i < count; i++)
        {
            // Half single irregular regions (holes and all), half sums of small regions.
            var text = i % 2 == 0
                ? Rules.Generate("regions", 1, rnd.Next(4, 11), rnd.Next())[0]
                : Rules.Generate("sums", 1, rnd.Next(2, maxRegions + 1), rnd.Next())[0];
            yield return Rules.Parse(text);
        }
    }

    private static void Check(IPlayer player, IPosition position, BruteForce brute)
    {
        foreach (var side in new[] { Side.Left, Side.Right })
        {
            var d = player.Choose(position, side, Plenty);
            bool wins = brute.Wins(position, side);
            Assert.True(d.Exact);
            Assert.True(d.Winning == wins, $"{player.Name}: {side.Word()} first on {position.Text}: says {d.Winning}, brute force {wins}");
            if (wins) Assert.False(brute.Wins(position.Play(side, d.Move!.Value), side.Other()), $"{player.Name}: {position.FormatMove(d.Move!.Value)} on {position.Text} does not win");
        }
    }

    [Fact]
    public void PerfectAgreesWithBruteForceOnRandomBoards()
    {
        var perfect = new PerfectPlayer();
        var brute = new BruteForce();
        foreach (var position in RandomBoards(seed: 601, count: 1000)) Check(perfect, position, brute);
    }

    [Fact]
    public void AlphaBetaAgreesWithBruteForceOnRandomBoards()
    {
        var alphabeta = new AlphaBetaPlayer(log2TableSize: 18);
        var brute = new BruteForce();
        foreach (var position in RandomBoards(seed: 602, count: 400, maxRegions: 3)) Check(alphabeta, position, brute);
    }

    [Fact]
    public void PerfectWithLargeRegionsAgreesWithBruteForce()
    {
        // Small node caps leave the bigger regions without an exact value, so the search of large components decides.
        var brute = new BruteForce();
        foreach (var position in RandomBoards(seed: 603, count: 150))
            Check(new PerfectPlayer(new PerfectSettings { ComponentCap = 4, PieceCap = 3 }), position, brute);
    }

    [Fact]
    public void InALostDomineeringPositionPerfectLeavesTheFewestWinningReplies()
    {
        // docs/players.md, the rule for lost positions; winning replies counted by plain search.
        // Sums of several small regions often repeat a region, so replies in equal regions must all count.
        var perfect = new PerfectPlayer();
        var brute = new BruteForce();
        int lost = 0;
        foreach (var position in RandomBoards(seed: 606, count: 300))
        {
            foreach (var side in new[] { Side.Left, Side.Right })
                if (LostRule.Check(perfect, brute, position, side, Plenty)) lost++;
        }
        Assert.True(lost > 50, $"only {lost} lost positions were generated");
    }

    [Fact]
    public void PerfectWithEveryRegionLargeAgreesWithBruteForce()
    {
        // Sizes and probe 0: no region gets an exact value, so the search of large components
        // plays real moves to the end of the game.
        var brute = new BruteForce();
        foreach (var position in RandomBoards(seed: 604, count: 150))
            Check(new PerfectPlayer(new PerfectSettings { ExactSize = 0, SmallSize = 0, ProbeCap = 0 }), position, brute);
        // And with a small threshold: pieces of up to 4 cells valued, the rest searched.
        foreach (var position in RandomBoards(seed: 605, count: 150))
            Check(new PerfectPlayer(new PerfectSettings { ExactSize = 4, SmallSize = 4, ProbeCap = 0 }), position, brute);
    }
}
