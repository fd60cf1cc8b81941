using System.ComponentModel;
using System.Diagnostics;
using System.Text;
using System.Threading.Channels;
using Bramble.Values;

namespace Bramble.Wire.Client;

/// <summary>
/// The harness's end of one twine/1 engine process. Requests go one at a time; each waits for its
/// final reply with its own time-out, so a stuck engine costs at most that time-out and never a
/// hang. Two pumps read the engine's stdout (bounded lines, into a bounded buffer) and stderr
/// (passed to a log sink, then dropped) all the time, so the engine can never block on a full pipe
/// while the harness is busy elsewhere. When the client is disposed the whole process tree is killed.
/// </summary>
public sealed class EngineClient : IAsyncDisposable
{
    private static readonly UTF8Encoding s_utf8 = new(encoderShouldEmitUTF8Identifier: false);

    private readonly Process _process;
    private readonly ClientLimits _limits;
    private readonly Channel<ReceivedLine> _lines;
    private readonly Stream _stdin;
    private readonly Task _stdoutPump;
    private readonly Task _stderrPump;
    private readonly Action<string>? _stderrSink;
    private volatile Exception? _readFault;
    private bool _broken;
    private string? _pendingThink;
    private bool _disposed;

    private EngineClient(Process process, EngineLaunch launch, ClientLimits limits, Action<string>? stderrSink)
    {
        _process = process;
        _limits = limits;
        _stderrSink = stderrSink;
        Launch = launch;
        ProcessId = process.Id;
        _lines = Channel.CreateBounded<ReceivedLine>(new BoundedChannelOptions(limits.LineBuffer)
        {
            SingleReader = true,
            SingleWriter = true,
            FullMode = BoundedChannelFullMode.Wait,
        });
        _stdin = process.StandardInput.BaseStream;
        _stdoutPump = Task.Run(PumpStdoutAsync);
        _stderrPump = Task.Run(PumpStderrAsync);
        _ = WatchExitAsync();
    }

    public EngineLaunch Launch { get; }

    public int ProcessId { get; }

    public bool HasExited
    {
        get
        {
            try { return _process.HasExited; }
            catch (InvalidOperationException) { return true; }
        }
    }

    /// <summary>False once the engine exited, sent something unreadable, or owes a reply the harness gave up on.</summary>
    public bool IsUsable => !_broken && !_disposed && _readFault is null && !HasExited;

    /// <summary>Starts the process from its argv, with no shell. Throws <see cref="EngineFailureException"/> (<c>StartFailed</c>).</summary>
    public static EngineClient Start(EngineLaunch launch, ClientLimits? limits = null, Action<string>? stderrSink = null)
    {
        if (launch.Argv.Count == 0 || string.IsNullOrWhiteSpace(launch.Argv[0]))
            throw new EngineFailureException(EngineFailureKind.StartFailed, $"{launch.Label}: empty command");
        var info = new ProcessStartInfo(launch.Argv[0])
        {
            UseShellExecute = false,
            RedirectStandardInput = true,
            RedirectStandardOutput = true,
            RedirectStandardError = true,
            CreateNoWindow = true,
        };
        foreach (var arg in launch.Argv.Skip(1)) info.ArgumentList.Add(arg);
        if (launch.WorkingDirectory is not null) info.WorkingDirectory = launch.WorkingDirectory;
        Process process;
        try
        {
            process = Process.Start(info) ?? throw new EngineFailureException(EngineFailureKind.StartFailed, $"{launch}: the process did not start");
        }
        catch (Exception e) when (e is Win32Exception or InvalidOperationException or PlatformNotSupportedException)
        {
            throw new EngineFailureException(EngineFailureKind.StartFailed, $"{launch}: cannot start: {e.Message}");
        }
        return new EngineClient(process, launch, limits ?? ClientLimits.Default, stderrSink);
    }

    /// <summary><c>hello twine 1</c> → <c>welcome</c>.</summary>
    public async Task<Welcome> HelloAsync(TimeSpan timeout, CancellationToken cancel = default)
    {
        var reply = await RequestAsync("hello twine 1", timeout, ["welcome"], null, cancel).ConfigureAwait(false);
        var rulesets = reply.Line.Key("rulesets") is { Length: > 0 } list
            ? list.Split(',', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries)
            : [];
        return new Welcome(reply.Line.Key("name") ?? "", reply.Line.Key("version") ?? "", rulesets);
    }

    /// <summary><c>set &lt;name&gt; &lt;value&gt;</c> → <c>ok</c>; an <c>err</c> throws <c>Refused</c>.</summary>
    public Task SetAsync(string name, string value, TimeSpan timeout, CancellationToken cancel = default) =>
        ExpectOkAsync($"set {Token(name, nameof(name))} {Text(value, nameof(value))}", timeout, cancel);

