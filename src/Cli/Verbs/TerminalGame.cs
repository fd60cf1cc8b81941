using Bramble.Pictures;
using Bramble.Rules;
using Bramble.Search;
using Bramble.Values;

namespace Bramble.Cli;

/// <summary>
/// One sitting of <c>bramble play</c>: games against the engine, the history for taking moves
/// back, and the commands. Each turn the board is printed once, just before the person is asked
/// for a move, under the lines naming the moves just played. At the end of a game it prints the
/// result and the move list and offers another; when the input ends it leaves quietly.
/// </summary>
public sealed class TerminalGame(IPosition start, Side human, Side firstMover, IPlayer engine, TimeSpan budget, TextReader input, TextWriter output)
{
    public const string Help = """
        commands:
          <move>          play a move (e3 in Hackenbush, c4 in Domineering, 2.1 in Forms)
          moves           list your legal moves and what each one does
          hint            a winning move if exact analysis finds one in time, else Thermostrat's choice (said so)
          value           the exact value of the position and who is winning
          undo            take back your last move and the engine's reply
          picture FILE    save an SVG picture of the position
          help            this list
          quit            leave the game
        """;

    /// <summary>Repeat each line read after its prompt (set when the input is a pipe, so the saved output reads as a dialogue).</summary>
    public bool EchoInput { get; init; }

    private readonly Stack<(IPosition Position, Side Mover)> _history = new();
    private readonly List<(Side Side, string Move)> _played = new();
    private readonly ValueContext _values = new();
    private PerfectPlayer? _hinter;
    private PlayBoard _board = null!;
    private IPosition _position = null!;
    private Side _mover;

    public int Run()
    {
        _mover = firstMover;
        _position = start;
        _board = new PlayBoard(start);
        output.WriteLine($"You play {human.Word()}{Role(start.Ruleset.Name, human)}; the engine plays {human.Other().Word()} with {engine.Name}. Type 'help' for commands.");
        while (true)
        {
            var result = PlayOneGame();
            if (result == Ending.Left) return Entry.Success;
            output.WriteLine("Another game? Type 'again' for a new game from the same start, or 'quit'.");
            while (true)
            {
                output.Write("> ");
                output.Flush();
                var line = ReadLine();
                if (line is null) { output.WriteLine(); output.WriteLine("input ended; goodbye."); return Entry.Success; }
                var word = line.Trim().ToLowerInvariant();
                if (word is "quit" or "q" or "no") { output.WriteLine("goodbye."); return Entry.Success; }
                if (word is "again" or "yes" or "y") break;
                if (word.Length > 0) output.WriteLine("type 'again' or 'quit'.");
            }
            _history.Clear();
            _played.Clear();
            _board = new PlayBoard(start);
            _position = start;
            _mover = firstMover;
            output.WriteLine();
            output.WriteLine("New game.");
        }
    }

    private enum Ending { Finished, Left }

    private Ending PlayOneGame()
    {
        IPosition? shown = null;
        while (true)
        {
            var moves = _position.Moves(_mover);
            if (moves.Count == 0)
            {
                output.WriteLine();
                output.WriteLine(_board.Draw(_position));
                var winner = _mover.Other();
                output.WriteLine();
                output.WriteLine($"Game over: {_mover.Word()} has no move, so {winner.Word()} wins — {(winner == human ? "you win!" : "the engine wins.")}");
                output.WriteLine($"Moves ({_played.Count}): {MoveList()}");
                return Ending.Finished;
            }
            if (_mover == human)
            {
                if (!ReferenceEquals(shown, _position))
                {
                    output.WriteLine();
                    output.WriteLine(_board.Draw(_position));
                    shown = _position;
                }
                output.Write($"{_mover.Word()} to move> ");
                output.Flush();
                var line = ReadLine();
                if (line is null)
                {
                    output.WriteLine();
                    output.WriteLine("input ended; leaving the game.");
                    if (_played.Count > 0) output.WriteLine($"Moves so far: {MoveList()}");
                    return Ending.Left;
                }
                if (!Command(line.Trim())) return Ending.Left;
            }
            else
            {
                var decision = engine.Choose(_position, _mover, budget);
                if (decision.Move is not { } move || !moves.Contains(move))
                {
                    output.WriteLine("the engine found no legal move and resigns.");
                    return Ending.Finished;
                }
                string name = _position.FormatMove(move);
                var side = _mover;
                Play(move);
                output.WriteLine($"engine ({side.Word()}) plays {name}" +
                    $"  [{decision.Nodes} nodes, {decision.ElapsedMs} ms{(decision.Exact ? ", exact" : "")}]; {ValueNow()}");
            }
        }
    }

    private string? ReadLine()
    {
        var line = input.ReadLine();
        if (line is not null && EchoInput) output.WriteLine(line);
        return line;
    }

    private string MoveList() =>
        _played.Count == 0 ? "none" : string.Join(", ", _played.Select((p, i) => $"{i + 1}) {(p.Side == human ? "you" : "engine")} {p.Move}"));

    private void Play(Move move)
    {
        _history.Push((_position, _mover));
        _board.Played(_position, _mover, move);
        _played.Add((_mover, _position.FormatMove(move)));
        _position = _position.Play(_mover, move);
        _mover = _mover.Other();
    }

