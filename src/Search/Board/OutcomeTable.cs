using System.Runtime.InteropServices;
using System.Numerics;

namespace Bramble.Search.Board;

/// <summary>
/// The transposition table of the whole-board search: a fixed array of four-entry buckets of 32
/// bytes, so it never grows, never allocates after construction and is never cleared when full.
/// Entries hold exact outcomes (the side to move wins or loses), which are valid at any depth, so
/// no bound or depth bookkeeping is needed.
/// <para>
/// An entry is one 64-bit word: bits 16–63 are the same bits of the key (the bucket is picked by
/// the low bits, so together they check the whole key on tables of at least 2^16 buckets); bit 0
/// win, bits 1–8 the move (top cell in the table's mirror orientation, 255 = none), bits 9–14 the
/// work as a power of two (the nodes of the subtree that settled it), bit 15 always set, so that
/// no entry is the empty word 0. A word is read and written whole, so two threads writing one slot
/// at once leave one of the two entries, never a mix, without locks.
/// </para>
/// <para>
/// Replacement, after the schemes compared by Breuker, Uiterwijk and van den Herik, "Solving 8×8
/// Domineering", TCS 230 (2000): a position already in the bucket is overwritten in place;
/// otherwise a new entry takes an empty slot or the slot whose entry cost the least work, so the
/// expensive results survive and the recent cheap ones still get a place.
/// </para>
/// <para>
/// The words live in native memory aligned to 2 MiB and, on Linux, marked for transparent huge
/// pages: a probe lands anywhere in hundreds of MiB, and with 4 KiB pages nearly every probe
/// would also miss the address translation cache (common practice in chess programs). A bucket
/// is half a cache line, so a probe costs one memory access.
/// </para>
/// </summary>
public sealed unsafe class OutcomeTable
{
    public const int NoMove = 255;

    private const nuint HugePage = 2 << 20;
    private const int Ways = 4;
    private const ulong CheckBits = ~0xFFFFUL;
    private const ulong Used = 1UL << 15;

    private readonly ulong* _words;
    private readonly long _length;
    private readonly ulong _mask;

    /// <param name="log2Buckets">Buckets as a power of two; each bucket takes 32 bytes.</param>
    public OutcomeTable(int log2Buckets = 21)
    {
        if (log2Buckets < 4 || log2Buckets > 30) throw new ArgumentOutOfRangeException(nameof(log2Buckets));
        _length = (1L << log2Buckets) * Ways;
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

    public long Buckets => _length / Ways;

    /// <summary>Looks up a key; on a hit gives whether the side to move wins and the stored move.</summary>
    public bool TryGet(ulong key, out bool win, out int move)
    {
        ulong* b = _words + (long)(key & _mask) * Ways;
        ulong check = key & CheckBits;
        for (int slot = 0; slot < Ways; slot++)
        {
            ulong e = Volatile.Read(ref b[slot]);
            if ((e & CheckBits) == check && e != 0)
            {
                win = (e & 1) != 0;
                move = (int)((e >> 1) & 0xFF);
                return true;
            }
        }
        win = false;
        move = NoMove;
        return false;
    }

    public void Store(ulong key, bool win, int move, long work)
    {
        int level = Math.Min(63, BitOperations.Log2((ulong)Math.Max(work, 1)));
        ulong check = key & CheckBits;
        ulong entry = check | Used | ((ulong)level << 9) | ((ulong)(move & 0xFF) << 1) | (win ? 1UL : 0UL);
        ulong* b = _words + (long)(key & _mask) * Ways;
        int victim = 0, least = int.MaxValue;
        for (int slot = 0; slot < Ways; slot++)
        {
            ulong e = b[slot];
            if (e == 0 || (e & CheckBits) == check)
            {
                victim = slot;
                break;
            }
            int cost = (int)((e >> 9) & 63);
            if (cost < least)
            {
                least = cost;
                victim = slot;
            }
        }
        Volatile.Write(ref b[victim], entry);
    }

    /// <summary>Entries in use (a scan; for reports only).</summary>
    public long Count()
    {
        long n = 0;
        for (long i = 0; i < _length; i++) if (_words[i] != 0) n++;
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
        int log2 = BitOperations.Log2((uint)Math.Max(n, 1) / Ways);
        if (n < 64 || log2 > 28 || n != Ways << log2) throw new InvalidDataException($"the saved table's size ({n} words) is not a power-of-two number of buckets");
        var table = new OutcomeTable(log2);
        for (int i = 0; i < n; i++) table._words[i] = r.ReadUInt64();
        return table;
    }
}
