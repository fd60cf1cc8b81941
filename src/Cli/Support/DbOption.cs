using System.CommandLine;
using Bramble.Rules;
using Bramble.Rules.Database;

namespace Bramble.Cli;

/// <summary>
/// The shared <c>--db FILE</c> option: a component-value database read into the value memo before
/// the job and, for jobs that compute values, written back after it with what was learnt. A file
/// that is not a database is refused and never overwritten. A missing FILE is where the user asked
/// for a database, so the first save creates it (in an existing folder only: folders are never
/// made) and says so. A folder, an unreadable or an unwritable file is reported on stderr and the
/// job goes on without the database: its answer is still printed (docs/database.md).
/// </summary>
public static class DbOption
{
    public static readonly Option<FileInfo?> Option = new("--db") { Description = "Component-value database file to read, and to extend (created if missing; docs/database.md)", HelpName = "FILE" };

    /// <summary>Reads the database into the memo; false (after a warning on stderr) when it could not be read.</summary>
    public static bool Load(FileInfo? file, ValueContext context)
    {
        if (file is null) return true;
        if (Directory.Exists(file.FullName))
        {
            Warn($"'{file.FullName}' is a folder, not a database file; going on without a database");
            return false;
        }
        try
        {
            ComponentDatabase.Load(file.FullName, context);
            return true;
        }
        catch (DatabaseFormatException e)
        {
            throw new InputException($"--db: {e.Message}");
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            Warn($"cannot read '{file.FullName}' ({e.Message}); going on without a database");
            return false;
        }
    }

    /// <summary>Writes what was learnt back; false (after a warning on stderr) when it could not be written.</summary>
    public static bool Save(FileInfo? file, ValueContext context)
    {
        if (file is null) return true;
        if (Directory.Exists(file.FullName)) return false; // said when it was loaded
        bool created = !File.Exists(file.FullName);
        if (created && !Directory.Exists(Path.GetDirectoryName(file.FullName)))
        {
            Warn($"the folder of '{file.FullName}' does not exist; no database was written (folders are not created)");
            return false;
        }
        try
        {
            ComponentDatabase.Save(file.FullName, context, "component values saved by bramble");
        }
        catch (DatabaseFormatException e)
        {
            throw new InputException($"--db: {e.Message}");
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            Warn($"cannot write '{file.FullName}' ({e.Message}); the values learnt were not saved");
            return false;
        }
        if (created) Console.Error.WriteLine($"--db: created the database '{file.FullName}'");
        return true;
    }

    private static void Warn(string text) => Console.Error.WriteLine($"--db: {text}");
}
