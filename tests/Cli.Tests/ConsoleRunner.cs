namespace Bramble.Cli.Tests;

/// <summary>Runs the CLI in-process with stdout and stderr captured. Tests that use it share one collection (the console is global).</summary>
public static class ConsoleRunner
{
    public static (int Exit, string Out, string Err) Run(params string[] args)
    {
        var oldOut = Console.Out;
        var oldErr = Console.Error;
        var o = new StringWriter();
        var e = new StringWriter();
        Console.SetOut(o);
        Console.SetError(e);
        try
        {
            int code = Entry.Run(args);
            return (code, o.ToString(), e.ToString());
        }
        finally
        {
            Console.SetOut(oldOut);
            Console.SetError(oldErr);
        }
    }
}

[CollectionDefinition("console", DisableParallelization = true)]
public sealed class ConsoleCollection;
