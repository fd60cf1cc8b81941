using System.CommandLine;
using System.CommandLine.Parsing;
using Serilog;
using Serilog.Events;

namespace Bramble.Cli;

/// <summary>Builds the command tree, sets up logging once, and maps failures to exit codes.</summary>
public static class Entry
{
    public const int Success = 0;
    public const int JobFailed = 1;
    public const int BadInput = 2;

    public static readonly Option<FileInfo?> LogOption = new("--log") { Description = "Write log events to this file", Recursive = true, HelpName = "FILE" };
    public static readonly Option<bool> VerboseOption = new("--verbose") { Description = "Log debug events too", Recursive = true };

    public static RootCommand BuildRoot()
    {
        var root = new RootCommand("Bramble: values, play and matches for sums of combinatorial games (reference: docs/)");
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
        root.Subcommands.Add(ServeVerb.Build());
        root.Subcommands.Add(ComposeVerb.Build());
        return root;
    }

    public static int Run(string[] args)
    {
        // Everything printed passes through one escaping writer per stream: text from input or
        // from an engine cannot move the cursor, ring the bell or reverse a line (docs/cli.md).
        var plainOut = Console.Out;
        var plainError = Console.Error;
        Console.SetOut(new SafeWriter(plainOut));
        Console.SetError(new SafeWriter(plainError));
        try
        {
            return RunSafely(args);
        }
        finally
        {
            Console.Out.Flush();
            Console.Error.Flush();
            Console.SetOut(plainOut);
            Console.SetError(plainError);
        }
    }

    private static int RunSafely(string[] args)
    {
        var root = BuildRoot();
        // '@path' is Bramble's own (a position file, read whole by PositionInput); the
        // library's response files would split its text into words first.
        var parse = root.Parse(args, new ParserConfiguration { ResponseFileTokenReplacer = null });
        SetUpLogging(parse.GetValue(LogOption), parse.GetValue(VerboseOption));
        try
        {
            if (args.Length == 0)
            {
                Console.Out.Write(VerbList.Text(root));
                return Success;
            }
            if (parse.Errors.Count > 0 && !IsHelpOrVersion(args))
            {
                // Bad command-line words are bad input: say what is wrong on stderr and exit 2.
                var command = parse.CommandResult.Command;
                if (command == root && args[0] is var first && !first.StartsWith('-'))
                {
                    Console.Error.WriteLine($"unknown verb '{first}'{VerbList.Suggestion(first, root.Subcommands.Select(c => c.Name))}");
                    Console.Error.Write(VerbList.Text(root));
                    return BadInput;
                }
                foreach (var error in parse.Errors) Console.Error.WriteLine(error.Message);
                foreach (var token in parse.UnmatchedTokens)
                {
                    var names = command.Options.Concat(root.Options).SelectMany(o => o.Aliases.Prepend(o.Name)).Concat(command.Subcommands.Select(c => c.Name));
                    var hint = VerbList.Suggestion(token, names);
                    if (hint.Length > 0) Console.Error.WriteLine($"'{token}'{hint}");
                }
                Console.Error.WriteLine($"see 'bramble {CommandPath(parse.CommandResult)}--help'");
                return BadInput;
            }
            if (IsHelpOrVersion(args))
            {
                // The library lists a subcommand's parents' arguments in its help too
                // ("bramble match [<spec>] merge"); the help is caught and tidied.
                var help = new StringWriter();
                int code = parse.Invoke(new InvocationConfiguration { Output = help });
                Console.Out.Write(SubcommandHelp.Tidy(parse.CommandResult.Command, help.ToString()));
                return code;
            }
            return parse.Invoke();
        }
        finally
        {
            Log.CloseAndFlush();
        }
    }

    /// <summary>"value " for bramble value, "match merge " for bramble match merge, "" for the root.</summary>
    private static string CommandPath(CommandResult result)
    {
        var names = new List<string>();
        for (SymbolResult? r = result; r is CommandResult c && c.Parent is not null; r = c.Parent) names.Add(c.Command.Name);
        names.Reverse();
        return names.Count == 0 ? "" : string.Join(" ", names) + " ";
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
