using System.Diagnostics;
using System.Runtime.InteropServices;
using Bramble.Arena.Journal;
using Bramble.Arena.Schedule;
using Bramble.Arena.Spec;
using Bramble.Arena.Standings;
using Bramble.Arena.Statistics;

namespace Bramble.Arena.Tests;

/// <summary>Whole matches with real engine processes (the fixture engine) on the test ruleset.</summary>
public class MatchEndToEndTests
{
    private static readonly MatchSpecLoader s_loader = new(FixtureProgram.Rulesets);

    private static object Player(string id, params string[] options) => new { id, run = FixtureProgram.Engine(options) };

    private static string Suite(TempFolder folder, params string[] positions) =>
        folder.Write("suites/garden.txt", "# garden test suite\n" + string.Join("\n", positions) + "\n");

    private static Task<MatchReport> RunAsync(string specPath, MatchOptions? options = null, CancellationToken cancel = default) =>
        new MatchRunner(s_loader.Load(specPath), FixtureProgram.Options(options)).RunAsync(cancel);

    private static void AssertSameStandings(MatchStandings expected, MatchStandings actual)
    {
        Assert.Equal(expected.Games, actual.Games);
        foreach (var player in expected.Players)
        {
            var other = actual.Players.Single(p => p.Id == player.Id);
            Assert.Equal((player.Games, player.Wins, player.Losses, player.Forfeits, player.Blunders), (other.Games, other.Wins, other.Losses, other.Forfeits, other.Blunders));
            Assert.Equal(player.Elo, other.Elo);
        }
    }

    [Fact]
    public async Task AMatchCompletesAndJournalStandingsAndMergedShardsAgree()
    {
        using var folder = new TempFolder();
        var pids = folder.PidFolder();
        Suite(folder, "L2 + R2 + N3", "N4 + N2", "L1 + R3 + N1");
        // Deterministic players (first legal move, perfect), so a game gives the same result in every run.
        var spec = folder.Spec(new
        {
            title = "Garden club",
            ruleset = "heaps",
            positions = new { file = "suites/garden.txt" },
            players = new[] { Player("hedger", "--pick", "first", "--pid-dir", pids), Player("pruner", "--pick", "perfect", "--pid-dir", pids), Player("weeder", "--pick", "first", "--pid-dir", pids) },
            seats = "all-four",
            clock = new { base_ms = 20000, inc_ms = 100 },
            parallel = 2,
            journal = "results/garden.jsonl",
        });
        var report = await RunAsync(spec);
        // Derived from the definitions: 3 pairs × 3 positions × 4 seatings.
        Assert.Equal(MatchStop.Finished, report.Stop);
        Assert.Equal(36, report.Records.Count);
        var journal = JournalFile.Read(Path.Combine(folder.Path, "results", "garden.jsonl"));
        Assert.Equal(Enumerable.Range(1, 36), journal.Records.Select(r => r.Game).Order());
        Assert.All(journal.Records, r => Assert.Equal(GameEnd.NoMove, r.End));
        Assert.All(journal.Records, r => Assert.NotNull(r.Theory));
        // The perfect player never blunders, and wins every game it can win (exact analysis in the harness agrees).
        Assert.DoesNotContain(journal.Records.SelectMany(r => r.Blunders), b => b.By == "pruner");
        Assert.All(journal.Records.Where(r => r.Pair.Contains("pruner") && r.PlayerOf(r.Theory!.Value) == "pruner"), r => Assert.Equal("pruner", r.WinnerId));
        var players = new[] { "hedger", "pruner", "weeder" };
        AssertSameStandings(report.Standings, MatchStandings.Compute(journal.Records, players));
        Assert.Empty(FixtureProgram.SurvivorsAfterWait(pids));

        var shards = new List<(string, JournalContents)>();
        for (var k = 1; k <= 3; k++)
        {
            var part = await RunAsync(spec, new MatchOptions { Shard = new Shard(k, 3) });
            Assert.All(part.Records, r => Assert.Equal(k % 3, r.Game % 3));
            shards.Add((part.JournalPath, JournalFile.Read(part.JournalPath)));
        }
        var merged = JournalMerge.Merge(shards);
        Assert.Empty(merged.Conflicts);
        AssertSameStandings(report.Standings, MatchStandings.Compute(merged.Records, players));
        // Merged with the whole match's journal too: every game agrees.
        Assert.Empty(JournalMerge.Merge(shards.Append(("whole", journal))).Conflicts);
        Assert.Empty(FixtureProgram.SurvivorsAfterWait(pids));
    }

