namespace Bramble.Values;

/// <summary>
/// The store's memo of a ≤ b: an open-addressing table of packed id pairs with the answer in
/// the low bit. One probe sequence in one array, where a dictionary of a few million entries
/// spends its time on the bucket, entry and resize indirections.
/// </summary>
internal sealed class PairTable
{
    // A slot holds (pair << 1) | answer, or 0 when empty; pair (0, 0) is never stored, since
    // a ≤ a is answered before the table is asked.
    private ulong[] _slots = new ulong[1 << 12];
    private int _count;

    // A small direct-mapped copy of recent answers in front of the big table: comparisons
    // recurse through the same few pairs again and again, and this array stays in the CPU's
    // cache where the big table does not.
    private const int RecentBits = 15;
    private readonly ulong[] _recent = new ulong[1 << RecentBits];

    public int Count => _count;

    public bool TryGet(long pair, out bool answer)
    {
        ulong want = (ulong)pair << 1;
        int hash = Hash(pair);
        ref ulong recent = ref _recent[hash >> (31 - RecentBits)];
        if ((recent & ~1UL) == want && want != 0) { answer = (recent & 1) != 0; return true; }
        int mask = _slots.Length - 1;
        for (int i = hash & mask; ; i = (i + 1) & mask)
        {
            ulong slot = _slots[i];
            if (slot == 0) { answer = false; return false; }
            if ((slot & ~1UL) == want) { recent = slot; answer = (slot & 1) != 0; return true; }
        }
    }

    public void Set(long pair, bool answer)
    {
        if (2 * (_count + 1) > _slots.Length) Grow();
        ulong value = (ulong)pair << 1 | (answer ? 1UL : 0UL);
        if (Insert(_slots, value)) _count++;
        _recent[Hash(pair) >> (31 - RecentBits)] = value;
    }

    /// <summary>A well-mixed 31-bit hash of a packed pair (Fibonacci hashing), also used by the store's pair-keyed dictionaries.</summary>
    internal static int Hash(long pair) => (int)(((ulong)pair * 0x9E3779B97F4A7C15UL) >> 33);

    /// <summary>Writes the slot; false when the pair was already there (its answer is replaced).</summary>
    private static bool Insert(ulong[] slots, ulong value)
    {
        int mask = slots.Length - 1;
        ulong want = value & ~1UL;
        for (int i = Hash((long)(value >> 1)) & mask; ; i = (i + 1) & mask)
        {
            ulong slot = slots[i];
            if (slot == 0) { slots[i] = value; return true; }
            if ((slot & ~1UL) == want) { slots[i] = value; return false; }
        }
    }

    private void Grow()
    {
        var bigger = new ulong[_slots.Length * 2];
        foreach (ulong slot in _slots) if (slot != 0) Insert(bigger, slot);
        _slots = bigger;
    }
}
