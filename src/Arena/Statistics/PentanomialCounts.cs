namespace Bramble.Arena.Statistics;

/// <summary>
/// How many seat-swapped pairs scored 0, ½, 1, 3/2 and 2 points out of 2 (pair scores 0, ¼, ½, ¾, 1),
/// the frequencies of the pentanomial model (M. Van den Bergh, "Normalized Elo", technical note, §4).
/// Games of combinatorial games have no draws, so only 0, 1 and 2 occur here, but the model is kept
/// whole so it can be checked against the published formula.
/// </summary>
public readonly record struct PentanomialCounts(long Zero, long Quarter, long Half, long ThreeQuarters, long One)
{
    public long Pairs => Zero + Quarter + Half + ThreeQuarters + One;

    /// <summary>Adds one pair with <paramref name="points"/> (0, 0.5, 1, 1.5 or 2) out of 2.</summary>
    public PentanomialCounts Add(double points) => (int)Math.Round(points * 2) switch
    {
        0 => this with { Zero = Zero + 1 },
        1 => this with { Quarter = Quarter + 1 },
        2 => this with { Half = Half + 1 },
        3 => this with { ThreeQuarters = ThreeQuarters + 1 },
        4 => this with { One = One + 1 },
        _ => throw new ArgumentOutOfRangeException(nameof(points), points, "a pair scores between 0 and 2 points"),
    };

    /// <summary>(pair score, frequency) for the five outcomes.</summary>
    public IEnumerable<(double Score, long Count)> Outcomes()
    {
        yield return (0.0, Zero);
        yield return (0.25, Quarter);
        yield return (0.5, Half);
        yield return (0.75, ThreeQuarters);
        yield return (1.0, One);
    }
}