    [Fact]
    public async Task MisbehavingEnginesForfeitAndTheMatchCompletes()
    {
        using var folder = new TempFolder();
        var pids = folder.PidFolder();
        Suite(folder, "L2 + R2 + N3");
        var cases = new (string Mode, GameEnd End, string[] Extra)[]
        {
            ("crash", GameEnd.Crash, []),
            ("hang", GameEnd.Timeout, []),
            ("slow", GameEnd.Timeout, ["--delay-ms", "10000"]),
            ("garbage", GameEnd.BadReply, []),
            ("huge", GameEnd.BadReply, []),
            ("wrong-kind", GameEnd.BadReply, []),
            ("illegal", GameEnd.BadMove, []),
            ("none", GameEnd.BadMove, []),
        };
        var players = cases.Select(c => Player(c.Mode, [.. c.Extra, "--mode", c.Mode, "--pid-dir", pids])).Prepend(Player("steady", "--pid-dir", pids)).ToArray();
        var spec = folder.Spec(new
        {
            ruleset = "heaps",
            positions = new { file = "suites/garden.txt" },
            players,
            format = "challenger",
            focus = "steady",
            seats = "swap",
            // Short enough that the stuck engines lose on time soon, long enough for the others on a busy machine.
            clock = new { base_ms = 2500, inc_ms = 0 },
            parallel = 2,
            journal = "j.jsonl",
        });
        var report = await RunAsync(spec, new MatchOptions { Timeouts = FixtureProgram.Timeouts with { Recover = TimeSpan.FromMilliseconds(500) } });
        Assert.Equal(MatchStop.Finished, report.Stop);
        Assert.Equal(cases.Length * 2, report.Records.Count);
        foreach (var (mode, end, _) in cases)
        {
            var games = report.Records.Where(r => r.Pair.Contains(mode)).ToList();
            Assert.Equal(2, games.Count);
            // Every game of the misbehaving engine ends as its forfeit of the expected kind, with the reason recorded.
            Assert.All(games, g => Assert.Equal((mode, end), (g.LoserId, g.End)));
            Assert.All(games, g => Assert.False(string.IsNullOrEmpty(g.Detail)));
            Assert.Equal(2, report.Standings.Players.Single(p => p.Id == mode).Forfeits);
        }
        Assert.Equal(16, report.Standings.Players.Single(p => p.Id == "steady").Wins);
        Assert.Empty(FixtureProgram.SurvivorsAfterWait(pids));
    }

    [Fact]
    public async Task ACrashedEngineIsRestartedForTheNextGame()
    {
        using var folder = new TempFolder();
        var pids = folder.PidFolder();
        Suite(folder, "L2 + R2 + N3", "N3 + L1");
        var spec = folder.Spec(new
        {
            ruleset = "heaps",
            positions = new { file = "suites/garden.txt" },
            players = new[] { Player("steady", "--pid-dir", pids), Player("flaky", "--mode", "crash", "--once", folder.File("crashed"), "--pid-dir", pids) },
            seats = "swap",
            parallel = 1,
            journal = "j.jsonl",
        });
        var report = await RunAsync(spec);
        Assert.Equal(4, report.Records.Count);
        var crash = Assert.Single(report.Records, r => r.End == GameEnd.Crash);
        Assert.Equal("flaky", crash.LoserId);
        Assert.All(report.Records.Where(r => r != crash), r => Assert.Equal(GameEnd.NoMove, r.End));
        // Two engines at the roll call and one restart of flaky, all gone now.
        Assert.Equal(3, Directory.GetFiles(pids).Length);
        Assert.Empty(FixtureProgram.SurvivorsAfterWait(pids));
    }

