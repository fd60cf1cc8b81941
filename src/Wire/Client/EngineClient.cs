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
    private bool _broken;
    private string? _pendingThink;
    private bool _disposed;
    private IReadOnlyList<ProcessTree.Member> _tree = [];
    private bool _grouped;

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
    public bool IsUsable => !_broken && !_disposed && !HasExited;

    /// <summary>Starts the process from its argv, with no shell. Throws <see cref="EngineFailureException"/> (<c>StartFailed</c>).</summary>
    public static EngineClient Start(EngineLaunch launch, ClientLimits? limits = null, Action<string>? stderrSink = null)
    {
        if (launch.Argv.Count == 0 || string.IsNullOrWhiteSpace(launch.Argv[0]))
            throw new EngineFailureException(EngineFailureKind.StartFailed, $"{launch.Label}: empty command");
        // In a session of its own (see ProcessGroup), so that killing the group ends everything it started.
        var grouped = ProcessGroup.Setsid is not null;
        var program = launch.Argv[0];
        if (grouped)
        {
            program = ProcessGroup.Locate(launch.Argv[0], launch.WorkingDirectory)
                ?? throw new EngineFailureException(EngineFailureKind.StartFailed, $"{launch}: cannot start: no program {launch.Argv[0]} (not found{(launch.Argv[0].Contains('/') ? "" : " on PATH")})");
        }
        var info = new ProcessStartInfo(grouped ? ProcessGroup.Setsid! : program)
        {
            UseShellExecute = false,
            RedirectStandardInput = true,
            RedirectStandardOutput = true,
            RedirectStandardError = true,
            CreateNoWindow = true,
        };
        if (grouped) info.ArgumentList.Add(program);
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
        return new EngineClient(process, launch, limits ?? ClientLimits.Default, stderrSink) { _grouped = grouped };
    }

    /// <summary><c>hello twine 1</c> → <c>welcome</c>.</summary>
    public async Task<Welcome> HelloAsync(TimeSpan timeout, CancellationToken cancel = default)
    {
        var (reply, _) = await RequestAsync(new HelloRequest(HelloRequest.CurrentVersion), timeout, null, cancel).ConfigureAwait(false);
        NoteTree();
        return reply is WelcomeReply welcome
            ? new Welcome(welcome.Name, welcome.Version, welcome.Rulesets)
            : throw Unexpected("hello", reply, "welcome");
    }

    /// <summary><c>set &lt;name&gt; &lt;value&gt;</c> → <c>ok</c>; an <c>err</c> throws <c>Refused</c>.</summary>
    public Task SetAsync(string name, string value, TimeSpan timeout, CancellationToken cancel = default) =>
        ExpectOkAsync(new SetRequest(name, value), timeout, cancel);

    /// <summary><c>begin &lt;ruleset&gt; &lt;position&gt;</c> → <c>ok components=n</c> (n null when not given).</summary>
    public async Task<int?> BeginAsync(string ruleset, string position, TimeSpan timeout, CancellationToken cancel = default)
    {
        var ok = await ExpectOkAsync(new BeginRequest(ruleset, position), timeout, cancel).ConfigureAwait(false);
        return ok.Components;
    }

    /// <summary><c>apply &lt;side&gt; &lt;move&gt;</c> → <c>ok</c>.</summary>
    public Task ApplyAsync(Side side, string move, TimeSpan timeout, CancellationToken cancel = default) =>
        ExpectOkAsync(new ApplyRequest(side, move), timeout, cancel);

    /// <summary>
    /// <c>think &lt;side&gt; clock= inc=</c> → notes, then <c>pick</c>. The time-out is the side's
    /// remaining clock: a pick that has not arrived by then is a <c>Timeout</c>, after which
    /// <see cref="RecoverAsync"/> can try to bring the engine back in step.
    /// </summary>
    public async Task<ThinkResult> ThinkAsync(Side side, long clockMs, long incMs, TimeSpan timeout,
        Action<NoteReply>? onNote = null, CancellationToken cancel = default)
    {
        var request = new ThinkRequest(side, Math.Max(0, clockMs), Math.Max(0, incMs));
        var (reply, elapsed) = await RequestAsync(request, timeout, onNote, cancel).ConfigureAwait(false);
        ThrowIfErr(reply);
        return reply is PickReply pick ? new ThinkResult(pick.Move, elapsed) : throw Unexpected("think", reply, "pick");
    }

    /// <summary>
    /// After a think timed out: sends <c>halt</c> and waits up to <paramref name="grace"/> for the
    /// owed pick, which is thrown away. True when the engine is back in step and may be used again.
    /// </summary>
    public async Task<bool> RecoverAsync(TimeSpan grace)
    {
        if (_pendingThink is null || _disposed || HasExited) return false;
        try
        {
            await SendAsync(Codec.Format(new HaltRequest()), grace, CancellationToken.None).ConfigureAwait(false);
            using var timer = new CancellationTokenSource(grace);
            while (true)
            {
                var received = await _lines.Reader.ReadAsync(timer.Token).ConfigureAwait(false);
                if (received.Text is null) return false;
                var parsed = Codec.ParseReply(received.Text);
                if (parsed.Message is NoteReply) continue;
                if (parsed.Message is not PickReply) return false;
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
        var (reply, _) = await RequestAsync(new AssessRequest(), timeout, null, cancel).ConfigureAwait(false);
        ThrowIfErr(reply);
        return reply is ValueReply value ? new Assessment(value.Value, value.Outcome) : throw Unexpected("assess", reply, "value");
    }

    /// <summary>
    /// Ends the engine politely when it is usable (<c>bye</c>, then a short wait for it to exit) and
    /// kills what is left of its process tree in every case. Never throws.
    /// </summary>
    public async Task CloseAsync()
    {
        if (IsUsable)
        {
            NoteTree();
            try
            {
                await RequestAsync(new ByeRequest(), _limits.ExitGrace, null, CancellationToken.None).ConfigureAwait(false);
                await _process.WaitForExitAsync().WaitAsync(_limits.ExitGrace).ConfigureAwait(false);
            }
            catch (Exception e) when (e is EngineFailureException or TimeoutException or OperationCanceledException)
            {
                // It gets killed below either way.
            }
        }
        await DisposeAsync().ConfigureAwait(false);
    }

    /// <summary>
    /// Kills the whole process tree at once (safe to call at any time, from any thread): the tree as
    /// it is now, and whatever is left of the tree last seen, in case the engine itself is gone already.
    /// </summary>
    public void Kill()
    {
        if (_grouped) ProcessGroup.Kill(ProcessId);
        try
        {
            if (!_process.HasExited) _process.Kill(entireProcessTree: true);
        }
        catch (Exception e) when (e is InvalidOperationException or Win32Exception or NotSupportedException)
        {
            // Already gone, or exiting right now.
        }
        ProcessTree.KillSurvivors(_tree);
    }

    /// <summary>
    /// Remembers the engine's descendants (after the handshake, and before saying bye), so processes
    /// it started can still be killed after it has exited and they have lost their parent.
    /// </summary>
    private void NoteTree()
    {
        var now = ProcessTree.Descendants(ProcessId);
        if (now.Count > 0 || _tree.Count > 0) _tree = _tree.Concat(now).Distinct().ToList();
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

    private async Task<OkReply> ExpectOkAsync(Request request, TimeSpan timeout, CancellationToken cancel)
    {
        var (reply, _) = await RequestAsync(request, timeout, null, cancel).ConfigureAwait(false);
        ThrowIfErr(reply);
        return reply as OkReply ?? throw Unexpected(Codec.Format(request).Split(' ')[0], reply, "ok");
    }

    private void ThrowIfErr(Reply reply)
    {
        if (reply is not ErrReply err) return;
        // A refusal is a complete, well-formed answer: the engine is still in step.
        throw new EngineFailureException(EngineFailureKind.Refused, $"{Launch.Label} answered 'err {err.Code} {Codec.Quote(err.Text).Trim('\'')}'", err.Code);
    }

    /// <summary>A well-formed reply of the wrong kind (say <c>ok</c> to <c>think</c>): the engine is out of step.</summary>
    private EngineFailureException Unexpected(string request, Reply reply, string expected) =>
        Broken(EngineFailureKind.BadReply, $"{Launch.Label} replied to '{request}' with {Describe(reply)}; expected {expected}");

    private static string Describe(Reply reply)
    {
        try
        {
            return Codec.Quote(Codec.Format(reply));
        }
        catch (ArgumentException)
        {
            return "a " + reply.GetType().Name;
        }
    }

    /// <summary>
    /// Sends one request and waits for its final reply, passing notes on. Which reply kinds are
    /// final is the caller's business; here any reply but a note ends the wait. The elapsed time
    /// runs from just before the send to the moment the reply's line came off the pipe.
    /// </summary>
    private async Task<(Reply Reply, TimeSpan Elapsed)> RequestAsync(Request request, TimeSpan timeout,
        Action<NoteReply>? onNote, CancellationToken cancel)
    {
        ObjectDisposedException.ThrowIf(_disposed, this);
        if (_broken) throw new EngineFailureException(EngineFailureKind.BadReply, $"{Launch.Label} is out of step with the harness");
        var line = Codec.Format(request);
        DrainStrayLines(onNote);
        using var timer = CancellationTokenSource.CreateLinkedTokenSource(cancel);
        timer.CancelAfter(timeout);
        var sent = Stopwatch.GetTimestamp();
        await SendAsync(line, timeout, cancel).ConfigureAwait(false);
        if (request is ThinkRequest) _pendingThink = line;
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
                throw Broken(EngineFailureKind.Timeout, $"{Launch.Label} gave no reply to {Codec.Quote(line)} within {timeout.TotalMilliseconds:0} ms");
            }
            catch (OperationCanceledException)
            {
                _broken = true;
                throw;
            }
            catch (ChannelClosedException)
            {
                throw Broken(EngineFailureKind.Exited, $"{Launch.Label} ended its output before replying to {Codec.Quote(line)}{ExitNote()}");
            }
            bytes += received.Bytes;
            if (bytes > _limits.MaxRequestOutputBytes)
                throw Broken(EngineFailureKind.BadReply, $"{Launch.Label} wrote more than {_limits.MaxRequestOutputBytes} bytes in reply to {Codec.Quote(line)}");
            if (received.Text is null)
                throw Broken(EngineFailureKind.BadReply, $"{Launch.Label} replied to {Codec.Quote(line)} with {received.Error!.Text}");
            var parsed = Codec.ParseReply(received.Text);
            if (!parsed.IsOk)
                throw Broken(EngineFailureKind.BadReply, $"{Launch.Label} replied to {Codec.Quote(line)} with {Codec.Quote(received.Text)}: {parsed.Error!.Text}");
            if (parsed.Message is NoteReply note)
            {
                onNote?.Invoke(note);
                continue;
            }
            if (request is ThinkRequest) _pendingThink = null;
            return (parsed.Message!, Stopwatch.GetElapsedTime(sent, received.Timestamp));
        }
    }

    /// <summary>Lines that arrived between requests: notes are passed on, anything else means the engine is out of step.</summary>
    private void DrainStrayLines(Action<NoteReply>? onNote)
    {
        while (_lines.Reader.TryRead(out var received))
        {
            if (received.Text is not null && Codec.ParseReply(received.Text).Message is NoteReply note)
            {
                onNote?.Invoke(note);
                continue;
            }
            throw Broken(EngineFailureKind.BadReply, $"{Launch.Label} wrote {Codec.Quote(received.Text ?? received.Error!.Text)} when no request was pending");
        }
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
        // The shared reader bounds each line at 1 MiB and decodes strictly: an overlong line or
        // bad UTF-8 arrives as an error in its place, which the request in progress turns into a bad reply.
        var reader = new LineReader(_process.StandardOutput.BaseStream, _limits.MaxLineBytes);
        try
        {
            while (await reader.ReadLineAsync().ConfigureAwait(false) is { } line)
            {
                var bytes = line.Text is { } text ? Encoding.UTF8.GetByteCount(text) + 1 : _limits.MaxLineBytes;
                await _lines.Writer.WriteAsync(new ReceivedLine(line.Text, line.Error, bytes, Stopwatch.GetTimestamp())).ConfigureAwait(false);
            }
        }
        catch (ChannelClosedException)
        {
            // The exit watcher closed the buffer already.
        }
        catch (Exception e) when (e is IOException or ObjectDisposedException or InvalidOperationException)
        {
            // A pipe torn down by a kill: the same as the end of output.
        }
        _lines.Writer.TryComplete();
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
}
