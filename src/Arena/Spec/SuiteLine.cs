using System.Text.RegularExpressions;

namespace Bramble.Arena.Spec;

/// <summary>
/// One line of a position suite. A suite holds one position per line; blank lines and lines whose
/// first non-blank character is a lone <c>#</c> (followed by a space or nothing) are comments, and
/// <c> # </c> after a position starts a trailing comment. (A bare <c>#</c> run is kept, because
/// <c>#</c> marks a filled cell in Domineering boards.) A line may name its own ruleset in front:
/// <c>forms: {3|-1} + *</c>.
/// </summary>
public sealed partial record SuiteLine(int Number, string? Ruleset, string Text)
{
    [GeneratedRegex(@"^(?<name>[A-Za-z][A-Za-z0-9_-]*)\s*:\s*(?<rest>.*)$")]
    private static partial Regex Prefix();

    /// <summary>The positions of a suite text; comment and blank lines are skipped.</summary>
    public static IReadOnlyList<SuiteLine> Split(string text)
    {
        var lines = new List<SuiteLine>();
        var number = 0;
        foreach (var raw in text.Split('\n'))
        {
            number++;
            var line = raw.TrimEnd('\r');
            var trailing = line.IndexOf(" # ", StringComparison.Ordinal);
            if (trailing >= 0) line = line[..trailing];
            line = line.Trim();
            if (line.Length == 0 || line == "#" || line.StartsWith("# ", StringComparison.Ordinal) || line.StartsWith("#\t", StringComparison.Ordinal))
                continue;
            var prefix = Prefix().Match(line);
            lines.Add(prefix.Success
                ? new SuiteLine(number, prefix.Groups["name"].Value.ToLowerInvariant(), prefix.Groups["rest"].Value.Trim())
                : new SuiteLine(number, null, line));
        }
        return lines;
    }
}
