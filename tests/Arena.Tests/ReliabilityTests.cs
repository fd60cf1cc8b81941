using System.Diagnostics;
using Bramble.Arena.Engines;
using Bramble.Arena.Journal;
using Bramble.Arena.Schedule;
using Bramble.Arena.Spec;

namespace Bramble.Arena.Tests;

/// <summary>
/// The harness under hostile conditions: two runs on one journal, leaked processes, paths that
/// lead outside the match's folder, devices instead of files. Time-outs only bound the tests; no
/// duration is asserted.
/// </summary>
public class ReliabilityTests
{
    private static readonly MatchSpecLoader s_loader = new(FixtureProgram.Rulesets);

    private static object Player(string id, params string[] options) => new { id, run = FixtureProgram.Engine(options) };

    private static void Suite(TempFolder folder, params string[] positions) =>
        folder.Write("suites/garden.txt", "# garden test suite\n" + string.Join("\n", positions) + "\n");

    private static string Spec(TempFolder folder, string journal = "j.jsonl", params object[] players) => folder.Spec(new
    {
        ruleset = "heaps",
        positions = new { file = "suites/garden.txt" },
        players = players.Length > 0 ? players : new[] { Player("a"), Player("b", "--seed", "2") },
        seats = "swap",
        parallel = 1,
        journal,
    });

    private static Shard ShardOf(string text) => Shard.TryParse(text, out var shard, out var problem) ? shard : throw new ArgumentException(problem);

    private static Task<MatchReport> RunAsync(string specPath, MatchOptions? options = null, CancellationToken cancel = default) =>
        new MatchRunner(s_loader.Load(specPath), FixtureProgram.Options(options)).RunAsync(cancel);

    [Fact]
    public async Task ASecondRunOnAJournalInUseRefusesAtOnceNamingTheJournalAndTheProcess()
    {
        using var folder = new TempFolder();
        Suite(folder, "L2 + R2 + N3");
        var spec = Spec(folder);
        var journal = folder.File("j.jsonl");
        // Another process holds the journal, and another a shard's journal, as runs writing them would.
        using (var holder = Holder(journal))
        using (var shardHolder = Holder(ShardOf("1/2").JournalPath(journal)))
        {
            var refused = await Assert.ThrowsAsync<MatchJobException>(() => RunAsync(spec, new MatchOptions { Resume = true }));
            Assert.Contains(journal, refused.Message);
            Assert.Contains($"process {holder.Id}", refused.Message);
            var shardRefused = await Assert.ThrowsAsync<MatchJobException>(() => RunAsync(spec, new MatchOptions { Shard = ShardOf("1/2") }));
            Assert.Contains($"process {shardHolder.Id}", shardRefused.Message);
            Assert.False(File.Exists(journal));
            holder.StandardInput.Close();
            shardHolder.StandardInput.Close();
            Assert.True(holder.WaitForExit(30_000) && shardHolder.WaitForExit(30_000));
        }
        // Once the other run is gone the journal is free again.
        var report = await RunAsync(spec);
        Assert.Equal(2, report.Records.Count);
    }

    [Fact]
    public async Task TwoHarnessesAtOnceOnOneJournalLoseNothing()
    {
        using var folder = new TempFolder();
        Suite(folder, "L2 + R2 + N3", "N4 + N2", "L1 + R3 + N1");
        var spec = Spec(folder, "j.jsonl", Player("a", "--mode", "slow", "--delay-ms", "200"), Player("b", "--mode", "slow", "--delay-ms", "200"));
        var journal = folder.File("j.jsonl");
        using var first = Harness(spec, "--resume");
        var deadline = DateTime.UtcNow + TimeSpan.FromSeconds(60);
        while (!File.Exists(JournalLock.LockPathOf(journal)) && DateTime.UtcNow < deadline) Thread.Sleep(10);
        using var second = Harness(spec, "--resume");
        var error = second.StandardError.ReadToEndAsync();
        Assert.True(second.WaitForExit(60_000), "the second run did not stop");
        // The second run refuses (exit 1), naming the journal and the first run's process.
        Assert.Equal(1, second.ExitCode);
        var said = await error;
        Assert.Contains(journal, said);
        Assert.Contains($"process {first.Id}", said);
        Assert.True(first.WaitForExit(120_000), "the first run did not finish");
        Assert.Equal(0, first.ExitCode);
        var contents = JournalFile.Read(journal);
        Assert.Null(contents.Notice);
        Assert.Equal(Enumerable.Range(1, 6), contents.Records.Select(r => r.Game).Order());
    }

