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
        var ruleset = new Argument<string>("ruleset") { Description = "forms, hackenbush or domineering" };
        var position = new Argument<string>("position") { Description = "position text, @file, or - for stdin" };
        var json = new Option<bool>("--json") { Description = "Print the SPEC.md §7 JSON fields" };
        var ascii = new Option<bool>("--ascii") { Description = "Write up, down and braces instead of the symbols" };
        var command = new Command("value", "Exact canonical value of a position and of each component") { ruleset, position, json, ascii };
        command.Options.Add(DbOption.Option);
        command.SetAction(parse => Failures.Guard(() =>
        {
            var text = PositionInput.Read(parse.GetValue(position)!);
            // Deep values recurse in the store and in the writer alike: both run on the big stack.
            var output = BigStack.Run(() =>
            {
                var report = Analyse(parse.GetValue(ruleset)!, text, parse.GetValue(ascii), parse.GetValue(DbOption.Option));
                return parse.GetValue(json) ? report.ToJson() : report.ToText();
            });
            Console.Out.WriteLine(output);
            return Entry.Success;
        }));
        return command;
    }

    public static ValueReport Analyse(string rulesetName, string text, bool ascii, FileInfo? db = null)
    {
        var context = new ValueContext();
        DbOption.Load(db, context);
        var rules = Rulesets.Find(rulesetName) ?? throw new InputException(
            $"unknown ruleset '{rulesetName}'; known: {string.Join(", ", Rulesets.All.Select(r => r.Name))}");
        var pos = rules.Parse(text);
        var store = context.Store;
        var parts = pos.Components().Select(c => (c.Text, rules.Value(c, context))).ToList();
        var total = store.Sum(parts.Select(p => p.Item2));
        DbOption.Save(db, context);
        return new ValueReport(store, total, parts.Select(p => (p.Text, store.Format(p.Item2, ascii))).ToList(), ascii);
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
        w.WriteLine($"birthday     {store.Birthday(value)}");
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
            ["birthday"] = store.Birthday(value),
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
