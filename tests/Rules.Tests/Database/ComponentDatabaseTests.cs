using System.Buffers.Binary;
using Bramble.Rules.Database;
using Bramble.Rules.Domineering;
using Bramble.Values;

namespace Bramble.Rules.Tests.Database;

/// <summary>The database file: round trips, refusal of foreign, truncated and corrupt files, safe replacement.</summary>
public sealed class ComponentDatabaseTests : IDisposable
{
    private readonly DomineeringRuleset _rules = new();
    private readonly string _folder = Directory.CreateTempSubdirectory("bramble-db-tests-").FullName;

    public void Dispose() => Directory.Delete(_folder, recursive: true);

    private string PathOf(string name) => Path.Combine(_folder, name);

    /// <summary>A context whose memo holds every region of up to <paramref name="cells"/> cells.</summary>
    private ValueContext Built(int cells)
    {
        var context = new ValueContext();
        foreach (var component in _rules.ComponentsUpTo(cells)) _rules.Value(component, context);
        return context;
    }

    [Fact]
    public void SavedRegionsLoadIntoAnotherStoreWithTheSameValues()
    {
        var built = Built(7);
        string file = PathOf("seven.db");
        ComponentDatabase.Save(file, built, "regions up to 7 cells");

        var loaded = new ValueContext();
        Assert.Equal(built.Memo.Count, ComponentDatabase.Load(file, loaded));
        Assert.Equal(built.Memo.Keys.OrderBy(k => k, StringComparer.Ordinal), loaded.Memo.Keys.OrderBy(k => k, StringComparer.Ordinal));
        foreach (var (key, game) in loaded.Memo)
        {
            // Recompute each region from scratch in the loading store: the stored value must be that game.
            var fresh = new ValueContext(loaded.Store);
            var region = _rules.Parse(key["domineering:".Length..]);
            Assert.Equal(_rules.Value(region, fresh), game);
        }
        Assert.Empty(Directory.GetFiles(_folder, "*.tmp"));
    }

    [Fact]
    public void LoadedValuesAnswerWithoutSearch()
    {
        string file = PathOf("six.db");
        ComponentDatabase.Save(file, Built(6), "");
        var context = new ValueContext();
        ComponentDatabase.Load(file, context);
        context.ResetCounters(nodeCap: 0);
        // Every region of at most 6 cells is in the file, so no node is searched.
        var value = _rules.Value(_rules.Parse("2x3"), context);
        Assert.Equal(0, context.Nodes);
        // Source: Wikipedia, "Domineering": the 2×3 board is {2 | −1/2}.
        Assert.Equal(context.Store.Make([context.Store.Integer(2)], [context.Store.Number(Dyadic.Create(-1, 1))]), value);
    }

    [Fact]
    public void AssortedGamesSurviveTheCodecBothWays()
    {
        var first = new GameStore();
        var games = new List<Game>
        {
            first.Zero, first.Star, first.Up, first.Down, first.Nimber(5), first.UpStar(Dyadic.Create(3, 2), 2, 1),
            first.Number(Dyadic.Create(-7, 5)), first.Number(Dyadic.FromInteger(System.Numerics.BigInteger.Pow(3, 60)).Shift(3)),
            first.Make([first.Integer(2)], [first.Number(Dyadic.Create(-1, 1))]),
        };
        games.Add(first.Make([games[^1], first.Star], [first.Up, first.Integer(-1)]));
        games.Add(first.Add(games[^1], games[^2]));
        var entries = games.Select((g, i) => ($"test:{i}", g)).ToDictionary(e => e.Item1, e => e.g);

        var second = new GameStore();
        var there = ComponentDatabase.Decode("mem", ComponentDatabase.Encode(entries, first, ""), second).Entries;
        var back = ComponentDatabase.Decode("mem", ComponentDatabase.Encode(there, second, ""), first).Entries;
        foreach (var (key, game) in entries) Assert.Equal(game, back[key]);
        // Order relations survive in the other store too (an independent check that the games are the same).
        Assert.True(second.Less(there["test:0"], there["test:2"]));
        Assert.Equal(Outcome.N, second.OutcomeOf(there["test:8"]));
    }

    [Fact]
    public void MissingFileLoadsAsEmpty()
    {
        Assert.Equal(0, ComponentDatabase.Load(PathOf("absent.db"), new ValueContext()));
    }

    [Fact]
    public void ForeignFileIsRefusedAndNeverOverwritten()
    {
        string file = PathOf("notes.db");
        File.WriteAllText(file, "apple tree pruning schedule\n");
        var error = Assert.Throws<DatabaseFormatException>(() => ComponentDatabase.Load(file, new ValueContext()));
        Assert.Contains("not a Bramble component database", error.Message);
        var refusal = Assert.Throws<DatabaseFormatException>(() => ComponentDatabase.Save(file, Built(4), ""));
        Assert.Contains("refusing to overwrite", refusal.Message);
        Assert.Equal("apple tree pruning schedule\n", File.ReadAllText(file));
    }

