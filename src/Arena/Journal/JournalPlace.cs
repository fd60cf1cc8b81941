namespace Bramble.Arena.Journal;

/// <summary>
/// Checks where a journal is to be written before a run touches it, and makes its folder. A match
/// file chooses its journal's path, so a file from someone else could ask for folders anywhere:
/// a missing folder is made only inside the match file's own folder, or anywhere when the user
/// said so on the command line (<c>--create-folders</c>). Where the path was spelled (relative or
/// absolute) does not matter, only where it lands. An existing folder is used wherever it is: the
/// user runs the match file, and may write wherever they can.
/// </summary>
public static class JournalPlace
{
    /// <summary>Makes the journal's folder when allowed; throws <see cref="MatchInputException"/> saying what is wrong with the path.</summary>
    public static void Prepare(string journal, string specFolder, bool createAnywhere)
    {
        var full = Path.GetFullPath(journal);
        if (Directory.Exists(full)) throw new MatchInputException($"the journal {journal} is a folder; give a file name");
        var folder = Path.GetDirectoryName(full);
        if (string.IsNullOrEmpty(folder) || Directory.Exists(folder)) return;
        // The nearest part of the path that exists: a file there means no folder can be made below it.
        for (var above = folder; !string.IsNullOrEmpty(above); above = Path.GetDirectoryName(above))
        {
            if (File.Exists(above))
                throw new MatchInputException($"the journal {journal} cannot be written: {above} is a file, not a folder");
            if (Directory.Exists(above)) break;
        }
        if (!createAnywhere && !Inside(folder, Path.GetFullPath(specFolder)))
            throw new MatchInputException($"the journal's folder {folder} does not exist and is outside the match file's folder {specFolder}: make it first, or pass --create-folders to let the match make it");
        try
        {
            Directory.CreateDirectory(folder);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            throw new MatchJobException($"cannot make the journal's folder {folder}: {e.Message}", e);
        }
    }

    private static bool Inside(string path, string folder)
    {
        var relative = Path.GetRelativePath(folder, path);
        return relative != ".." && !relative.StartsWith(".." + Path.DirectorySeparatorChar, StringComparison.Ordinal) && !Path.IsPathRooted(relative);
    }
}