    /// <summary>A process holding the journal's lock until its input is closed.</summary>
    private static Process Holder(string journal)
    {
        var info = new ProcessStartInfo(FixtureProgram.Program) { RedirectStandardInput = true, RedirectStandardOutput = true, UseShellExecute = false };
        info.ArgumentList.Add("lock");
        info.ArgumentList.Add(journal);
        var process = Process.Start(info)!;
        Assert.Equal("locked", process.StandardOutput.ReadLine());
        return process;
    }

    private static Process Harness(string spec, params string[] flags)
    {
        var info = new ProcessStartInfo(FixtureProgram.Program) { RedirectStandardOutput = true, RedirectStandardError = true, UseShellExecute = false };
        info.ArgumentList.Add("match");
        info.ArgumentList.Add(spec);
        foreach (var flag in flags) info.ArgumentList.Add(flag);
        var process = Process.Start(info)!;
        _ = process.StandardOutput.ReadToEndAsync();
        return process;
    }

    [Fact]
    public async Task AGrandchildStartedAfterTheHandshakeDiesWithItsEngine()
    {
        if (!OperatingSystem.IsLinux()) return;
        using var folder = new TempFolder();
        var pids = folder.PidFolder();
        Suite(folder, "L2 + R2 + N3", "N4 + N2");
        var spec = Spec(folder, "j.jsonl", Player("steady", "--pid-dir", pids), Player("orphan", "--mode", "orphan", "--pid-dir", pids));
        var report = await RunAsync(spec);
        Assert.Equal(4, report.Records.Count);
        // Each of the orphan's games is its crash; the sleep it left holding its stdout was killed with its process group.
        Assert.All(report.Records.Where(r => r.LoserId == "orphan"), r => Assert.Equal(GameEnd.Crash, r.End));
        Assert.Contains(Directory.GetFiles(pids), f => File.ReadAllText(f) == "sleep");
        Assert.Empty(FixtureProgram.SurvivorsAfterWait(pids));
    }

    [Fact]
    public async Task AJournalFolderOutsideTheMatchFolderIsMadeOnlyWhenAllowed()
    {
        using var folder = new TempFolder();
        folder.Write("sub/suites/garden.txt", "L2 + R2 + N3\n");
        var spec = folder.Spec(new
        {
            ruleset = "heaps",
            positions = new { file = "suites/garden.txt" },
            players = new[] { Player("a"), Player("b", "--seed", "2") },
            seats = "swap",
            journal = "../made/j.jsonl",
        }, "sub/match.json");
        var refused = await Assert.ThrowsAsync<MatchInputException>(() => RunAsync(spec));
        Assert.Contains("--create-folders", refused.Message);
        Assert.False(Directory.Exists(folder.File("made")));
        var report = await RunAsync(spec, new MatchOptions { CreateFolders = true });
        Assert.Equal(2, report.Records.Count);
        Assert.True(File.Exists(folder.File("made/j.jsonl")));
    }

    [Fact]
    public async Task AJournalBelowAFileGetsAClearMessage()
    {
        using var folder = new TempFolder();
        Suite(folder, "L2 + R2 + N3");
        folder.Write("notes.txt", "pruning notes\n");
        var spec = Spec(folder, "notes.txt/j.jsonl");
        var refused = await Assert.ThrowsAsync<MatchInputException>(() => RunAsync(spec));
        Assert.Contains("is a file, not a folder", refused.Message);
    }

