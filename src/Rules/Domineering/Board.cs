namespace Bramble.Rules.Domineering;

/// <summary>
/// The cells of a Domineering board: one 32-bit mask of empty cells per row (bit c = column c),
/// so a board of up to 26 columns and <see cref="MaxRows"/> rows of any shape fits, even when it
/// is too big for one 128-bit <see cref="Region"/>. Immutable: the array is never written after
/// construction.
/// </summary>
public sealed class Board
{
    public const int MaxColumns = 26;
    public const int MaxRows = 64;

    private readonly uint[] _empty;

    public Board(int rows, int columns, uint[] empty)
    {
        if (rows < 1 || rows > MaxRows) throw new ArgumentOutOfRangeException(nameof(rows));
        if (columns < 1 || columns > MaxColumns) throw new ArgumentOutOfRangeException(nameof(columns));
        if (empty.Length != rows) throw new ArgumentException("one mask per row", nameof(empty));
        uint full = RowMask(columns);
        foreach (uint row in empty)
            if ((row & ~full) != 0) throw new ArgumentException("cells outside the board", nameof(empty));
        Rows = rows;
        Columns = columns;
        _empty = empty;
    }

    public static Board Empty(int rows, int columns) => new(rows, columns, Enumerable.Repeat(RowMask(columns), rows).ToArray());

    public int Rows { get; }
    public int Columns { get; }

    public uint EmptyRow(int row) => _empty[row];

    public bool IsEmpty(int row, int column) =>
        row >= 0 && row < Rows && column >= 0 && column < Columns && ((_empty[row] >> column) & 1) != 0;

    public int EmptyCount
    {
        get
        {
            int n = 0;
            foreach (uint row in _empty) n += System.Numerics.BitOperations.PopCount(row);
            return n;
        }
    }

    /// <summary>The board with the given cells filled (cells as row * 26 + column).</summary>
    public Board Fill(int cellA, int cellB)
    {
        var rows = (uint[])_empty.Clone();
        rows[cellA / MaxColumns] &= ~(1u << (cellA % MaxColumns));
        rows[cellB / MaxColumns] &= ~(1u << (cellB % MaxColumns));
        return new Board(Rows, Columns, rows);
    }

    /// <summary>The board with only the given cells empty, everything else filled.</summary>
    public Board Keep(IEnumerable<int> cells)
    {
        var rows = new uint[Rows];
        foreach (int cell in cells) rows[cell / MaxColumns] |= 1u << (cell % MaxColumns);
        return new Board(Rows, Columns, rows);
    }

    /// <summary>The 4-connected groups of empty cells, each as a list of cells (row * 26 + column), in reading order of their first cell.</summary>
    public IReadOnlyList<int[]> Regions()
    {
        var seen = new bool[Rows * MaxColumns];
        var result = new List<int[]>();
        var queue = new Queue<int>();
        for (int r = 0; r < Rows; r++)
        {
            for (int c = 0; c < Columns; c++)
            {
                int start = r * MaxColumns + c;
                if (!IsEmpty(r, c) || seen[start]) continue;
                var cells = new List<int>();
                seen[start] = true;
                queue.Enqueue(start);
                while (queue.Count > 0)
                {
                    int cell = queue.Dequeue();
                    cells.Add(cell);
                    int cr = cell / MaxColumns, cc = cell % MaxColumns;
                    Visit(cr - 1, cc); Visit(cr + 1, cc); Visit(cr, cc - 1); Visit(cr, cc + 1);
                }
                cells.Sort();
                result.Add(cells.ToArray());
            }
        }
        return result;

        void Visit(int r, int c)
        {
            if (!IsEmpty(r, c)) return;
            int cell = r * MaxColumns + c;
            if (seen[cell]) return;
            seen[cell] = true;
            queue.Enqueue(cell);
        }
    }

    /// <summary>
    /// The cells as a <see cref="Region"/> laid out over their bounding box, or null when that
    /// box has more than <see cref="Region.MaxArea"/> cells.
    /// </summary>
    public static Region? ToRegion(IReadOnlyList<int> cells)
    {
        if (cells.Count == 0) return new Region(UInt128.Zero, 0, 0);
        int top = int.MaxValue, bottom = int.MinValue, left = int.MaxValue, right = int.MinValue;
        foreach (int cell in cells)
        {
            int r = cell / MaxColumns, c = cell % MaxColumns;
            top = Math.Min(top, r); bottom = Math.Max(bottom, r);
            left = Math.Min(left, c); right = Math.Max(right, c);
        }
        int h = bottom - top + 1, w = right - left + 1;
        if (h * w > Region.MaxArea) return null;
        var bits = UInt128.Zero;
        foreach (int cell in cells) bits |= UInt128.One << ((cell / MaxColumns - top) * w + (cell % MaxColumns - left));
        return new Region(bits, h, w);
    }

    public static uint RowMask(int columns) => columns >= 32 ? uint.MaxValue : (1u << columns) - 1;
}
