namespace Bramble.Search.Board;

/// <summary>
/// Proof and disproof numbers of the positions a proof-number search has looked at but not
/// settled (settled ones go to the <see cref="OutcomeTable"/>): two-entry buckets keyed by the
/// same 64-bit keys; a new entry takes the slot of the same position, else the one whose subtree
/// cost less work. Numbers are for the side to move: proof = the cost of showing it wins.
/// </summary>
public sealed class ProofTable
{
    private struct Entry
    {
        public ulong Key;
        public uint Proof, Disproof;
        public long Work;
    }

    private readonly Entry[] _entries;
    private readonly long _mask;

    /// <param name="log2Buckets">Buckets as a power of two; each holds two entries of 24 bytes.</param>
    public ProofTable(int log2Buckets)
    {
        if (log2Buckets < 4 || log2Buckets > 28) throw new ArgumentOutOfRangeException(nameof(log2Buckets));
        _entries = new Entry[2L << log2Buckets];
        _mask = (1L << log2Buckets) - 1;
    }

    public bool TryGet(ulong key, out uint proof, out uint disproof)
    {
        long at = (long)(key & (ulong)_mask) * 2;
        ref var a = ref _entries[at];
        if (a.Key == key && a.Work > 0) { (proof, disproof) = (a.Proof, a.Disproof); return true; }
        ref var b = ref _entries[at + 1];
        if (b.Key == key && b.Work > 0) { (proof, disproof) = (b.Proof, b.Disproof); return true; }
        (proof, disproof) = (0, 0);
        return false;
    }

    public void Store(ulong key, uint proof, uint disproof, long work)
    {
        long at = (long)(key & (ulong)_mask) * 2;
        ref var a = ref _entries[at];
        ref var b = ref _entries[at + 1];
        bool first = a.Key == key || a.Work == 0 || (b.Key != key && b.Work != 0 && a.Work <= b.Work);
        ref var slot = ref first ? ref a : ref b;
        slot.Key = key;
        slot.Proof = proof;
        slot.Disproof = disproof;
        slot.Work = Math.Max(1, work);
    }
}