    /// <summary><c>begin &lt;ruleset&gt; &lt;position&gt;</c> → <c>ok components=n</c> (n null when not given).</summary>
    public async Task<int?> BeginAsync(string ruleset, string position, TimeSpan timeout, CancellationToken cancel = default)
    {
        var reply = await RequestAsync($"begin {Token(ruleset, nameof(ruleset))} {Text(position, nameof(position))}", timeout, ["ok", "err"], null, cancel).ConfigureAwait(false);
        ThrowIfErr(reply.Line);
        return int.TryParse(reply.Line.Key("components"), out var n) ? n : null;
    }

    /// <summary><c>apply &lt;side&gt; &lt;move&gt;</c> → <c>ok</c>.</summary>
    public Task ApplyAsync(Side side, string move, TimeSpan timeout, CancellationToken cancel = default) =>
        ExpectOkAsync($"apply {side.Word()} {Token(move, nameof(move))}", timeout, cancel);

    /// <summary>
    /// <c>think &lt;side&gt; clock= inc=</c> → notes, then <c>pick</c>. The time-out is the side's
    /// remaining clock: a pick that has not arrived by then is a <c>Timeout</c>, after which
    /// <see cref="RecoverAsync"/> can try to bring the engine back in step.
    /// </summary>
    public async Task<ThinkResult> ThinkAsync(Side side, long clockMs, long incMs, TimeSpan timeout,
        Action<ReplyLine>? onNote = null, CancellationToken cancel = default)
    {
        var line = $"think {side.Word()} clock={Math.Max(0, clockMs)} inc={Math.Max(0, incMs)}";
        var reply = await RequestAsync(line, timeout, ["pick", "err"], onNote, cancel, isThink: true).ConfigureAwait(false);
        ThrowIfErr(reply.Line);
        if (reply.Line.Words.Count == 0)
            throw Broken(EngineFailureKind.BadReply, $"'pick' without a move");
        var move = reply.Line.Words[0];
        return new ThinkResult(move == "none" ? null : move, reply.Elapsed);
    }

    /// <summary>
    /// After a think timed out: sends <c>halt</c> and waits up to <paramref name="grace"/> for the
    /// owed pick, which is thrown away. True when the engine is back in step and may be used again.
    /// </summary>
    public async Task<bool> RecoverAsync(TimeSpan grace)
    {
        if (_pendingThink is null || _disposed || _readFault is not null || HasExited) return false;
        try
        {
            await SendAsync("halt", grace, CancellationToken.None).ConfigureAwait(false);
            using var timer = new CancellationTokenSource(grace);
            while (true)
            {
                var received = await _lines.Reader.ReadAsync(timer.Token).ConfigureAwait(false);
                if (!ReplyLine.TryParse(received.Text, out var reply, out _)) return false;
                if (reply.Word == "note") continue;
                if (reply.Word != "pick") return false;
                _pendingThink = null;
                _broken = false;
                return true;
            }
        }
        catch (Exception e) when (e is OperationCanceledException or ChannelClosedException or EngineFailureException)
        {
            return false;
        }
    }

    /// <summary><c>assess</c> → <c>value &lt;value&gt; outcome=X</c>.</summary>
    public async Task<Assessment> AssessAsync(TimeSpan timeout, CancellationToken cancel = default)
    {
        var reply = await RequestAsync("assess", timeout, ["value", "err"], null, cancel).ConfigureAwait(false);
        ThrowIfErr(reply.Line);
        // The value may contain spaces ("1/2 + ↑*"), so it is the text before the first key=value pair.
        var value = string.Join(' ', reply.Line.Rest.Split(' ', StringSplitOptions.RemoveEmptyEntries)
            .TakeWhile(t => !(t.Contains('=') && reply.Line.Keys.ContainsKey(t[..t.IndexOf('=')]))));
        return new Assessment(value, reply.Line.Key("outcome"));
    }

    /// <summary>
    /// Ends the engine politely when it is usable (<c>bye</c>, then a short wait for it to exit) and
    /// kills what is left of its process tree in every case. Never throws.
    /// </summary>
    public async Task CloseAsync()
    {
        if (IsUsable)
        {
            try
            {
                await RequestAsync("bye", _limits.ExitGrace, ["bye"], null, CancellationToken.None).ConfigureAwait(false);
                await _process.WaitForExitAsync().WaitAsync(_limits.ExitGrace).ConfigureAwait(false);
            }
            catch (Exception e) when (e is EngineFailureException or TimeoutException or OperationCanceledException)
            {
                // It gets killed below either way.
            }
        }
        await DisposeAsync().ConfigureAwait(false);
    }

    /// <summary>Kills the whole process tree at once (safe to call at any time, from any thread).</summary>
    public void Kill()
    {
        try
        {
            if (!_process.HasExited) _process.Kill(entireProcessTree: true);
        }
        catch (Exception e) when (e is InvalidOperationException or Win32Exception or NotSupportedException)
        {
            // Already gone, or exiting right now.
        }
    }

