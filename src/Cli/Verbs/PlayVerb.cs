using System.CommandLine;
using Bramble.Pictures;
using Bramble.Rules;
using Bramble.Search;
using Bramble.Values;

namespace Bramble.Cli;

/// <summary>
/// <c>bramble play</c>: a terminal game against the engine. Reads moves and a few plain commands
/// from stdin, so a game can also be scripted through a pipe.
/// </summary>
public static class PlayVerb
{
    /// <summary>Positions used when none is given: a few from the orchard demo scenario.</summary>
    private static readonly Dictionary<string, string[]> s_demo = new(StringComparer.OrdinalIgnoreCase)
    {
        ["hackenbush"] = ["BRB + G(B,R) + [B0-1,R1-2,G2-0,B1-3]", "GGG + BR + G(G,G) + RRB", "[G0-1,G1-2,G2-0,B2-3,R3-3] + BBR"],
        ["domineering"] = ["4x4", "..#./..../...#/....", "3x5"],
        ["forms"] = ["{3|-1} + {5|2||0} + * + 1/2", "{4|0} + {2||1|0} + ↑ + {6|2||-1}"],
    };

    private const string Help = """
        commands:
          <move>          play a move (e3 in Hackenbush, c4 in Domineering, 2.1 in Forms)
          moves           list your legal moves
          value           the exact value of the position and who is winning
          undo            take back your last move and the engine's reply
          picture FILE    save an SVG picture of the position
          help            this list
          quit            leave the game
        """;

    public static Command Build()
    {
        var ruleset = new Argument<string>("ruleset") { Description = "hackenbush, domineering or forms" };
        var position = new Argument<string?>("position") { Description = "start position: the text, @file (read whole) or - for stdin (default: one from the demo suite)", Arity = ArgumentArity.ZeroOrOne };
        var asSide = new Option<string>("--as") { Description = "the side you play: left or right", DefaultValueFactory = _ => "left" };
        var first = new Option<string>("--first") { Description = "who moves first: left or right", DefaultValueFactory = _ => "left" };
        var strategy = new Option<string>("--strategy") { Description = $"the engine's strategy: {string.Join(", ", Players.Names)} (docs/players.md)", DefaultValueFactory = _ => "perfect" };
        var budget = new Option<int>("--budget-ms") { Description = "the engine's thinking time per move", DefaultValueFactory = _ => 2000 };
        var seed = new Option<int>("--seed") { Description = "seed for random choices", DefaultValueFactory = _ => 1 };
        var command = new Command("play", "Play a game against the engine in the terminal\nMoves are typed as the ruleset names them: e7 (Hackenbush edge), c4 (Domineering cell), 2.1 (Forms term.option).") { ruleset, position, asSide, first, strategy, budget, seed };
        command.SetAction(parse => Failures.Guard(() =>
        {
            var rules = Rulesets.Find(parse.GetValue(ruleset)!) ?? throw new InputException(
                $"unknown ruleset '{parse.GetValue(ruleset)}'; known: {string.Join(", ", Rulesets.All.Select(r => r.Name))}");
            var rng = new Random(parse.GetValue(seed));
            string text = parse.GetValue(position) is { } given ? PositionInput.Read(given)
                : s_demo.TryGetValue(rules.Name, out var list) ? list[rng.Next(list.Length)]
                : throw new InputException($"give a {rules.Name} position to play");
            if (!SideExtensions.TryParse(parse.GetValue(asSide)!, out var human)) throw new InputException("--as takes left or right");
            if (!SideExtensions.TryParse(parse.GetValue(first)!, out var mover)) throw new InputException("--first takes left or right");
            var player = Players.Create(parse.GetValue(strategy)!, parse.GetValue(seed));
            var start = rules.Parse(text);
            return BigStack.Run(() => new TerminalGame(start, human, mover, player, TimeSpan.FromMilliseconds(parse.GetValue(budget)), Console.In, Console.Out).Run());
        }));
        return command;
    }

    /// <summary>One game: the loop, the history for taking moves back, and the commands.</summary>
    public sealed class TerminalGame(IPosition start, Side human, Side firstMover, IPlayer engine, TimeSpan budget, TextReader input, TextWriter output)
    {
        private readonly Stack<(IPosition Position, Side Mover)> _history = new();
        private IPosition _position = start;
        private Side _mover = firstMover;

        public int Run()
        {
            output.WriteLine($"You play {human.Word()} ({Colour(human)}); the engine plays {human.Other().Word()} with {engine.Name}. Type 'help' for commands.");
            IPosition? shown = null;
            while (true)
            {
                if (!ReferenceEquals(shown, _position))
                {
                    output.WriteLine();
                    output.WriteLine(TextPicture.Draw(_position));
                    shown = _position;
                }
                var moves = _position.Moves(_mover);
                if (moves.Count == 0)
                {
                    var winner = _mover.Other();
                    output.WriteLine($"{_mover.Word()} has no move: {winner.Word()} wins — {(winner == human ? "you win!" : "the engine wins.")}");
                    return Entry.Success;
                }
                if (_mover == human)
                {
                    output.Write($"{_mover.Word()} to move> ");
                    output.Flush();
                    var line = input.ReadLine();
                    if (line is null) { output.WriteLine(); output.WriteLine("input ended; leaving the game."); return Entry.Success; }
                    if (!Command(line.Trim())) return Entry.Success;
                }
                else
                {
                    var decision = engine.Choose(_position, _mover, budget);
                    if (decision.Move is not { } move || !moves.Contains(move))
                    {
                        output.WriteLine("the engine found no legal move and resigns.");
                        return Entry.Success;
                    }
                    _history.Push((_position, _mover));
                    output.WriteLine($"engine ({_mover.Word()}) plays {_position.FormatMove(move)}" +
                        $"  [{decision.Nodes} nodes, {decision.ElapsedMs} ms{(decision.Exact ? ", exact" : "")}{(decision.Value is { } v ? ", value " + v : "")}]");
                    _position = _position.Play(_mover, move);
                    _mover = _mover.Other();
                }
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
                    return false;
                case "moves":
                    output.WriteLine("your moves: " + string.Join(" ", _position.Moves(_mover).Select(_position.FormatMove)));
                    return true;
                case "undo":
                    // Take back the engine's reply and the person's move before it.
                    while (_history.Count > 0)
                    {
                        var (p, m) = _history.Pop();
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
            _history.Push((_position, _mover));
            _position = _position.Play(_mover, move);
            _mover = _mover.Other();
            return true;
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

        private static string Colour(Side side) => side == Side.Left ? "blue / vertical" : "red / horizontal";
    }
}
