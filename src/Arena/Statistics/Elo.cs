namespace Bramble.Arena.Statistics;

/// <summary>
/// The logistic Elo model (A. Elo, <i>The Rating of Chessplayers, Past and Present</i>, 1978):
/// a rating difference Δ gives the stronger side the expected score E = 1 / (1 + 10^(−Δ/400)),
/// and an observed score s maps back to Δ = −400·log10(1/s − 1).
/// </summary>
public static class Elo
{
    /// <summary>Expected score of a player rated <paramref name="delta"/> points above its opponent.</summary>
    public static double ExpectedScore(double delta) => 1.0 / (1.0 + Math.Pow(10.0, -delta / 400.0));

    /// <summary>The rating difference that predicts the score <paramref name="score"/>; ±∞ at 1 and 0.</summary>
    public static double FromScore(double score) => score switch
    {
        <= 0 => double.NegativeInfinity,
        >= 1 => double.PositiveInfinity,
        _ => -400.0 * Math.Log10(1.0 / score - 1.0),
    };
}
