using System.CommandLine;
using System.Text.Json;
using System.Text.Json.Nodes;
using Bramble.Values;

namespace Bramble.Cli;

/// <summary><c>bramble bench [--quick] [--json]</c>: perfect against alphabeta on the same positions.</summary>
public static class BenchVerb
{
    public static Command Build()
    {
        var quick = new Option<bool>("--quick") { Description = "Fewer, smaller cases and a lower node cap (under a minute)" };
        var json = new Option<bool>("--json") { Description = "Print JSON instead of the table (fields in docs/cli.md)" };
        var command = new Command("bench", "Decomposition search against whole-board alpha-beta, side by side") { quick, json };
        command.SetAction(parse => Failures.Guard(() =>
        {
            bool q = parse.GetValue(quick);
            long cap = q ? 300_000 : 5_000_000;
            var perfectBudget = TimeSpan.FromSeconds(q ? 10 : 60);
            var alphaBudget = TimeSpan.FromSeconds(q ? 8 : 90);
            var results = new List<BenchResult>();
            bool table = !parse.GetValue(json);
            if (table) Console.Out.WriteLine($"{"case",-28} {"perfect ms",10} {"nodes",12} {"alphabeta ms",12} {"nodes",12} {"ratio",10}");
            foreach (var c in BenchSuite.Cases(q))
            {
                var r = BigStack.Run(() => BenchSuite.Run(c, perfectBudget, cap, alphaBudget));
                results.Add(r);
                if (table)
                {
                    string ab = r.AlphaBetaCapped ? "capped" : r.AlphaBetaNodes.ToString();
                    string ratio = (r.AlphaBetaCapped ? "≥" : "") + r.Ratio.ToString("0.#");
                    Console.Out.WriteLine($"{c.Name,-28} {r.PerfectMs,10} {r.PerfectNodes,12}{(r.PerfectExact ? " " : "~")} {r.AlphaBetaMs,11} {ab,12} {ratio,10}");
                }
                else Console.Error.WriteLine($"bench: {c.Name} done");
            }
            if (table)
            {
                Console.Out.WriteLine();
                Console.Out.WriteLine($"alphabeta node cap {cap:N0}; '~' marks a perfect answer that was not exact; ratio = alphabeta nodes / perfect nodes (a lower bound when capped).");
                Console.Out.WriteLine("positions:");
                foreach (var r in results)
                    Console.Out.WriteLine($"  {r.Case.Name,-28} {(r.Case.Position.Length > 90 ? r.Case.Position[..87] + "..." : r.Case.Position)}");
            }
            else
            {
                var cases = new JsonArray();
                foreach (var r in results)
                    cases.Add(new JsonObject
                    {
                        ["name"] = r.Case.Name,
                        ["perfect_ms"] = r.PerfectMs,
                        ["perfect_nodes"] = r.PerfectNodes,
                        ["alphabeta_ms"] = r.AlphaBetaMs,
                        ["alphabeta_nodes"] = r.AlphaBetaNodes,
                        ["alphabeta_capped"] = r.AlphaBetaCapped,
                        ["ratio"] = Math.Round(r.Ratio, 2),
                    });
                Console.Out.WriteLine(new JsonObject { ["cases"] = cases }.ToJsonString(new JsonSerializerOptions { WriteIndented = true }));
            }
            var wrong = results.Where(r => r.Disagree).ToList();
            foreach (var r in wrong) Console.Error.WriteLine($"bench: perfect and alphabeta disagree on '{r.Case.Name}': {r.Case.Position}");
            return wrong.Count == 0 ? Entry.Success : Entry.JobFailed;
        }));
        return command;
    }
}
