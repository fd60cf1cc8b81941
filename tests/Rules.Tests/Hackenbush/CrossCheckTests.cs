using Bramble.Rules.Hackenbush;
using Bramble.Values;

namespace Bramble.Rules.Tests.Hackenbush;

/// <summary>
/// Every shortcut of the evaluator against plain brute-force search (<see cref="BruteForce"/>) on
/// thousands of seeded random small positions of every shape and colour mix. The shapes pick
/// the method: green pieces go through fusion and the colon principle, blue-red stalks through
/// sign expansion, trees through ordinal sums, graphs through hanging-part replacement and the
/// subset search.
/// </summary>
public sealed class CrossCheckTests
{
    private readonly HackenbushRuleset _rules = new();

    public static TheoryData<string, string> ShapesAndColours()
    {
        var data = new TheoryData<string, string>();
        foreach (var shape in new[] { "stalk", "tree", "graph", "sum" })
            foreach (var palette in new[] { "G", "BR", "BRG", "BG", "RG", "B" })
                data.Add(shape, palette);
        return data;
    }

    private static Drawing Make(string shape, Random random, string palette)
    {
        int n = 1 + random.Next(10);
        return shape switch
        {
            "stalk" => Shapes.Stalk(random, n, palette),
            "tree" => Shapes.Tree(random, n, palette),
            "graph" => Shapes.Graph(random, n, palette),
            _ => Shapes.Sum(random, n, palette),
        };
    }

    [Theory]
    [MemberData(nameof(ShapesAndColours))]
    public void ValueEqualsBruteForce(string shape, string palette)
    {
        var context = new ValueContext();
        var random = new Random(HashCode.Combine(shape.Length, palette.Length, palette[0], shape[0]));
        for (int i = 0; i < 120; i++)
        {
            var d = Make(shape, random, palette);
            var expected = new BruteForce(d, context.Store).Value();
            var actual = _rules.Value(_rules.Parse(d.Bracket()), context);
            Assert.True(expected == actual,
                $"{d.Bracket()}: brute force {context.Store.Format(expected, true)}, evaluator {context.Store.Format(actual, true)}");
        }
    }

    [Theory]
    [MemberData(nameof(ShapesAndColours))]
    public void OutcomeReadOffTheValueEqualsOutcomeFoundByPlay(string shape, string palette)
    {
        var context = new ValueContext();
        var random = new Random(17 + shape.Length * 31 + palette.Length * 7 + palette[0]);
        for (int i = 0; i < 60; i++)
        {
            var d = Make(shape, random, palette);
            var byPlay = new BruteForce(d, context.Store).OutcomeByPlay();
            var value = _rules.Value(_rules.Parse(d.Bracket()), context);
            Assert.True(byPlay == context.Store.OutcomeOf(value), $"{d.Bracket()}: play says {byPlay}, value {context.Store.Format(value, true)}");
        }
    }

    [Fact]
    public void FusionAndColonPrincipleEqualBruteForceOnGreenGraphs()
    {
        var store = new GameStore();
        var random = new Random(99);
        for (int i = 0; i < 600; i++)
        {
            var d = random.Next(3) == 0 ? Shapes.Sum(random, 1 + random.Next(12), "G") : Shapes.Graph(random, 1 + random.Next(12), "G");
            var expected = new BruteForce(d, store).Value();
            Assert.True(store.TryGetNimber(expected, out int nimber), d.Bracket());
            Assert.Equal(nimber, Fusion.NimValue(_rules.ParsePosition(d.Bracket())));
        }
    }

    [Fact]
    public void SignExpansionEqualsBruteForceOnBlueRedStalks()
    {
        var store = new GameStore();
        var random = new Random(5);
        for (int i = 0; i < 500; i++)
        {
            var d = Shapes.Stalk(random, 1 + random.Next(14), "BR");
            Assert.True(store.TryGetNumber(new BruteForce(d, store).Value(), out var expected));
            var colours = d.Edges.Select(e => e.Colour == 'B' ? EdgeColour.Blue : EdgeColour.Red);
            Assert.Equal(expected, SignExpansion.Stalk(colours));
        }
    }

