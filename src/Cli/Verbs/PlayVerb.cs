using System.CommandLine;
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

    public static Command Build()
    {
        var ruleset = new Argument<string>("ruleset") { Description = "the ruleset: " + RulesetNames.Listed };
        var position = new Argument<string?>("position")
        {
            Description = "start position in the ruleset's notation (BRB + G(B,R); ..#./....; {3|-1} + *), @file, or - for stdin; default: one from the demo suite",
            Arity = ArgumentArity.ZeroOrOne,
        };
        var asSide = new Option<string>("--as") { Description = "the side you play: left or right", DefaultValueFactory = _ => "left", HelpName = "left|right" };
        var first = new Option<string>("--first") { Description = "who moves first: left or right", DefaultValueFactory = _ => "left", HelpName = "left|right" };
        var level = new Option<string?>("--level") { Description = "how well the engine plays: " + PlayLevels.Describe() + " (default perfect)", HelpName = "LEVEL" };
        var strategy = new Option<string?>("--strategy") { Description = "the engine's strategy by name, instead of --level: " + string.Join(", ", Players.Names), HelpName = "S" };
        var budget = new Option<int>("--budget-ms") { Description = "the engine's thinking time per move (also the budget of hint and value)", DefaultValueFactory = _ => 2000, HelpName = "N" };
        var seed = new Option<int>("--seed") { Description = "seed for random choices", DefaultValueFactory = _ => 1, HelpName = "X" };
        var command = new Command("play", "Play a game against the engine in the terminal (commands: moves, hint, value, undo, picture, help, quit)")
            { ruleset, position, asSide, first, level, strategy, budget, seed };
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
            string? levelWord = parse.GetValue(level), strategyName = parse.GetValue(strategy);
            if (levelWord is not null && strategyName is not null) throw new InputException("give --level or --strategy, not both");
            string chosen = strategyName ?? PlayLevels.StrategyFor(levelWord ?? "perfect");
            if (!Players.Names.Contains(chosen.ToLowerInvariant()))
                throw new InputException($"unknown strategy '{chosen}'; known: {string.Join(", ", Players.Names)}");
            var player = Players.Create(chosen, parse.GetValue(seed));
            var start = rules.Parse(text);
            return BigStack.Run(() => new TerminalGame(start, human, mover, player, TimeSpan.FromMilliseconds(parse.GetValue(budget)), Console.In, Console.Out)
            {
                EchoInput = Console.IsInputRedirected,
            }.Run());
        }));
        return command;
    }
}
