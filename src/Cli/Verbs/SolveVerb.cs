using System.CommandLine;
using System.Runtime.InteropServices;
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
        var ruleset = new Argument<string>("ruleset") { Description = "the ruleset: " + RulesetNames.Listed };
        var position = new Argument<string>("position") { Description = "position text, @file, or - for stdin" };
        var first = new Option<string>("--first") { Description = "Who moves first: left, right or both", DefaultValueFactory = _ => "both" };
        first.AcceptOnlyFromAmong("left", "right", "both");
        var strategy = new Option<string>("--strategy") { Description = "perfect (decomposition search) or alphabeta (whole-board search)", DefaultValueFactory = _ => "perfect" };
        strategy.AcceptOnlyFromAmong("perfect", "alphabeta");
        var budget = new Option<long>("--budget-ms") { Description = "Time budget of each first player's search, in milliseconds", DefaultValueFactory = _ => DefaultBudgetMs, HelpName = "N" };
        var json = new Option<bool>("--json") { Description = "Print JSON (fields in docs/cli.md)" };
        var threads = new Option<int>("--threads") { Description = "Threads of the whole-board search of big Domineering boards", DefaultValueFactory = _ => Math.Min(2, Environment.ProcessorCount), HelpName = "N" };
        var table = new Option<FileInfo?>("--table") { Description = "Whole-board table file: read before the solve when it exists, written after it (so an interrupted solve resumes)", HelpName = "FILE" };
        var progress = new Option<bool>("--progress") { Description = "Report nodes, nodes per second, the root move being searched and the line below it on stderr every two seconds" };
        var search = new Option<bool>("--search") { Description = "Search even where a published theorem gives the winner (empty Domineering rectangles)" };
        var command = new Command("solve", "Who wins with each side moving first, and a winning first move") { ruleset, position, first, strategy, budget, json, threads, table, progress, search };
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
            int n = parse.GetValue(threads);
            if (n < 1 || n > 64) throw new InputException($"--threads must be between 1 and 64, got {n}");
            var extra = new SolveExtras(n, parse.GetValue(table), parse.GetValue(progress), parse.GetValue(search));
            var report = BigStack.Run(() => Solve(rules, text, firsts, parse.GetValue(strategy)!, TimeSpan.FromMilliseconds(ms), db, extra));
            Console.Out.WriteLine(parse.GetValue(json) ? ToJson(report) : ToText(report));
            return Entry.Success;
        }));
        return command;
    }

    /// <summary>
    /// The whole-board options of <c>solve</c>: threads, a table file to resume from, progress on
    /// stderr, and whether to search where a published theorem already gives the winner.
    /// </summary>
    public sealed record SolveExtras(int Threads = 1, FileInfo? Table = null, bool Progress = false, bool Search = false);

    public static SolveReport Solve(IRuleset rules, string text, IReadOnlyCollection<Side> firsts, string strategy, TimeSpan budget, FileInfo? db = null, SolveExtras? extras = null)
    {
        extras ??= new SolveExtras();
        var pos = rules.Parse(text);
        var context = new ValueContext();
        DbOption.Load(db, context);
        if (strategy == "alphabeta") return Solver.Solve(pos, firsts, new AlphaBetaPlayer(log2TableSize: 22), budget);
        var settings = new PerfectSettings { ProofOnly = true, BoardOptions = new Bramble.Search.Board.BoardSearchOptions { Threads = extras.Threads } };
        var player = new PerfectPlayer(settings, context);
        if (extras.Table is { Exists: true } file)
        {
            try
            {
                using var input = file.OpenRead();
                player.WholeBoard.LoadTable(input);
            }
            catch (Exception e) when (e is InvalidDataException or EndOfStreamException or IOException)
            {
                throw new InputException($"--table {file.Name}: {e.Message}");
            }
        }
        // Ctrl-C stops the search cleanly, so that the table is still written for a later resume;
        // so does SIGTERM, which is how `timeout`, a scheduler or a service manager ends a long solve.
        using var halt = new CancellationTokenSource();
        ConsoleCancelEventHandler onCancel = (_, e) => { e.Cancel = true; halt.Cancel(); };
        Console.CancelKeyPress += onCancel;
        using var term = PosixSignalRegistration.Create(PosixSignal.SIGTERM, context =>
        {
            context.Cancel = true;
            halt.Cancel();
        });
        using var timer = extras.Progress ? new Timer(_ => Report(player.WholeBoard.Current), null, 2000, 2000) : null;
        try
        {
            var report = extras.Search ? Solver.Solve(pos, firsts, player, budget, halt.Token) : TheoremsFirst.Solve(pos, firsts, player, budget, halt.Token);
            DbOption.Save(db, context);
            return report;
        }
        finally
        {
            Console.CancelKeyPress -= onCancel;
            if (extras.Table is { } output && player.WholeBoard.Table is not null)
            {
                using var stream = output.Create();
                player.WholeBoard.SaveTable(stream);
            }
        }
    }

    private static void Report(Bramble.Search.Board.BoardProgress? p)
    {
        if (p is not { } x) return;
        double rate = x.ElapsedMs > 0 ? x.Nodes * 1000.0 / x.ElapsedMs : 0;
        string below = x.Below is { Count: > 0 } line
            ? "; below it " + string.Join(", ", line.Select(m => $"{Bramble.Rules.Domineering.CellName.Format(m.Move.A)} ({m.Place} of {m.Open})"))
            : "";
        Console.Error.WriteLine($"solve: {x.Nodes:N0} nodes, {rate:N0} nodes/s, {x.ElapsedMs / 1000.0:F0} s, root move {Bramble.Rules.Domineering.CellName.Format(x.RootMove.A)} ({x.RootMoveIndex + 1} of {x.RootMoves}){below}");
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
            if (a.Line is { Count: > 1 } line) w.WriteLine($"             line {string.Join(" ", line)}");
            if (a.Theorem is { } t) w.WriteLine($"             by theorem: {t.Name}, {t.Source}");
        }
        if (new[] { r.LeftFirst, r.RightFirst }.All(a => a is null || a.Theorem is not null)) w.WriteLine("search       none: published theorems give the winners (--search to search anyway)");
        else w.WriteLine($"search       {r.Strategy}, {r.Nodes} nodes, {r.ElapsedMs} ms, {(r.Exact ? "exact" : "not exact (budget spent)")}");
        return w.ToString().TrimEnd();
    }

    public static string ToJson(SolveReport r)
    {
        static JsonNode? Answer(SolveAnswer? a) => a is null ? null : new JsonObject
        {
            ["winner"] = a.Winner?.Word(),
            ["move"] = a.Move,
            ["line"] = a.Line is { } line ? new JsonArray(line.Select(m => (JsonNode?)JsonValue.Create(m)).ToArray()) : null,
            ["nodes"] = a.Nodes,
            ["elapsed_ms"] = a.ElapsedMs,
            ["by"] = a.Theorem is null ? "search" : "theorem",
            ["theorem"] = a.Theorem is { } t ? new JsonObject { ["name"] = t.Name, ["source"] = t.Source } : null,
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
