using System.CommandLine;
using System.Runtime.InteropServices;
using Bramble.Arena;
using Bramble.Arena.Journal;
using Bramble.Arena.Schedule;
using Bramble.Arena.Spec;
using Bramble.Arena.Standings;
using Bramble.Cli.Report;
using Bramble.Rules;
using Serilog;

namespace Bramble.Cli;

/// <summary>
/// <c>bramble match [&lt;spec.json&gt;] [--resume] [--shard K/N] [--parallel N] [--json]</c> and
/// <c>bramble match merge &lt;journal&gt;… [--json] [--out FILE]</c>. Without a spec it runs the
/// built-in demo, matches/demo.json, starting afresh each time unless --resume is given.
/// </summary>
public static class MatchVerb
{
    private const string DemoSpec = "matches/demo.json";

    public static Command Build()
    {
        var spec = new Argument<string?>("spec.json") { Description = "Match specification (JSON); none: the built-in demo", Arity = ArgumentArity.ZeroOrOne };
        var resume = new Option<bool>("--resume") { Description = "Continue the journal, skipping the games it holds" };
        var shard = new Option<string?>("--shard") { Description = "K/N: play only the games whose id ≡ K (mod N), into a journal of their own (e.g. 0/4)", HelpName = "K/N" };
        var parallel = new Option<int?>("--parallel") { Description = "Games at once (default: the spec's, else the number of cores)", HelpName = "N" };
        var json = new Option<bool>("--json") { Description = "Print the standings as JSON" };
        var createFolders = new Option<bool>("--create-folders") { Description = "Let the match make its journal's folder even outside the match file's folder" };
        var command = new Command("match", "Play a tournament between engines and print the standings (a match file runs the programs it names)")
        {
            spec, resume, shard, parallel, json, createFolders,
        };
        command.Options.Add(DbOption.Option);
        command.Subcommands.Add(BuildMerge());
        command.Subcommands.Add(BuildReport());
        command.SetAction(parse => Run(parse.GetValue(spec), parse.GetValue(resume), parse.GetValue(shard), parse.GetValue(parallel), parse.GetValue(json),
            parse.GetValue(createFolders), parse.GetValue(DbOption.Option)));
        return command;
    }

    private static Command BuildMerge()
    {
        var journals = new Argument<string[]>("journal") { Description = "Journals to merge (e.g. the shards of one match)", Arity = ArgumentArity.OneOrMore };
        var json = new Option<bool>("--json") { Description = "Print the standings as JSON" };
        var output = new Option<string?>("--out") { Description = "Also write the merged journal to this file", HelpName = "FILE" };
        var command = new Command("merge", "Merge shard journals and print the standings") { journals, json, output };
        command.SetAction(parse => Merge(parse.GetValue(journals) ?? [], parse.GetValue(json), parse.GetValue(output)));
        return command;
    }

