using System.CommandLine;
using Serilog;
using Serilog.Events;

namespace Bramble.Cli;

/// <summary>Builds the command tree, sets up logging once, and maps failures to exit codes.</summary>
public static class Entry
{
    public const int Success = 0;
    public const int JobFailed = 1;
    public const int BadInput = 2;

    public static readonly Option<FileInfo?> LogOption = new("--log") { Description = "Write log events to this file", Recursive = true };
    public static readonly Option<bool> VerboseOption = new("--verbose") { Description = "Log debug events too", Recursive = true };

    public static int Run(string[] args)
    {
        var root = new RootCommand("Bramble: values, play and matches for sums of combinatorial games");
        root.Options.Add(LogOption);
        root.Options.Add(VerboseOption);
        // One line per verb; each verb lives in Verbs/<Name>Verb.cs.
        root.Subcommands.Add(ValueVerb.Build());
        root.Subcommands.Add(DrawVerb.Build());
        root.Subcommands.Add(PlayVerb.Build());
        root.Subcommands.Add(BenchVerb.Build());
        root.Subcommands.Add(GenerateVerb.Build());
        root.Subcommands.Add(DbVerb.Build());
        root.Subcommands.Add(SolveVerb.Build());
        root.Subcommands.Add(MatchVerb.Build());
        root.Subcommands.Add(EngineVerb.Build());
        root.Subcommands.Add(ComposeVerb.Build());

        var parse = root.Parse(args);
        SetUpLogging(parse.GetValue(LogOption), parse.GetValue(VerboseOption));
        try
        {
            if (parse.Errors.Count > 0 && !IsHelpOrVersion(args))
            {
                // Bad command-line words are bad input: say what is wrong on stderr and exit 2.
                foreach (var error in parse.Errors) Console.Error.WriteLine(error.Message);
                Console.Error.WriteLine("see 'bramble --help' (or 'bramble <verb> --help')");
                return BadInput;
            }
            return parse.Invoke();
        }
        finally
        {
            Log.CloseAndFlush();
        }
    }

    private static bool IsHelpOrVersion(string[] args) => args.Any(a => a is "--help" or "-h" or "-?" or "--version");

    private static void SetUpLogging(FileInfo? file, bool verbose)
    {
        var config = new LoggerConfiguration().MinimumLevel.Is(verbose ? LogEventLevel.Debug : LogEventLevel.Information);
        if (file is not null)
            config = config.WriteTo.File(file.FullName, restrictedToMinimumLevel: verbose ? LogEventLevel.Debug : LogEventLevel.Information);
        // stdout belongs to the command's output (and to twine/1 in engine mode): logs go to stderr only.
        config = config.WriteTo.Console(
            restrictedToMinimumLevel: verbose ? LogEventLevel.Debug : LogEventLevel.Warning,
            standardErrorFromLevel: LogEventLevel.Verbose);
        Log.Logger = config.CreateLogger();
    }
}
