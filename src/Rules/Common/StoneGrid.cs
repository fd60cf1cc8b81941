namespace Bramble.Rules.Common;

/// <summary>
/// A rectangular board of stones for Clobber and Konane. Notation: rows separated by '/' (or
/// newlines), <c>x</c> a Left stone, <c>o</c> a Right stone, <c>.</c> an empty square, as in
/// <c>xox/o.x</c>; <c>&lt;rows&gt;x&lt;columns&gt;</c> is the full checkerboard with x on a1.
/// The printed papers draw black (Left) and white (Right) stones, so <c>●</c>/<c>○</c> and
/// <c>B</c>/<c>W</c> are read as x and o too. Squares are named like Domineering cells: column
/// letter from the left, row number from the top (<c>c4</c>). Immutable.
/// </summary>
public sealed class StoneGrid
{
    public const int MaxRows = 26;
    public const int MaxColumns = 26;
    private readonly Stone[] _cells;

    public StoneGrid(int rows, int columns, Stone[] cells)
    {
        Rows = rows;
        Columns = columns;
        _cells = cells;
    }

    public int Rows { get; }
    public int Columns { get; }

    public Stone this[int cell] => _cells[cell];
    public Stone At(int row, int column) => _cells[row * Columns + column];

    public int Index(int row, int column) => row * Columns + column;

    public ReadOnlySpan<Stone> Cells => _cells;

    public Stone[] CopyCells() => (Stone[])_cells.Clone();

    public int StoneCount => _cells.Count(s => s != Stone.None);

    public static Stone Opponent(Stone s) => s == Stone.Left ? Stone.Right : s == Stone.Right ? Stone.Left : Stone.None;

    public static Stone Of(Values.Side side) => side == Values.Side.Left ? Stone.Left : Stone.Right;

    // ---- notation ----

    public static StoneGrid Parse(string text, string example)
    {
        int start = 0;
        while (start < text.Length && char.IsWhiteSpace(text[start])) start++;
        if (start == text.Length) throw new PositionSyntaxException(text, start, example);
        return char.IsAsciiDigit(text[start]) ? ParseSize(text, start) : ParseRows(text, start, example);
    }

    private static StoneGrid ParseSize(string text, int i)
    {
        int rows = NotationNumber.Read(text, ref i, "a number of rows");
        while (i < text.Length && (text[i] == ' ' || text[i] == '\t')) i++;
        if (i >= text.Length || (text[i] != 'x' && text[i] != 'X' && text[i] != '×'))
            throw new PositionSyntaxException(text, i, "'x' between the numbers of rows and columns, as in 5x6");
        i++;
        while (i < text.Length && (text[i] == ' ' || text[i] == '\t')) i++;
        int columnsAt = i;
        int columns = NotationNumber.Read(text, ref i, "a number of columns");
        while (i < text.Length && char.IsWhiteSpace(text[i])) i++;
        if (i < text.Length) throw new PositionSyntaxException(text, i, "the end of the board size");
        if (rows < 1 || rows > MaxRows) throw new PositionSyntaxException(text, 0, $"between 1 and {MaxRows} rows");
        if (columns < 1 || columns > MaxColumns) throw new PositionSyntaxException(text, columnsAt, $"between 1 and {MaxColumns} columns");
        var cells = new Stone[rows * columns];
        for (int r = 0; r < rows; r++)
            for (int c = 0; c < columns; c++)
                cells[r * columns + c] = (r + c) % 2 == 0 ? Stone.Left : Stone.Right;
        return new StoneGrid(rows, columns, cells);
    }

    private static Stone? Read(char ch) => ch switch
    {
        'x' or 'X' or '●' or 'B' or 'b' => Stone.Left,
        'o' or 'O' or '○' or 'W' or 'w' => Stone.Right,
        '.' or '_' or '□' => Stone.None,
        _ => null,
    };

