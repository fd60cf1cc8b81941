using Bramble.Arena.Statistics;

namespace Bramble.Arena.Tests;

/// <summary>The joint maximum-likelihood ratings: hand-computable cases, the estimating equations, and coverage in simulation.</summary>
public class JointRatingsTests
{
    private static List<PairedGame> Games(params (int A, int B, int WinsOfA, int LossesOfA)[] results)
    {
        var games = new List<PairedGame>();
        foreach (var (a, b, wins, losses) in results)
        {
            for (var k = 0; k < wins; k++) games.Add(new PairedGame(a, b, 1, games.Count));
            for (var k = 0; k < losses; k++) games.Add(new PairedGame(a, b, 0, games.Count));
        }
        return games;
    }

    [Fact]
    public void ThreeWinsInFourGamesIsLog10Of3Times400BetweenTwoPlayers()
    {
        var fit = JointRatings.Fit(2, Games((0, 1, 3, 1)));
        // Hand computation: two players, so the MLE matches the observed score, 1/(1 + 10^(−Δ/400)) = 3/4,
        // Δ = 400·log10 3 = 190.85; anchored at mean 0 each is ±Δ/2.
        Assert.Equal(200 * Math.Log10(3), fit.Ratings[0], 6);
        Assert.Equal(-200 * Math.Log10(3), fit.Ratings[1], 6);
        Assert.False(fit.Regularised);
        // Hand computation: with independent games the sandwich equals the inverse information at the
        // estimate, var(Δ) = 1/(n p (1 − p)) = 1/(4·3/16) = 4/3 in natural units; each rating carries half of Δ.
        var se = JointRatings.Scale * Math.Sqrt(4.0 / 3) / 2;
        Assert.Equal(se, fit.StandardError(0), 6);
        Assert.Equal(fit.Ratings[0] - 1.959964 * se, fit.Interval(0).Low, 3);
        // Hand computation: LOS = Φ(Δ / sd(Δ)) = Φ(ln 3 / √(4/3)) = Φ(0.9514) ≈ 0.8293 (normal table).
        Assert.Equal(0.8293, fit.Superiority(0, 1), 3);
        Assert.Equal(1.0, fit.Superiority(0, 1) + fit.Superiority(1, 0), 9);
    }

    [Fact]
    public void ACycleOfEqualResultsRatesEveryoneZero()
    {
        // Derived from the definitions: A beats B, B beats C and C beats A, each 2 to 1: by symmetry all three are equal.
        var fit = JointRatings.Fit(3, Games((0, 1, 2, 1), (1, 2, 2, 1), (2, 0, 2, 1)));
        Assert.All(fit.Ratings, r => Assert.Equal(0, r, 6));
    }

    [Fact]
    public void TheFitSolvesTheBradleyTerryEquationsOnRandomTournaments()
    {
        // Derived from the definitions (Zermelo 1929; Bradley and Terry 1952): at the maximum each
        // player's wins equal the wins the fitted model expects for it over the games it played.
        var random = new Random(5);
        for (var trial = 0; trial < 40; trial++)
        {
            var n = 2 + random.Next(5);
            var results = new List<(int, int, int, int)>();
            for (var a = 0; a < n; a++)
                for (var b = a + 1; b < n; b++)
                    results.Add((a, b, 1 + random.Next(6), 1 + random.Next(6)));
            var games = Games([.. results]);
            var fit = JointRatings.Fit(n, games);
            Assert.False(fit.Regularised);
            Assert.Equal(0, fit.Ratings.Average(), 6);
            for (var i = 0; i < n; i++)
            {
                var wins = games.Sum(g => g.A == i ? g.ScoreA : g.B == i ? 1 - g.ScoreA : 0);
                var expected = games.Sum(g => g.A == i ? Elo.ExpectedScore(fit.Ratings[g.A] - fit.Ratings[g.B])
                    : g.B == i ? Elo.ExpectedScore(fit.Ratings[g.B] - fit.Ratings[g.A]) : 0);
                Assert.Equal(wins, expected, 6);
            }
        }
    }

    [Fact]
    public void ACleanSweepStaysFiniteAndSaysSo()
    {
        // Derived from the definitions: a player who won every game has no finite maximum-likelihood rating.
        var fit = JointRatings.Fit(3, Games((0, 1, 4, 0), (0, 2, 4, 0), (1, 2, 2, 2)));
        Assert.True(fit.Regularised);
        Assert.All(fit.Ratings, r => Assert.True(double.IsFinite(r)));
        Assert.True(fit.Ratings[0] > fit.Ratings[1] && fit.Ratings[0] > fit.Ratings[2]);
        Assert.Equal(0, fit.Ratings.Average(), 6);
    }

    [Fact]
    public void IntervalsCoverTheTrueRatingsAtAboutTheirNominalRateWithPairedGames()
    {
        // A simulation with known strengths. Four players, every pair meets in 15 seat-swapped pairs.
        // Each game A wins with probability E(r_A − r_B), exactly the model; the two games of a pair are
        // dependent as when the position decides: with probability 0.6 the second game's chance is
        // the mirror of the first (A wins it exactly when the seat that won the first is A's again),
        // which keeps each game's own probability but correlates the pair. Intervals that treated
        // the games as independent would be wrong; the cluster-robust ones should cover the true
        // ratings about 95% of the time.
        double[] truth = [150, 40, -60, -130];
        var random = new Random(2024);
        int covered = 0, checks = 0;
        double robustWidth = 0, naiveWidth = 0;
        for (var tournament = 0; tournament < 300; tournament++)
        {
            var games = new List<PairedGame>();
            for (var a = 0; a < 4; a++)
                for (var b = a + 1; b < 4; b++)
                    for (var k = 0; k < 15; k++)
                    {
                        var p = Elo.ExpectedScore(truth[a] - truth[b]);
                        var u = random.NextDouble();
                        var u2 = random.NextDouble() < 0.6 ? 1 - u : random.NextDouble();
                        var cluster = games.Count;
                        games.Add(new PairedGame(a, b, u < p ? 1 : 0, cluster));
                        games.Add(new PairedGame(a, b, u2 < p ? 1 : 0, cluster));
                    }
            var fit = JointRatings.Fit(4, games);
            if (fit.Regularised) continue;
            for (var i = 0; i < 4; i++)
            {
                var (low, high) = fit.Interval(i);
                checks++;
                if (low <= truth[i] && truth[i] <= high) covered++;
                robustWidth += high - low;
            }
            var naive = JointRatings.Fit(4, games.Select((g, n) => g with { Cluster = n }).ToList());
            for (var i = 0; i < 4; i++) naiveWidth += naive.Interval(i).High - naive.Interval(i).Low;
        }
        var rate = (double)covered / checks;
        // common practice: a tolerant band around the nominal 95% for ~1,200 checks (binomial sd ≈ 0.6%)
        // and a small-sample estimator.
        Assert.InRange(rate, 0.91, 0.985);
        Assert.True(checks >= 1100);
        // The pairing was seen: negatively correlated pairs make the honest interval narrower.
        Assert.True(robustWidth < 0.95 * naiveWidth, $"robust {robustWidth} naive {naiveWidth}");
    }
}
