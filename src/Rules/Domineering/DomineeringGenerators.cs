using System.Text;

namespace Bramble.Rules.Domineering;

/// <summary>
/// Reproducible random boards for <c>bramble generate domineering …</c> (docs/domineering.md):
/// <c>rectangles</c> (empty m×n boards, 1 ≤ m, n ≤ size), <c>regions</c> (one random connected
/// region of size cells) and <c>sums</c> (size separate random regions of 2 to 7 cells).
/// </summary>
public static class DomineeringGenerators
{
    public static readonly IReadOnlyList<string> Names = ["rectangles", "regions", "sums"];

    public static IReadOnlyList<string> Generate(string generator, int count, int size, int seed)
    {
        if (count < 0) throw new ArgumentOutOfRangeException(nameof(count), "count must not be negative");
        var random = new Random(seed);
        Func<Random, int, string> make = generator.ToLowerInvariant() switch
        {
            "rectangles" => Rectangle,
            "regions" => (rng, s) => BoardNotation.Format(DomineeringRuleset.ToBoard(RandomRegion(rng, s))),
            "sums" => Sum,
            _ => throw new ArgumentException($"unknown domineering generator '{generator}'; known: {string.Join(", ", Names)}"),
        };
        CheckSize(generator.ToLowerInvariant(), size);
        var result = new List<string>(count);
        for (int i = 0; i < count; i++) result.Add(make(random, size));
        return result;
    }

    private static void CheckSize(string generator, int size)
    {
        (int low, int high) = generator switch
        {
            "rectangles" => (1, Board.MaxColumns),
            "regions" => (2, 64),
            _ => (1, 24),
        };
        if (size < low || size > high)
            throw new ArgumentOutOfRangeException(nameof(size), $"size for {generator} must be between {low} and {high}");
    }

    private static string Rectangle(Random random, int size)
    {
        while (true)
        {
            int rows = random.Next(1, size + 1), columns = random.Next(1, size + 1);
            if (rows * columns >= 2 || size == 1) return $"{rows}x{columns}";
        }
    }

    /// <summary>A region grown from one cell by adding a uniformly chosen empty neighbour each step, within 26 columns.</summary>
    public static Region RandomRegion(Random random, int cells, int maxHeight = Board.MaxRows)
    {
        while (true)
        {
            var region = new HashSet<(int R, int C)> { (0, 0) };
            var frontier = new List<(int R, int C)>();
            AddNeighbours((0, 0));
            int top = 0, bottom = 0, left = 0, right = 0;
            while (region.Count < cells && frontier.Count > 0)
            {
                int k = random.Next(frontier.Count);
                var cell = frontier[k];
                frontier[k] = frontier[^1];
                frontier.RemoveAt(frontier.Count - 1);
                if (region.Contains(cell)) continue;
                int nt = Math.Min(top, cell.R), nb = Math.Max(bottom, cell.R), nl = Math.Min(left, cell.C), nr = Math.Max(right, cell.C);
                // Keep the box a legal board that fits one 128-bit region.
                if (nr - nl + 1 > Board.MaxColumns || nb - nt + 1 > maxHeight || (nb - nt + 1) * (nr - nl + 1) > Region.MaxArea) continue;
                (top, bottom, left, right) = (nt, nb, nl, nr);
                region.Add(cell);
                AddNeighbours(cell);
            }
            if (region.Count < cells) continue;
            int h = bottom - top + 1, w = right - left + 1;
            var bits = UInt128.Zero;
            foreach (var (r, c) in region) bits |= UInt128.One << ((r - top) * w + (c - left));
            return new Region(bits, h, w);

            void AddNeighbours((int R, int C) at)
            {
                foreach (var n in new[] { (at.R - 1, at.C), (at.R + 1, at.C), (at.R, at.C - 1), (at.R, at.C + 1) })
                    if (!region.Contains(n)) frontier.Add(n);
            }
        }
    }

    /// <summary>Several random regions of 2–7 cells side by side, kept apart by filled cells, in bands of at most 26 columns.</summary>
    private static string Sum(Random random, int regions)
    {
        var bands = new List<List<Region>> { new() };
        int bandWidth = 0;
        for (int i = 0; i < regions; i++)
        {
            var region = RandomRegion(random, random.Next(2, 8), maxHeight: 4);
            int needed = (bandWidth == 0 ? 0 : 1) + region.Width;
            if (bandWidth + needed > Board.MaxColumns) { bands.Add(new()); bandWidth = 0; needed = region.Width; }
            bands[^1].Add(region);
            bandWidth += needed;
        }
        int width = bands.Max(b => b.Sum(r => r.Width) + Math.Max(0, b.Count - 1));
        var lines = new List<string>();
        foreach (var band in bands)
        {
            if (lines.Count > 0) lines.Add(new string('#', width));
            int height = band.Max(r => r.Height);
            for (int row = 0; row < height; row++)
            {
                var sb = new StringBuilder(width);
                foreach (var region in band)
                {
                    if (sb.Length > 0) sb.Append('#');
                    for (int c = 0; c < region.Width; c++) sb.Append(region.Contains(row, c) ? '.' : '#');
                }
                lines.Add(sb.ToString().PadRight(width, '#'));
            }
        }
        return string.Join("/", lines);
    }
}