    public async ValueTask DisposeAsync()
    {
        if (_disposed) return;
        _disposed = true;
        Kill();
        try
        {
            await _process.WaitForExitAsync().WaitAsync(_limits.ExitGrace).ConfigureAwait(false);
        }
        catch (Exception e) when (e is TimeoutException or InvalidOperationException)
        {
            // The kill was sent; a process stuck in the kernel is beyond the harness's reach.
        }
        try { _stdin.Dispose(); } catch (IOException) { }
        await Task.WhenAny(Task.WhenAll(_stdoutPump, _stderrPump), Task.Delay(_limits.ExitGrace)).ConfigureAwait(false);
        _process.Dispose();
    }

    private async Task ExpectOkAsync(string line, TimeSpan timeout, CancellationToken cancel)
    {
        var reply = await RequestAsync(line, timeout, ["ok", "err"], null, cancel).ConfigureAwait(false);
        ThrowIfErr(reply.Line);
    }

    private void ThrowIfErr(ReplyLine line)
    {
        if (line.Word != "err") return;
        var code = line.Words.Count > 0 ? line.Words[0] : "";
        // A refusal is a complete, well-formed answer: the engine is still in step.
        throw new EngineFailureException(EngineFailureKind.Refused, $"{Launch.Label} answered '{ReplyLine.Shorten("err " + line.Rest, 200)}'", code);
    }

    private async Task<(ReplyLine Line, TimeSpan Elapsed)> RequestAsync(string line, TimeSpan timeout,
        string[] finals, Action<ReplyLine>? onNote, CancellationToken cancel, bool isThink = false)
    {
        ObjectDisposedException.ThrowIf(_disposed, this);
        if (_broken) throw new EngineFailureException(EngineFailureKind.BadReply, $"{Launch.Label} is out of step with the harness");
        DrainStrayLines(onNote);
        using var timer = CancellationTokenSource.CreateLinkedTokenSource(cancel);
        timer.CancelAfter(timeout);
        var sent = Stopwatch.GetTimestamp();
        await SendAsync(line, timeout, cancel).ConfigureAwait(false);
        if (isThink) _pendingThink = line;
        long bytes = 0;
        while (true)
        {
            ReceivedLine received;
            try
            {
                received = await _lines.Reader.ReadAsync(timer.Token).ConfigureAwait(false);
            }
            catch (OperationCanceledException) when (!cancel.IsCancellationRequested)
            {
                throw Broken(EngineFailureKind.Timeout, $"{Launch.Label} gave no reply to '{ReplyLine.Shorten(line)}' within {timeout.TotalMilliseconds:0} ms");
            }
            catch (OperationCanceledException)
            {
                _broken = true;
                throw;
            }
            catch (ChannelClosedException)
            {
                throw ReadFailure(line);
            }
            bytes += received.Bytes;
            if (bytes > _limits.MaxRequestOutputBytes)
                throw Broken(EngineFailureKind.BadReply, $"{Launch.Label} wrote more than {_limits.MaxRequestOutputBytes} bytes in reply to '{ReplyLine.Shorten(line)}'");
            if (!ReplyLine.TryParse(received.Text, out var reply, out var problem))
                throw Broken(EngineFailureKind.BadReply, $"{Launch.Label} replied to '{ReplyLine.Shorten(line)}' with '{ReplyLine.Shorten(received.Text)}': {problem}");
            if (reply.Word == "note")
            {
                onNote?.Invoke(reply);
                continue;
            }
            if (!finals.Contains(reply.Word))
                throw Broken(EngineFailureKind.BadReply, $"{Launch.Label} replied to '{ReplyLine.Shorten(line)}' with '{ReplyLine.Shorten(received.Text)}'; expected {string.Join(" or ", finals)}");
            if (isThink) _pendingThink = null;
            return (reply, Stopwatch.GetElapsedTime(sent, received.Timestamp));
        }
    }

    /// <summary>Lines that arrived between requests: notes are passed on, anything else means the engine is out of step.</summary>
    private void DrainStrayLines(Action<ReplyLine>? onNote)
    {
        while (_lines.Reader.TryRead(out var received))
        {
            if (ReplyLine.TryParse(received.Text, out var reply, out _) && reply.Word == "note")
            {
                onNote?.Invoke(reply);
                continue;
            }
            throw Broken(EngineFailureKind.BadReply, $"{Launch.Label} wrote '{ReplyLine.Shorten(received.Text)}' when no request was pending");
        }
        if (_readFault is not null && _lines.Reader.Completion.IsCompleted) throw ReadFailure("the next request");
    }