    [Fact]
    public void BlueEdgeCarryingXIsTheOrdinalSumFormula()
    {
        // Winning Ways vol. 1 ch. 2; On Numbers and Games trees: 1:x = x + 1 for x ≥ 0, else (x + j)/2^(j−1) with j the least positive
        // integer such that x + j > 1 [M formula; the ordinal sum itself is P]. Checked here against
        // brute force too, so the remembered formula is confirmed rather than trusted.
        var context = new ValueContext();
        var random = new Random(3);
        for (int i = 0; i < 300; i++)
        {
            var above = Shapes.Sum(random, 1 + random.Next(8), "BR");
            var withStem = new Drawing().Add('B', 0, 1000);
            foreach (var (c, a, b) in above.Edges) withStem.Add(c, a == 0 ? 1000 : a, b == 0 ? 1000 : b);
            Assert.True(context.Store.TryGetNumber(new BruteForce(above, context.Store).Value(), out var x));
            Dyadic expected;
            if (x >= Dyadic.Zero) expected = x + Dyadic.One;
            else
            {
                int j = 1;
                while (x + j <= Dyadic.One) j++;
                expected = (x + j).Shift(j - 1);
            }
            Assert.Equal(context.Store.Number(expected), _rules.Value(_rules.Parse(withStem.Bracket()), context));
            Assert.Equal(context.Store.Number(expected), new BruteForce(withStem, context.Store).Value());
        }
    }

    [Fact]
    public void TreeNotationAndBracketNotationAgree()
    {
        var context = new ValueContext();
        var random = new Random(12);
        for (int i = 0; i < 300; i++)
        {
            var d = new Drawing();
            for (int t = 1 + random.Next(3); t > 0; t--) Shapes.Tree(random, 1 + random.Next(5), "BRG", d);
            var text = Shapes.TreeText(d, out _);
            var fromTrees = _rules.Parse(text);
            var fromGraph = _rules.Parse(d.Bracket());
            Assert.Equal(new BruteForce(d, context.Store).Value(), _rules.Value(fromTrees, context));
            Assert.Equal(fromGraph.NormalKey, fromTrees.NormalKey);
        }
    }

    [Fact]
    public void WholeValueIsTheSumOfComponentValues()
    {
        var context = new ValueContext();
        var random = new Random(21);
        for (int i = 0; i < 200; i++)
        {
            var p = _rules.Parse(Shapes.Sum(random, 2 + random.Next(10), "BRG").Bracket());
            var sum = context.Store.Sum(p.Components().Select(c => _rules.Value(c, context)));
            Assert.Equal(sum, _rules.Value(p, context));
        }
    }

    [Fact]
    public void LargerCircuitsOfMixedEdgesEqualBruteForce()
    {
        // Bigger blocks than the shape tests: a circuit through the ground with chords and a few twigs.
        var context = new ValueContext();
        var random = new Random(77);
        for (int i = 0; i < 40; i++)
        {
            var d = new Drawing();
            int n = 4 + random.Next(6);
            for (int v = 0; v < n; v++) d.Add(Shapes.Colour(random, "BRG"), v, v + 1 == n ? 0 : v + 1);
            for (int c = random.Next(4); c > 0; c--) d.Add(Shapes.Colour(random, "BRG"), random.Next(n), random.Next(n));
            for (int t = random.Next(3); t > 0; t--) d.Add(Shapes.Colour(random, "BRG"), 1 + random.Next(n - 1), 100 + t);
            var expected = new BruteForce(d, context.Store).Value();
            Assert.Equal(expected, _rules.Value(_rules.Parse(d.Bracket()), context));
        }
    }
}
