using System.CommandLine;
using Bramble.Pictures;
using Bramble.Rules;
using Bramble.Values;

namespace Bramble.Cli;

/// <summary>
/// <c>bramble draw &lt;ruleset&gt; &lt;position&gt; --out FILE.svg</c> (<c>--out -</c>: stdout) and
/// <c>bramble draw thermograph &lt;value&gt; --out FILE.svg</c>.
/// </summary>
public static class DrawVerb
{
    public static Command Build()
    {
        var what = new Argument<string>("ruleset") { Description = RulesetNames.Listed + ", or thermograph" };
        var position = new Argument<string>("position") { Description = "position text (or a value for thermograph), @file, or -" };
        var output = new Option<string>("--out") { Description = "SVG file to write, or - for stdout", Required = true, HelpName = "FILE" };
        var command = new Command("draw", "Draw a position or a thermograph as SVG") { what, position, output };
        command.SetAction(parse => Failures.Guard(() =>
        {
            var kind = parse.GetValue(what)!;
            var text = PositionInput.Read(parse.GetValue(position)!);
            var target = parse.GetValue(output)!;
            string svg = BigStack.Run(() =>
            {
                if (kind.Equals("thermograph", StringComparison.OrdinalIgnoreCase))
                {
                    var store = new GameStore();
                    var g = store.Parse(text);
                    return ThermographPicture.Draw(store.Thermograph(g), store.Format(g), text);
                }
                var rules = Rulesets.Find(kind) ?? throw new InputException(
                    $"unknown ruleset '{kind}'; known: {string.Join(", ", Rulesets.All.Select(r => r.Name).Append("thermograph"))}");
                return PositionPicture.Draw(rules.Parse(text));
            });
            if (target == "-")
            {
                Console.Out.Write(svg);
                return Entry.Success;
            }
            var file = new FileInfo(target);
            try
            {
                File.WriteAllText(file.FullName, svg);
            }
            catch (Exception e) when (e is IOException or UnauthorizedAccessException)
            {
                Console.Error.WriteLine($"could not write {file.FullName}: {e.Message}");
                return Entry.JobFailed;
            }
            Console.Out.WriteLine($"wrote {file.FullName}");
            return Entry.Success;
        }));
        return command;
    }
}
