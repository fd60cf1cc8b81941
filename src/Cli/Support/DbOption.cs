using System.CommandLine;
using Bramble.Rules;

namespace Bramble.Cli;

/// <summary>The shared <c>--db FILE</c> option: a component-value database loaded before and saved after the job.</summary>
public static class DbOption
{
    public static readonly Option<FileInfo?> Option = new("--db") { Description = "Component-value database file to read (and extend)" };

    public static void Load(FileInfo? file, ValueContext context)
    {
        if (file is null) return;
        throw new InputException("--db: the component-value database is not available in this build yet");
    }

    public static void Save(FileInfo? file, ValueContext context)
    {
    }
}