    private static int Run(string? specPath, bool resume, string? shardText, int? parallel, bool json, bool createFolders, FileInfo? db)
    {
        var demo = specPath is null;
        if (demo)
        {
            specPath = FindDemo();
            if (specPath is null)
            {
                Console.Error.WriteLine($"match: the built-in demo {DemoSpec} was not found (run from the repository, or give a spec file)");
                return Entry.JobFailed;
            }
        }
        var shard = Shard.Whole;
        if (shardText is not null && !Shard.TryParse(shardText, out shard, out var problem))
        {
            Console.Error.WriteLine($"match: --shard {problem}");
            return Entry.BadInput;
        }
        if (parallel is < 1)
        {
            Console.Error.WriteLine($"match: --parallel {parallel}: need at least 1");
            return Entry.BadInput;
        }

        MatchSpec spec;
        try
        {
            spec = new MatchSpecLoader(RulesetFinders.Registry).Load(specPath!);
            // The demo that travels with an installed program writes its journal where the user
            // is, not into the program's folder.
            if (demo && !FoundFromWorkingFolder(specPath!))
                spec = spec with { JournalPath = Path.GetFullPath(Path.Combine("results", "demo.jsonl")) };
        }
        catch (MatchSpecException e)
        {
            Console.Error.WriteLine(e.Message);
            return Entry.BadInput;
        }

        if (db is not null)
        {
            // Checked before any engine starts, so a bad file is a bad-input exit rather than a broken match.
            try
            {
                DbOption.Load(db, new ValueContext());
            }
            catch (InputException e)
            {
                Console.Error.WriteLine($"match: {e.Message}");
                return Entry.BadInput;
            }
            catch (Exception e) when (e is IOException or UnauthorizedAccessException)
            {
                Console.Error.WriteLine($"match: --db {db}: {e.Message}");
                return Entry.BadInput;
            }
        }

        using var cancel = new CancellationTokenSource();
        ConsoleCancelEventHandler onCancel = (_, e) =>
        {
            // The first Ctrl-C stops the match cleanly (engines killed, journal intact); a second one is not intercepted.
            if (cancel.IsCancellationRequested) return;
            e.Cancel = true;
            Console.Error.WriteLine("\nmatch: interrupted; stopping engines");
            cancel.Cancel();
        };
        Console.CancelKeyPress += onCancel;
        // A cluster scheduler ends a job with SIGTERM (time limit, scancel): treat it like Ctrl-C.
        using var term = PosixSignalRegistration.Create(PosixSignal.SIGTERM, context =>
        {
            context.Cancel = true;
            cancel.Cancel();
        });
        var progress = new ProgressLine(Console.Error, !Console.IsErrorRedirected);
        var options = new MatchOptions
        {
            Resume = resume,
            Fresh = demo && !resume,
            Shard = shard,
            Parallel = parallel,
            // The built-in demo writes to results/ in the working folder (outside the installed
            // program's matches/), a place this program chose and documents, so it may make it.
            CreateFolders = createFolders || demo,
            Database = db?.FullName,
            Progress = progress,
            Log = Log.Logger,
        };
        try
        {
            Console.Error.WriteLine($"match: {spec.Title}: {spec.Players.Count} players, {spec.Positions.Count} positions{(shard.IsWhole ? "" : $", shard {shard}")}");
            var report = new MatchRunner(spec, options).RunAsync(cancel.Token).GetAwaiter().GetResult();
            progress.Finish();
            foreach (var note in report.Notes) Console.Error.WriteLine($"match: {note}");
            var title = shard.IsWhole ? spec.Title : $"{spec.Title} (shard {shard})";
            Console.Out.Write(json ? StandingsJson.Write(report.Standings, title, report.Notes) + "\n" : StandingsText.Table(report.Standings, title));
            Console.Error.WriteLine($"match: journal {report.JournalPath}");
            if (report.Stop == MatchStop.Cancelled)
            {
                Console.Error.WriteLine($"match: stopped with {report.Records.Count} of {report.Total} games recorded; --resume continues");
                return Entry.JobFailed;
            }
            return Entry.Success;
        }
        catch (MatchInputException e)
        {
            progress.Finish();
            Console.Error.WriteLine($"match: {e.Message}");
            return Entry.BadInput;
        }
        catch (MatchJobException e)
        {
            progress.Finish();
            Console.Error.WriteLine($"match: {e.Message}");
            return Entry.JobFailed;
        }
        finally
        {
            Console.CancelKeyPress -= onCancel;
        }
    }

