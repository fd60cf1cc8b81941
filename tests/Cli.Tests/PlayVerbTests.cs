using Bramble.Rules;
using Bramble.Search;
using Bramble.Values;

namespace Bramble.Cli.Tests;

public class PlayVerbTests
{
    /// <summary>A scripted person: asks for the moves, answers with the first one listed, and types nonsense now and then.</summary>
    private sealed class ScriptedPerson(StringWriter screen) : TextReader
    {
        private int _turn;
        private bool _askedForMoves;

        public override string? ReadLine()
        {
            if (!_askedForMoves)
            {
                _askedForMoves = true;
                return _turn++ % 3 == 0 ? "not-a-move" : "moves";
            }
            var text = screen.ToString();
            int at = text.LastIndexOf("your moves: ", StringComparison.Ordinal);
            if (at < 0) return "moves";
            var line = text[(at + "your moves: ".Length)..].Split('\n')[0].Trim();
            _askedForMoves = false;
            return line.Split(' ', StringSplitOptions.RemoveEmptyEntries).FirstOrDefault() ?? "quit";
        }
    }

    [Theory]
    [InlineData("hackenbush", "BRB + G(B,R) + [B0-1,R1-2,G2-0,B1-3] + GG", "random")]
    [InlineData("domineering", "4x4", "random")]
    [InlineData("forms", "{3|-1} + {5|2||0} + * + 1/2", "random")]
    public void ScriptedGameReachesTheEnd(string ruleset, string position, string strategy)
    {
        if (Rulesets.Find(ruleset) is not { } rules) { Assert.Fail($"{ruleset} is not registered"); return; }
        var screen = new StringWriter();
        var game = new PlayVerb.TerminalGame(rules.Parse(position), Side.Left, Side.Left, Players.Create(strategy, 3),
            TimeSpan.FromMilliseconds(200), new ScriptedPerson(screen), screen);
        Assert.Equal(0, game.Run());
        var text = screen.ToString();
        Assert.Contains(" wins", text);
        Assert.Contains("is not a move or command", text);
        Assert.DoesNotContain("resigns", text);
        Assert.Contains("engine (right) plays", text);
    }

    [Fact]
    public void UndoTakesBackAMovePair()
    {
        var rules = Rulesets.Get("domineering");
        var screen = new StringWriter();
        var input = new StringReader("a1\nundo\nquit\n");
        var game = new PlayVerb.TerminalGame(rules.Parse("3x3"), Side.Left, Side.Left, Players.Create("random", 1),
            TimeSpan.FromMilliseconds(100), input, screen);
        game.Run();
        Assert.Contains("took back a move pair", screen.ToString());
    }
}
