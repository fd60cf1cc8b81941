using System.CommandLine;
using System.Text.Json;
using System.Text.Json.Nodes;
using Bramble.Rules;
using Bramble.Values;

namespace Bramble.Cli;

/// <summary><c>bramble value &lt;ruleset&gt; &lt;position&gt; [--json] [--ascii]</c>: exact value and its measures.</summary>
public static class ValueVerb
{
    public static Command Build()
    {
        var ruleset = new Argument<string>("ruleset") { Description = "the ruleset: " + RulesetNames.Listed };
        var position = new Argument<string>("position") { Description = "position text, @file (read whole), or - for stdin" };
        var json = new Option<bool>("--json") { Description = "Print JSON (fields in docs/cli.md)" };
        var ascii = new Option<bool>("--ascii") { Description = "Print only ASCII: up, down, +-x and words instead of the symbols" };
        var budget = new Option<long?>("--budget-ms") { Description = "Give up after this many milliseconds and say the value is not exact within the budget (default: no limit)", HelpName = "N" };
        var command = new Command("value", "Exact canonical value of a position and of each component") { ruleset, position, json, ascii, budget };
        command.Options.Add(DbOption.Option);
        command.SetAction(parse => Failures.Guard(() =>
        {
            long? ms = parse.GetValue(budget);
            if (ms is <= 0) throw new InputException($"--budget-ms must be a positive number of milliseconds, got {ms}");
            var text = PositionInput.Read(parse.GetValue(position)!);
            var db = parse.GetValue(DbOption.Option);
            var context = new ValueContext();
            bool dbRead = DbOption.Load(db, context);
            bool asJson = parse.GetValue(json);
            // Deep values recurse in the store and in the writer alike: both run on the big stack.
            string Work()
            {
                var report = Analyse(parse.GetValue(ruleset)!, text, parse.GetValue(ascii), context);
                return asJson ? report.ToJson() : report.ToText();
            }
            string output;
            if (ms is { } limit)
            {
                // The context stops cooperative searches at the deadline; the wait below also
                // covers work that never looks at the clock, which is left behind when the verb ends.
                using var stop = new CancellationTokenSource(TimeSpan.FromMilliseconds(limit));
                context.Cancellation = stop.Token;
                context.ResetCounters(budgetMs: limit);
                string? done;
                try
                {
                    if (!BigStack.TryRun(Work, TimeSpan.FromMilliseconds(limit + 200), out done)) done = null;
                }
                catch (BudgetExceededException)
                {
                    done = null;
                }
                if (done is null)
                {
                    Console.Out.WriteLine(asJson ? NotExactJson(limit) : NotExactText(limit));
                    return Entry.JobFailed;
                }
                output = done;
            }
            else output = BigStack.Run(Work);
            Console.Out.WriteLine(output);
            bool dbSaved = DbOption.Save(db, context);
            return dbRead && dbSaved ? Entry.Success : Entry.JobFailed;
        }));
        return command;
    }

    public static string NotExactText(long budgetMs) =>
        $"value        not exact within the budget: no exact value in {budgetMs} ms (raise --budget-ms, or leave it out for no limit)";

    public static string NotExactJson(long budgetMs) =>
        new JsonObject { ["exact"] = false, ["budget_ms"] = budgetMs }.ToJsonString();

    /// <summary>The report for a position text, in a fresh value context.</summary>
    public static ValueReport Analyse(string rulesetName, string text, bool ascii) => Analyse(rulesetName, text, ascii, new ValueContext());

    public static ValueReport Analyse(string rulesetName, string text, bool ascii, ValueContext context)
    {
        var rules = Rulesets.Find(rulesetName) ?? throw new InputException(
            $"unknown ruleset '{rulesetName}'; known: {string.Join(", ", Rulesets.All.Select(r => r.Name))}");
        var pos = rules.Parse(text);
        var store = context.Store;
        var parts = pos.Components().Select(c => (c.Text, rules.Value(c, context))).ToList();
        var total = store.Sum(parts.Select(p => p.Item2));
        return new ValueReport(store, total, parts.Select(p => (ascii ? AsciiText(p.Text) : p.Text, store.Format(p.Item2, ascii))).ToList(), ascii);
    }

    /// <summary>
    /// A component's text in ASCII: the rulesets' own notations are ASCII already, and a Forms
    /// term with symbols is written again with the ASCII spellings (up, down, +-x).
    /// </summary>
    public static string AsciiText(string text)
    {
        if (text.All(char.IsAscii)) return text;
        try
        {
            return ValueExprWriter.Write(ValueNotation.Parse(text), ascii: true);
        }
        catch (ValueSyntaxException)
        {
            return string.Concat(text.Select(ch => char.IsAscii(ch) ? ch.ToString() : $"\\u{(int)ch:X4}"));
        }
    }
}

/// <summary>What <c>value</c> prints, in words or as JSON.</summary>
public sealed class ValueReport(GameStore store, Game value, IReadOnlyList<(string Text, string Value)> components, bool ascii)
{
    public string Value => store.Format(value, ascii);
    public Outcome Outcome => store.OutcomeOf(value);

    public string ToText()
    {
        var w = new StringWriter();
        w.WriteLine($"value        {Value}");
        w.WriteLine($"outcome      {Outcome} ({Describe(Outcome)})");
        w.WriteLine($"stops        left {store.LeftStop(value)}, right {store.RightStop(value)}");
        w.WriteLine($"mean         {store.Mean(value)}");
        w.WriteLine($"temperature  {store.Temperature(value)}");
        w.WriteLine($"birthday     {store.ExactBirthday(value)}");
        if (store.AtomicWeight(value) is { } aw) w.WriteLine($"atomic weight {store.Format(aw, ascii)}");
        if (components.Count > 0)
        {
            w.WriteLine($"components   {components.Count}");
            int i = 1;
            foreach (var (text, v) in components) w.WriteLine($"  {i++,3}. {Shorten(text)}  =  {v}");
        }
        return w.ToString().TrimEnd();
    }

    public string ToJson()
    {
        var o = new JsonObject
        {
            ["value"] = Value,
            ["outcome"] = Outcome.ToString(),
            ["left_stop"] = store.LeftStop(value).ToString(),
            ["right_stop"] = store.RightStop(value).ToString(),
            ["mean"] = store.Mean(value).ToString(),
            ["temperature"] = store.Temperature(value).ToString(),
            ["birthday"] = JsonNode.Parse(store.ExactBirthday(value).ToString()),
            ["exact"] = true,
        };
        if (store.AtomicWeight(value) is { } aw) o["atomic_weight"] = store.Format(aw, ascii);
        var list = new JsonArray();
        foreach (var (text, v) in components) list.Add(new JsonObject { ["text"] = text, ["value"] = v });
        o["components"] = list;
        return o.ToJsonString(new JsonSerializerOptions { Encoder = System.Text.Encodings.Web.JavaScriptEncoder.UnsafeRelaxedJsonEscaping });
    }

    /// <summary>Component text for people: a long one is cut (the JSON keeps it whole).</summary>
    private static string Shorten(string text) =>
        text.Length <= 160 ? text : $"{text[..100]}… ({text.Length:N0} characters)";

    public static string Describe(Outcome o) => o switch
    {
        Outcome.L => "Left wins whoever starts",
        Outcome.R => "Right wins whoever starts",
        Outcome.N => "the player to move wins",
        _ => "the player to move loses",
    };
}