    [Fact]
    public async Task ADeviceAsJournalOrSuiteIsRefusedWithAMessage()
    {
        if (!File.Exists("/dev/zero") || !File.Exists("/dev/full")) return;
        using var folder = new TempFolder();
        // /dev/zero never ends: read up to the suite limit, then refused (before: read until memory ran out).
        var zero = folder.Spec(new { ruleset = "heaps", positions = new { file = "/dev/zero" }, players = new[] { Player("a"), Player("b") }, journal = "j.jsonl" });
        var problem = Assert.Throws<MatchSpecException>(() => s_loader.Load(zero));
        Assert.Contains("/dev/zero", problem.Message);
        Assert.Contains("longer than", problem.Message);

        Suite(folder, "L2 + R2 + N3");
        var full = Spec(folder, "/dev/full");
        var lockFile = JournalLock.LockPathOf("/dev/full");
        var existed = File.Exists(lockFile);
        try
        {
            // Read as a journal it is an endless line; either way a message, never a trace or a hang.
            var failed = await Assert.ThrowsAnyAsync<Exception>(() => RunAsync(full, new MatchOptions { Resume = true }));
            Assert.True(failed is MatchInputException or MatchJobException, failed.ToString());
            Assert.Contains("/dev/full", failed.Message);
        }
        finally
        {
            if (!existed) try { File.Delete(lockFile); } catch (Exception e) when (e is IOException or UnauthorizedAccessException) { }
        }
    }

    [Fact]
    public void AFullDiskIsAnIOExceptionAndLeavesNoHalfLineBehind()
    {
        if (!File.Exists("/dev/full")) return;
        using var writer = JournalWriter.Open("/dev/full", JournalContents.Empty);
        var record = new GameRecord { Game = 1, Pair = ["a", "b"], Left = "a", Right = "b", First = Bramble.Values.Side.Left, Ruleset = "heaps", Position = "L1", Moves = [], Winner = Bramble.Values.Side.Left, End = GameEnd.NoMove };
        // ENOSPC comes back as an IOException, which the runner turns into "cannot write the journal" (exit 1).
        Assert.ThrowsAny<IOException>(() => writer.Append(record));
    }

    [Fact]
    public async Task TheTimeLeftIsEstimatedOnlyAfterSomeGames()
    {
        using var folder = new TempFolder();
        Suite(folder, "L2 + R2 + N3", "N4 + N2", "L1 + R3 + N1", "N1 + L1");
        var seen = new List<MatchProgress>();
        var report = await RunAsync(Spec(folder), new MatchOptions { Progress = new Collect(seen), Parallel = 1 });
        Assert.Equal(8, report.Records.Count);
        // The first games pay for warming up: no estimate from them.
        Assert.Null(seen[0].TimeLeft);
        Assert.Null(seen[1].TimeLeft);
        Assert.NotNull(seen[^1].TimeLeft);
    }

    private sealed class Collect(List<MatchProgress> seen) : IProgress<MatchProgress>
    {
        public void Report(MatchProgress value)
        {
            lock (seen) seen.Add(value);
        }
    }

    [Fact]
    public void BuiltInEnginesGetTheMatchDatabaseUnlessTheyNameOne()
    {
        var self = new[] { "/opt/bramble" };
        var plain = new PlayerSpec("a", ["bramble", "engine", "--strategy", "perfect"], []);
        Assert.Equal(["/opt/bramble", "engine", "--strategy", "perfect", "--db", "/data/values.db"],
            EngineCommand.Resolve(plain, "/tmp", self, path: "", database: "/data/values.db").Argv);
        var own = new PlayerSpec("b", ["bramble", "engine", "--db", "mine.db"], []);
        Assert.Equal(["/opt/bramble", "engine", "--db", "mine.db"], EngineCommand.Resolve(own, "/tmp", self, path: "", database: "/data/values.db").Argv);
        var other = new PlayerSpec("c", ["./engines/weeder", "engine"], []);
        Assert.DoesNotContain("--db", EngineCommand.Resolve(other, "/tmp", self, path: "", database: "/data/values.db").Argv);
        Assert.DoesNotContain("--db", EngineCommand.Resolve(plain, "/tmp", self, path: "").Argv);
    }
}
