using Bramble.Values;

namespace Bramble.Rules.Amazons;

/// <summary>
/// Reproducible Amazons positions for <c>bramble generate amazons …</c> and match suites:
/// <list type="bullet">
/// <item><c>starts</c>: the opening layout on a size×size board (4 to 10; 10 is the standard start);</item>
/// <item><c>endgames</c>: size separate small regions (2 to 6) on a 10×10 board, each with one amazon of
/// each side and a few burnt squares, every region hot (its temperature is above 0), so the order of
/// play between regions matters — the sums the temperature strategies were made for;</item>
/// <item><c>regions</c>: one random region of about size squares (3 to 16) with one or two amazons a side;</item>
/// <item><c>midgames</c>: the standard 10×10 start after size random moves (0 to 60) — whole boards
/// for the heuristic player.</item>
/// </list>
/// </summary>
public static class AmazonsGenerators
{
    public static readonly IReadOnlyList<string> Names = ["regions", "endgames", "starts", "midgames"];

    public static IReadOnlyList<string> Generate(AmazonsRuleset ruleset, string generator, int count, int size, int seed)
    {
        if (count < 0) throw new ArgumentOutOfRangeException(nameof(count), "count must not be negative");
        string name = generator.ToLowerInvariant();
        if (!Names.Contains(name))
            throw new ArgumentException($"unknown amazons generator '{generator}'; known: {string.Join(", ", Names)}");
        var (low, high) = name switch { "starts" => (4, 10), "endgames" => (2, 6), "regions" => (3, 16), _ => (0, 60) };
        if (size < low || size > high)
            throw new ArgumentOutOfRangeException(nameof(size), $"size for {name} must be between {low} and {high}");
        var random = new Random(seed);
        var result = new List<string>(count);
        var context = new ValueContext();
        for (int i = 0; i < count; i++)
        {
            result.Add(name switch
            {
                "starts" => AmazonsBoard.Start(size, size).Text,
                "endgames" => Endgame(ruleset, random, size, context),
                "regions" => Region(random, size).Text,
                _ => Midgame(ruleset, random, size),
            });
        }
        return result;
    }

    /// <summary>Slots of the 10×10 board for endgame regions: 3 rows by 2 columns of blocks, burnt lines between.</summary>
    private static readonly (int Top, int Left, int Height, int Width)[] Slots =
        [(0, 0, 3, 4), (0, 5, 3, 5), (4, 0, 2, 4), (4, 5, 2, 5), (7, 0, 3, 4), (7, 5, 3, 5)];

    private static string Endgame(AmazonsRuleset ruleset, Random random, int regions, ValueContext context)
    {
        var cells = new Square[100];
        Array.Fill(cells, Square.Burnt);
        var slots = Enumerable.Range(0, Slots.Length).OrderBy(_ => random.Next()).Take(regions).ToList();
        foreach (int s in slots)
        {
            var (top, left, height, width) = Slots[s];
            for (int attempt = 0; ; attempt++)
            {
                int h = random.Next(2, height + 1), w = random.Next(2, width + 1);
                if (h * w > 10) continue;
                var region = Region(random, h, w, amazonsEach: 1, burnt: random.Next(0, 3));
                var position = (AmazonsPosition)ruleset.Parse(region.Text);
                if (position.Regions.Length != 1) continue;
                context.ResetCounters(nodeCap: 2_000_000);
                bool hot;
                try
                {
                    hot = context.Store.Temperature(ruleset.Value(position, context)) > Dyadic.Zero;
                }
                catch (BudgetExceededException)
                {
                    hot = false;
                }
                finally
                {
                    context.EndBudget();
                }
                // A cold region now and then after many tries, rather than no position.
                if (!hot && attempt < 40) continue;
                for (int r = 0; r < h; r++)
                    for (int c = 0; c < w; c++)
                        cells[(top + r) * 10 + left + c] = region.At(r, c);
                break;
            }
        }
        return new AmazonsBoard(10, 10, cells).Text;
    }

    private static AmazonsBoard Region(Random random, int squares)
    {
        int h = Math.Max(1, (int)Math.Sqrt(squares)), w = (squares + h - 1) / h;
        while (w > AmazonsBoard.MaxSide) { h++; w = (squares + h - 1) / h; }
        int each = squares >= 9 && random.Next(2) == 0 ? 2 : 1;
        return Region(random, h, w, each, random.Next(0, Math.Max(1, squares / 4)));
    }

    private static AmazonsBoard Region(Random random, int h, int w, int amazonsEach, int burnt)
    {
        var cells = new Square[h * w];
        var order = Enumerable.Range(0, h * w).OrderBy(_ => random.Next()).ToArray();
        int k = 0;
        for (int i = 0; i < amazonsEach && k < order.Length; i++) cells[order[k++]] = Square.LeftAmazon;
        for (int i = 0; i < amazonsEach && k < order.Length; i++) cells[order[k++]] = Square.RightAmazon;
        for (int i = 0; i < burnt && k < order.Length - 1; i++) cells[order[k++]] = Square.Burnt;
        return new AmazonsBoard(h, w, cells);
    }

    private static string Midgame(AmazonsRuleset ruleset, Random random, int moves)
    {
        IPosition position = ruleset.Parse("start");
        var side = Side.Left;
        for (int i = 0; i < moves; i++)
        {
            var list = position.Moves(side);
            if (list.Count == 0) break;
            position = position.Play(side, list[random.Next(list.Count)]);
            side = side.Other();
        }
        return position.Text;
    }
}
