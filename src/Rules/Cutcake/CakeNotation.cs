using Bramble.Rules.Common;

namespace Bramble.Rules.Cutcake;

/// <summary>
/// Cutcake notation: a sum of rectangles <c>&lt;rows&gt;x&lt;columns&gt;</c> joined by '+', as in
/// <c>3x4 + 2x5</c>, or <c>0</c> for no cake. A rectangle may also be drawn as rows of '.'
/// separated by '/' (<c>..../....</c> is 2x4), like an empty Domineering board. Spaces are ignored.
/// </summary>
public static class CakeNotation
{
    public const int MaxSide = 1000;
    private const string Example = "a rectangle such as 3x4 (rows x columns)";

    public static IReadOnlyList<(int Rows, int Columns)> Parse(string text)
    {
        int i = 0;
        Skip(text, ref i);
        if (i == text.Length) throw new PositionSyntaxException(text, i, Example + ", or 0");
        if (text[i] == '0')
        {
            int at = i;
            i++;
            Skip(text, ref i);
            if (i == text.Length) return [];
            if (!char.IsAsciiDigit(text[i]) && text[i] != 'x' && text[i] != 'X') throw new PositionSyntaxException(text, i, "the end of the position after 0");
            i = at;
        }
        var pieces = new List<(int, int)>();
        while (true)
        {
            pieces.Add(text[i] == '.' ? ReadDrawing(text, ref i) : ReadSize(text, ref i));
            Skip(text, ref i);
            if (i == text.Length) return pieces;
            if (text[i] != '+') throw new PositionSyntaxException(text, i, "'+' between rectangles, or the end of the position");
            i++;
            Skip(text, ref i);
            if (i == text.Length) throw new PositionSyntaxException(text, i, Example + " after '+'");
        }
    }

    private static (int, int) ReadSize(string text, ref int i)
    {
        int rowsAt = i;
        int rows = NotationNumber.Read(text, ref i, Example);
        Skip(text, ref i);
        if (i >= text.Length || (text[i] != 'x' && text[i] != 'X' && text[i] != '×'))
            throw new PositionSyntaxException(text, i, "'x' between the numbers of rows and columns, as in 3x4");
        i++;
        Skip(text, ref i);
        int columnsAt = i;
        int columns = NotationNumber.Read(text, ref i, "a number of columns");
        if (rows < 1 || rows > MaxSide) throw new PositionSyntaxException(text, rowsAt, $"between 1 and {MaxSide} rows");
        if (columns < 1 || columns > MaxSide) throw new PositionSyntaxException(text, columnsAt, $"between 1 and {MaxSide} columns");
        return (rows, columns);
    }

    private static (int, int) ReadDrawing(string text, ref int i)
    {
        int rows = 0, width = -1, cells = 0;
        for (; ; i++)
        {
            char ch = i < text.Length ? text[i] : '\0';
            if (ch == '.')
            {
                if (width >= 0 && cells == width) throw new PositionSyntaxException(text, i, $"'/': every row has {width} cells, like row 1");
                cells++;
                if (cells > MaxSide) throw new PositionSyntaxException(text, i, $"'/': at most {MaxSide} columns");
                continue;
            }
            if (ch == ' ' || ch == '\t') continue;
            bool rowEnd = ch == '/' || ch == '\n' || ch == '\0' || ch == '+';
            if (!rowEnd) throw new PositionSyntaxException(text, i, "'.', '/', '+' or the end of the position");
            if (cells == 0) throw new PositionSyntaxException(text, i, "a row of '.'");
            if (width >= 0 && cells != width) throw new PositionSyntaxException(text, i, $"'.': every row has {width} cells, like row 1");
            width = cells;
            cells = 0;
            rows++;
            if (ch != '/' && ch != '\n') return (rows, width);
        }
    }

    private static void Skip(string text, ref int i)
    {
        while (i < text.Length && char.IsWhiteSpace(text[i])) i++;
    }

    public static string Format(IEnumerable<Piece> pieces)
    {
        var text = string.Join(" + ", pieces.Select(p => p.Text));
        return text.Length == 0 ? "0" : text;
    }
}
