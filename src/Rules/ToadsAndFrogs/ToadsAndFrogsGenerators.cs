namespace Bramble.Rules.ToadsAndFrogs;

/// <summary>
/// Reproducible strips for <c>bramble generate toads-and-frogs …</c> (docs/toads-and-frogs.md):
/// <c>starts</c> (toads on the left, frogs on the right, empty squares between: the starting
/// positions the papers tabulate, size squares long), <c>strips</c> (size squares, each a toad,
/// a frog or empty at random) and <c>sums</c> (size random strips of 3 to 7 squares, walled off).
/// </summary>
public static class ToadsAndFrogsGenerators
{
    public static readonly IReadOnlyList<string> Names = ["starts", "strips", "sums"];

    public static IReadOnlyList<string> Generate(string generator, int count, int size, int seed)
    {
        if (count < 0) throw new ArgumentOutOfRangeException(nameof(count), "count must not be negative");
        string name = generator.ToLowerInvariant();
        if (!Names.Contains(name))
            throw new ArgumentException($"unknown toads-and-frogs generator '{generator}'; known: {string.Join(", ", Names)}");
        (int low, int high) = name switch { "starts" => (3, 60), "strips" => (2, 60), _ => (1, 12) };
        if (size < low || size > high)
            throw new ArgumentOutOfRangeException(nameof(size), $"size for {name} must be between {low} and {high}");
        var random = new Random(seed);
        var result = new List<string>(count);
        for (int i = 0; i < count; i++)
        {
            result.Add(name switch
            {
                "starts" => Start(random, size),
                "strips" => Strip(random, size),
                _ => string.Join("#", Enumerable.Range(0, size).Select(_ => Strip(random, random.Next(3, 8)))),
            });
        }
        return result;
    }

    private static string Start(Random random, int size)
    {
        int empty = random.Next(1, Math.Max(2, size / 3) + 1);
        int toads = random.Next(1, size - empty);
        int frogs = size - empty - toads;
        if (frogs < 1) { frogs = 1; toads = size - empty - 1; }
        return new string('T', toads) + new string('.', empty) + new string('F', frogs);
    }

    private static string Strip(Random random, int size)
    {
        var chars = new char[size];
        for (int k = 0; k < size; k++) chars[k] = "TF."[random.Next(3)];
        return new string(chars);
    }
}
