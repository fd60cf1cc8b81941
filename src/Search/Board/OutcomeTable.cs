using System.Runtime.InteropServices;
using System.Numerics;

namespace Bramble.Search.Board;

/// <summary>
/// The transposition table of the whole-board search: a fixed array of two-entry buckets, each
/// entry two 64-bit words, so it never grows, never allocates after construction and is never
/// cleared when full. Entries hold exact outcomes (the side to move wins or loses), which are
/// valid at any depth, so no bound or depth bookkeeping is needed.
/// <para>
/// Entry layout (16 bytes): word 0 = key XOR word 1; word 1 = bit 0 win, bits 1–8 the move (top
/// cell in the table's mirror orientation, 255 = none), bits 16–63 the work (nodes of the subtree
/// that settled it). The key is stored XORed with the data so that two threads writing one entry
/// at once leave a pair that no longer matches its key and reads as a miss, without locks
/// (lockless hashing, common practice in chess programs).
/// </para>
/// <para>
/// Replacement, after the schemes compared by Breuker, Uiterwijk and van den Herik, "Solving 8×8
/// Domineering", TCS 230 (2000): slot 0 of a bucket keeps the entry with the most work (a new
/// entry with more work pushes the old one down into slot 1), slot 1 is always replaced — so the
/// expensive results survive and the recent cheap ones still get a place.
/// </para>
/// <para>
/// The words live in native memory aligned to 2 MiB and, on Linux, marked for transparent huge
/// pages: a probe lands anywhere in hundreds of MiB, and with 4 KiB pages nearly every probe
/// would also miss the address translation cache (common practice in chess programs).
/// </para>
/// </summary>
public sealed unsafe class OutcomeTable
{
    public const int NoMove = 255;

    private const nuint HugePage = 2 << 20;

    private readonly ulong* _words;
    private readonly long _length;
    private readonly ulong _mask;

    /// <param name="log2Buckets">Buckets as a power of two; each bucket takes 32 bytes.</param>
    public OutcomeTable(int log2Buckets = 21)
    {
        if (log2Buckets < 4 || log2Buckets > 30) throw new ArgumentOutOfRangeException(nameof(log2Buckets));
        _length = (1L << log2Buckets) * 4;
        _mask = (1UL << log2Buckets) - 1;
        nuint bytes = (nuint)_length * sizeof(ulong);
        _words = (ulong*)NativeMemory.AlignedAlloc(bytes, Math.Min(bytes, HugePage));
        if (OperatingSystem.IsLinux() && bytes >= HugePage) AdviseHugePages(_words, bytes);
        // Cleared after the advice, so that the pages are first touched as huge ones.
        NativeMemory.Clear(_words, bytes);
        GC.AddMemoryPressure((long)bytes);
    }

    ~OutcomeTable()
    {
        NativeMemory.AlignedFree(_words);
        GC.RemoveMemoryPressure(_length * sizeof(ulong));
    }

    [DllImport("libc", EntryPoint = "madvise", SetLastError = false)]
    private static extern int Madvise(void* address, nuint length, int advice);

    private static void AdviseHugePages(void* address, nuint length)
    {
        const int MadvHugePage = 14;
        try
        {
            // Only advice: where the kernel declines, the table works the same with small pages.
            _ = Madvise(address, length, MadvHugePage);
        }
        catch (DllNotFoundException) { }
        catch (EntryPointNotFoundException) { }
    }

    public long Buckets => _length / 4;

    /// <summary>Looks up a key; on a hit gives whether the side to move wins and the stored move.</summary>
    public bool TryGet(ulong key, out bool win, out int move)
    {
        ulong* b = _words + (long)(key & _mask) * 4;
        for (int slot = 0; slot < 2; slot++)
        {
            ulong check = Volatile.Read(ref b[slot * 2]);
            ulong data = Volatile.Read(ref b[slot * 2 + 1]);
            if ((check ^ data) == key && data != 0)
            {
                win = (data & 1) != 0;
                move = (int)((data >> 1) & 0xFF);
                return true;
            }
        }
        win = false;
        move = NoMove;
        return false;
    }

    public void Store(ulong key, bool win, int move, long work)
    {
        // Work 0 would make data 0 for a loss without a move, which reads as an empty slot.
        ulong data = (win ? 1UL : 0UL) | ((ulong)(move & 0xFF) << 1) | ((ulong)Math.Clamp(work, 1, (1L << 47) - 1) << 16);
        ulong* b = _words + (long)(key & _mask) * 4;
        ulong data0 = b[1];
        bool sameAs0 = (b[0] ^ data0) == key;
        if (sameAs0 || (data >> 16) >= (data0 >> 16))
        {
            // Push the old deep entry down to the always-replace slot unless it is this position.
            if (!sameAs0 && data0 != 0)
            {
                b[2] = b[0];
                b[3] = data0;
            }
            b[0] = key ^ data;
            b[1] = data;
        }
        else
        {
            b[2] = key ^ data;
            b[3] = data;
        }
    }

    /// <summary>Entries in use (a scan; for reports only).</summary>
    public long Count()
    {
        long n = 0;
        for (long i = 1; i < _length; i += 2) if (_words[i] != 0) n++;
        return n;
    }

    /// <summary>Writes the table (for resuming a long solve).</summary>
    public void Save(BinaryWriter w)
    {
        // The word count is written as an int, as before: tables of up to 2^28 buckets (8 GiB).
        if (_length > int.MaxValue) throw new InvalidOperationException($"a table of {Buckets} buckets is too big to save (at most 2^28)");
        w.Write((int)_length);
        for (long i = 0; i < _length; i++) w.Write(_words[i]);
    }

    /// <summary>Reads a table written by <see cref="Save"/>, at the size it was saved with.</summary>
    public static OutcomeTable Read(BinaryReader r)
    {
        int n = r.ReadInt32();
        int log2 = BitOperations.Log2((uint)Math.Max(n, 1) / 4);
        if (n < 64 || log2 > 28 || n != 4 << log2) throw new InvalidDataException($"the saved table's size ({n} words) is not a power-of-two number of buckets");
        var table = new OutcomeTable(log2);
        for (int i = 0; i < n; i++) table._words[i] = r.ReadUInt64();
        return table;
    }
}
