namespace Bramble.Arena.Schedule;

/// <summary>
/// The seed a player gets for one game: a function of the match's seed, the game's id and the
/// player's id only. Engines are reused from game to game and games run in whatever order the
/// workers take them, so a random generator shared across games would make every game depend on
/// the ones before it on that engine; a seed per game makes each game depend on itself alone,
/// whatever <c>--parallel</c>, shard or resumed run plays it.
/// </summary>
public static class PerGameChance
{
    public static int For(long matchSeed, int gameId, string playerId)
    {
        // FNV-1a over the id's UTF-16 units (string.GetHashCode differs from run to run), then
        // SplitMix64 finalisers to spread neighbouring game ids over the whole range.
        ulong name = 14695981039346656037UL;
        foreach (var c in playerId)
        {
            name ^= c;
            name *= 1099511628211UL;
        }
        var mixed = Mix(Mix((ulong)matchSeed) ^ Mix((ulong)gameId + 0x632BE59BD9B4E019UL) ^ name);
        return (int)(mixed >> 33);
    }

    /// <summary>SplitMix64's output function (Steele, Lea, Flood, "Fast splittable pseudorandom number generators", OOPSLA 2014).</summary>
    private static ulong Mix(ulong z)
    {
        z += 0x9E3779B97F4A7C15UL;
        z = (z ^ (z >> 30)) * 0xBF58476D1CE4E5B9UL;
        z = (z ^ (z >> 27)) * 0x94D049BB133111EBUL;
        return z ^ (z >> 31);
    }
}