    [Fact]
    public void EmptyFileIsRefused()
    {
        string file = PathOf("empty.db");
        File.WriteAllBytes(file, []);
        Assert.Contains("empty", Assert.Throws<DatabaseFormatException>(() => ComponentDatabase.Load(file, new ValueContext())).Message);
    }

    [Fact]
    public void TruncatedFileIsRefused()
    {
        var bytes = ComponentDatabase.Encode(Built(5).Memo, Built(5).Store, "");
        foreach (int length in new[] { 4, 20, bytes.Length / 2, bytes.Length - 1 })
        {
            var error = Assert.Throws<DatabaseFormatException>(() => ComponentDatabase.Decode("cut.db", bytes[..length], new GameStore()));
            Assert.True(error.Message.Contains("truncated") || error.Message.Contains("not a Bramble"), error.Message);
        }
    }

    [Fact]
    public void EveryFlippedByteIsCaught()
    {
        var context = Built(5);
        var bytes = ComponentDatabase.Encode(context.Memo, context.Store, "five");
        for (int i = 0; i < bytes.Length; i++)
        {
            var damaged = (byte[])bytes.Clone();
            damaged[i] ^= 0x10;
            Assert.Throws<DatabaseFormatException>(() => ComponentDatabase.Decode("flip.db", damaged, new GameStore()));
        }
    }

    [Fact]
    public void NewerFormatVersionIsRefusedByName()
    {
        var context = Built(4);
        var bytes = ComponentDatabase.Encode(context.Memo, context.Store, "");
        BinaryPrimitives.WriteUInt16LittleEndian(bytes.AsSpan(8), 2);
        BinaryPrimitives.WriteUInt32LittleEndian(bytes.AsSpan(bytes.Length - 4), Crc32.Of(bytes.AsSpan(0, bytes.Length - 4)));
        Assert.Contains("format version 2", Assert.Throws<DatabaseFormatException>(() => ComponentDatabase.Decode("v2.db", bytes, new GameStore())).Message);
    }

    [Fact]
    public void ChecksumIsTheUsualCrc32()
    {
        // Common practice: the CRC-32 check value of the ASCII digits "123456789" is 0xCBF43926.
        Assert.Equal(0xCBF43926u, Crc32.Of("123456789"u8));
    }

    [Fact]
    public void SavingMergesWithWhatTheFileAlreadyHolds()
    {
        string file = PathOf("merged.db");
        var wide = new ValueContext();
        _rules.Value(_rules.Parse("2x4"), wide);
        ComponentDatabase.Save(file, wide, "");
        var tall = new ValueContext();
        _rules.Value(_rules.Parse("###/.../..."), tall);
        ComponentDatabase.Save(file, tall, "");

        var both = new ValueContext();
        ComponentDatabase.Load(file, both);
        foreach (string key in wide.Memo.Keys.Concat(tall.Memo.Keys)) Assert.Contains(key, both.Memo.Keys);
    }

    [Fact]
    public async Task ReadersNeverSeeAHalfWrittenFile()
    {
        string file = PathOf("shared.db");
        var small = Built(5);
        var large = Built(7);
        ComponentDatabase.Save(file, small, "");
        var writer = Task.Run(() =>
        {
            for (int i = 0; i < 20; i++)
            {
                // Alternate between a smaller and a larger file so a torn read would show.
                File.Delete(file);
                ComponentDatabase.Save(file + ".next", i % 2 == 0 ? large : small, "");
                File.Move(file + ".next", file);
            }
        });
        var readers = Enumerable.Range(0, 2).Select(_ => Task.Run(() =>
        {
            int reads = 0;
            while (!writer.IsCompleted || reads == 0)
            {
                try
                {
                    var contents = ComponentDatabase.Read(file, new GameStore());
                    Assert.True(contents.Entries.Count == small.Memo.Count || contents.Entries.Count == large.Memo.Count);
                    reads++;
                }
                catch (FileNotFoundException)
                {
                    // Between the delete and the move there is no file, which readers report as missing, not corrupt.
                }
            }
            return reads;
        })).ToArray();
        await writer;
        foreach (var reader in readers) Assert.True(await reader > 0);
    }

    [Fact]
    public void SummaryCountsComponentsBySize()
    {
        string file = PathOf("summary.db");
        ComponentDatabase.Save(file, Built(6), "regions up to 6 cells");
        var summary = DatabaseSummary.Of(file);
        Assert.Equal("regions up to 6 cells", summary.Description);
        var part = Assert.Single(summary.Rulesets);
        Assert.Equal("domineering", part.Ruleset);
        // [from memory] OEIS A000105: 1, 2, 5, 12, 35 free polyominoes of 2..6 cells.
        Assert.Equal(new Dictionary<int, int> { [2] = 1, [3] = 2, [4] = 5, [5] = 12, [6] = 35 }, part.EntriesBySize);
        Assert.Equal(part.Entries, part.Numbers + part.Nimbers + part.OtherValues);
    }
}