    [Fact]
    public async Task AnEngineThatCannotStartMakesTheMatchImpossible()
    {
        using var folder = new TempFolder();
        var pids = folder.PidFolder();
        Suite(folder, "L1");
        var spec = folder.Spec(new
        {
            ruleset = "heaps",
            positions = new { file = "suites/garden.txt" },
            players = new[] { Player("steady", "--pid-dir", pids), Player("ghost", "--mode", "exit-at-start", "--pid-dir", pids) },
            journal = "j.jsonl",
        });
        var e = await Assert.ThrowsAsync<MatchJobException>(() => RunAsync(spec));
        Assert.Contains("ghost", e.Message);
        var wrong = folder.Spec(new
        {
            ruleset = "heaps",
            positions = new { file = "suites/garden.txt" },
            players = new[] { Player("steady", "--pid-dir", pids), Player("stranger", "--rulesets", "domineering", "--pid-dir", pids) },
            journal = "j2.jsonl",
        }, "wrong.json");
        e = await Assert.ThrowsAsync<MatchJobException>(() => RunAsync(wrong));
        Assert.Contains("does not play heaps", e.Message);
        Assert.Empty(FixtureProgram.SurvivorsAfterWait(pids));
    }

    [Fact]
    public async Task AJournalIsNeverOverwrittenOrMixedWithAnotherMatch()
    {
        using var folder = new TempFolder();
        Suite(folder, "L1 + R1");
        var spec = folder.Spec(new
        {
            ruleset = "heaps",
            positions = new { file = "suites/garden.txt" },
            players = new[] { Player("a"), Player("b") },
            seats = "swap",
            journal = "j.jsonl",
        });
        var first = await RunAsync(spec);
        Assert.Equal(2, first.Played);
        await Assert.ThrowsAsync<MatchInputException>(() => RunAsync(spec));
        var resumed = await RunAsync(spec, new MatchOptions { Resume = true });
        Assert.Equal(0, resumed.Played);
        Assert.Equal(2, resumed.Records.Count);

        Suite(folder, "N5");
        var e = await Assert.ThrowsAsync<MatchInputException>(() => RunAsync(spec, new MatchOptions { Resume = true }));
        Assert.Contains("the spec has changed", e.Message);
    }

    [Fact]
    public async Task TheSprtStopsTheMatchOnceItDecides()
    {
        using var folder = new TempFolder();
        var spec = folder.Spec(new
        {
            ruleset = "heaps",
            positions = new { generate = "random", count = 200, size = 5, seed = 3 },
            players = new[] { Player("pruner", "--pick", "perfect"), Player("random", "--seed", "9") },
            seats = "swap",
            parallel = 2,
            sprt = new { null_elo = 0, alternative_elo = 100, alpha = 0.05, beta = 0.05 },
            analysis_ms = 0,
            journal = "j.jsonl",
        });
        var report = await RunAsync(spec);
        Assert.Equal(MatchStop.SprtDecided, report.Stop);
        Assert.True(report.Records.Count < report.Total);
        Assert.Equal(SprtDecision.Alternative, report.Standings.Sprt!.Decision);
        // The decision rests on what the journal holds: recomputing from the file gives the same.
        var again = MatchStandings.Compute(JournalFile.Read(report.JournalPath).Records, ["pruner", "random"], report.Spec.Sprt);
        Assert.Equal(report.Standings.Sprt.Llr, again.Sprt!.Llr, 12);
        Assert.Equal(0, (await RunAsync(spec, new MatchOptions { Resume = true })).Played);
    }

