namespace Bramble.Arena.Statistics;

/// <summary>What a sequential test says so far.</summary>
public enum SprtDecision
{
    Continue,
    /// <summary>The test chose the null hypothesis (Δ = null_elo) at its error rates.</summary>
    Null,
    /// <summary>The test chose the alternative (Δ = alternative_elo) at its error rates.</summary>
    Alternative,
}

/// <summary>Wald's stopping bounds on the log-likelihood ratio.</summary>
public readonly record struct SprtBounds(double Lower, double Upper)
{
    /// <summary>
    /// A. Wald, "Sequential tests of statistical hypotheses", Ann. Math. Stat. 16 (1945): choose the
    /// alternative once LLR ≥ ln((1−β)/α), the null hypothesis once LLR ≤ ln(β/(1−α)).
    /// </summary>
    public static SprtBounds From(double alpha, double beta) =>
        new(Math.Log(beta / (1.0 - alpha)), Math.Log((1.0 - beta) / alpha));

    public SprtDecision Decide(double llr) =>
        llr >= Upper ? SprtDecision.Alternative : llr <= Lower ? SprtDecision.Null : SprtDecision.Continue;
}

/// <summary>
/// Wald's sequential probability ratio test of the null hypothesis Δ = elo0 against the alternative Δ = elo1 (A. Wald 1945),
/// with the hypotheses turned into expected scores by the logistic model (A. Elo 1978).
/// </summary>
public static class Sprt
{
    /// <summary>
    /// Games as independent Bernoulli trials (no draws in these games): with p = E(elo), the
    /// log-likelihood ratio is W·ln(p1/p0) + L·ln((1−p1)/(1−p0)) — Wald's ratio computed exactly.
    /// </summary>
    public static double LlrBernoulli(long wins, long losses, double elo0, double elo1)
    {
        var p0 = Elo.ExpectedScore(elo0);
        var p1 = Elo.ExpectedScore(elo1);
        return wins * Math.Log(p1 / p0) + losses * Math.Log((1.0 - p1) / (1.0 - p0));
    }

    /// <summary>
    /// Samples with mean <paramref name="mean"/> and per-sample variance <paramref name="variance"/>
    /// under a normal model with that variance: Wald's ratio Σ[(x−s0)² − (x−s1)²]/(2σ²) sums to
    /// n·(s1 − s0)·(2·mean − s0 − s1)/(2σ²), with s = E(elo) (derived from the definitions). Used
    /// with seat-swapped pairs as samples and the pentanomial variance. Zero variance gives NaN:
    /// the caller must fall back to <see cref="LlrBernoulli"/>.
    /// </summary>
    public static double LlrNormal(long samples, double mean, double variance, double elo0, double elo1)
    {
        if (samples == 0) return 0.0;
        if (variance <= 0) return double.NaN;
        var s0 = Elo.ExpectedScore(elo0);
        var s1 = Elo.ExpectedScore(elo1);
        return samples * (s1 - s0) * (2.0 * mean - s0 - s1) / (2.0 * variance);
    }

    /// <summary>The pentanomial form of <see cref="LlrNormal"/>: pair scores as the samples.</summary>
    public static double LlrPentanomial(PentanomialCounts counts, double elo0, double elo1)
    {
        var estimate = EloInterval.FromPairs(counts);
        var variance = estimate.StandardError * estimate.StandardError * estimate.Samples;
        return LlrNormal(estimate.Samples, estimate.Score, variance, elo0, elo1);
    }
}
