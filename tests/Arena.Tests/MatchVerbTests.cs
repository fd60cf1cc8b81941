using System.Diagnostics;
using System.Text.Json;
using Bramble.Arena.Journal;

namespace Bramble.Arena.Tests;

/// <summary>
/// <c>bramble match</c> as a user runs it: the real program, real <c>bramble engine</c> players and
/// the real Hackenbush ruleset, on a tiny match.
/// </summary>
public class MatchVerbTests
{
    private static readonly string s_bramble = Path.Combine(AppContext.BaseDirectory, OperatingSystem.IsWindows() ? "bramble.exe" : "bramble");

    private static (int Code, string Out, string Err) Run(string workingDirectory, params string[] args)
    {
        var info = new ProcessStartInfo(s_bramble) { RedirectStandardOutput = true, RedirectStandardError = true, UseShellExecute = false, WorkingDirectory = workingDirectory };
        foreach (var arg in args) info.ArgumentList.Add(arg);
        // "bramble" must mean this very program, not one that happens to be installed.
        info.Environment["PATH"] = "/usr/bin:/bin";
        using var process = Process.Start(info)!;
        var output = process.StandardOutput.ReadToEndAsync();
        var error = process.StandardError.ReadToEndAsync();
        Assert.True(process.WaitForExit(120_000), "bramble match did not finish");
        return (process.ExitCode, output.Result, error.Result);
    }

    [Fact]
    public void ABadSpecListsEveryProblemAndExitsTwo()
    {
        using var folder = new TempFolder();
        var spec = folder.Write("bad.json", """{ "ruleset": "hackenbush", "positions": { "file": "none.txt" }, "players": [ { "id": "a", "run": "bramble engine" } ], "seats": "three" }""");
        var (code, _, error) = Run(folder.Path, "match", spec);
        // docs/matches.md and docs/cli.md: every error at once with its JSON path; exit 2 for bad input.
        Assert.Equal(2, code);
        Assert.Contains("$.positions.file", error);
        Assert.Contains("$.players[0].run", error);
        Assert.Contains("$.players: a match needs at least two players", error);
        Assert.Contains("$.seats", error);
        Assert.Equal(2, Run(folder.Path, "match", spec, "--shard", "9/4").Code);
    }

    [Fact]
    public void ATinyHackenbushMatchRunsAndMergesToTheSameStandings()
    {
        using var folder = new TempFolder();
        folder.Write("suites/hedge.txt", "# two hedges\nBRB + G(B,R)\n[B0-1,R1-2,G2-0] + RB\n");
        var spec = folder.Spec(new
        {
            title = "Hedge trial",
            ruleset = "hackenbush",
            positions = new { file = "suites/hedge.txt" },
            players = new[]
            {
                new { id = "pruner", run = new[] { "bramble", "engine", "--strategy", "perfect" } },
                new { id = "windfall", run = new[] { "bramble", "engine", "--strategy", "random", "--seed", "3" } },
            },
            seats = "all-four",
            clock = new { base_ms = 20000, inc_ms = 100 },
            parallel = 2,
            journal = "results/hedge.jsonl",
        });
        var (code, output, error) = Run(folder.Path, "match", spec, "--json");
        Assert.True(code == 0, error);
        using var standings = JsonDocument.Parse(output);
        Assert.Equal(8, standings.RootElement.GetProperty("games").GetInt32());
        var journal = Path.Combine(folder.Path, "results", "hedge.jsonl");
        var records = JournalFile.Read(journal).Records;
        Assert.Equal(Enumerable.Range(1, 8), records.Select(r => r.Game).Order());
        Assert.All(records, r => Assert.NotNull(r.Theory));
        // Each blunder is charged to the player who made that ply (plies alternate from the first mover).
        Assert.All(records, r => Assert.All(r.Blunders, b => Assert.Equal(r.PlayerOf(r.Moves[b.Ply - 1].Side), b.By)));

        var (mergeCode, merged, _) = Run(folder.Path, "match", "merge", journal, "--json");
        Assert.Equal(0, mergeCode);
        using var again = JsonDocument.Parse(merged);
        Assert.Equal(
            standings.RootElement.GetProperty("players").EnumerateArray().Select(p => (p.GetProperty("id").GetString(), p.GetProperty("wins").GetInt32(), p.GetProperty("elo").ToString())),
            again.RootElement.GetProperty("players").EnumerateArray().Select(p => (p.GetProperty("id").GetString(), p.GetProperty("wins").GetInt32(), p.GetProperty("elo").ToString())));

        // Running again without --resume would mix two matches in one journal: refused.
        Assert.Equal(2, Run(folder.Path, "match", spec).Code);
        var (resumeCode, table, _) = Run(folder.Path, "match", spec, "--resume");
        Assert.Equal(0, resumeCode);
        Assert.Contains("Hedge trial: 8 games", table);
    }

    [Fact]
    public void ATinyMatchRunsInEachNewRuleset()
    {
        using var folder = new TempFolder();
        folder.Write("suites/stones.txt", "# two clobber beds\nxoxo/oxox\nxxo/o.x/oxo\n");
        folder.Write("suites/jumps.txt", "# two konane beds\nxo.o./..x../o.xo.\nx.xo/oxo./.o.x\n");
        folder.Write("suites/pond.txt", "# two strips\nTT.F.TF.F\nT.TF.F#TF..F\n");
        folder.Write("suites/tea.txt", "# two cakes\n4x9 + 3x3\n5x7\n");
        var spec = folder.Spec(new
        {
            title = "Allotment trial",
            positions = new object[]
            {
                new { file = "suites/stones.txt", ruleset = "clobber" },
                new { file = "suites/jumps.txt", ruleset = "konane" },
                new { file = "suites/pond.txt", ruleset = "toads-and-frogs" },
                new { file = "suites/tea.txt", ruleset = "cutcake" },
            },
            players = new[]
            {
                new { id = "digger", run = new[] { "bramble", "engine", "--strategy", "perfect", "--nodes", "20000" } },
                new { id = "scatter", run = new[] { "bramble", "engine", "--strategy", "random", "--seed", "5" } },
            },
            seats = "swap",
            clock = new { base_ms = 20000, inc_ms = 100 },
            parallel = 2,
            journal = "results/allotment.jsonl",
        });
        var (code, output, error) = Run(folder.Path, "match", spec, "--json");
        Assert.True(code == 0, error);
        using var standings = JsonDocument.Parse(output);
        // Derived from the definitions: one pair × 8 positions × 2 seatings.
        Assert.Equal(16, standings.RootElement.GetProperty("games").GetInt32());
        var records = JournalFile.Read(Path.Combine(folder.Path, "results", "allotment.jsonl")).Records;
        Assert.Equal(["clobber", "cutcake", "konane", "toads-and-frogs"], records.Select(r => r.Ruleset).Distinct().Order(StringComparer.Ordinal));
        Assert.All(records, r => Assert.NotNull(r.Theory));
    }

    [Fact]
    public void MergeRefusesConflictingJournals()
    {
        using var folder = new TempFolder();
        var a = folder.Write("a.jsonl", JournalFormat.Write(JournalTests.Record(1, winner: Values.Side.Left)) + "\n");
        var b = folder.Write("b.jsonl", JournalFormat.Write(JournalTests.Record(1, winner: Values.Side.Right)) + "\n");
        var (code, _, error) = Run(folder.Path, "match", "merge", a, b);
        Assert.Equal(2, code);
        Assert.Contains("two results", error);
    }
}