    private async Task SendAsync(string line, TimeSpan timeout, CancellationToken cancel)
    {
        var bytes = s_utf8.GetBytes(line + "\n");
        try
        {
            // WaitAsync bounds the wait even where a blocked pipe write ignores the token (an
            // engine that stopped reading its stdin while the pipe buffer is full).
            await WriteLineAsync(bytes, cancel).WaitAsync(timeout, cancel).ConfigureAwait(false);
        }
        catch (TimeoutException)
        {
            throw Broken(EngineFailureKind.Timeout, $"{Launch.Label} stopped reading its input");
        }
        catch (OperationCanceledException)
        {
            _broken = true;
            throw;
        }
        catch (Exception e) when (e is IOException or ObjectDisposedException)
        {
            throw Broken(EngineFailureKind.Exited, $"{Launch.Label} closed its input (broken pipe){ExitNote()}");
        }
    }

    private async Task WriteLineAsync(byte[] bytes, CancellationToken cancel)
    {
        await _stdin.WriteAsync(bytes, cancel).ConfigureAwait(false);
        await _stdin.FlushAsync(cancel).ConfigureAwait(false);
    }

    private EngineFailureException ReadFailure(string request) => _readFault switch
    {
        LineTooLongException tooLong => Broken(EngineFailureKind.BadReply, $"{Launch.Label} wrote {tooLong.Message} in reply to '{ReplyLine.Shorten(request)}'"),
        null => Broken(EngineFailureKind.Exited, $"{Launch.Label} ended its output before replying to '{ReplyLine.Shorten(request)}'{ExitNote()}"),
        var other => Broken(EngineFailureKind.Exited, $"{Launch.Label}: reading its output failed: {other.Message}"),
    };

    private EngineFailureException Broken(EngineFailureKind kind, string message)
    {
        _broken = true;
        return new EngineFailureException(kind, message);
    }

    private string ExitNote()
    {
        try
        {
            return _process.WaitForExit(200) ? $" (exit status {_process.ExitCode})" : "";
        }
        catch (Exception e) when (e is InvalidOperationException or Win32Exception)
        {
            return "";
        }
    }

    private async Task PumpStdoutAsync()
    {
        var reader = new BoundedLineReader(_process.StandardOutput.BaseStream, _limits.MaxLineBytes);
        try
        {
            while (await reader.ReadLineAsync().ConfigureAwait(false) is { } line)
                await _lines.Writer.WriteAsync(line).ConfigureAwait(false);
            _lines.Writer.TryComplete();
        }
        catch (ChannelClosedException)
        {
            // The exit watcher closed the buffer already.
        }
        catch (Exception e) when (e is LineTooLongException or IOException or ObjectDisposedException or InvalidOperationException)
        {
            _readFault = e;
            _lines.Writer.TryComplete();
        }
    }

    private async Task PumpStderrAsync()
    {
        long passed = 0;
        var buffer = new byte[16 * 1024];
        var text = new StringBuilder();
        try
        {
            var stream = _process.StandardError.BaseStream;
            int n;
            while ((n = await stream.ReadAsync(buffer).ConfigureAwait(false)) > 0)
            {
                if (_stderrSink is null || passed >= _limits.MaxStderrBytes) continue;
                passed += n;
                text.Append(s_utf8.GetString(buffer, 0, n));
                int newline;
                while ((newline = text.ToString().IndexOf('\n')) >= 0)
                {
                    _stderrSink(text.ToString(0, newline).TrimEnd('\r'));
                    text.Remove(0, newline + 1);
                }
                if (passed >= _limits.MaxStderrBytes) _stderrSink("(further stderr output dropped)");
            }
            if (text.Length > 0) _stderrSink?.Invoke(text.ToString());
        }
        catch (Exception e) when (e is IOException or ObjectDisposedException or InvalidOperationException)
        {
            // The process is gone; nothing more to read.
        }
    }

    /// <summary>
    /// When the process exits, closes the line buffer after a short pause even if a grandchild still
    /// holds the stdout pipe open, so a pending request reports <c>Exited</c> rather than waiting for its time-out.
    /// </summary>
    private async Task WatchExitAsync()
    {
        try
        {
            await _process.WaitForExitAsync().ConfigureAwait(false);
            await Task.WhenAny(_stdoutPump, Task.Delay(250)).ConfigureAwait(false);
            _lines.Writer.TryComplete();
        }
        catch (InvalidOperationException)
        {
            _lines.Writer.TryComplete();
        }
    }

    private static string Token(string text, string what)
    {
        if (text.Length == 0 || text.Any(c => c is ' ' or '\n' or '\r'))
            throw new ArgumentException($"a twine/1 {what} must be one token: '{text}'", what);
        return text;
    }

    private static string Text(string text, string what)
    {
        if (text.Contains('\n') || text.Contains('\r'))
            throw new ArgumentException($"a twine/1 {what} must fit on one line", what);
        return text;
    }
}
