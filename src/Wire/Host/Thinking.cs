using System.Diagnostics;
using Bramble.Rules;
using Bramble.Search;
using Bramble.Values;
using Serilog;

namespace Bramble.Wire;

/// <summary>
/// One pending <c>think</c>: the player runs on the worker thread so the host can go on reading
/// (and see <c>halt</c>), and exactly one answer is written — the player's, or the host's fallback
/// when the player overruns its budget by the grace period or ignores a halt for that long.
/// </summary>
internal sealed class Thinking : IDisposable
{
    private readonly IPlayer _player;
    private readonly IPosition _position;
    private readonly Side _side;
    private readonly TimeSpan _budget;
    private readonly TimeSpan _grace;
    private readonly LineWriter _out;
    private readonly ILogger _log;
    private readonly CancellationTokenSource _halt = new();
    private readonly ManualResetEventSlim _answered = new();
    private readonly Stopwatch _clock = new();
    private Timer? _overrun;
    private Timer? _fallback;
    private int _claimed;

    public Thinking(long index, IPlayer player, IPosition position, Side side, TimeSpan budget, TimeSpan grace, LineWriter output, ILogger log)
    {
        Index = index;
        _player = player;
        _position = position;
        _side = side;
        _budget = budget;
        _grace = grace;
        _out = output;
        _log = log;
    }

    /// <summary>The think request's place in the session.</summary>
    public long Index { get; }

    /// <summary>True when the host had to answer for the player; its thread may still be running, so it must not be used again.</summary>
    public bool Abandoned { get; private set; }

    public void Start(ThinkWorker worker)
    {
        _clock.Start();
        _overrun = new Timer(_ => { _log.Warning("{Player} overran its budget of {Budget} ms; halting it", _player.Name, _budget.TotalMilliseconds); Halt(); },
            null, _budget + _grace, Timeout.InfiniteTimeSpan);
        worker.Run(Run);
    }

    /// <summary>Asks the player to stop now; if it has not answered within the grace period, the host answers.</summary>
    public void Halt()
    {
        if (_answered.IsSet) return;
        try
        {
            _halt.Cancel();
            Interlocked.CompareExchange(ref _fallback, new Timer(_ => Fallback("ignored-halt", abandon: true), null, _grace, Timeout.InfiniteTimeSpan), null);
        }
        catch (ObjectDisposedException)
        {
            // Answered and disposed between the check and the cancel: nothing left to halt.
        }
    }

    /// <summary>Blocks until the answer has been written.</summary>
    public void Wait() => _answered.Wait();

    private void Run()
    {
        Decision decision;
        try
        {
            decision = _player.Choose(_position, _side, _budget, _halt.Token);
        }
        catch (Exception e)
        {
            _log.Error(e, "{Player} failed while thinking", _player.Name);
            Fallback("player-failed", abandon: false);
            return;
        }
        if (decision.Move is { } move && !_position.Moves(_side).Contains(move))
        {
            _log.Error("{Player} chose {Move}, which is not legal for {Side}", _player.Name, move, _side.Word());
            Fallback("illegal-choice", abandon: false);
            return;
        }
        if (decision.Move is null && _position.Moves(_side).Count > 0)
        {
            _log.Error("{Player} found no move for {Side} although it has one", _player.Name, _side.Word());
            Fallback("no-choice", abandon: false);
            return;
        }
        Answer(() => [Note(decision), new PickReply(decision.Move is { } m ? _position.FormatMove(m) : null)]);
    }

    /// <summary>
    /// The host's own answer: the first legal move in the ruleset's fixed order. With
    /// <paramref name="abandon"/> the player is still running and must not be used again.
    /// </summary>
    private void Fallback(string reason, bool abandon)
    {
        Answer(() =>
        {
            Abandoned = abandon;
            var moves = _position.Moves(_side);
            var note = new NoteReply([new("ms", Text(_clock.ElapsedMilliseconds)), new("fallback", reason)]);
            return [note, new PickReply(moves.Count > 0 ? _position.FormatMove(moves[0]) : null)];
        });
    }

    private NoteReply Note(Decision decision)
    {
        var fields = new List<KeyValuePair<string, string>>
        {
            new("nodes", Text(decision.Nodes)),
            new("ms", Text(decision.ElapsedMs)),
        };
        if (decision.Value is { } value && NoSpaces(value) is { Length: > 0 } compact) fields.Add(new("value", compact));
        if (decision.Line is { Count: > 0 } line && line.All(m => NoSpaces(m) == m && !m.Contains(',')))
            fields.Add(new("line", string.Join(',', line)));
        fields.Add(new("exact", decision.Exact ? "true" : "false"));
        if (decision.Winning is { } winning) fields.Add(new("winning", winning ? "true" : "false"));
        return new NoteReply(fields);
    }

    private static string Text(long n) => n.ToString(System.Globalization.CultureInfo.InvariantCulture);

    private static string NoSpaces(string text) => new(text.Where(c => !char.IsWhiteSpace(c) && !char.IsControl(c)).ToArray());

    /// <summary>Writes the answer if nobody has yet; the first caller wins, later ones do nothing.</summary>
    private void Answer(Func<IReadOnlyList<Reply>> replies)
    {
        if (Interlocked.Exchange(ref _claimed, 1) != 0) return;
        try
        {
            foreach (var reply in replies()) _out.Write(reply);
        }
        catch (Exception e)
        {
            // Output gone (the harness closed its end) or a formatting bug: log it; the reading thread decides what next.
            _log.Error(e, "could not write the answer to think");
        }
        finally
        {
            _answered.Set();
        }
    }

    public void Dispose()
    {
        _overrun?.Dispose();
        _fallback?.Dispose();
        // The token source stays alive on purpose: an abandoned player may still be polling it.
    }
}
