namespace Bramble.Rules.Hackenbush;

/// <summary>
/// A fixed 64-bit mixing function (the SplitMix64 finaliser). Zobrist keys and the hashes that
/// order normal keys are computed from it rather than from a random table, so they are the same
/// in every process — a normal key written to a database file must mean the same thing tomorrow.
/// </summary>
internal static class Mix
{
    public static ulong Hash(ulong x)
    {
        x += 0x9E3779B97F4A7C15UL;
        x = (x ^ (x >> 30)) * 0xBF58476D1CE4E5B9UL;
        x = (x ^ (x >> 27)) * 0x94D049BB133111EBUL;
        return x ^ (x >> 31);
    }

    public static ulong Hash(ulong a, ulong b) => Hash(Hash(a) ^ (b * 0xD6E8FEB86659FD93UL));

    /// <summary>The Zobrist key of an edge: the position hash is the XOR of these over its edges.</summary>
    public static ulong EdgeKey(int id, EdgeColour colour) => Hash(((ulong)(uint)id << 2) | (byte)colour, 0x5A6E6B62UL);
}
