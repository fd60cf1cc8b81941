namespace Bramble.Rules.Cutcake;

/// <summary>
/// Reproducible random cakes for <c>bramble generate cutcake …</c> (docs/cutcake.md):
/// <c>rectangles</c> (one piece, each side 1 to size) and <c>sums</c> (size pieces, sides 1 to 8).
/// </summary>
public static class CutcakeGenerators
{
    public static readonly IReadOnlyList<string> Names = ["rectangles", "sums"];

    public static IReadOnlyList<string> Generate(string generator, int count, int size, int seed)
    {
        if (count < 0) throw new ArgumentOutOfRangeException(nameof(count), "count must not be negative");
        string name = generator.ToLowerInvariant();
        if (!Names.Contains(name))
            throw new ArgumentException($"unknown cutcake generator '{generator}'; known: {string.Join(", ", Names)}");
        int high = name == "rectangles" ? CakeNotation.MaxSide : 64;
        if (size < 1 || size > high)
            throw new ArgumentOutOfRangeException(nameof(size), $"size for {name} must be between 1 and {high}");
        var random = new Random(seed);
        var result = new List<string>(count);
        for (int i = 0; i < count; i++)
        {
            result.Add(name == "rectangles"
                ? $"{random.Next(1, size + 1)}x{random.Next(1, size + 1)}"
                : string.Join(" + ", Enumerable.Range(0, size).Select(_ => $"{random.Next(1, 9)}x{random.Next(1, 9)}")));
        }
        return result;
    }
}