    private static Command BuildReport()
    {
        var journals = new Argument<string[]>("journal") { Description = "Journals of one match (e.g. its shards)", Arity = ArgumentArity.OneOrMore };
        var output = new Option<string>("--out") { Description = "The HTML file to write", Required = true, HelpName = "FILE" };
        var specFile = new Option<string?>("--spec") { Description = "The match file: its title, player order and SPRT (the journal does not carry them)", HelpName = "FILE" };
        var board = new Option<string?>("--board") { Description = $"The browser board's address, for the links that replay each game there (default {Bramble.Web.ReplayLink.DefaultBoard}: bramble serve on this computer)", HelpName = "URL" };
        var command = new Command("report", "Write one self-contained HTML page about a match: standings, ratings, crosstable, SPRT, positions, blunders, games")
        {
            journals, output, specFile, board,
        };
        command.SetAction(parse => WriteReport(parse.GetValue(journals) ?? [], parse.GetValue(output)!, parse.GetValue(specFile), parse.GetValue(board)));
        return command;
    }

    private static int WriteReport(string[] journals, string output, string? specPath, string? board)
    {
        if (board is not null && !(Uri.TryCreate(board, UriKind.Absolute, out var address) && (address.Scheme == Uri.UriSchemeHttp || address.Scheme == Uri.UriSchemeHttps)))
        {
            Console.Error.WriteLine($"match report: --board {board}: give the board's address as http://HOST:PORT/");
            return Entry.BadInput;
        }
        if (ReadAndMerge(journals, "match report") is not var (records, _)) return Entry.BadInput;
        MatchSpec? spec = null;
        if (specPath is not null)
        {
            try
            {
                spec = new MatchSpecLoader(RulesetFinders.Registry).Load(specPath);
            }
            catch (MatchSpecException e)
            {
                Console.Error.WriteLine(e.Message);
                return Entry.BadInput;
            }
        }
        var title = spec?.Title ?? $"Match report: {string.Join(", ", journals.Select(Path.GetFileName))}";
        var page = ReportPage.Render(title, records, spec?.Sprt, spec?.Players.Select(p => p.Id).ToList(), board);
        try
        {
            File.WriteAllText(output, page);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            Console.Error.WriteLine($"match report: cannot write {output}: {e.Message}");
            return Entry.JobFailed;
        }
        Console.Error.WriteLine($"match report: {records.Count} games, written to {output}");
        return Entry.Success;
    }

    /// <summary>The games of the journals, merged by id; null (after saying why) when a journal is missing, damaged or contradicts another.</summary>
    private static (IReadOnlyList<GameRecord> Records, IReadOnlyList<string> Notices)? ReadAndMerge(string[] journals, string verb)
    {
        var read = new List<(string, JournalContents)>();
        foreach (var path in journals)
        {
            if (!File.Exists(path))
            {
                Console.Error.WriteLine($"{verb}: no such journal: {path}");
                return null;
            }
            JournalContents contents;
            try
            {
                contents = JournalFile.Read(path);
            }
            catch (JournalFormatException e)
            {
                Console.Error.WriteLine($"{verb}: {e.Message}");
                return null;
            }
            catch (Exception e) when (e is IOException or UnauthorizedAccessException)
            {
                Console.Error.WriteLine($"{verb}: cannot read {path}: {e.Message}");
                return null;
            }
            // Text with no game record in it at all (its one line unreadable) is some other file, not a journal cut short.
            if (contents.Records.Count == 0 && contents.Notice is not null)
            {
                Console.Error.WriteLine($"{verb}: {path} is not a journal: it holds no game record");
                return null;
            }
            read.Add((path, contents));
        }
        var merged = JournalMerge.Merge(read);
        foreach (var note in merged.Notices) Console.Error.WriteLine($"{verb}: {note}");
        if (merged.Conflicts.Count > 0)
        {
            foreach (var conflict in merged.Conflicts) Console.Error.WriteLine($"{verb}: {conflict}");
            Console.Error.WriteLine($"{verb}: {merged.Conflicts.Count} game{(merged.Conflicts.Count == 1 ? " was" : "s were")} recorded with different results; no standings");
            return null;
        }
        return (merged.Records, merged.Notices);
    }

