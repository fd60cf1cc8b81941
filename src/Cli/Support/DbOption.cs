using System.CommandLine;
using Bramble.Rules;
using Bramble.Rules.Database;

namespace Bramble.Cli;

/// <summary>
/// The shared <c>--db FILE</c> option: a component-value database read into the value memo before
/// the job (a missing file reads as empty) and, for jobs that compute values, written back after
/// it with what was learnt. A file that is not a database is refused and never overwritten.
/// </summary>
public static class DbOption
{
    public static readonly Option<FileInfo?> Option = new("--db") { Description = "Component-value database file to read (and extend)" };

    public static void Load(FileInfo? file, ValueContext context)
    {
        if (file is null) return;
        try
        {
            ComponentDatabase.Load(file.FullName, context);
        }
        catch (DatabaseFormatException e)
        {
            throw new InputException($"--db: {e.Message}");
        }
    }

    public static void Save(FileInfo? file, ValueContext context)
    {
        if (file is null) return;
        try
        {
            ComponentDatabase.Save(file.FullName, context, "component values saved by bramble");
        }
        catch (DatabaseFormatException e)
        {
            throw new InputException($"--db: {e.Message}");
        }
    }
}
