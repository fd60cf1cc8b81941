using Bramble.Values;

namespace Bramble.Rules.Forms;

/// <summary>
/// Reproducible random sums for <c>bramble generate forms …</c>; size is the number of terms
/// (docs/forms.md). <c>hot</c> and <c>hot-extra</c> follow the random test sums used in the
/// literature for sums of hot games (the slides accompanying M. Müller and Z. Li,
/// "Locally informed global search for sums of combinatorial games", CG 2004).
/// </summary>
public static class FormsGenerators
{
    public static readonly IReadOnlyList<string> Names = ["switches", "hot", "hot-extra", "mixed"];

    public const int MaxTerms = 1000;

    public static IReadOnlyList<string> Generate(string generator, int count, int size, int seed)
    {
        if (count < 0) throw new ArgumentOutOfRangeException(nameof(count), "count must not be negative");
        Func<Random, ValueExpr> term = generator.ToLowerInvariant() switch
        {
            "switches" => Switch,
            "hot" => Hot,
            "hot-extra" => HotWithExtraOptions,
            "mixed" => Mixed,
            _ => throw new ArgumentException($"unknown forms generator '{generator}'; known: {string.Join(", ", Names)}"),
        };
        if (size < 1 || size > MaxTerms)
            throw new ArgumentOutOfRangeException(nameof(size), $"size (the number of terms) must be between 1 and {MaxTerms}");
        var random = new Random(seed);
        var result = new List<string>(count);
        for (int i = 0; i < count; i++)
            result.Add(string.Join(" + ", Enumerable.Range(0, size).Select(_ => FormsTerm.TextOf(term(random)))));
        return result;
    }

    private static NumberExpr N(long n) => new(Dyadic.FromInteger(n));

    private static OptionsExpr Braces(ValueExpr left, ValueExpr right) => new([left], [right]);

    /// <summary>{a | b} with integers a &gt; b: a hot switch of temperature (a − b)/2 between 1/2 and 10.</summary>
    private static ValueExpr Switch(Random random)
    {
        int b = random.Next(-20, 21);
        int a = b + 1 + random.Next(20);
        return Braces(N(a), N(b));
    }

    /// <summary>{a|b||c|d} with d = 0, c = d + rand(50), b = c + rand(50), a = b + rand(50), rand(n) uniform on 0..n−1.</summary>
    private static ValueExpr Hot(Random random)
    {
        var (a, b, c, d) = HotNumbers(random);
        return Braces(Braces(N(a), N(b)), Braces(N(c), N(d)));
    }

    private static (long A, long B, long C, long D) HotNumbers(Random random)
    {
        long d = 0;
        long c = d + random.Next(50);
        long b = c + random.Next(50);
        long a = b + random.Next(50);
        return (a, b, c, d);
    }

    /// <summary>
    /// The variant with extra options: beside Left's option A = {a|b} Left also gets
    /// {A + rand(10) | A + rand(10)}, where A + r = {a + r | b + r}; likewise Right beside B = {c|d}.
    /// </summary>
    private static ValueExpr HotWithExtraOptions(Random random)
    {
        var (a, b, c, d) = HotNumbers(random);
        ValueExpr Shifted(long x, long y, long r) => Braces(N(x + r), N(y + r));
        var leftExtra = Braces(Shifted(a, b, random.Next(10)), Shifted(a, b, random.Next(10)));
        var rightExtra = Braces(Shifted(c, d, random.Next(10)), Shifted(c, d, random.Next(10)));
        return new OptionsExpr([Braces(N(a), N(b)), leftExtra], [Braces(N(c), N(d)), rightExtra]);
    }

    /// <summary>A small term of a random kind: number, nimber, ups, ±x, a two-level hot game, or a small explicit form.</summary>
    private static ValueExpr Mixed(Random random)
    {
        switch (random.Next(6))
        {
            case 0:
                return new NumberExpr(Dyadic.Create(random.Next(-8, 9), random.Next(3)));
            case 1:
                return new UpStarExpr(Dyadic.Zero, 0, random.Next(1, 4));
            case 2:
                return new UpStarExpr(Dyadic.Zero, new[] { -2, -1, 1, 2 }[random.Next(4)], random.Next(2));
            case 3:
                return new SwitchExpr(Dyadic.Create(random.Next(1, 7), 1));
            case 4:
            {
                int d = random.Next(-2, 1), c = d + random.Next(3), b = c + random.Next(3), a = b + random.Next(3);
                return Braces(Braces(N(a), N(b)), Braces(N(c), N(d)));
            }
            default:
                return SmallForm(random, depth: 2);
        }
    }

    private static readonly ValueExpr[] s_atoms =
    [
        new NumberExpr(Dyadic.Zero), new UpStarExpr(Dyadic.Zero, 0, 1), new NumberExpr(Dyadic.One),
        new NumberExpr(Dyadic.MinusOne), new UpStarExpr(Dyadic.Zero, 1, 0), new NumberExpr(Dyadic.Half),
    ];

    private static ValueExpr SmallForm(Random random, int depth)
    {
        ValueExpr Option() => depth > 1 && random.Next(3) == 0 ? SmallForm(random, depth - 1) : s_atoms[random.Next(s_atoms.Length)];
        var left = Enumerable.Range(0, random.Next(1, 3)).Select(_ => Option()).ToArray();
        var right = Enumerable.Range(0, random.Next(0, 3)).Select(_ => Option()).ToArray();
        return new OptionsExpr(left, right);
    }
}
