using System.CommandLine;
using Bramble.Rules;

namespace Bramble.Cli;

/// <summary>
/// <c>bramble generate &lt;ruleset&gt; &lt;generator&gt; --count N --size S --seed X [--colours BRG]</c>:
/// reproducible random positions, one per line, from the ruleset's own generators.
/// </summary>
public static class GenerateVerb
{
    public static Command Build()
    {
        var ruleset = new Argument<string>("ruleset") { Description = "the ruleset: " + RulesetNames.Listed };
        var generator = new Argument<string>("generator") { Description = "the generator, by ruleset: " + RulesetNames.Generators };
        var count = new Option<int>("--count") { Description = "how many positions", DefaultValueFactory = _ => 1, HelpName = "N" };
        var size = new Option<int>("--size") { Description = "size of each position (edges, cells or terms; see docs/)", DefaultValueFactory = _ => 8, HelpName = "S" };
        var seed = new Option<int>("--seed") { Description = "seed: the same seed gives the same positions", DefaultValueFactory = _ => 1, HelpName = "X" };
        var colours = new Option<string?>("--colours") { Description = "Hackenbush: the edge colours to draw from, e.g. BR or G (default BRG)", HelpName = "COLOURS" };
        var command = new Command("generate", "Reproducible random positions, one per line") { ruleset, generator, count, size, seed, colours };
        command.SetAction(parse => Failures.Guard(() =>
        {
            var rules = Rulesets.Find(parse.GetValue(ruleset)!) ?? throw new InputException(
                $"unknown ruleset '{parse.GetValue(ruleset)}'; known: {string.Join(", ", Rulesets.All.Select(r => r.Name))}");
            var name = parse.GetValue(generator)!;
            if (!rules.Generators.Contains(name, StringComparer.OrdinalIgnoreCase))
                throw new InputException($"unknown {rules.Name} generator '{name}'; known: {string.Join(", ", rules.Generators)}");
            int n = parse.GetValue(count);
            if (n < 0) throw new InputException("--count must be 0 or more");
            IReadOnlyList<string> positions;
            try
            {
                positions = rules.Generate(name, n, parse.GetValue(size), parse.GetValue(seed), parse.GetValue(colours));
            }
            catch (ArgumentOutOfRangeException e)
            {
                throw new InputException(e.Message.Split(" (Parameter")[0]);
            }
            foreach (var p in positions) Console.Out.WriteLine(p);
            return Entry.Success;
        }));
        return command;
    }
}
