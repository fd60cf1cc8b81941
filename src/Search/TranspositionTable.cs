namespace Bramble.Search;

/// <summary>
/// Alpha-beta's transposition table: a fixed array indexed by the low bits of the position's hash
/// (with the side to move mixed in), each slot holding one entry and replaced when a deeper or a
/// proven result arrives. A fixed array keeps memory flat however long the search runs.
/// </summary>
public sealed class TranspositionTable
{
    /// <summary>
    /// One slot, 16 bytes: the full 64-bit key (so a slot collision is recognised; two positions
    /// with the same 64-bit key are assumed not to meet), the depth the result holds to (proven
    /// results hold to any depth), the result and the index of the move that decided it.
    /// </summary>
    public struct Entry
    {
        public ulong Key;
        public int Depth;
        public SearchResult Result;
        public short Best;
    }

    private readonly Entry[] _slots;
    private readonly int _mask;

    public TranspositionTable(int log2Size)
    {
        _slots = new Entry[1 << log2Size];
        _mask = (1 << log2Size) - 1;
    }

    public bool TryGet(ulong key, out Entry entry)
    {
        entry = _slots[(int)(key & (ulong)_mask)];
        return entry.Key == key && entry.Result != SearchResult.None;
    }

    public void Store(ulong key, int depth, SearchResult result, int best)
    {
        ref var slot = ref _slots[(int)(key & (ulong)_mask)];
        // Keep a proven result of another position against an unproven one; otherwise the newer wins.
        if (slot.Key != key && slot.Result is SearchResult.Win or SearchResult.Loss && result == SearchResult.Unknown) return;
        slot.Key = key;
        slot.Depth = depth;
        slot.Result = result;
        slot.Best = (short)Math.Clamp(best, -1, short.MaxValue);
    }

    public void Clear() => Array.Clear(_slots);
}

/// <summary>Result of a win/loss search for the side to move.</summary>
public enum SearchResult : byte { None, Unknown, Win, Loss }
