using Bramble.Rules.Common;
using Bramble.Values;

namespace Bramble.Rules.Amazons;

/// <summary>
/// A rectangular Amazons board of at most 10×10 squares. Notation (docs/amazons.md): rows
/// separated by '/', <c>L</c> a Left amazon, <c>R</c> a Right amazon, <c>#</c> a burnt square
/// (an arrow), <c>.</c> an empty square, as in <c>L..#/..R.</c>; lower case is read too. The
/// word <c>start</c> is the standard 10×10 opening and <c>start RxC</c> the same layout on a
/// smaller board (<see cref="Start"/>). Squares are named as on the other grid boards: column
/// letter from the left, row number from the top (<c>c4</c>). Immutable.
/// </summary>
public sealed class AmazonsBoard
{
    public const int MaxSide = 10;

    /// <summary>The eight queen directions (row step, column step).</summary>
    public static readonly (int Dr, int Dc)[] Directions = [(-1, 0), (1, 0), (0, -1), (0, 1), (-1, -1), (-1, 1), (1, -1), (1, 1)];

    private readonly Square[] _cells;

    public AmazonsBoard(int rows, int columns, Square[] cells)
    {
        Rows = rows;
        Columns = columns;
        _cells = cells;
    }

    public int Rows { get; }
    public int Columns { get; }
    public int Count => _cells.Length;

    public Square this[int cell] => _cells[cell];
    public Square At(int row, int column) => _cells[row * Columns + column];
    public int Index(int row, int column) => row * Columns + column;
    public bool Inside(int row, int column) => row >= 0 && row < Rows && column >= 0 && column < Columns;

    public Square[] CopyCells() => (Square[])_cells.Clone();

    public ReadOnlySpan<Square> Cells => _cells;

    public static Square AmazonOf(Side side) => side == Side.Left ? Square.LeftAmazon : Square.RightAmazon;

    public static Square Swap(Square s) => s switch { Square.LeftAmazon => Square.RightAmazon, Square.RightAmazon => Square.LeftAmazon, _ => s };

    public static char Letter(Square s) => s switch { Square.LeftAmazon => 'L', Square.RightAmazon => 'R', Square.Burnt => '#', _ => '.' };

    // ------------------------------------------------------------------ notation

    internal const string Example = "a board such as L..#/..R. (L Left's amazon, R Right's, # burnt, . empty) or the word start";

    public static AmazonsBoard Parse(string text)
    {
        int i = 0;
        while (i < text.Length && char.IsWhiteSpace(text[i])) i++;
        if (i == text.Length) throw new PositionSyntaxException(text, i, Example);
        if (text.Length - i >= 5 && string.Compare(text, i, "start", 0, 5, StringComparison.OrdinalIgnoreCase) == 0)
            return ParseStart(text, i + 5);
        return ParseRows(text, i);
    }

    private static AmazonsBoard ParseStart(string text, int i)
    {
        while (i < text.Length && char.IsWhiteSpace(text[i])) i++;
        if (i == text.Length) return Start(MaxSide, MaxSide);
        int rowsAt = i;
        int rows = NotationNumber.Read(text, ref i, "a board size such as 5x5 after 'start', or nothing (10x10)");
        if (i >= text.Length || (text[i] != 'x' && text[i] != 'X' && text[i] != '×'))
            throw new PositionSyntaxException(text, i, "'x' between the numbers of rows and columns, as in start 5x5");
        i++;
        int columnsAt = i;
        int columns = NotationNumber.Read(text, ref i, "a number of columns");
        int end = i;
        while (i < text.Length && char.IsWhiteSpace(text[i])) i++;
        if (i < text.Length) throw new PositionSyntaxException(text, i, "the end of the board size");
        if (rows < 4 || rows > MaxSide) throw new PositionSyntaxException(text, rowsAt, $"between 4 and {MaxSide} rows for a start");
        if (columns < 4 || columns > MaxSide) throw new PositionSyntaxException(text, columnsAt, $"between 4 and {MaxSide} columns for a start");
        _ = end;
        return Start(rows, columns);
    }

    /// <summary>
    /// The opening layout on a board of <paramref name="rows"/> × <paramref name="columns"/>: four
    /// amazons a side. Right's stand in the top part, Left's in the bottom part: on the edge row at
    /// the columns a third of the way in from each side, and on the edge columns a third of the way
    /// in from that row. On 10×10 these are the standard squares (d1, g1, a4, j4 for Right; d10, g10,
    /// a7, j7 for Left — the usual chess-style names with the rows counted the other way); on 6 columns
    /// × 5 rows they are the published small-board start (docs/amazons.md).
    /// </summary>
    public static AmazonsBoard Start(int rows, int columns)
    {
        var cells = new Square[rows * columns];
        int inC = (columns - 1) / 3, inR = (rows - 1) / 3;
        void Put(int r, int c, Square s) => cells[r * columns + c] = s;
        Put(0, inC, Square.RightAmazon);
        Put(0, columns - 1 - inC, Square.RightAmazon);
        Put(inR, 0, Square.RightAmazon);
        Put(inR, columns - 1, Square.RightAmazon);
        Put(rows - 1, inC, Square.LeftAmazon);
        Put(rows - 1, columns - 1 - inC, Square.LeftAmazon);
        Put(rows - 1 - inR, 0, Square.LeftAmazon);
        Put(rows - 1 - inR, columns - 1, Square.LeftAmazon);
        return new AmazonsBoard(rows, columns, cells);
    }

    private static Square? Read(char ch) => ch switch
    {
        'L' or 'l' => Square.LeftAmazon,
        'R' or 'r' => Square.RightAmazon,
        '#' => Square.Burnt,
        '.' => Square.Empty,
        _ => null,
    };

    private static AmazonsBoard ParseRows(string text, int i)
    {
        var (cells, rows, columns) = GridRows.Read<Square>(text, i, Read, ['L', 'R', '#', '.'], MaxSide, MaxSide, Example);
        return new AmazonsBoard(rows, columns, cells);
    }

    public string Text => GridRows.Write(Cells, Rows, Columns, Letter);

    public override string ToString() => Text;

    // ------------------------------------------------------------------ square names

    public string CellName(int cell) => SquareNames.Format(cell, Columns);

    /// <summary>Reads a square name such as <c>c4</c> at <paramref name="i"/>; null when there is none or it is off the board.</summary>
    public int? ReadCell(string text, ref int i) => SquareNames.Read(text, ref i, Rows, Columns);

    // ------------------------------------------------------------------ lines

    /// <summary>
    /// Whether a queen goes from <paramref name="from"/> to <paramref name="to"/> in a straight line
    /// over empty squares (the target empty too), treating <paramref name="vacated"/> as empty.
    /// </summary>
    public bool QueenReaches(int from, int to, int vacated = -1)
    {
        if (from == to) return false;
        int r0 = from / Columns, c0 = from % Columns, r1 = to / Columns, c1 = to % Columns;
        int dr = Math.Sign(r1 - r0), dc = Math.Sign(c1 - c0);
        if (r0 != r1 && c0 != c1 && Math.Abs(r1 - r0) != Math.Abs(c1 - c0)) return false;
        int r = r0, c = c0;
        do
        {
            r += dr;
            c += dc;
            int cell = Index(r, c);
            if (_cells[cell] != Square.Empty && cell != vacated) return false;
        }
        while (r != r1 || c != c1);
        return true;
    }
}
