using System.Collections.Concurrent;
using Bramble.Rules;
using Bramble.Search;
using Bramble.Values;
using Serilog;

namespace Bramble.Wire;

/// <summary>
/// The engine side of twine/1: reads requests, keeps the current game, and serves any
/// <see cref="IPlayer"/>. A thin adapter — players never see protocol text. Every request gets
/// exactly one final reply, in the order the requests came; bad input of any kind gets an
/// <c>err</c> and the host keeps serving until <c>bye</c> or end of input. <c>halt</c> is the one
/// request without a reply of its own: it makes the pending <c>think</c> answer at once, and is
/// ignored when nothing is pending (it may simply have crossed the <c>pick</c> on the wire).
/// Requests sent while a think is pending are answered after its <c>pick</c>, in order.
/// One host serves one session; make another for the next.
/// </summary>
public sealed class EngineHost
{
    private readonly EngineSetup _setup;
    private readonly ILogger _log;
    private EngineSettings _settings;
    private bool _greeted;
    private IPosition? _position;
    private Side? _lastMover;
    private IPlayer? _player;
    private Thinking? _thinking;
    private ThinkWorker? _worker;
    private long _haltMark;
    private ValueContext? _values;
    private LineWriter _out = null!;
    private int _served;
    private readonly ManualResetEventSlim _finished = new();
    private long _taken;

    public EngineHost(EngineSetup? setup = null)
    {
        _setup = setup ?? new EngineSetup();
        _log = _setup.Log.ForContext<EngineHost>();
        _settings = _setup.Settings ?? EngineSettings.Default(_setup.Strategies);
    }

    /// <summary>Serves <paramref name="input"/> until <c>bye</c> or its end; returns the exit status (0).</summary>
    public int Serve(Stream input, Stream output)
    {
        if (Interlocked.Exchange(ref _served, 1) != 0) throw new InvalidOperationException("an engine host serves one session; make a new one");
        _out = new LineWriter(output);
        _log.Information("engine {Name} {Version} serving twine/1 with strategy {Strategy}", _setup.Name, _setup.Version, _settings.Strategy);
        // Lines are read on their own thread so a halt is seen even while requests queue behind a think.
        var queue = new BlockingCollection<Numbered>(boundedCapacity: 4096);
        var reader = new Thread(() => Read(input, queue)) { IsBackground = true, Name = "twine-in" };
        reader.Start();
        try
        {
            return Serve(queue);
        }
        finally
        {
            _finished.Set();
            // The reading thread may still wait on input nobody will send; let it drop what it reads.
            queue.CompleteAdding();
            _worker?.Dispose();
        }
    }

    private int Serve(BlockingCollection<Numbered> queue)
    {
        foreach (var (index, line) in queue.GetConsumingEnumerable())
        {
            Interlocked.Increment(ref _taken);
            if (line is null) break;
            var parsed = line.Value.Text is { } text ? Codec.ParseRequest(text) : new Parsed<Request>(null, line.Value.Error);
            if (parsed.Message is HaltRequest) continue; // already acted on by the reading thread
            if (parsed.Message is ByeRequest)
            {
                FinishThinking(halt: true);
                Reply(new ByeReply());
                _log.Information("bye");
                return 0;
            }
            FinishThinking(halt: false);
            try
            {
                if (parsed.Error is { } error) Reply(new ErrReply(error));
                else Serve(parsed.Message!, index);
            }
            catch (Exception e) when (e is not IOException)
            {
                // A bug of ours must not end the session: report it against this request and go on.
                _log.Error(e, "failed to serve {Request}", parsed.Message);
                Reply(new ErrReply(ErrorCodes.Failed, e.GetType().Name + ": " + e.Message));
            }
        }
        FinishThinking(halt: true);
        _log.Information("end of input");
        return 0;
    }

    /// <summary>A line with its place in the session, so a halt applies to the thinks sent before it and to no later one.</summary>
    private readonly record struct Numbered(long Index, InputLine? Line);

    private void Read(Stream input, BlockingCollection<Numbered> queue)
    {
        var reader = new LineReader(input);
        long index = 0;
        try
        {
            while (reader.ReadLine() is { } line)
            {
                index++;
                if (line.Text is { } text)
                {
                    _log.Debug("in  {Line}", text.Length > 200 ? text[..200] + "…" : text);
                    if (text.StartsWith("halt", StringComparison.Ordinal) && Codec.ParseRequest(text).Message is HaltRequest) Halt(index);
                }
                queue.Add(new Numbered(index, line));
            }
            queue.Add(new Numbered(index + 1, null));
            WatchEnd();
        }
        catch (IOException e)
        {
            _log.Warning(e, "reading the input failed; treating it as its end");
            TryAdd(queue, new Numbered(index + 1, null));
            WatchEnd();
        }
        catch (InvalidOperationException)
        {
            // The session is over (bye): nothing more is served.
        }
    }

