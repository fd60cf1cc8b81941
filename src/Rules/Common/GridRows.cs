namespace Bramble.Rules.Common;

/// <summary>
/// Reads (and writes) the rows of a board written one letter per square, rows separated by '/' or newlines
/// (spaces and tabs ignored), every row as long as the first; the one reader behind the Clobber,
/// Konane and Amazons notations, so that their messages point at faults the same way.
/// </summary>
public static class GridRows
{
    /// <param name="letters">The letters a square may be, in the order messages list them.</param>
    public static (T[] Cells, int Rows, int Columns) Read<T>(
        string text, int i, Func<char, T?> read, IReadOnlyList<char> letters, int maxRows, int maxColumns, string example)
        where T : struct
    {
        string or = List(letters, "or"), and = List(letters, "and");
        string orSlash = string.Join(", ", letters.Select(c => $"'{c}'")) + " or '/'";
        var cells = new List<T>();
        int width = -1, count = 0, rows = 0, rowStart = i;
        int end = text.Length;
        while (end > i && char.IsWhiteSpace(text[end - 1])) end--;
        for (; i <= end; i++)
        {
            char ch = i < end ? text[i] : '/';
            if (ch == ' ' || ch == '\t' || ch == '\r') continue;
            if (read(ch) is { } square)
            {
                if (count == maxColumns) throw new PositionSyntaxException(text, i, $"'/': at most {maxColumns} columns");
                if (width >= 0 && count == width) throw new PositionSyntaxException(text, i, $"'/': every row has {width} squares, like row 1");
                cells.Add(square);
                count++;
                continue;
            }
            if (ch != '/' && ch != '\n') throw new PositionSyntaxException(text, i, rows == 0 && count == 0 ? example : orSlash);
            if (count == 0) throw new PositionSyntaxException(text, i, $"a row of {and}");
            if (width >= 0 && count != width) throw new PositionSyntaxException(text, i, $"{or}: every row has {width} squares, like row 1");
            if (rows == maxRows) throw new PositionSyntaxException(text, rowStart, $"the end of the board: at most {maxRows} rows");
            width = count;
            count = 0;
            rows++;
            rowStart = i + 1;
        }
        return (cells.ToArray(), rows, width);
    }

    /// <summary>The board written back: one letter per square, rows separated by '/'.</summary>
    public static string Write<T>(ReadOnlySpan<T> cells, int rows, int columns, Func<T, char> letter)
    {
        var sb = new System.Text.StringBuilder(rows * (columns + 1));
        for (int r = 0; r < rows; r++)
        {
            if (r > 0) sb.Append('/');
            for (int c = 0; c < columns; c++) sb.Append(letter(cells[r * columns + c]));
        }
        return sb.ToString();
    }

    private static string List(IReadOnlyList<char> letters, string last) =>
        string.Join(", ", letters.Take(letters.Count - 1).Select(c => $"'{c}'")) + $" {last} '{letters[^1]}'";
}
