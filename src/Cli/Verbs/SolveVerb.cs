using System.CommandLine;
using System.Text.Json;
using System.Text.Json.Nodes;
using Bramble.Rules;
using Bramble.Search;
using Bramble.Values;

namespace Bramble.Cli;

/// <summary>
/// <c>bramble solve &lt;ruleset&gt; &lt;position&gt; [--first left|right|both] [--strategy perfect|alphabeta]
/// [--budget-ms N] [--db FILE] [--json]</c>: the winner with each side moving first, a winning first
/// move when there is one, nodes, time, and whether the answer is exact.
/// </summary>
public static class SolveVerb
{
    public const long DefaultBudgetMs = 60_000;

    public static Command Build()
    {
        var ruleset = new Argument<string>("ruleset") { Description = "forms, hackenbush or domineering" };
        var position = new Argument<string>("position") { Description = "position text, @file, or - for stdin" };
        var first = new Option<string>("--first") { Description = "Who moves first: left, right or both", DefaultValueFactory = _ => "both" };
        first.AcceptOnlyFromAmong("left", "right", "both");
        var strategy = new Option<string>("--strategy") { Description = "perfect (decomposition search) or alphabeta (whole-board search)", DefaultValueFactory = _ => "perfect" };
        strategy.AcceptOnlyFromAmong("perfect", "alphabeta");
        var budget = new Option<long>("--budget-ms") { Description = "Time budget of each first player's search, in milliseconds", DefaultValueFactory = _ => DefaultBudgetMs };
        var json = new Option<bool>("--json") { Description = "Print JSON (fields in docs/cli.md)" };
        var command = new Command("solve", "Who wins with each side moving first, and a winning first move") { ruleset, position, first, strategy, budget, json };
        command.Options.Add(DbOption.Option);
        command.SetAction(parse => Failures.Guard(() =>
        {
            long ms = parse.GetValue(budget);
            if (ms <= 0) throw new InputException($"--budget-ms must be a positive number of milliseconds, got {ms}");
            var rules = Rulesets.Find(parse.GetValue(ruleset)!) ?? throw new InputException(
                $"unknown ruleset '{parse.GetValue(ruleset)}'; known: {string.Join(", ", Rulesets.All.Select(r => r.Name))}");
            var text = PositionInput.Read(parse.GetValue(position)!);
            var firsts = parse.GetValue(first) switch
            {
                "left" => new[] { Side.Left },
                "right" => new[] { Side.Right },
                _ => new[] { Side.Left, Side.Right },
            };
            var db = parse.GetValue(DbOption.Option);
            var report = BigStack.Run(() => Solve(rules, text, firsts, parse.GetValue(strategy)!, TimeSpan.FromMilliseconds(ms), db));
            Console.Out.WriteLine(parse.GetValue(json) ? ToJson(report) : ToText(report));
            return Entry.Success;
        }));
        return command;
    }

    public static SolveReport Solve(IRuleset rules, string text, IReadOnlyCollection<Side> firsts, string strategy, TimeSpan budget, FileInfo? db = null)
    {
        var pos = rules.Parse(text);
        var context = new ValueContext();
        DbOption.Load(db, context);
        IPlayer player = strategy == "alphabeta" ? new AlphaBetaPlayer(log2TableSize: 22) : new PerfectPlayer(context: context);
        var report = Solver.Solve(pos, firsts, player, budget);
        if (player is PerfectPlayer) DbOption.Save(db, context);
        return report;
    }

    public static string ToText(SolveReport r)
    {
        var w = new StringWriter();
        w.WriteLine(r.Outcome is { } o ? $"outcome      {o} ({ValueReport.Describe(o)})" : "outcome      unknown");
        foreach (var a in new[] { r.LeftFirst, r.RightFirst })
        {
            if (a is null) continue;
            string who = a.Winner is { } win ? $"{win.Word()} wins" : "unknown (out of budget)";
            string move = a.Move is { } m ? $", e.g. {m}" : "";
            w.WriteLine($"{(a.First == Side.Left ? "left first " : "right first")}  {who}{move}");
        }
        w.WriteLine($"search       {r.Strategy}, {r.Nodes} nodes, {r.ElapsedMs} ms, {(r.Exact ? "exact" : "not exact (budget spent)")}");
        return w.ToString().TrimEnd();
    }

    public static string ToJson(SolveReport r)
    {
        static JsonNode? Answer(SolveAnswer? a) => a is null ? null : new JsonObject
        {
            ["winner"] = a.Winner?.Word(),
            ["move"] = a.Move,
        };
        var o = new JsonObject
        {
            ["outcome"] = r.Outcome?.ToString(),
            ["left_first"] = Answer(r.LeftFirst),
            ["right_first"] = Answer(r.RightFirst),
            ["nodes"] = r.Nodes,
            ["elapsed_ms"] = r.ElapsedMs,
            ["strategy"] = r.Strategy,
            ["exact"] = r.Exact,
        };
        return o.ToJsonString(new JsonSerializerOptions { Encoder = System.Text.Encodings.Web.JavaScriptEncoder.UnsafeRelaxedJsonEscaping });
    }
}