    [Fact]
    public async Task CancellingStopsEnginesAndKeepsTheJournalWhole()
    {
        using var folder = new TempFolder();
        var pids = folder.PidFolder();
        Suite(folder, "L2 + R2 + N3", "N4 + N4", "L3 + R3");
        var spec = folder.Spec(new
        {
            ruleset = "heaps",
            positions = new { file = "suites/garden.txt" },
            players = new[] { Player("a", "--mode", "slow", "--delay-ms", "150", "--pid-dir", pids), Player("b", "--pid-dir", pids) },
            seats = "all-four",
            parallel = 2,
            journal = "j.jsonl",
        });
        using var cancel = new CancellationTokenSource();
        var progress = new Progress(() => cancel.Cancel());
        var report = await RunAsync(spec, new MatchOptions { Progress = progress }, cancel.Token);
        Assert.Equal(MatchStop.Cancelled, report.Stop);
        Assert.InRange(report.Records.Count, 1, 11);
        Assert.Empty(FixtureProgram.SurvivorsAfterWait(pids));
        var resumed = await RunAsync(spec, new MatchOptions { Resume = true });
        Assert.Equal(MatchStop.Finished, resumed.Stop);
        Assert.Equal(Enumerable.Range(1, 12), JournalFile.Read(resumed.JournalPath).Records.Select(r => r.Game).Order());
    }

    private sealed class Progress(Action onFirst) : IProgress<MatchProgress>
    {
        private int _seen;

        public void Report(MatchProgress value)
        {
            Assert.InRange(value.Done, 1, value.Total);
            if (Interlocked.Increment(ref _seen) == 1) onFirst();
        }
    }

    [Fact]
    public async Task KillingTheHarnessHardAndResumingRecordsEveryGameExactlyOnce()
    {
        using var folder = new TempFolder();
        var pids = folder.PidFolder();
        Suite(folder, "L2 + R2 + N3", "N4 + N2", "L1 + R3 + N1", "N3 + N3 + L1");
        var spec = folder.Spec(new
        {
            ruleset = "heaps",
            positions = new { file = "suites/garden.txt" },
            // Player a thinks 30 ms a move, so the match outlasts the four kills however fast the
            // machine is (without it the 48 games could finish before the harness was killed).
            players = new[] { Player("a", "--mode", "slow", "--delay-ms", "30", "--pid-dir", pids), Player("b", "--seed", "2", "--pid-dir", pids), Player("c", "--seed", "3", "--pid-dir", pids) },
            seats = "all-four",
            parallel = 2,
            journal = "j.jsonl",
        });
        var journal = folder.File("j.jsonl");
        var random = new Random(17);
        var kills = 0;
        for (var run = 0; run < 30; run++)
        {
            using var harness = Process.Start(new ProcessStartInfo(FixtureProgram.Program)
            {
                ArgumentList = { "match", spec, "--resume" },
                RedirectStandardOutput = true,
                RedirectStandardError = true,
                UseShellExecute = false,
            })!;
            _ = harness.StandardOutput.ReadToEndAsync();
            _ = harness.StandardError.ReadToEndAsync();
            if (kills < 4)
            {
                // A random moment, after some games are recorded, possibly in the middle of a write.
                var before = Lines(journal);
                var deadline = DateTime.UtcNow + TimeSpan.FromSeconds(30);
                while (Lines(journal) <= before && !harness.HasExited && DateTime.UtcNow < deadline) Thread.Sleep(5);
                Thread.Sleep(random.Next(0, 150));
                if (!harness.HasExited)
                {
                    harness.Kill(entireProcessTree: false); // SIGKILL to the harness alone: its engines are orphaned
                    kills++;
                }
                harness.WaitForExit();
                continue;
            }
            harness.WaitForExit();
            Assert.Equal(0, harness.ExitCode);
            break;
        }
        Assert.Equal(4, kills);
        var records = JournalFile.Read(journal).Records;
        // 3 pairs × 4 positions × 4 seatings; every game exactly once.
        Assert.Equal(Enumerable.Range(1, 48), records.Select(r => r.Game).Order());
        // Orphaned engines see their input close and exit: nothing is left behind.
        Assert.Empty(FixtureProgram.SurvivorsAfterWait(pids));
    }

