using System.Text;
using Bramble.Rules.Common;

namespace Bramble.Rules.Domineering;

/// <summary>
/// The board notation of docs/domineering.md: rows of '.' (empty) and '#' (filled) separated by '/', or
/// <c>&lt;rows&gt;x&lt;columns&gt;</c> for an empty board. A newline also separates rows (so a board
/// can be kept in a file as a picture), and spaces and tabs are ignored.
/// </summary>
public static class BoardNotation
{
    public static Board Parse(string text)
    {
        int start = 0;
        while (start < text.Length && char.IsWhiteSpace(text[start])) start++;
        if (start == text.Length) throw new PositionSyntaxException(text, start, "a board such as ..#./.... or 6x7");
        return char.IsAsciiDigit(text[start]) ? ParseSize(text, start) : ParseRows(text, start);
    }

    private static Board ParseSize(string text, int i)
    {
        int rows = NotationNumber.Read(text, ref i, "a number of rows");
        SkipBlanks(text, ref i);
        if (i >= text.Length || (text[i] != 'x' && text[i] != 'X')) throw new PositionSyntaxException(text, i, "'x' between the numbers of rows and columns, as in 6x7");
        i++;
        SkipBlanks(text, ref i);
        int columnsAt = i;
        int columns = NotationNumber.Read(text, ref i, "a number of columns");
        while (i < text.Length && char.IsWhiteSpace(text[i])) i++;
        if (i < text.Length) throw new PositionSyntaxException(text, i, "the end of the board size");
        if (rows < 1 || rows > Board.MaxRows) throw new PositionSyntaxException(text, 0, $"between 1 and {Board.MaxRows} rows");
        if (columns < 1 || columns > Board.MaxColumns) throw new PositionSyntaxException(text, columnsAt, $"between 1 and {Board.MaxColumns} columns");
        return Board.Empty(rows, columns);
    }

    private static void SkipBlanks(string text, ref int i)
    {
        while (i < text.Length && (text[i] == ' ' || text[i] == '\t')) i++;
    }

    private static Board ParseRows(string text, int i)
    {
        var rows = new List<uint>();
        int width = -1;
        uint row = 0;
        int cells = 0;
        int rowStart = i;
        int end = text.Length;
        while (end > i && char.IsWhiteSpace(text[end - 1])) end--;
        for (; i <= end; i++)
        {
            char ch = i < end ? text[i] : '/';
            bool separator = ch == '/' || ch == '\n' || (ch == '\r' && !(i + 1 < end && text[i + 1] == '\n'));
            if (ch == ' ' || ch == '\t' || (ch == '\r' && !separator)) continue;
            if (ch == '.' || ch == '#')
            {
                if (cells == Board.MaxColumns) throw new PositionSyntaxException(text, i, $"'/': at most {Board.MaxColumns} columns");
                if (width >= 0 && cells == width) throw new PositionSyntaxException(text, i, $"'/': every row has {width} cells, like row 1");
                if (ch == '.') row |= 1u << cells;
                cells++;
                continue;
            }
            if (!separator) throw new PositionSyntaxException(text, i, rows.Count == 0 && cells == 0 ? "a board such as ..#./.... or 6x7" : "'.', '#' or '/'");
            if (cells == 0) throw new PositionSyntaxException(text, i, "a row of '.' and '#'");
            if (width >= 0 && cells != width) throw new PositionSyntaxException(text, i, $"'.' or '#': every row has {width} cells, like row 1");
            if (rows.Count == Board.MaxRows) throw new PositionSyntaxException(text, rowStart, $"the end of the board: at most {Board.MaxRows} rows");
            width = cells;
            rows.Add(row);
            row = 0;
            cells = 0;
            rowStart = i + 1;
        }
        return new Board(rows.Count, width, rows.ToArray());
    }

    /// <summary>Rows of '.' and '#' joined by '/' (always this form, so holes are visible and it parses back).</summary>
    public static string Format(Board board)
    {
        var sb = new StringBuilder(board.Rows * (board.Columns + 1));
        for (int r = 0; r < board.Rows; r++)
        {
            if (r > 0) sb.Append('/');
            for (int c = 0; c < board.Columns; c++) sb.Append(board.IsEmpty(r, c) ? '.' : '#');
        }
        return sb.ToString();
    }
}
