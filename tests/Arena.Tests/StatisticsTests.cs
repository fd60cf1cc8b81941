using Bramble.Arena.Statistics;

namespace Bramble.Arena.Tests;

public class StatisticsTests
{
    [Fact]
    public void TwoHundredEloIsAboutThreeQuartersExpectedScore()
    {
        // Source: A. Elo, The Rating of Chessplayers (1978), logistic form; A. Elo 1978; A. Wald 1945: "200 points ≈ 0.76 expected score".
        Assert.Equal(0.76, Elo.ExpectedScore(200), 2);
        // Derived from the definitions: 1 / (1 + 10^(−1/2)).
        Assert.Equal(1.0 / (1.0 + Math.Pow(10, -0.5)), Elo.ExpectedScore(200), 12);
    }

    [Theory]
    [InlineData(0.5, 0.0)]
    [InlineData(0.75, 190.84850188786498)]
    [InlineData(0.25, -190.84850188786498)]
    [InlineData(0.9, 381.6970037757299)]
    public void ScoreMapsToEloByTheLogisticFormula(double score, double elo)
    {
        // Source: A. Elo 1978, Δ = −400·log10(1/s − 1) (A. Elo 1978; A. Wald 1945); the figures derived from the definitions.
        Assert.Equal(elo, Elo.FromScore(score), 9);
    }

    [Fact]
    public void EloFromScoreInvertsTheExpectedScore()
    {
        // Derived from the definitions: the two formulas are inverse functions.
        for (var delta = -800.0; delta <= 800.0; delta += 37.5)
            Assert.Equal(delta, Elo.FromScore(Elo.ExpectedScore(delta)), 9);
    }

    [Fact]
    public void AnIntervalReachingAPerfectScoreIsOpenEnded()
    {
        // Derived from the definitions: 0.8 ± 1.96·0.105 passes 1, where the logistic Elo is +∞.
        var estimate = EloInterval.FromGames(7, 2, 1);
        Assert.True(double.IsPositiveInfinity(estimate.High));
        Assert.True(double.IsFinite(estimate.Low));
    }

    [Fact]
    public void PerfectScoresAreInfinite()
    {
        // Derived from the definitions: 1/s − 1 is 0 at s = 1 and ∞ at s = 0.
        Assert.True(double.IsPositiveInfinity(Elo.FromScore(1.0)));
        Assert.True(double.IsNegativeInfinity(Elo.FromScore(0.0)));
    }

    [Theory]
    [InlineData(60, 0, 40)]
    [InlineData(17, 4, 11)]
    [InlineData(123, 31, 77)]
    public void TrinomialIntervalIsTheNormalIntervalOfTheMeanScore(int wins, int draws, int losses)
    {
        // Derived from the definitions: the samples listed one by one, mean and population variance
        // computed directly, 95% = ±1.96 standard errors of the mean, mapped by Elo's logistic formula.
        var samples = Enumerable.Repeat(1.0, wins).Concat(Enumerable.Repeat(0.5, draws)).Concat(Enumerable.Repeat(0.0, losses)).ToList();
        var (mean, variance) = MeanAndVariance(samples);
        var se = Math.Sqrt(variance / samples.Count);
        var estimate = EloInterval.FromGames(wins, draws, losses);
        Assert.Equal(ScoreModel.Trinomial, estimate.Model);
        Assert.Equal(mean, estimate.Score, 12);
        Assert.Equal(se, estimate.StandardError, 12);
        Assert.Equal(-400 * Math.Log10(1 / mean - 1), estimate.Delta, 9);
        Assert.Equal(-400 * Math.Log10(1 / (mean - 1.959963984540054 * se) - 1), estimate.Low, 9);
        Assert.Equal(-400 * Math.Log10(1 / (mean + 1.959963984540054 * se) - 1), estimate.High, 9);
    }