    /// <summary>The value of the position now, within a small budget, for the line after the engine's move.</summary>
    private string ValueNow()
    {
        _values.ResetCounters(budgetMs: (long)Math.Clamp(budget.TotalMilliseconds, 200, 1000));
        try
        {
            var g = _position.Ruleset.Value(_position, _values);
            var winner = _values.Store.OutcomeOf(g).WinnerMovingFirst(_mover);
            return $"value now {_values.Store.Format(g)}, {(winner == human ? "you" : "the engine")} ({winner.Word()}) win{(winner == human ? "" : "s")} with best play";
        }
        catch (BudgetExceededException)
        {
            return "value now: not found within the budget";
        }
    }

    /// <summary>Handles one line from the person; false means leave.</summary>
    private bool Command(string line)
    {
        if (line.Length == 0) return true;
        var word = line.Split(' ', 2, StringSplitOptions.RemoveEmptyEntries);
        switch (word[0].ToLowerInvariant())
        {
            case "help":
                output.WriteLine(Help);
                return true;
            case "quit":
                output.WriteLine("leaving the game.");
                if (_played.Count > 0) output.WriteLine($"Moves so far: {MoveList()}");
                return false;
            case "moves":
                output.WriteLine("your moves:");
                foreach (var m in _board.DescribeMoves(_position, _mover)) output.WriteLine("  " + m);
                return true;
            case "hint":
                Hint();
                return true;
            case "undo":
                // Take back the engine's reply and the person's move before it.
                while (_history.Count > 0)
                {
                    var (p, m) = _history.Pop();
                    _board.TakeBack(p);
                    _played.RemoveAt(_played.Count - 1);
                    _position = p;
                    _mover = m;
                    if (m == human) { output.WriteLine("took back a move pair."); return true; }
                }
                output.WriteLine("nothing to take back.");
                return true;
            case "value":
                ShowValue();
                return true;
            case "picture":
                if (word.Length < 2) { output.WriteLine("picture needs a file name, e.g. picture board.svg"); return true; }
                try
                {
                    File.WriteAllText(word[1], PositionPicture.Draw(_position));
                    output.WriteLine($"saved {word[1]}");
                }
                catch (Exception e) when (e is IOException or UnauthorizedAccessException or ArgumentException)
                {
                    output.WriteLine($"could not save the picture: {e.Message}");
                }
                return true;
        }
        Move move;
        try
        {
            move = _position.ParseMove(line);
        }
        catch (IllegalMoveException e)
        {
            output.WriteLine($"'{line}' is not a move or command: {e.Message} (type 'help')");
            return true;
        }
        if (!_position.Moves(_mover).Contains(move))
        {
            output.WriteLine($"{_position.FormatMove(move)} is not a legal move for {_mover.Word()}; type 'moves' to see them.");
            return true;
        }
        output.WriteLine($"you played {_position.FormatMove(move)}");
        Play(move);
        return true;
    }

    /// <summary>
    /// Exact analysis first (the perfect player within the engine's budget); when it cannot finish,
    /// its fallback, Thermostrat, picks the move, and the hint says it is only that strategy's choice.
    /// </summary>
    private void Hint()
    {
        _hinter ??= new PerfectPlayer();
        var d = _hinter.Choose(_position, _mover, budget);
        if (d.Move is not { } move) { output.WriteLine("hint: you have no move."); return; }
        string name = _position.FormatMove(move);
        if (d.Exact && d.Winning == true) output.WriteLine($"hint: {name} wins (exact analysis: after it the engine loses whatever it does).");
        else if (d.Exact && d.Winning == false) output.WriteLine($"hint: no move wins against best play (exact analysis); {name} leaves the engine the fewest winning replies.");
        else output.WriteLine($"hint: exact analysis did not finish in {budget.TotalMilliseconds:0} ms; Thermostrat's choice is {name} (a strategy's choice, not proven).");
    }

    private void ShowValue()
    {
        var context = new ValueContext();
        context.ResetCounters(budgetMs: (long)Math.Max(500, budget.TotalMilliseconds));
        try
        {
            var g = _position.Ruleset.Value(_position, context);
            var outcome = context.Store.OutcomeOf(g);
            var winner = outcome.WinnerMovingFirst(_mover);
            output.WriteLine($"value {context.Store.Format(g)}: {ValueReport.Describe(outcome)}; with {_mover.Word()} to move, {winner.Word()} wins{(winner == human ? " (you)" : " (the engine)")}.");
        }
        catch (BudgetExceededException)
        {
            output.WriteLine("the exact value takes longer than the budget here.");
        }
    }

    /// <summary>What a side's pieces are called in the rulesets whose players know them by name; nothing for the rest.</summary>
    private static string Role(string ruleset, Side side) => (ruleset, side) switch
    {
        ("hackenbush", Side.Left) => " (blue edges, and green)",
        ("hackenbush", Side.Right) => " (red edges, and green)",
        ("domineering", Side.Left) => " (vertical dominoes)",
        ("domineering", Side.Right) => " (horizontal dominoes)",
        ("clobber" or "konane", Side.Left) => " (the x stones)",
        ("clobber" or "konane", Side.Right) => " (the o stones)",
        ("toads-and-frogs", Side.Left) => " (the toads, T)",
        ("toads-and-frogs", Side.Right) => " (the frogs, F)",
        ("cutcake", Side.Left) => " (cuts between columns)",
        ("cutcake", Side.Right) => " (cuts between rows)",
        ("amazons", Side.Left) => " (the L amazons)",
        ("amazons", Side.Right) => " (the R amazons)",
        ("snort" or "col", Side.Left) => " (colours vertices blue)",
        ("snort" or "col", Side.Right) => " (colours vertices red)",
        _ => "",
    };
}
