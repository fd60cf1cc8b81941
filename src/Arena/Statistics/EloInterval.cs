namespace Bramble.Arena.Statistics;

/// <summary>Rating differences with 95% intervals from match results under the two sampling models.</summary>
public static class EloInterval
{
    /// <summary>
    /// Independent games: mean s = (W + D/2)/n, per-game variance σ² = (W + D/4)/n − s², standard
    /// error √(σ²/n) (the trinomial model; logistic Elo per A. Elo 1978).
    /// </summary>
    public static EloEstimate FromGames(long wins, long draws, long losses)
    {
        var n = wins + draws + losses;
        if (n == 0) return new EloEstimate(0.5, double.PositiveInfinity, 0, ScoreModel.Trinomial);
        var mean = (wins + 0.5 * draws) / n;
        var variance = Math.Max(0.0, (wins + 0.25 * draws) / n - mean * mean);
        return new EloEstimate(mean, Math.Sqrt(variance / n), n, ScoreModel.Trinomial);
    }

    /// <summary>
    /// Colour-swapped pairs as the samples (M. Van den Bergh, "Normalized Elo", §4): with pair-score
    /// frequencies p_i over the scores x_i ∈ {0, ¼, ½, ¾, 1}, mean s = Σ p_i x_i, per-pair variance
    /// σ² = Σ p_i x_i² − s², and the standard error of the mean √(σ²/N) for N pairs. Pairing removes
    /// the seat's share of the variance, which in combinatorial games (the start position decides a
    /// lot) is most of it.
    /// </summary>
    public static EloEstimate FromPairs(PentanomialCounts counts)
    {
        var n = counts.Pairs;
        if (n == 0) return new EloEstimate(0.5, double.PositiveInfinity, 0, ScoreModel.Pentanomial);
        double mean = 0, square = 0;
        foreach (var (score, count) in counts.Outcomes())
        {
            var p = (double)count / n;
            mean += p * score;
            square += p * score * score;
        }
        var variance = Math.Max(0.0, square - mean * mean);
        return new EloEstimate(mean, Math.Sqrt(variance / n), n, ScoreModel.Pentanomial);
    }
}
