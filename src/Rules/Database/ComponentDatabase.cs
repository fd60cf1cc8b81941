using System.Buffers.Binary;
using System.IO.Compression;
using System.Text;
using Bramble.Values;

namespace Bramble.Rules.Database;

/// <summary>
/// The component-value database file: the memo of (ruleset, normal key) → canonical value, kept
/// between runs. Layout (little-endian):
/// <code>
///   0   8  magic "BRAMBLDB"
///   8   2  format version (1)
///  10   2  flags (0; reserved)
///  12   4  entry count
///  16   4  game node count
///  20   8  body length in the file (Brotli-compressed)
///  28   8  body length uncompressed
///  36   …  body: description (string), game nodes (<see cref="GameCodec"/>), entries (key string, node index), keys sorted
///  end  4  CRC-32 of every byte before it
/// </code>
/// The counts sit in the header as well as the body so a damaged body is caught twice. Writers
/// write a temporary file beside the target and rename it into place, so a reader (in this or
/// any other process) sees the old file or the new one, never half of one. A file that is not a
/// valid database is refused with a message and never written over.
/// </summary>
public static class ComponentDatabase
{
    public const ushort FormatVersion = 1;
    private const int HeaderBytes = 36;
    private static readonly byte[] s_magic = "BRAMBLDB"u8.ToArray();
    private static readonly UTF8Encoding s_utf8 = new(encoderShouldEmitUTF8Identifier: false, throwOnInvalidBytes: true);

    /// <summary>Reads a database into <paramref name="store"/>. Throws <see cref="DatabaseFormatException"/> for a file that is not a valid one.</summary>
    public static DatabaseContents Read(string path, GameStore store)
    {
        byte[] bytes;
        using (var stream = new FileStream(path, FileMode.Open, FileAccess.Read, FileShare.ReadWrite | FileShare.Delete))
        {
            bytes = new byte[stream.Length];
            stream.ReadExactly(bytes);
        }
        return Decode(path, bytes, store);
    }

    /// <summary>
    /// Adds the entries of the database at <paramref name="path"/> to the context's memo (entries
    /// already in the memo are kept) and returns how many were read; a file that does not exist
    /// yet reads as empty.
    /// </summary>
    public static int Load(string path, ValueContext context)
    {
        if (!File.Exists(path)) return 0;
        var contents = Read(path, context.Store);
        foreach (var (key, game) in contents.Entries) context.Memo.TryAdd(key, game);
        return contents.Entries.Count;
    }

    /// <summary>
    /// Writes the context's memo to <paramref name="path"/>. When a valid database is already there
    /// its entries are merged in first (so two runs sharing a file lose nothing but a race); when
    /// something else is there, throws <see cref="DatabaseFormatException"/> and leaves it alone.
    /// </summary>
    public static void Save(string path, ValueContext context, string description)
    {
        if (File.Exists(path))
        {
            try
            {
                Load(path, context);
            }
            catch (DatabaseFormatException e)
            {
                throw new DatabaseFormatException(path, e.Reason + "; refusing to overwrite it (move it away or choose another file)");
            }
        }
        var bytes = Encode(context.Memo, context.Store, description);
        string full = Path.GetFullPath(path);
        string temporary = $"{full}.{Environment.ProcessId}.{Guid.NewGuid():N}.tmp";
        try
        {
            using (var stream = new FileStream(temporary, FileMode.CreateNew, FileAccess.Write, FileShare.None))
            {
                stream.Write(bytes);
                stream.Flush(flushToDisk: true);
            }
            File.Move(temporary, full, overwrite: true);
        }
        finally
        {
            if (File.Exists(temporary)) File.Delete(temporary);
        }
    }

    /// <summary>The file image of a set of entries (keys "ruleset:normal key").</summary>
    public static byte[] Encode(IReadOnlyDictionary<string, Game> entries, GameStore store, string description)
    {
        var keys = entries.Keys.ToArray();
        Array.Sort(keys, StringComparer.Ordinal);
        var codec = new GameCodec.Writer(store);
        var indices = new int[keys.Length];
        for (int i = 0; i < keys.Length; i++) indices[i] = codec.Add(entries[keys[i]]);

        var body = new MemoryStream();
        using (var writer = new BinaryWriter(body, s_utf8, leaveOpen: true))
        {
            writer.Write(description);
            codec.WriteNodes(writer);
            writer.Write7BitEncodedInt(keys.Length);
            for (int i = 0; i < keys.Length; i++)
            {
                writer.Write(keys[i]);
                writer.Write7BitEncodedInt(indices[i]);
            }
        }
        var packed = new MemoryStream();
        using (var brotli = new BrotliStream(packed, CompressionLevel.Optimal, leaveOpen: true))
        {
            body.Position = 0;
            body.CopyTo(brotli);
        }

        var file = new byte[HeaderBytes + packed.Length + 4];
        s_magic.CopyTo(file, 0);
        BinaryPrimitives.WriteUInt16LittleEndian(file.AsSpan(8), FormatVersion);
        BinaryPrimitives.WriteUInt16LittleEndian(file.AsSpan(10), 0);
        BinaryPrimitives.WriteUInt32LittleEndian(file.AsSpan(12), (uint)keys.Length);
        BinaryPrimitives.WriteUInt32LittleEndian(file.AsSpan(16), (uint)codec.Count);
        BinaryPrimitives.WriteUInt64LittleEndian(file.AsSpan(20), (ulong)packed.Length);
        BinaryPrimitives.WriteUInt64LittleEndian(file.AsSpan(28), (ulong)body.Length);
        packed.GetBuffer().AsSpan(0, (int)packed.Length).CopyTo(file.AsSpan(HeaderBytes));
        BinaryPrimitives.WriteUInt32LittleEndian(file.AsSpan(file.Length - 4), Crc32.Of(file.AsSpan(0, file.Length - 4)));
        return file;
    }

