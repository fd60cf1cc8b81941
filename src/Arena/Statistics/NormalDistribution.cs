namespace Bramble.Arena.Statistics;

/// <summary>The standard normal distribution function, for likelihoods of superiority.</summary>
public static class NormalDistribution
{
    /// <summary>
    /// Φ(x) = erfc(−x/√2)/2, with erfc by the Chebyshev-fitted formula of Press et al., <i>Numerical
    /// Recipes in C</i>, 2nd ed. (1992), §6.2 (<c>erfcc</c>, fractional error below 1.2·10⁻⁷) — ample
    /// for a percentage shown to one decimal.
    /// </summary>
    public static double Cdf(double x)
    {
        if (double.IsPositiveInfinity(x)) return 1;
        if (double.IsNegativeInfinity(x)) return 0;
        return 0.5 * Erfc(-x / Math.Sqrt(2));
    }

    private static double Erfc(double x)
    {
        var z = Math.Abs(x);
        var t = 1.0 / (1.0 + 0.5 * z);
        var r = t * Math.Exp(-z * z - 1.26551223 + t * (1.00002368 + t * (0.37409196 + t * (0.09678418 + t * (-0.18628806
            + t * (0.27886807 + t * (-1.13520398 + t * (1.48851587 + t * (-0.82215223 + t * 0.17087277)))))))));
        return x >= 0 ? r : 2.0 - r;
    }
}
