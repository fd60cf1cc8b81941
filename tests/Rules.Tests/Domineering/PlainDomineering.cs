using Bramble.Values;

namespace Bramble.Rules.Tests.Domineering;

/// <summary>
/// Plain search for the tests, written apart from the code under test: a board is a grid of
/// bools, a position's value is {values after each vertical domino | after each horizontal one}
/// over the whole board at once (no splitting, no symmetry), memoised only by the exact set of
/// empty cells (one bit per cell of a board of at most 64 cells).
/// </summary>
public sealed class PlainDomineering(GameStore store)
{
    private readonly Dictionary<(ulong Empty, int Rows, int Columns), Game> _seen = new();

    /// <summary>The value of a board of at most 64 cells.</summary>
    public Game Value(bool[,] empty)
    {
        int rows = empty.GetLength(0), columns = empty.GetLength(1);
        if (rows * columns > 64) throw new ArgumentException("plain search takes boards of at most 64 cells");
        ulong bits = 0;
        for (int r = 0; r < rows; r++)
            for (int c = 0; c < columns; c++)
                if (empty[r, c]) bits |= 1UL << (r * columns + c);
        return Value(bits, rows, columns);
    }

    private Game Value(ulong empty, int rows, int columns)
    {
        if (_seen.TryGetValue((empty, rows, columns), out var known)) return known;
        var left = new List<Game>();
        var right = new List<Game>();
        for (int r = 0; r < rows; r++)
        {
            for (int c = 0; c < columns; c++)
            {
                ulong here = 1UL << (r * columns + c);
                if ((empty & here) == 0) continue;
                ulong below = here << columns, beside = here << 1;
                if (r + 1 < rows && (empty & below) != 0) left.Add(Value(empty & ~here & ~below, rows, columns));
                if (c + 1 < columns && (empty & beside) != 0) right.Add(Value(empty & ~here & ~beside, rows, columns));
            }
        }
        var value = store.Make(left, right);
        _seen[(empty, rows, columns)] = value;
        return value;
    }

    // ------------------------------------------------------------ boards as text, for the tests

    public static bool[,] Grid(string rows)
    {
        var lines = rows.Split('/');
        var grid = new bool[lines.Length, lines[0].Length];
        for (int r = 0; r < lines.Length; r++)
            for (int c = 0; c < lines[r].Length; c++) grid[r, c] = lines[r][c] == '.';
        return grid;
    }

    public static string Text(bool[,] grid)
    {
        var lines = new List<string>();
        for (int r = 0; r < grid.GetLength(0); r++)
        {
            var chars = new char[grid.GetLength(1)];
            for (int c = 0; c < chars.Length; c++) chars[c] = grid[r, c] ? '.' : '#';
            lines.Add(new string(chars));
        }
        return string.Join("/", lines);
    }

    /// <summary>A random board of the given size with each cell empty with probability <paramref name="emptiness"/>.</summary>
    public static bool[,] RandomGrid(Random random, int rows, int columns, double emptiness)
    {
        var grid = new bool[rows, columns];
        for (int r = 0; r < rows; r++)
            for (int c = 0; c < columns; c++) grid[r, c] = random.NextDouble() < emptiness;
        return grid;
    }

    /// <summary>The eight images of a board; the first four are mirror images, the last four transposes.</summary>
    public static IReadOnlyList<bool[,]> Images(bool[,] g)
    {
        int h = g.GetLength(0), w = g.GetLength(1);
        var result = new List<bool[,]>();
        foreach (var map in new Func<int, int, (int, int)>[]
        {
            (r, c) => (r, c), (r, c) => (r, w - 1 - c), (r, c) => (h - 1 - r, c), (r, c) => (h - 1 - r, w - 1 - c),
        })
        {
            var image = new bool[h, w];
            for (int r = 0; r < h; r++) for (int c = 0; c < w; c++) { var (r2, c2) = map(r, c); image[r2, c2] = g[r, c]; }
            result.Add(image);
        }
        foreach (var map in new Func<int, int, (int, int)>[]
        {
            (r, c) => (c, r), (r, c) => (w - 1 - c, r), (r, c) => (c, h - 1 - r), (r, c) => (w - 1 - c, h - 1 - r),
        })
        {
            var image = new bool[w, h];
            for (int r = 0; r < h; r++) for (int c = 0; c < w; c++) { var (r2, c2) = map(r, c); image[r2, c2] = g[r, c]; }
            result.Add(image);
        }
        return result;
    }
}
