using Bramble.Rules.Hackenbush;
using Bramble.Values;

namespace Bramble.Rules.Tests.Hackenbush;

/// <summary>
/// The subset search on the shapes it exists for — one big block (a circuit through the ground
/// with chords), with and without stalks hanging at its vertices, so that the bit-set block
/// decomposition, the green fusion inside the search, the dropping of dominated number options
/// and the moves inside hanging values are all exercised — against plain brute force
/// (<see cref="BruteForce"/>), on random positions from a fixed random source.
/// </summary>
public sealed class BlockSearchTests
{
    private readonly HackenbushRuleset _rules = new();

    /// <summary>A circuit of k vertices through the ground, chords between random vertices, then stalks hanging at random vertices.</summary>
    private static Drawing Block(Random random, int circuit, int chords, int hanging, string palette)
    {
        var d = new Drawing();
        for (int v = 0; v < circuit; v++) d.Add(Shapes.Colour(random, palette), v, (v + 1) % circuit);
        for (int i = 0; i < chords; i++)
        {
            int a = random.Next(circuit), b = random.Next(circuit);
            d.Add(Shapes.Colour(random, palette), a, b); // a == b gives a loop, a repeated pair parallel edges
        }
        int next = circuit;
        for (int i = 0; i < hanging; i++)
        {
            int at = random.Next(circuit);
            d.Add(Shapes.Colour(random, palette), at, next);
            at = next++;
            if (random.Next(2) == 0) { d.Add(Shapes.Colour(random, palette), at, next); next++; i++; }
        }
        return d;
    }

    [Theory]
    [InlineData("BRG")]
    [InlineData("BR")]
    [InlineData("BG")]
    [InlineData("RG")]
    public void OneBigBlockEqualsBruteForce(string palette)
    {
        var context = new ValueContext();
        var random = new Random(4100 + palette.Length * 13 + palette[^1]);
        for (int i = 0; i < 40; i++)
        {
            int circuit = 3 + random.Next(4);
            var d = Block(random, circuit, 2 + random.Next(4), random.Next(4), palette);
            var expected = new BruteForce(d, context.Store).Value();
            var actual = _rules.Value(_rules.Parse(d.Bracket()), context);
            Assert.True(expected == actual,
                $"{d.Bracket()}: brute force {context.Store.Format(expected, true)}, evaluator {context.Store.Format(actual, true)}");
        }
    }

    [Fact]
    public void SumOfBlocksEqualsSumOfBruteForceValues()
    {
        var context = new ValueContext();
        var store = context.Store;
        var random = new Random(4242);
        for (int i = 0; i < 10; i++)
        {
            var a = Block(random, 4, 3, 1, "BRG");
            var b = Block(random, 3, 3, 2, "BRG");
            var expected = store.Add(new BruteForce(a, store).Value(), new BruteForce(b, store).Value());
            var actual = _rules.Value(_rules.Parse(a.Bracket() + " + " + b.Bracket()), context);
            Assert.True(expected == actual, $"{a.Bracket()} + {b.Bracket()}: brute force {store.Format(expected, true)}, evaluator {store.Format(actual, true)}");
        }
    }
}
