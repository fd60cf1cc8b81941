namespace Bramble.Rules.Hackenbush;

/// <summary>
/// SplitMix64: a tiny generator whose output for a seed is fixed forever, so that a generated
/// suite (`bramble generate … --seed X`) reads the same on every machine and every .NET version.
/// </summary>
internal sealed class RepeatableRandom(long seed)
{
    private ulong _state = (ulong)seed;

    public ulong NextULong()
    {
        ulong z = _state += 0x9E3779B97F4A7C15UL;
        z = (z ^ (z >> 30)) * 0xBF58476D1CE4E5B9UL;
        z = (z ^ (z >> 27)) * 0x94D049BB133111EBUL;
        return z ^ (z >> 31);
    }

    /// <summary>Uniform in 0..n-1 (n ≥ 1), by the multiply-high method.</summary>
    public int Next(int n) => (int)Math.BigMul(NextULong(), (ulong)n, out _);

    public bool Chance(int numerator, int denominator) => Next(denominator) < numerator;
}
