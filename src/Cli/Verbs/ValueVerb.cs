using System.CommandLine;

namespace Bramble.Cli;

/// <summary><c>bramble value &lt;ruleset&gt; &lt;position&gt; [--json] [--ascii]</c>.</summary>
public static class ValueVerb
{
    public static Command Build()
    {
        var ruleset = new Argument<string>("ruleset") { Description = "forms, hackenbush or domineering" };
        var position = new Argument<string>("position") { Description = "position text, @file, or - for stdin" };
        var json = new Option<bool>("--json") { Description = "Print the SPEC.md JSON fields" };
        var ascii = new Option<bool>("--ascii") { Description = "Write up, down, * as words" };
        var command = new Command("value", "Exact canonical value of a position and its components") { ruleset, position, json, ascii };
        command.SetAction(parse =>
        {
            Console.Error.WriteLine("not yet");
            return Entry.JobFailed;
        });
        return command;
    }
}
