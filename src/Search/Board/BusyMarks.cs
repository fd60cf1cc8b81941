namespace Bramble.Search.Board;

/// <summary>
/// Which positions the threads of one solve are searching right now, so that a thread that meets
/// a move another one is already searching puts it off and takes the next (after Weill's ABDADA,
/// 1996, for alpha-beta on shared transposition tables). A fixed array of counters indexed by the
/// low bits of the table key: two positions that share a counter only make a move look busy when
/// it is not, which costs a little order and never an answer.
/// </summary>
public sealed class BusyMarks
{
    private readonly int[] _counts;
    private readonly int _mask;

    /// <param name="depth">Plies from the root within which nodes are marked and moves put off; deeper subtrees are too small to share.</param>
    public BusyMarks(int depth, int log2Counters = 16)
    {
        Depth = depth;
        _counts = new int[1 << log2Counters];
        _mask = (1 << log2Counters) - 1;
    }

    public int Depth { get; }

    /// <summary>Marks a position as being searched; returns the handle for <see cref="Leave"/>.</summary>
    public int Enter(ulong key)
    {
        int slot = (int)(key & (ulong)_mask);
        Interlocked.Increment(ref _counts[slot]);
        return slot;
    }

    public void Leave(int handle) => Interlocked.Decrement(ref _counts[handle]);

    public bool IsBusy(ulong key) => Volatile.Read(ref _counts[(int)(key & (ulong)_mask)]) > 0;
}
