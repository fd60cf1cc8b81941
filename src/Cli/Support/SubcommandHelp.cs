using System.CommandLine;

namespace Bramble.Cli;

/// <summary>
/// The help of a subcommand shows only its own arguments. The command-line library lists the
/// arguments of every parent too, and writes them into the usage line, so that
/// <c>bramble match report --help</c> would say <c>bramble match [&lt;spec&gt;] report</c> and list
/// the match file as an argument of the report, which it is not. Its help layout cannot be
/// changed from outside, so the finished text is tidied here.
/// </summary>
public static class SubcommandHelp
{
    /// <summary>The help text of <paramref name="command"/> without its parents' arguments.</summary>
    public static string Tidy(Command command, string help)
    {
        var parents = new List<Command>();
        foreach (var parent in command.Parents) if (parent is Command p) Collect(p, parents);
        var foreign = parents.SelectMany(p => p.Arguments).Where(a => !command.Arguments.Contains(a)).ToList();
        if (foreign.Count == 0) return help;

        var lines = help.Split('\n').ToList();
        for (int i = 0; i < lines.Count; i++)
        {
            if (lines[i].TrimEnd('\r') != "Usage:" || i + 1 >= lines.Count) continue;
            foreach (var a in foreign)
                foreach (var label in new[] { $" [<{a.Name}>]", $" <{a.Name}>...", $" <{a.Name}>" })
                {
                    // Only before the subcommand's own name: its own arguments may come after it.
                    int own = lines[i + 1].IndexOf(" " + command.Name, StringComparison.Ordinal);
                    int at = lines[i + 1].IndexOf(label + " ", StringComparison.Ordinal);
                    if (at >= 0 && (own < 0 || at < own)) lines[i + 1] = lines[i + 1].Remove(at, label.Length);
                }
        }
        int section = lines.FindIndex(l => l.TrimEnd('\r') == "Arguments:");
        if (section < 0) return string.Join('\n', lines);
        int row = section + 1;
        while (row < lines.Count && lines[row].Trim().Length > 0)
        {
            bool theirs = foreign.Any(a => lines[row].StartsWith($"  <{a.Name}> ", StringComparison.Ordinal) || lines[row].TrimEnd('\r') == $"  <{a.Name}>");
            if (!theirs)
            {
                row++;
                continue;
            }
            lines.RemoveAt(row);
            // A long description wraps onto lines that begin with spaces only up to its column.
            while (row < lines.Count && lines[row].StartsWith("   ", StringComparison.Ordinal) && !lines[row].TrimStart().StartsWith('<')) lines.RemoveAt(row);
        }
        if (row == section + 1)
        {
            // Nothing of its own left: the section goes with the blank line after it.
            lines.RemoveAt(section);
            if (section < lines.Count && lines[section].Trim().Length == 0) lines.RemoveAt(section);
        }
        return string.Join('\n', lines);
    }

    private static void Collect(Command command, List<Command> into)
    {
        into.Add(command);
        foreach (var parent in command.Parents) if (parent is Command p) Collect(p, into);
    }
}