    [Fact]
    public void SixtyOfHundredGivesTheIntervalWorkedByHand()
    {
        // Derived from the definitions by hand: s = 0.6, σ² = 0.6 − 0.36 = 0.24, se = √0.0024 = 0.04899,
        // s ± 1.96·se = 0.5040 … 0.6960, which is +2.8 … +143.9 Elo; the point estimate +70.4.
        var estimate = EloInterval.FromGames(60, 0, 40);
        Assert.Equal(70.4, estimate.Delta, 1);
        Assert.Equal(2.8, estimate.Low, 1);
        Assert.Equal(143.9, estimate.High, 1);
    }

    [Fact]
    public void PentanomialVarianceComesFromThePairScores()
    {
        // Source: M. Van den Bergh, "Normalized Elo", §4 — pair scores 0, ¼, ½, ¾, 1 with their
        // frequencies; variance of the mean = per-pair variance / number of pairs. Checked against
        // the pair scores listed one by one (derived from the definitions).
        var counts = new PentanomialCounts(3, 10, 40, 25, 7);
        var pairs = Enumerable.Repeat(0.0, 3).Concat(Enumerable.Repeat(0.25, 10)).Concat(Enumerable.Repeat(0.5, 40))
            .Concat(Enumerable.Repeat(0.75, 25)).Concat(Enumerable.Repeat(1.0, 7)).ToList();
        var (mean, variance) = MeanAndVariance(pairs);
        var estimate = EloInterval.FromPairs(counts);
        Assert.Equal(ScoreModel.Pentanomial, estimate.Model);
        Assert.Equal(85, estimate.Samples);
        Assert.Equal(mean, estimate.Score, 12);
        Assert.Equal(Math.Sqrt(variance / 85), estimate.StandardError, 12);
    }

    [Fact]
    public void PairingNarrowsTheIntervalWhenSeatsDecideGames()
    {
        // Source: M. Van den Bergh, "Normalized Elo" §4 — the point of pairs: when the seat decides most
        // games, pairs split 1–1 and the pair variance is far below the game variance (derived from the definitions).
        var pairs = new PentanomialCounts(0, 0, 80, 0, 20); // 80 pairs split, 20 won twice
        var games = EloInterval.FromGames(120, 0, 80); // the same 200 games unpaired: 80 + 40 wins, 80 losses
        var paired = EloInterval.FromPairs(pairs);
        Assert.Equal(games.Score, paired.Score, 12);
        Assert.True(paired.High - paired.Low < games.High - games.Low);
    }

    [Fact]
    public void WaldBoundsAtFivePercentArePlusMinus2944()
    {
        // Source: A. Wald, "Sequential tests of statistical hypotheses", Ann. Math. Stat. 16 (1945);
        // A. Elo 1978; A. Wald 1945: ±2.944 at α = β = 0.05.
        var bounds = SprtBounds.From(0.05, 0.05);
        Assert.Equal(-2.944, bounds.Lower, 3);
        Assert.Equal(2.944, bounds.Upper, 3);
        // Wald 1945: upper ln((1−β)/α), lower ln(β/(1−α)), with unequal error rates.
        var skewed = SprtBounds.From(0.01, 0.1);
        Assert.Equal(Math.Log(0.9 / 0.01), skewed.Upper, 12);
        Assert.Equal(Math.Log(0.1 / 0.99), skewed.Lower, 12);
    }

    [Fact]
    public void BernoulliLlrIsTheSumOfLogLikelihoodRatiosOfTheGames()
    {
        // Source: A. Wald 1945 — the LLR is Σ ln f1(x)/f0(x); here f is Bernoulli with p = E(elo)
        // (A. Elo 1978). The sum is taken game by game (derived from the definitions).
        var random = new Random(7);
        for (var trial = 0; trial < 20; trial++)
        {
            var elo0 = random.Next(-20, 10);
            var elo1 = elo0 + 1 + random.Next(40);
            var games = Enumerable.Range(0, 1 + random.Next(300)).Select(_ => random.NextDouble() < 0.55).ToList();
            double p0 = 1 / (1 + Math.Pow(10, -elo0 / 400.0)), p1 = 1 / (1 + Math.Pow(10, -elo1 / 400.0));
            var expected = games.Sum(win => win ? Math.Log(p1 / p0) : Math.Log((1 - p1) / (1 - p0)));
            Assert.Equal(expected, Sprt.LlrBernoulli(games.Count(w => w), games.Count(w => !w), elo0, elo1), 9);
        }
    }