    /// <summary>Checks and reads a file image; <paramref name="path"/> is only for messages.</summary>
    public static DatabaseContents Decode(string path, byte[] bytes, GameStore store)
    {
        if (bytes.Length == 0) throw new DatabaseFormatException(path, "the file is empty, not a Bramble component database");
        if (bytes.Length < s_magic.Length || !bytes.AsSpan(0, s_magic.Length).SequenceEqual(s_magic))
            throw new DatabaseFormatException(path, "not a Bramble component database (it does not start with BRAMBLDB)");
        if (bytes.Length < HeaderBytes + 4)
            throw new DatabaseFormatException(path, $"truncated: {bytes.Length} bytes, shorter than the {HeaderBytes + 4}-byte frame");
        ushort version = BinaryPrimitives.ReadUInt16LittleEndian(bytes.AsSpan(8));
        if (version != FormatVersion)
            throw new DatabaseFormatException(path, $"format version {version}, but this build of Bramble reads version {FormatVersion}");
        uint entryCount = BinaryPrimitives.ReadUInt32LittleEndian(bytes.AsSpan(12));
        uint nodeCount = BinaryPrimitives.ReadUInt32LittleEndian(bytes.AsSpan(16));
        ulong packedLength = BinaryPrimitives.ReadUInt64LittleEndian(bytes.AsSpan(20));
        ulong bodyLength = BinaryPrimitives.ReadUInt64LittleEndian(bytes.AsSpan(28));
        ulong expected = HeaderBytes + packedLength + 4;
        if ((ulong)bytes.Length < expected)
            throw new DatabaseFormatException(path, $"truncated: the header promises {expected} bytes, the file has {bytes.Length}");
        if ((ulong)bytes.Length > expected)
            throw new DatabaseFormatException(path, $"corrupt: {(ulong)bytes.Length - expected} bytes after the end of the database");
        uint stored = BinaryPrimitives.ReadUInt32LittleEndian(bytes.AsSpan(bytes.Length - 4));
        if (stored != Crc32.Of(bytes.AsSpan(0, bytes.Length - 4)))
            throw new DatabaseFormatException(path, "corrupt: the checksum does not match the contents");
        if (bodyLength > int.MaxValue)
            throw new DatabaseFormatException(path, $"corrupt: a body of {bodyLength} bytes");

        try
        {
            var body = new byte[bodyLength];
            using (var brotli = new BrotliStream(new MemoryStream(bytes, HeaderBytes, (int)packedLength), CompressionMode.Decompress))
            {
                brotli.ReadExactly(body);
                if (brotli.ReadByte() != -1) throw new InvalidDataException("more data than the header says");
            }
            using var reader = new BinaryReader(new MemoryStream(body), s_utf8);
            string description = reader.ReadString();
            var nodes = GameCodec.ReadNodes(reader, store);
            if (nodes.Length != nodeCount) throw new InvalidDataException($"{nodes.Length} game nodes, the header says {nodeCount}");
            int entries = reader.Read7BitEncodedInt();
            if (entries != entryCount) throw new InvalidDataException($"{entries} entries, the header says {entryCount}");
            var map = new Dictionary<string, Game>(entries, StringComparer.Ordinal);
            for (int i = 0; i < entries; i++)
            {
                string key = reader.ReadString();
                int index = reader.Read7BitEncodedInt();
                if (index < 0 || index >= nodes.Length) throw new InvalidDataException($"entry '{key}' names game node {index} of {nodes.Length}");
                if (key.IndexOf(':') <= 0) throw new InvalidDataException($"entry '{key}' has no ruleset name");
                if (!map.TryAdd(key, nodes[index])) throw new InvalidDataException($"entry '{key}' appears twice");
            }
            if (reader.BaseStream.Position != reader.BaseStream.Length) throw new InvalidDataException("data after the last entry");
            return new DatabaseContents(description, version, map, nodes.Length, bytes.Length);
        }
        catch (Exception e) when (e is InvalidDataException or EndOfStreamException or DecoderFallbackException or IOException or ArgumentException or OverflowException)
        {
            throw new DatabaseFormatException(path, "corrupt: " + e.Message);
        }
    }
}