    private static StoneGrid ParseRows(string text, int i, string example)
    {
        var (cells, rows, columns) = GridRows.Read<Stone>(text, i, Read, ['x', 'o', '.'], MaxRows, MaxColumns, example);
        return new StoneGrid(rows, columns, cells);
    }

    public static char Letter(Stone s) => s == Stone.Left ? 'x' : s == Stone.Right ? 'o' : '.';

    public string Text => GridRows.Write(Cells, Rows, Columns, Letter);

    // ---- square names ----

    public string CellName(int cell) => SquareNames.Format(cell, Columns);

    /// <summary>Reads a square name such as <c>c4</c> from <paramref name="text"/> at <paramref name="i"/>; null when there is none or it is off the board.</summary>
    public int? ReadCell(string text, ref int i) => SquareNames.Read(text, ref i, Rows, Columns);

    /// <summary>Reads "from-to" (also "from to", "fromxto", "fromto") as two squares; throws <see cref="IllegalMoveException"/> with <paramref name="example"/>.</summary>
    public (int From, int To) ReadMove(string text, string example)
    {
        var t = text.Trim();
        int i = 0;
        var from = ReadCell(t, ref i);
        if (from is null) throw new IllegalMoveException($"bad move '{text}': expected a square of the {Rows}x{Columns} board then where the stone goes, such as {example}");
        while (i < t.Length && (t[i] == '-' || t[i] == ' ' || t[i] == 'x' && i + 1 < t.Length && char.IsAsciiLetter(t[i + 1]))) i++;
        var to = ReadCell(t, ref i);
        if (to is null || i != t.Length) throw new IllegalMoveException($"bad move '{text}': expected two squares of the {Rows}x{Columns} board, such as {example}");
        return (from.Value, to.Value);
    }

    // ---- normal keys ----

    /// <summary>
    /// The key of the stones inside the rectangle (top, left, height, width) under the symmetries
    /// of the rectangle and the exchange of colours: the smallest text among the eight images and
    /// their colour swaps, with a leading '-' when it is a colour-swapped image (whose game is the
    /// negative — Left and Right trade stones). When a plain image and a swapped one tie, the
    /// plain one wins (the game then equals its negative, so it is 0 either way).
    /// </summary>
    public string SignedKey(int top, int left, int height, int width)
    {
        // Each image is written into a buffer and compared there; only the winner becomes a string
        // (this runs for every position searched).
        int longest = height * width + Math.Max(height, width);
        Span<char> image = longest <= 512 ? stackalloc char[longest] : new char[longest];
        Span<char> best = longest <= 512 ? stackalloc char[longest] : new char[longest];
        int bestLength = -1;
        bool bestSwapped = false;
        for (int t = 0; t < 8; t++)
        {
            bool transposed = t >= 4;
            int h = transposed ? width : height, w = transposed ? height : width;
            for (int swap = 0; swap < 2; swap++)
            {
                int n = 0;
                for (int r = 0; r < h; r++)
                {
                    if (r > 0) image[n++] = '/';
                    for (int c = 0; c < w; c++)
                    {
                        // Image cell (r, c) reads source cell (sr, sc) after the optional transpose and flips.
                        int sr = transposed ? c : r, sc = transposed ? r : c;
                        if ((t & 1) != 0) sr = height - 1 - sr;
                        if ((t & 2) != 0) sc = width - 1 - sc;
                        var stone = At(top + sr, left + sc);
                        if (swap == 1) stone = Opponent(stone);
                        image[n++] = Letter(stone);
                    }
                }
                int cmp = bestLength < 0 ? -1 : ((ReadOnlySpan<char>)image[..n]).SequenceCompareTo(best[..bestLength]);
                if (cmp < 0 || (cmp == 0 && bestSwapped && swap == 0))
                {
                    image[..n].CopyTo(best);
                    bestLength = n;
                    bestSwapped = swap == 1;
                }
            }
        }
        string text = new(best[..bestLength]);
        return bestSwapped ? "-" + text : text;
    }

    public override string ToString() => Text;
}
