using System.CommandLine;
using System.Text.Json;
using System.Text.Json.Nodes;
using Bramble.Rules;
using Bramble.Rules.Compose;
using Bramble.Values;

namespace Bramble.Cli;

/// <summary>
/// <c>bramble compose &lt;ruleset&gt; &lt;value&gt; [--max-size N] [--count K] [--budget-ms N] [--json]</c>:
/// positions of a ruleset whose value is the given one, smallest first (docs/compose.md).
/// </summary>
public static class ComposeVerb
{
    private const long DefaultBudgetMs = 10_000;

    public static Command Build()
    {
        var ruleset = new Argument<string>("ruleset") { Description = "the ruleset: " + RulesetNames.Listed };
        var value = new Argument<string>("value") { Description = "the target value in value notation (↑, *2, 3/8, {1|-1}, ...), @file, or - for stdin" };
        var maxSize = new Option<int?>("--max-size") { Description = "Look at positions up to this size (edges, cells, terms)", HelpName = "N" };
        var count = new Option<int>("--count") { Description = "How many positions to find", DefaultValueFactory = _ => 1, HelpName = "N" };
        var budget = new Option<long>("--budget-ms") { Description = "Stop searching after this many milliseconds", DefaultValueFactory = _ => DefaultBudgetMs, HelpName = "N" };
        var json = new Option<bool>("--json") { Description = "Print the result as JSON" };
        var command = new Command("compose", "Positions of a ruleset whose value is the given one, smallest first") { ruleset, value, maxSize, count, budget, json };
        command.Options.Add(DbOption.Option);
        command.SetAction(parse => Failures.Guard(() =>
        {
            var rules = Rulesets.Find(parse.GetValue(ruleset)!) ?? throw new InputException(
                $"unknown ruleset '{parse.GetValue(ruleset)}'; known: {string.Join(", ", Rulesets.All.Select(r => r.Name))}");
            var text = PositionInput.Read(parse.GetValue(value)!);
            var settings = new ComposeSettings(parse.GetValue(maxSize), parse.GetValue(count), parse.GetValue(budget));
            if (settings.Count < 1) throw new InputException("--count must be at least 1");
            if (settings.MaxSize is < 0) throw new InputException("--max-size must not be negative");
            if (settings.BudgetMs < 1) throw new InputException("--budget-ms must be at least 1");
            var db = parse.GetValue(DbOption.Option);
            var (report, output) = BigStack.Run(() =>
            {
                var context = new ValueContext();
                DbOption.Load(db, context);
                var target = context.Store.Parse(text);
                var result = new Composer(rules, context).Run(target, settings, new StderrProgress());
                DbOption.Save(db, context);
                return (result, parse.GetValue(json) ? ToJson(result, context.Store) : ToText(result, context.Store));
            });
            Console.Out.WriteLine(output);
            // Nothing found and the budget cut the search short: the job was not done.
            return report.Positions.Count == 0 && report.Stop == ComposeStop.Budget ? Entry.JobFailed : Entry.Success;
        }));
        return command;
    }

    public static string ToText(ComposeReport r, GameStore store)
    {
        var w = new StringWriter();
        string unit = r.SizeUnit;
        w.WriteLine($"target     {store.Format(r.Target)}  ({r.Ruleset.Name})");
        if (r.Positions.Count == 0) w.WriteLine($"found      none{r.NoneReason()}");
        int i = 1;
        foreach (var p in r.Positions)
            w.WriteLine($"  {i++,3}. {p.Position.Text}   ({p.Size} {unit}, {(p.Route == ComposeRoute.Construction ? "constructed" : "found by search")})");
        w.WriteLine($"searched   {r.Searched()}");
        w.WriteLine($"stopped    {r.Stopped()}");
        foreach (var note in r.Notes) w.WriteLine($"note       {note}");
        return w.ToString().TrimEnd();
    }

    public static string ToJson(ComposeReport r, GameStore store)
    {
        var positions = new JsonArray();
        foreach (var p in r.Positions)
            positions.Add(new JsonObject
            {
                ["text"] = p.Position.Text,
                ["size"] = p.Size,
                ["route"] = p.RouteWord(),
                ["found_ms"] = p.FoundMs,
            });
        var o = new JsonObject
        {
            ["ruleset"] = r.Ruleset.Name,
            ["target"] = store.Format(r.Target),
            ["positions"] = positions,
            ["size_unit"] = r.SizeUnit,
            ["least_size"] = r.LeastSize,
            ["bound"] = r.Bound,
            ["searched_through"] = r.SearchedThrough,
            ["sampled"] = r.Sampled,
            ["restricted"] = r.Restricted,
            ["components_tried"] = r.ComponentsTried,
            ["sums_tried"] = r.SumsTried,
            ["elapsed_ms"] = r.ElapsedMs,
            ["first_ms"] = r.FirstMs,
            ["stopped"] = r.StopWord(),
            ["notes"] = new JsonArray(r.Notes.Select(n => (JsonNode?)JsonValue.Create(n)).ToArray()),
        };
        return o.ToJsonString(new JsonSerializerOptions { Encoder = System.Text.Encodings.Web.JavaScriptEncoder.UnsafeRelaxedJsonEscaping });
    }

    /// <summary>Progress lines on stderr, written at once (the search runs on this thread).</summary>
    private sealed class StderrProgress : IProgress<ComposeProgress>
    {
        public void Report(ComposeProgress p) => Console.Error.WriteLine(
            $"compose: size {p.Size} {p.SizeUnit}: {p.ComponentsTried:N0} components valued, {p.SumsTried:N0} sums tried, {p.Found} found, {p.ElapsedMs / 1000.0:F1} s");
    }
}
