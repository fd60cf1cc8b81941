using System.CommandLine;

namespace Bramble.Cli;

/// <summary>What <c>bramble</c> alone prints, and the "did you mean" hint for a near miss.</summary>
public static class VerbList
{
    public static string Text(RootCommand root)
    {
        var w = new StringWriter();
        w.WriteLine("usage: bramble <verb> [arguments] [options]");
        w.WriteLine();
        int width = root.Subcommands.Max(c => c.Name.Length);
        foreach (var verb in root.Subcommands) w.WriteLine($"  {verb.Name.PadRight(width)}  {FirstLine(verb.Description)}");
        w.WriteLine();
        w.WriteLine("'bramble <verb> --help' says more about one verb; docs/ in the repository is the full reference.");
        return w.ToString();
    }

    private static string FirstLine(string? text) => (text ?? "").Split('\n')[0].Trim();

    /// <summary>"; did you mean value?" for the nearest known word within a small edit distance, else "".</summary>
    public static string Suggestion(string typed, IEnumerable<string> known)
    {
        var best = known
            .Select(k => (Word: k, Distance: Distance(typed.ToLowerInvariant(), k.ToLowerInvariant())))
            .Where(x => x.Distance <= Math.Max(1, x.Word.TrimStart('-').Length / 3))
            .OrderBy(x => x.Distance).ThenBy(x => x.Word, StringComparer.Ordinal)
            .FirstOrDefault();
        return best.Word is null ? "" : $"; did you mean {best.Word}?";
    }

    /// <summary>Edit distance where swapping two neighbours counts one (valeu → value).</summary>
    public static int Distance(string a, string b)
    {
        var d = new int[a.Length + 1, b.Length + 1];
        for (int i = 0; i <= a.Length; i++) d[i, 0] = i;
        for (int j = 0; j <= b.Length; j++) d[0, j] = j;
        for (int i = 1; i <= a.Length; i++)
        {
            for (int j = 1; j <= b.Length; j++)
            {
                int cost = a[i - 1] == b[j - 1] ? 0 : 1;
                d[i, j] = Math.Min(Math.Min(d[i - 1, j] + 1, d[i, j - 1] + 1), d[i - 1, j - 1] + cost);
                if (i > 1 && j > 1 && a[i - 1] == b[j - 2] && a[i - 2] == b[j - 1]) d[i, j] = Math.Min(d[i, j], d[i - 2, j - 2] + 1);
            }
        }
        return d[a.Length, b.Length];
    }
}
