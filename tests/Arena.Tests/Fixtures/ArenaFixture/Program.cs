using System.Runtime.InteropServices;
using Bramble.Arena;
using Bramble.Arena.Fixture;
using Bramble.Arena.Schedule;
using Bramble.Arena.Spec;
using Bramble.Arena.Standings;

// ArenaFixture engine [--mode M] [--after N] [--once FILE] [--delay-ms D] [--seed S] [--pid-dir DIR] [--rulesets a,b] [--pick first]
// ArenaFixture sleeper [--pid-dir DIR]
// ArenaFixture lock JOURNAL
// ArenaFixture match SPEC [--resume] [--fresh] [--shard K/N] [--parallel N]
if (args.Length == 0) return 2;
var options = new Dictionary<string, string>();
var flags = new HashSet<string>();
string? positional = null;
for (var i = 1; i < args.Length; i++)
{
    if (!args[i].StartsWith("--")) positional ??= args[i];
    else if (args[i] is "--resume" or "--fresh") flags.Add(args[i][2..]);
    else options[args[i][2..]] = args[++i];
}

switch (args[0])
{
    case "engine":
        return new FixtureEngine(options).Run();
    case "sleeper":
        if (options.TryGetValue("pid-dir", out var folder))
            File.WriteAllText(Path.Combine(folder, Environment.ProcessId.ToString()), "sleeper");
        Thread.Sleep(Timeout.Infinite);
        return 0;
    case "match":
        return Match(positional!, options, flags);
    case "lock":
        // Holds a journal's lock, as a run writing it would, until its input ends.
        using (Bramble.Arena.Journal.JournalLock.Take(positional!))
        {
            Console.Out.WriteLine("locked");
            Console.Out.Flush();
            Console.In.ReadToEnd();
        }
        return 0;
    default:
        return 2;
}

static int Match(string specPath, Dictionary<string, string> options, HashSet<string> flags)
{
    var rulesets = RulesetFinders.With(new HeapsRuleset());
    MatchSpec spec;
    try
    {
        spec = new MatchSpecLoader(rulesets).Load(specPath);
    }
    catch (MatchSpecException e)
    {
        Console.Error.WriteLine(e.Message);
        return 2;
    }
    var shard = Shard.Whole;
    if (options.TryGetValue("shard", out var text) && !Shard.TryParse(text, out shard, out var problem))
    {
        Console.Error.WriteLine(problem);
        return 2;
    }
    using var cancel = new CancellationTokenSource();
    using var term = PosixSignalRegistration.Create(PosixSignal.SIGTERM, context =>
    {
        context.Cancel = true;
        cancel.Cancel();
    });
    var run = new MatchOptions
    {
        Resume = flags.Contains("resume"),
        Fresh = flags.Contains("fresh"),
        Shard = shard,
        Parallel = options.TryGetValue("parallel", out var p) ? int.Parse(p) : null,
        Rulesets = rulesets,
    };
    try
    {
        var report = new MatchRunner(spec, run).RunAsync(cancel.Token).GetAwaiter().GetResult();
        foreach (var note in report.Notes) Console.Error.WriteLine(note);
        Console.Out.WriteLine(StandingsJson.Write(report.Standings, spec.Title, report.Notes));
        return report.Stop == MatchStop.Cancelled ? 1 : 0;
    }
    catch (MatchInputException e)
    {
        Console.Error.WriteLine(e.Message);
        return 2;
    }
    catch (MatchJobException e)
    {
        Console.Error.WriteLine(e.Message);
        return 1;
    }
}
