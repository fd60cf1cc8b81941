namespace Bramble.Rules.Common;

/// <summary>
/// Reproducible stone boards for <c>bramble generate clobber|konane …</c>: <c>boards</c> (the
/// full size×size checkerboard for Clobber; for Konane the same with the two centre-most stones
/// of a corner taken off, as in the traditional opening, so there are moves), <c>random</c>
/// (size stones of random colours scattered over a board just big enough) and <c>strips</c>
/// (one row of size squares, for Konane with one square in four left empty).
/// </summary>
public static class StoneGenerators
{
    public static readonly IReadOnlyList<string> Names = ["boards", "random", "strips"];

    public static IReadOnlyList<string> Generate(string ruleset, string generator, int count, int size, int seed)
    {
        if (count < 0) throw new ArgumentOutOfRangeException(nameof(count), "count must not be negative");
        string name = generator.ToLowerInvariant();
        if (!Names.Contains(name))
            throw new ArgumentException($"unknown {ruleset} generator '{generator}'; known: {string.Join(", ", Names)}");
        (int low, int high) = name switch { "boards" => (2, StoneGrid.MaxColumns), "random" => (2, 200), _ => (2, StoneGrid.MaxColumns) };
        if (size < low || size > high)
            throw new ArgumentOutOfRangeException(nameof(size), $"size for {name} must be between {low} and {high}");
        bool konane = ruleset == "konane";
        var random = new Random(seed);
        var result = new List<string>(count);
        for (int i = 0; i < count; i++)
        {
            result.Add(name switch
            {
                "boards" => Board(random, size, konane),
                "random" => Scatter(random, size, konane),
                _ => Strip(random, size, konane),
            });
        }
        return result;
    }

    private static string Board(Random random, int size, bool konane)
    {
        var cells = new char[size, size];
        for (int r = 0; r < size; r++)
            for (int c = 0; c < size; c++)
                cells[r, c] = (r + c) % 2 == 0 ? 'x' : 'o';
        if (konane)
        {
            // The traditional opening: Left removes a stone from a corner or the centre, Right an adjacent one.
            int r = random.Next(2) == 0 ? 0 : size / 2, c = r == 0 ? 0 : size / 2;
            cells[r, c] = '.';
            cells[r, c + 1 < size ? c + 1 : c - 1] = '.'; // size ≥ 2, so one neighbour in the row exists
        }
        return Join(cells, size, size);
    }

    private static string Scatter(Random random, int stones, bool konane)
    {
        int side = 2;
        while (side * side * (konane ? 2 : 1) < stones * 3 / 2 && side < StoneGrid.MaxColumns) side++;
        var cells = new char[side, side];
        for (int r = 0; r < side; r++)
            for (int c = 0; c < side; c++)
                cells[r, c] = '.';
        int placed = 0;
        while (placed < Math.Min(stones, side * side))
        {
            int r = random.Next(side), c = random.Next(side);
            if (cells[r, c] != '.') continue;
            cells[r, c] = random.Next(2) == 0 ? 'x' : 'o';
            placed++;
        }
        return Join(cells, side, side);
    }

    private static string Strip(Random random, int size, bool konane)
    {
        var chars = new char[size];
        for (int k = 0; k < size; k++)
            chars[k] = konane && random.Next(4) == 0 ? '.' : random.Next(2) == 0 ? 'x' : 'o';
        return new string(chars);
    }

    private static string Join(char[,] cells, int rows, int columns) =>
        string.Join("/", Enumerable.Range(0, rows).Select(r => new string(Enumerable.Range(0, columns).Select(c => cells[r, c]).ToArray())));
}