    private static int Merge(string[] journals, bool json, string? output)
    {
        if (ReadAndMerge(journals, "match merge") is not var (records, notices)) return Entry.BadInput;
        if (output is not null)
        {
            try
            {
                File.WriteAllLines(output, records.Select(JournalFormat.Write));
            }
            catch (Exception e) when (e is IOException or UnauthorizedAccessException)
            {
                Console.Error.WriteLine($"match merge: cannot write {output}: {e.Message}");
                return Entry.JobFailed;
            }
        }
        var standings = MatchStandings.Compute(records);
        var title = $"merge of {journals.Length} journal{(journals.Length == 1 ? "" : "s")}";
        Console.Out.Write(json ? StandingsJson.Write(standings, title, notices) + "\n" : StandingsText.Table(standings, title));
        return Entry.Success;
    }

    /// <summary>True when the demo file sits in matches/ of the working folder or of one above it (a checkout).</summary>
    private static bool FoundFromWorkingFolder(string demoPath)
    {
        var root = Path.GetDirectoryName(Path.GetDirectoryName(Path.GetFullPath(demoPath)))!;
        var here = Path.GetFullPath(Directory.GetCurrentDirectory());
        return here == root || here.StartsWith(root.TrimEnd(Path.DirectorySeparatorChar) + Path.DirectorySeparatorChar, StringComparison.Ordinal);
    }

    /// <summary>matches/demo.json from the working folder upward, then from the program's folder upward (a fresh checkout).</summary>
    private static string? FindDemo()
    {
        foreach (var start in new[] { Directory.GetCurrentDirectory(), AppContext.BaseDirectory })
        {
            for (var folder = new DirectoryInfo(start); folder is not null; folder = folder.Parent)
            {
                var candidate = Path.Combine(folder.FullName, DemoSpec);
                if (File.Exists(candidate)) return candidate;
            }
        }
        return null;
    }

    /// <summary>
    /// The running match's one-line status on stderr: games done/total, games per minute, time left
    /// and the current leader. On a terminal the line is rewritten in place; into a file or a pipe
    /// (a cluster job's log) it is written as a new line at most every few seconds and at the end.
    /// </summary>
    private sealed class ProgressLine(TextWriter error, bool inPlace) : IProgress<MatchProgress>
    {
        private static readonly TimeSpan s_logEvery = TimeSpan.FromSeconds(10);
        private readonly Lock _gate = new();
        private DateTime _lastWritten = DateTime.MinValue;
        private MatchProgress? _last;
        private int _width;
        private bool _pending;

        public void Report(MatchProgress value)
        {
            lock (_gate)
            {
                _last = value;
                if (inPlace) Write();
                else if (DateTime.UtcNow - _lastWritten >= s_logEvery || value.Done == value.Total) Write();
                else _pending = true;
            }
        }

        /// <summary>Ends the status line so the table starts on a line of its own.</summary>
        public void Finish()
        {
            lock (_gate)
            {
                if (_last is null) return;
                if (!inPlace && _pending) Write();
                if (inPlace) error.WriteLine();
                _last = null;
            }
        }

        private void Write()
        {
            var line = Format(_last!);
            if (inPlace)
            {
                SafeWriter.CarriageReturn(error);
                error.Write(line.PadRight(_width));
                _width = Math.Max(_width, line.Length);
            }
            else error.WriteLine(line);
            error.Flush();
            _lastWritten = DateTime.UtcNow;
            _pending = false;
        }

        public static string Format(MatchProgress p)
        {
            var left = p.TimeLeft is { } t ? (t.TotalHours >= 1 ? $"{(int)t.TotalHours}h{t.Minutes:00}m left" : $"{t.Minutes}m{t.Seconds:00}s left") : "time left: estimating";
            var leader = p.Leader is { } l ? $"{l.Id} {100 * l.Score:0}%" : "-";
            return $"games {p.Done}/{p.Total} · {p.GamesPerMinute:0.0}/min · {left} · leader {leader}";
        }
    }
}
