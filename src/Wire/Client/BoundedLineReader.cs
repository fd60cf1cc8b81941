using System.Buffers;
using System.Diagnostics;
using System.Text;

namespace Bramble.Wire.Client;

/// <summary>One line read from an engine, with the moment it arrived (for clocks that must not
/// count the time the harness took to get round to reading it).</summary>
public readonly record struct ReceivedLine(string Text, int Bytes, long Timestamp);

/// <summary>The engine wrote a line longer than the limit; the rest of the stream is not trusted.</summary>
public sealed class LineTooLongException(int limit) : Exception($"a line longer than {limit} bytes");

/// <summary>
/// Splits a byte stream into lines terminated by <c>\n</c> (a trailing <c>\r</c> is dropped) without
/// ever holding more than the limit of one line: <see cref="StreamReader.ReadLineAsync()"/> would buffer
/// an endless line whole. Invalid UTF-8 becomes U+FFFD, which no twine/1 reply parses as.
/// </summary>
public sealed class BoundedLineReader(Stream stream, int maxLineBytes)
{
    private static readonly UTF8Encoding s_utf8 = new(encoderShouldEmitUTF8Identifier: false, throwOnInvalidBytes: false);
    private readonly byte[] _chunk = new byte[64 * 1024];
    private readonly ArrayBufferWriter<byte> _line = new(256);
    private int _start;
    private int _end;

    /// <summary>The next line, or null at end of stream (a last line without <c>\n</c> is still returned).</summary>
    public async ValueTask<ReceivedLine?> ReadLineAsync(CancellationToken cancel = default)
    {
        _line.ResetWrittenCount();
        while (true)
        {
            if (_start == _end)
            {
                _start = 0;
                _end = await stream.ReadAsync(_chunk, cancel).ConfigureAwait(false);
                if (_end == 0)
                    return _line.WrittenCount == 0 ? null : Finish(_line.WrittenSpan);
            }
            var span = _chunk.AsSpan(_start, _end - _start);
            var newline = span.IndexOf((byte)'\n');
            var take = newline < 0 ? span : span[..newline];
            if (_line.WrittenCount + take.Length > maxLineBytes)
                throw new LineTooLongException(maxLineBytes);
            _line.Write(take);
            if (newline < 0)
            {
                _start = _end;
                continue;
            }
            _start += newline + 1;
            return Finish(_line.WrittenSpan);
        }
    }

    private static ReceivedLine Finish(ReadOnlySpan<byte> bytes)
    {
        var stamp = Stopwatch.GetTimestamp();
        var count = bytes.Length + 1;
        if (bytes.Length > 0 && bytes[^1] == (byte)'\r') bytes = bytes[..^1];
        return new ReceivedLine(s_utf8.GetString(bytes), count, stamp);
    }
}
