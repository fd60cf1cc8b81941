using System.Text;

namespace Bramble.Arena.Journal;

/// <summary>
/// Appends game records, one line each, written in a single call and flushed to the disk before
/// the harness moves on, so a game that was reported finished survives a crash or a kill -9.
/// Thread-safe: parallel games finish at the same time.
/// </summary>
public sealed class JournalWriter : IDisposable
{
    private readonly FileStream _stream;
    private readonly Lock _gate = new();

    private JournalWriter(FileStream stream) => _stream = stream;

    public string Path => _stream.Name;

    /// <summary>
    /// Opens for appending after <paramref name="contents"/> (from <see cref="JournalFile.Read"/>):
    /// an ignored incomplete last line is cut off first, a missing last newline is added.
    /// </summary>
    public static JournalWriter Open(string path, JournalContents contents)
    {
        // Unbuffered: every line goes out in one write of its own, and a failed write (a full disk)
        // leaves nothing behind in a buffer for a later flush to push after it.
        var stream = new FileStream(path, FileMode.OpenOrCreate, FileAccess.ReadWrite, FileShare.Read, bufferSize: 0);
        try
        {
            if (stream.Length > contents.ValidBytes) stream.SetLength(contents.ValidBytes);
            stream.Seek(0, SeekOrigin.End);
            if (contents.NeedsNewline) stream.WriteByte((byte)'\n');
            stream.Flush(flushToDisk: true);
        }
        catch
        {
            stream.Dispose();
            throw;
        }
        return new JournalWriter(stream);
    }

    public void Append(GameRecord record)
    {
        var bytes = Encoding.UTF8.GetBytes(JournalFormat.Write(record) + "\n");
        lock (_gate)
        {
            _stream.Write(bytes);
            _stream.Flush(flushToDisk: true);
        }
    }

    public void Dispose()
    {
        lock (_gate)
        {
            try
            {
                _stream.Dispose();
            }
            catch (IOException)
            {
                // Nothing is buffered; a device that fails on close has already failed a write, and that was reported.
            }
        }
    }
}
