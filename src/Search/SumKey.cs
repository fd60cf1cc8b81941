using Bramble.Values;

namespace Bramble.Search;

/// <summary>
/// A multiset of canonical non-number component values: their game ids, sorted. Equal keys are
/// equal sums, so the global memo shares entries between every move order that reaches the same
/// components (and between equal components anywhere in the position).
/// </summary>
public readonly struct SumKey : IEquatable<SumKey>
{
    private readonly int[] _ids;
    private readonly int _hash;

    private SumKey(int[] sortedIds)
    {
        _ids = sortedIds;
        var h = new HashCode();
        foreach (int id in sortedIds) h.Add(id);
        _hash = h.ToHashCode();
    }

    public static readonly SumKey Empty = new([]);

    public static SumKey Of(IEnumerable<Game> games)
    {
        var ids = games.Select(g => g.Id).ToArray();
        Array.Sort(ids);
        return new SumKey(ids);
    }

    public int Count => Ids.Length;
    public bool IsEmpty => Ids.Length == 0;
    public ReadOnlySpan<int> Ids => _ids ?? [];
    public Game this[int i] => new(Ids[i]);

    public IEnumerable<Game> Games => (_ids ?? []).Select(id => new Game(id));

    /// <summary>This multiset with the entry at <paramref name="index"/> removed and <paramref name="added"/> put in.</summary>
    public SumKey Replace(int index, ReadOnlySpan<int> added)
    {
        var ids = new int[Ids.Length - 1 + added.Length];
        int w = 0;
        for (int i = 0; i < Ids.Length; i++) if (i != index) ids[w++] = Ids[i];
        added.CopyTo(ids.AsSpan(w));
        Array.Sort(ids);
        return new SumKey(ids);
    }

    public bool Equals(SumKey other) => _hash == other._hash && Ids.SequenceEqual(other.Ids);
    public override bool Equals(object? obj) => obj is SumKey k && Equals(k);
    public override int GetHashCode() => _hash;

    public override string ToString() => "[" + string.Join(",", (_ids ?? []).Select(i => "#" + i)) + "]";
}