    /// <summary>
    /// At end of input the requests already read are still answered, in order (a script may send
    /// everything and then close its end); but when one request stays in hand longer than
    /// <see cref="EngineSetup.EndGrace"/> (a long computation), <see cref="EngineSetup.ForceExit"/>
    /// ends the process: the harness may be gone (killed), and an engine must never outlive it
    /// thinking for nobody.
    /// </summary>
    private void WatchEnd()
    {
        if (_setup.ForceExit is not { } exit) return;
        var seen = Interlocked.Read(ref _taken);
        while (!_finished.Wait(_setup.EndGrace))
        {
            var now = Interlocked.Read(ref _taken);
            if (now != seen)
            {
                seen = now;
                continue;
            }
            _log.Warning("end of input while still busy: exiting");
            exit(0);
            return;
        }
    }

    private static void TryAdd(BlockingCollection<Numbered> queue, Numbered item)
    {
        try { queue.Add(item); }
        catch (InvalidOperationException) { }
    }

    /// <summary>Halts the pending think if it was requested before the halt at <paramref name="index"/>.</summary>
    private void Halt(long index)
    {
        // Written before reading the pending think, while the serving thread publishes a think
        // before reading the mark: whichever runs second sees the other, so no halt is lost.
        Interlocked.Exchange(ref _haltMark, index);
        if (Volatile.Read(ref _thinking) is { } thinking && thinking.Index < index) thinking.Halt();
    }

    private void Serve(Request request, long index)
    {
        if (request is HelloRequest hello)
        {
            Hello(hello);
            return;
        }
        if (!_greeted)
        {
            Reply(Err(ErrorCodes.OutOfOrder, "the session starts with 'hello twine 1'"));
            return;
        }
        switch (request)
        {
            case SetRequest set: Set(set); break;
            case BeginRequest begin: Begin(begin); break;
            case ApplyRequest apply: Apply(apply); break;
            case ThinkRequest think: Think(think, index); break;
            case AssessRequest: Assess(); break;
            default: throw new InvalidOperationException($"request {request} reached the dispatcher");
        }
    }

    private void Hello(HelloRequest hello)
    {
        if (hello.Version != HelloRequest.CurrentVersion)
        {
            Reply(Err(ErrorCodes.BadRequest, $"this engine speaks twine {HelloRequest.CurrentVersion}, not twine {hello.Version}"));
            return;
        }
        _greeted = true;
        Reply(new WelcomeReply(_setup.Name, _setup.Version, _setup.Rulesets.Select(r => r.Name).ToList()));
    }

    private void Set(SetRequest set)
    {
        var (settings, error) = _settings.With(set.Name, set.Value, _setup.Strategies);
        if (error is not null)
        {
            Reply(new ErrReply(error));
            return;
        }
        // A seed, once set, is where the player's chance starts: even the same seed again starts it afresh.
        if (settings!.Strategy != _settings.Strategy || settings.Nodes != _settings.Nodes || set.Name == "seed") _player = null;
        _settings = settings;
        _log.Information("set {Name} {Value}", set.Name, set.Value);
        Reply(new OkReply());
    }

    private void Begin(BeginRequest begin)
    {
        // A failed begin ends the old game too, so a later think cannot play on a stale position.
        _position = null;
        _lastMover = null;
        var ruleset = _setup.Rulesets.FirstOrDefault(r => string.Equals(r.Name, begin.Ruleset, StringComparison.OrdinalIgnoreCase));
        if (ruleset is null)
        {
            var known = _setup.Rulesets.Count == 0 ? "none" : string.Join(", ", _setup.Rulesets.Select(r => r.Name));
            Reply(Err(ErrorCodes.BadPosition, $"unknown ruleset {Codec.Quote(begin.Ruleset)}; known: {known}"));
            return;
        }
        IPosition position;
        try
        {
            position = ruleset.Parse(begin.Position);
        }
        catch (PositionSyntaxException e)
        {
            Reply(Err(ErrorCodes.BadPosition, $"column {e.Column + 1}: expected {e.Expected}, found {Found(e.Text, e.Column)}"));
            return;
        }
        catch (ValueSyntaxException e)
        {
            Reply(Err(ErrorCodes.BadPosition, $"column {e.Column + 1}: expected {e.Expected}, found {Found(e.Text, e.Column)}"));
            return;
        }
        catch (Exception e) when (e is FormatException or ArgumentException or OverflowException)
        {
            Reply(Err(ErrorCodes.BadPosition, e.Message));
            return;
        }
        _position = position;
        _values = null;
        // Limited by work, a player starts every game with an empty memo: what it remembers from
        // earlier games would change its node counts, and so its moves, with the order games come in.
        if (_settings.Nodes is not null) _player = null;
        _log.Information("begin {Ruleset} {Position}", ruleset.Name, position.Text);
        Reply(new OkReply(position.Components().Count));
    }

