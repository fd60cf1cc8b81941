using Bramble.Values;

namespace Bramble.Rules.Tests.Domineering;

/// <summary>
/// Plain search for the tests, written apart from the code under test: a board is a grid of
/// bools, a position's value is {values after each vertical domino | after each horizontal one}
/// over the whole board at once (no splitting, no symmetry), memoised only by the exact set of
/// empty cells.
/// </summary>
public sealed class PlainDomineering(GameStore store)
{
    private readonly Dictionary<string, Game> _seen = new();

    public Game Value(bool[,] empty)
    {
        string key = Key(empty);
        if (_seen.TryGetValue(key, out var known)) return known;
        int rows = empty.GetLength(0), columns = empty.GetLength(1);
        var left = new List<Game>();
        var right = new List<Game>();
        for (int r = 0; r < rows; r++)
        {
            for (int c = 0; c < columns; c++)
            {
                if (!empty[r, c]) continue;
                if (r + 1 < rows && empty[r + 1, c]) left.Add(After(empty, r, c, r + 1, c));
                if (c + 1 < columns && empty[r, c + 1]) right.Add(After(empty, r, c, r, c + 1));
            }
        }
        var value = store.Make(left, right);
        _seen[key] = value;
        return value;
    }

    private Game After(bool[,] empty, int r1, int c1, int r2, int c2)
    {
        var next = (bool[,])empty.Clone();
        next[r1, c1] = false;
        next[r2, c2] = false;
        return Value(next);
    }

    private static string Key(bool[,] empty)
    {
        var chars = new char[empty.Length + empty.GetLength(0)];
        int k = 0;
        for (int r = 0; r < empty.GetLength(0); r++)
        {
            for (int c = 0; c < empty.GetLength(1); c++) chars[k++] = empty[r, c] ? '.' : '#';
            chars[k++] = '/';
        }
        return new string(chars);
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