    [Fact]
    public void NormalLlrIsTheSumOfNormalLogLikelihoodRatios()
    {
        // Source: A. Wald 1945 with a normal model of known variance σ²: ln f1(x)/f0(x) =
        // [(x − s0)² − (x − s1)²] / (2σ²), summed sample by sample (derived from the definitions).
        var random = new Random(11);
        for (var trial = 0; trial < 20; trial++)
        {
            var samples = Enumerable.Range(0, 2 + random.Next(200)).Select(_ => random.Next(5) / 4.0).ToList();
            var (mean, variance) = MeanAndVariance(samples);
            if (variance == 0) continue;
            double elo0 = -5, elo1 = 15;
            double s0 = 1 / (1 + Math.Pow(10, -elo0 / 400)), s1 = 1 / (1 + Math.Pow(10, -elo1 / 400));
            var expected = samples.Sum(x => ((x - s0) * (x - s0) - (x - s1) * (x - s1)) / (2 * variance));
            Assert.Equal(expected, Sprt.LlrNormal(samples.Count, mean, variance, elo0, elo1), 9);
        }
    }

    [Fact]
    public void PentanomialLlrUsesThePairVariance()
    {
        // Source: M. Van den Bergh, "Normalized Elo" §4 (pair variance) in Wald's normal-model ratio
        // (A. Wald 1945); checked against the pair scores listed one by one (derived from the definitions).
        var counts = new PentanomialCounts(1, 6, 50, 30, 13);
        var pairs = Enumerable.Repeat(0.0, 1).Concat(Enumerable.Repeat(0.25, 6)).Concat(Enumerable.Repeat(0.5, 50))
            .Concat(Enumerable.Repeat(0.75, 30)).Concat(Enumerable.Repeat(1.0, 13)).ToList();
        var (mean, variance) = MeanAndVariance(pairs);
        double s0 = 0.5, s1 = 1 / (1 + Math.Pow(10, -20 / 400.0));
        var expected = pairs.Sum(x => ((x - s0) * (x - s0) - (x - s1) * (x - s1)) / (2 * variance));
        Assert.Equal(expected, Sprt.LlrPentanomial(counts, 0, 20), 9);
    }

    [Fact]
    public void ZeroVarianceLeavesTheNormalModelWithoutAnAnswer()
    {
        // Derived from the definitions: σ² = 0 makes the normal ratio undefined; the caller falls back.
        Assert.True(double.IsNaN(Sprt.LlrPentanomial(new PentanomialCounts(0, 0, 30, 0, 0), 0, 20)));
        Assert.Equal(0.0, Sprt.LlrNormal(0, 0.5, 0.1, 0, 20));
    }

    [Fact]
    public void DecisionsFollowTheBounds()
    {
        // Source: A. Wald 1945 — H1 at LLR ≥ upper bound, H0 at LLR ≤ lower bound, else continue.
        var bounds = SprtBounds.From(0.05, 0.05);
        Assert.Equal(SprtDecision.Alternative, bounds.Decide(2.95));
        Assert.Equal(SprtDecision.Null, bounds.Decide(-2.95));
        Assert.Equal(SprtDecision.Continue, bounds.Decide(2.9));
        Assert.Equal(SprtDecision.Continue, bounds.Decide(-2.9));
    }

    private static (double Mean, double Variance) MeanAndVariance(IReadOnlyList<double> samples)
    {
        var mean = samples.Sum() / samples.Count;
        var variance = samples.Sum(x => (x - mean) * (x - mean)) / samples.Count;
        return (mean, variance);
    }
}
