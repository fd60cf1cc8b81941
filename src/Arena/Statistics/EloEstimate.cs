namespace Bramble.Arena.Statistics;

/// <summary>
/// A rating difference estimated from a score, with a 95% interval: the interval of the mean score
/// (normal approximation, mean ± 1.96 standard errors) mapped through the logistic model, so it is
/// not symmetric in Elo. Infinite ends mean the score interval reached 0 or 1.
/// </summary>
/// <param name="Score">Mean score per game, 0..1.</param>
/// <param name="StandardError">Standard error of the mean score.</param>
/// <param name="Samples">Games (trinomial) or pairs (pentanomial) behind the estimate.</param>
public sealed record EloEstimate(double Score, double StandardError, long Samples, ScoreModel Model)
{
    /// <summary>The two-sided 95% normal quantile (common practice: Φ⁻¹(0.975)).</summary>
    public const double Z95 = 1.959963984540054;

    public double Delta => Elo.FromScore(Score);

    public double Low => Elo.FromScore(Math.Max(0.0, Score - Z95 * StandardError));

    public double High => Elo.FromScore(Math.Min(1.0, Score + Z95 * StandardError));
}
