using System.Text;

namespace Bramble.Values;

/// <summary>
/// Text that came from input, made fit to show a person. Control characters (ESC starts a
/// terminal command, BEL rings, NUL and backspace hide text) and the bidirectional overrides
/// that make a line read differently from what it holds are written as visible escapes
/// (<c>\x1B</c>, <c>\u202E</c>); newline and tab pass. An error's echo of the input is cut to a
/// window around the fault, so a huge input is never printed whole.
/// </summary>
public static class PrintableText
{
    /// <summary>Characters of the faulty line shown before the fault.</summary>
    public const int Before = 60;

    /// <summary>Characters of the faulty line shown after the fault.</summary>
    public const int After = 20;

    public static bool NeedsEscape(char ch) =>
        (ch < ' ' && ch != '\n' && ch != '\t') || (ch >= '\u007F' && ch <= '\u009F') || IsBidiControl(ch);

    /// <summary>The Unicode bidirectional formatting characters (marks, embeddings, overrides, isolates).</summary>
    private static bool IsBidiControl(char ch) =>
        ch is '\u061C' or '\u200E' or '\u200F' or (>= '\u202A' and <= '\u202E') or (>= '\u2066' and <= '\u2069');

    public static string Escape(string text)
    {
        int first = 0;
        while (first < text.Length && !NeedsEscape(text[first])) first++;
        if (first == text.Length) return text;
        var sb = new StringBuilder(text.Length + 8);
        sb.Append(text, 0, first);
        for (int i = first; i < text.Length; i++)
        {
            char ch = text[i];
            if (!NeedsEscape(ch)) sb.Append(ch);
            else if (ch <= '\u00FF') sb.Append("\\x").Append(((int)ch).ToString("X2"));
            else sb.Append("\\u").Append(((int)ch).ToString("X4"));
        }
        return sb.ToString();
    }

    /// <summary>
    /// The line of <paramref name="text"/> that holds <paramref name="column"/> (0-based), cut to
    /// a window around it and escaped, with a caret under the fault and what was expected there.
    /// </summary>
    public static string Caret(string text, int column, string expected)
    {
        column = Math.Clamp(column, 0, text.Length);
        int lineStart = column == 0 ? 0 : text.LastIndexOf('\n', column - 1) + 1;
        int lineEnd = text.IndexOf('\n', column);
        if (lineEnd < 0) lineEnd = text.Length;
        int from = Math.Max(lineStart, column - Before);
        int to = Math.Min(lineEnd, column + After);
        string head = (from > lineStart ? "…" : "") + Escape(text[from..column]);
        string tail = Escape(text[column..to]) + (to < lineEnd ? "…" : "");
        string where = "";
        if (lineStart > 0 || lineEnd < text.Length)
        {
            int line = 1;
            for (int i = 0; i < lineStart; i++) if (text[i] == '\n') line++;
            where = $"line {line}, column {column - lineStart + 1}: ";
        }
        return $"{head}{tail}\n{new string(' ', head.Length)}^ {where}expected {expected}";
    }
}
