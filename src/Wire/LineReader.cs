using System.Text;

namespace Bramble.Wire;

/// <summary>One line read from the wire: its text (terminator removed), or why it is not a line of text.</summary>
public readonly record struct InputLine(string? Text, WireError? Error)
{
    public bool IsText => Text is not null;
}

/// <summary>
/// Reads twine/1 lines from a byte stream: splits on <c>\n</c> (dropping one <c>\r</c> before it),
/// decodes UTF-8 strictly and bounds the line length. It works on bytes rather than on a
/// <see cref="TextReader"/> because a reader would silently replace invalid UTF-8 and hold an
/// unbounded line in memory; here a 2 MiB line costs 1 MiB at most and comes back as one error,
/// aligned with the line it replaces, so "one request, one reply" still holds.
/// Not thread-safe: one reader per stream.
/// </summary>
public sealed class LineReader(Stream stream, int maxLineBytes = Codec.MaxLineBytes)
{
    private static readonly UTF8Encoding s_strict = new(encoderShouldEmitUTF8Identifier: false, throwOnInvalidBytes: true);

    private readonly byte[] _buffer = new byte[64 * 1024];
    private readonly MemoryStream _line = new();
    private int _start;
    private int _end;
    private bool _overlong;
    private bool _finished;

    /// <summary>The next line, or null at end of input. Blocks until a whole line is there.</summary>
    public InputLine? ReadLine()
    {
        while (true)
        {
            if (TryTake(out var line)) return line;
            if (_finished) return null;
            _start = 0;
            _end = stream.Read(_buffer, 0, _buffer.Length);
            if (_end == 0) return Finish();
        }
    }

    /// <summary>The next line, or null at end of input.</summary>
    public async ValueTask<InputLine?> ReadLineAsync(CancellationToken cancel = default)
    {
        while (true)
        {
            if (TryTake(out var line)) return line;
            if (_finished) return null;
            _start = 0;
            _end = await stream.ReadAsync(_buffer.AsMemory(), cancel).ConfigureAwait(false);
            if (_end == 0) return Finish();
        }
    }

    /// <summary>Moves buffered bytes into the current line; true with the line when a terminator was found.</summary>
    private bool TryTake(out InputLine line)
    {
        line = default;
        if (_start >= _end) return false;
        var span = _buffer.AsSpan(_start, _end - _start);
        var newline = span.IndexOf((byte)'\n');
        var chunk = newline < 0 ? span : span[..newline];
        Append(chunk);
        if (newline < 0)
        {
            _start = _end;
            return false;
        }
        _start += newline + 1;
        line = Complete();
        return true;
    }

    private void Append(ReadOnlySpan<byte> chunk)
    {
        if (_overlong) return;
        // One byte of slack so a line of exactly the limit may still carry its '\r'.
        if (_line.Length + chunk.Length > maxLineBytes + 1)
        {
            _overlong = true;
            _line.SetLength(0);
            return;
        }
        _line.Write(chunk);
    }

    /// <summary>End of input: a last line without terminator still counts; then null for ever.</summary>
    private InputLine? Finish()
    {
        _finished = true;
        return _line.Length > 0 || _overlong ? Complete() : null;
    }

    private InputLine Complete()
    {
        try
        {
            if (_overlong) return TooLong();
            var bytes = _line.GetBuffer().AsSpan(0, (int)_line.Length);
            if (bytes.Length > 0 && bytes[^1] == (byte)'\r') bytes = bytes[..^1];
            if (bytes.Length > maxLineBytes) return TooLong();
            try
            {
                return new InputLine(s_strict.GetString(bytes), null);
            }
            catch (DecoderFallbackException bad)
            {
                var at = bad.Index >= 0 ? $" at byte {bad.Index + 1}" : "";
                return new InputLine(null, new WireError(ErrorCodes.BadRequest, $"invalid UTF-8{at}"));
            }
        }
        finally
        {
            _overlong = false;
            _line.SetLength(0);
            // A past monster line should not pin a megabyte for the rest of the session.
            if (_line.Capacity > 64 * 1024) _line.Capacity = 64 * 1024;
        }
    }

    private InputLine TooLong() =>
        new(null, new WireError(ErrorCodes.BadRequest, $"line longer than {maxLineBytes} bytes"));
}
