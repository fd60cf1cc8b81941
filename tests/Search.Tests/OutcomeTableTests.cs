using Bramble.Search.Board;
using Xunit;

namespace Bramble.Search.Tests;

/// <summary>
/// The whole-board transposition table on its own: what goes in comes out, a full bucket gives up
/// the entry that cost the least work (the replacement rule of common practice, after the schemes
/// Breuker, Uiterwijk and van den Herik compared for Domineering), and keys never answer for one another.
/// </summary>
public class OutcomeTableTests
{
    private const int Log2 = 12;

    /// <summary>A key that lands in bucket <paramref name="bucket"/>, told apart by <paramref name="high"/>.</summary>
    private static ulong KeyIn(int bucket, ulong high) => (high << 20) | (uint)bucket;

    [Fact]
    public void EveryStoredOutcomeAndMoveComesBack()
    {
        var table = new OutcomeTable(Log2);
        var random = new Random(20261203);
        var stored = new List<(ulong Key, bool Win, int Move)>();
        for (int bucket = 0; bucket < 1 << Log2; bucket += 3)
        {
            ulong key = KeyIn(bucket, (ulong)random.NextInt64(1, 1L << 43));
            bool win = random.Next(2) == 0;
            int move = random.Next(2) == 0 ? OutcomeTable.NoMove : random.Next(128);
            table.Store(key, win, move, random.Next(1, 1_000_000));
            stored.Add((key, win, move));
        }
        foreach (var (key, win, move) in stored)
        {
            Assert.True(table.TryGet(key, out bool w, out int m), $"key {key:x} lost");
            Assert.Equal(win, w);
            Assert.Equal(move, m);
        }
        Assert.Equal(stored.Count, table.Count());
    }

    [Fact]
    public void AFullBucketGivesUpTheCheapestEntry()
    {
        var table = new OutcomeTable(Log2);
        ulong a = KeyIn(77, 1), b = KeyIn(77, 2), c = KeyIn(77, 3), d = KeyIn(77, 4), e = KeyIn(77, 5), f = KeyIn(77, 6);
        table.Store(a, true, 1, 1_000);
        table.Store(b, false, 2, 10);
        table.Store(c, true, 3, 5_000);
        table.Store(d, false, 4, 20);
        // Four slots are full: the fifth entry takes the place of the one that cost least (b).
        table.Store(e, true, 5, 7);
        Assert.False(table.TryGet(b, out _, out _));
        Assert.True(table.TryGet(e, out _, out _));
        // And the next takes e's, now the cheapest.
        table.Store(f, false, 6, 100_000);
        Assert.False(table.TryGet(e, out _, out _));
        foreach (var (key, move) in new[] { (a, 1), (c, 3), (d, 4), (f, 6) })
        {
            Assert.True(table.TryGet(key, out _, out int m));
            Assert.Equal(move, m);
        }
    }

    [Fact]
    public void StoringAPositionAgainOverwritesItInPlace()
    {
        var table = new OutcomeTable(Log2);
        ulong key = KeyIn(5, 99);
        table.Store(key, false, OutcomeTable.NoMove, 3);
        table.Store(key, true, 17, 3);
        Assert.True(table.TryGet(key, out bool win, out int move));
        Assert.True(win);
        Assert.Equal(17, move);
        Assert.Equal(1, table.Count());
    }

    [Fact]
    public void KeysDifferingInAnyBitDoNotAnswerForEachOther()
    {
        var table = new OutcomeTable(16);
        ulong key = 0x9E37_79B9_7F4A_7C15UL;
        table.Store(key, true, 9, 1);
        for (int bit = 0; bit < 64; bit++)
            Assert.False(table.TryGet(key ^ (1UL << bit), out _, out _), $"a key differing in bit {bit} was found");
    }

    [Fact]
    public void ASavedTableReadsBackEntryForEntry()
    {
        var table = new OutcomeTable(Log2);
        var random = new Random(7);
        var keys = new List<ulong>();
        for (int k = 0; k < 500; k++)
        {
            ulong key = (ulong)random.NextInt64();
            table.Store(key, k % 3 == 0, k % 128, k + 1);
            keys.Add(key);
        }
        using var file = new MemoryStream();
        using (var w = new BinaryWriter(file, System.Text.Encoding.UTF8, leaveOpen: true)) table.Save(w);
        file.Position = 0;
        using var r = new BinaryReader(file);
        var back = OutcomeTable.Read(r);
        Assert.Equal(table.Buckets, back.Buckets);
        Assert.Equal(table.Count(), back.Count());
        foreach (ulong key in keys)
        {
            bool had = table.TryGet(key, out bool win, out int move);
            Assert.Equal(had, back.TryGet(key, out bool win2, out int move2));
            Assert.Equal((win, move), (win2, move2));
        }
    }
}
