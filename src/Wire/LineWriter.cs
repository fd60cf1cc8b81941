using System.Text;

namespace Bramble.Wire;

/// <summary>
/// Writes twine/1 lines as UTF-8 with a <c>\n</c> terminator and flushes each one, since the other
/// side waits for whole lines. Thread-safe, because an engine writes progress notes from its
/// thinking thread while the reading thread may answer too.
/// </summary>
public sealed class LineWriter(Stream stream)
{
    // A semaphore rather than a lock so the asynchronous path can hold it across an await.
    private readonly SemaphoreSlim _gate = new(1, 1);

    public void Write(Message message) => WriteLine(Codec.Format(message));

    public async ValueTask WriteAsync(Message message, CancellationToken cancel = default)
    {
        var bytes = Encode(Codec.Format(message));
        await _gate.WaitAsync(cancel).ConfigureAwait(false);
        try
        {
            await stream.WriteAsync(bytes, cancel).ConfigureAwait(false);
            await stream.FlushAsync(cancel).ConfigureAwait(false);
        }
        finally
        {
            _gate.Release();
        }
    }

    /// <summary>Writes an already formatted line (no terminator).</summary>
    public void WriteLine(string line)
    {
        var bytes = Encode(line);
        _gate.Wait();
        try
        {
            stream.Write(bytes);
            stream.Flush();
        }
        finally
        {
            _gate.Release();
        }
    }

    private static byte[] Encode(string line) => Encoding.UTF8.GetBytes(line + "\n");
}