    [Fact]
    public async Task SigtermEndsTheHarnessCleanly()
    {
        using var folder = new TempFolder();
        var pids = folder.PidFolder();
        Suite(folder, "L2 + R2 + N3", "N4 + N2", "L1 + R3 + N1");
        var spec = folder.Spec(new
        {
            ruleset = "heaps",
            positions = new { file = "suites/garden.txt" },
            players = new[] { Player("a", "--mode", "slow", "--delay-ms", "100", "--pid-dir", pids), Player("b", "--mode", "stubborn", "--delay-ms", "100", "--pid-dir", pids) },
            seats = "all-four",
            parallel = 2,
            journal = "j.jsonl",
        });
        var journal = folder.File("j.jsonl");
        using var harness = Process.Start(new ProcessStartInfo(FixtureProgram.Program)
        {
            ArgumentList = { "match", spec },
            RedirectStandardOutput = true,
            UseShellExecute = false,
        })!;
        _ = harness.StandardOutput.ReadToEndAsync();
        var deadline = DateTime.UtcNow + TimeSpan.FromSeconds(30);
        while (Lines(journal) == 0 && !harness.HasExited && DateTime.UtcNow < deadline) Thread.Sleep(10);
        Assert.False(harness.HasExited);
        Assert.Equal(0, SendSignal(harness.Id, 15));
        Assert.True(harness.WaitForExit(20_000));
        // Interrupted: not done (exit 1), but every engine gone at once and the journal whole.
        Assert.Equal(1, harness.ExitCode);
        Assert.Empty(FixtureProgram.Survivors(pids));
        var contents = JournalFile.Read(journal);
        Assert.Null(contents.Notice);
        Assert.InRange(contents.Records.Count, 1, 11);
        await Task.CompletedTask;
    }

    [DllImport("libc", EntryPoint = "kill", SetLastError = true)]
    private static extern int SendSignal(int pid, int signal);

    private static int Lines(string path)
    {
        try
        {
            using var stream = new FileStream(path, FileMode.Open, FileAccess.Read, FileShare.ReadWrite);
            var count = 0;
            int b;
            while ((b = stream.ReadByte()) >= 0) if (b == '\n') count++;
            return count;
        }
        catch (IOException)
        {
            return 0;
        }
    }

    [Fact]
    public async Task ASeededMatchOfWorkLimitedPlayersWritesTheSameJournalAtAnyParallel()
    {
        using var folder = new TempFolder();
        Suite(folder, "L2 + R2 + N3", "N4 + N2", "L1 + R3 + N1", "N3 + N3 + L2");
        // Players that move at random: were their chance shared across the games an engine happens to
        // play, the journal would depend on how the workers interleave the games.
        var spec = folder.Spec(new
        {
            ruleset = "heaps",
            positions = new { file = "suites/garden.txt" },
            players = new[] { Player("hedger", "--pick", "random"), Player("weeder", "--pick", "random"), Player("mower", "--pick", "random") },
            seats = "all-four",
            seed = 11,
            clock = new { base_ms = 20000, inc_ms = 100 },
            journal = "results/seeded.jsonl",
        });
        var one = await RunAsync(spec, new MatchOptions { Parallel = 1 });
        var journal = Path.Combine(folder.Path, "results", "seeded.jsonl");
        var first = Comparable(journal);
        File.Delete(journal);
        var two = await RunAsync(spec, new MatchOptions { Parallel = 2 });
        Assert.Equal(48, one.Records.Count);
        Assert.Equal(48, two.Records.Count);
        // Game for game and move for move, once sorted by game id and with the timings left out.
        Assert.Equal(first, Comparable(journal));
        // The games are not all alike (the seeds per game do differ): some position is played two ways.
        Assert.True(one.Records.GroupBy(r => (r.Position, r.Left, r.Right, r.First)).Count() > 1);
        Assert.True(one.Records.Select(r => string.Join(" ", r.Moves.Select(m => m.Move))).Distinct().Count() > 12);
    }

    /// <summary>The journal's lines sorted by game id, each without its per-move times.</summary>
    private static List<string> Comparable(string journal) =>
        JournalFile.Read(journal).Records
            .OrderBy(r => r.Game)
            .Select(r => JournalFormat.Write(r with { Moves = r.Moves.Select(m => m with { Ms = 0 }).ToList() }))
            .ToList();
}