    /// <summary>What stands at the fault, for the one-line error (the CLI draws a caret instead).</summary>
    private static string Found(string text, int column) =>
        column >= text.Length ? "the end of the position" : Codec.Quote(text[column..Math.Min(text.Length, column + 12)]);

    private void Apply(ApplyRequest apply)
    {
        if (_position is null)
        {
            Reply(Err(ErrorCodes.OutOfOrder, "no game: send 'begin <ruleset> <position>' first"));
            return;
        }
        if (_lastMover == apply.Side)
        {
            Reply(Err(ErrorCodes.BadMove, $"{apply.Side.Word()} moved last; it is {apply.Side.Other().Word()}'s turn"));
            return;
        }
        try
        {
            var move = _position.ParseMove(apply.Move);
            _position = _position.Play(apply.Side, move);
        }
        catch (Exception e) when (e is IllegalMoveException or FormatException or ArgumentException)
        {
            Reply(Err(ErrorCodes.BadMove, $"{Codec.Quote(apply.Move)} for {apply.Side.Word()}: {e.Message}"));
            return;
        }
        _lastMover = apply.Side;
        Reply(new OkReply());
    }

    private void Think(ThinkRequest think, long index)
    {
        if (_position is null)
        {
            Reply(Err(ErrorCodes.OutOfOrder, "no game: send 'begin <ruleset> <position>' first"));
            return;
        }
        if (_lastMover == think.Side)
        {
            Reply(Err(ErrorCodes.OutOfOrder, $"{think.Side.Word()} moved last; it is {think.Side.Other().Word()}'s turn"));
            return;
        }
        _player ??= _setup.CreatePlayer(_settings.Strategy, _settings.Seed, _settings.Nodes);
        var budget = _settings.Nodes is null
            ? MoveBudget.For(think.ClockMs, think.IncMs, _settings.BudgetMs, _position.Size)
            : MoveBudget.SafetyNet(think.ClockMs, _settings.BudgetMs);
        _log.Debug("think {Side} with {Budget} ms", think.Side.Word(), budget.TotalMilliseconds);
        var thinking = new Thinking(index, _player, _position, think.Side, budget, _setup.Grace, _out, _log);
        Interlocked.Exchange(ref _thinking, thinking);
        thinking.Start(_worker ??= new ThinkWorker());
        if (Interlocked.Read(ref _haltMark) > index) thinking.Halt();
    }

    private void Assess()
    {
        if (_position is null)
        {
            Reply(Err(ErrorCodes.OutOfOrder, "no game: send 'begin <ruleset> <position>' first"));
            return;
        }
        // One context per game, so components met in earlier assessments stay memoised.
        var context = _values ??= _setup.CreateValueContext();
        var position = _position;
        context.ResetCounters(_settings.AssessMs);
        try
        {
            var reply = BigStack.Run(() =>
            {
                var value = position.Ruleset.Value(position, context);
                return new ValueReply(context.Store.Format(value), context.Store.OutcomeOf(value));
            });
            Reply(reply);
        }
        catch (BudgetExceededException e)
        {
            Reply(Err(ErrorCodes.NoValue, $"no exact value within {_settings.AssessMs} ms ({e.Message}, {context.Nodes} nodes)"));
        }
        catch (NotImplementedException)
        {
            Reply(Err(ErrorCodes.NoValue, $"the {position.Ruleset.Name} ruleset has no exact values in this build"));
        }
    }

    /// <summary>Waits for the pending think's answer, halting it first when the session is ending.</summary>
    private void FinishThinking(bool halt)
    {
        if (_thinking is not { } thinking) return;
        if (halt) thinking.Halt();
        thinking.Wait();
        if (thinking.Abandoned)
        {
            // Its thread is still busy with the stuck player: the next think gets a fresh player and thread.
            _player = null;
            _worker?.Dispose();
            _worker = null;
        }
        thinking.Dispose();
        Interlocked.Exchange(ref _thinking, null);
    }

    private static ErrReply Err(string code, string text) => new(code, text);

    private void Reply(Reply reply)
    {
        var line = Codec.Format(reply);
        _log.Debug("out {Line}", line);
        _out.WriteLine(line);
    }
}
