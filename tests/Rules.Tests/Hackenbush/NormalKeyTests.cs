using Bramble.Rules.Hackenbush;
using Bramble.Values;

namespace Bramble.Rules.Tests.Hackenbush;

/// <summary>Normal keys: the same for every relabelling, and equal keys only for equal values.</summary>
public sealed class NormalKeyTests
{
    private readonly HackenbushRuleset _rules = new();

    [Theory]
    [InlineData("BRG", 1)]
    [InlineData("G", 2)]
    [InlineData("BRG", 3)]
    [InlineData("BR", 4)]
    public void KeysIgnoreIdsNodeLabelsAndEdgeOrder(string palette, int seed)
    {
        var random = new Random(seed);
        for (int i = 0; i < 300; i++)
        {
            var d = random.Next(2) == 0 ? Shapes.Graph(random, 1 + random.Next(14), palette) : Shapes.Tree(random, 1 + random.Next(14), palette);
            var key = _rules.Parse(d.Bracket()).NormalKey;
            for (int k = 0; k < 3; k++)
            {
                var copy = d.Relabelled(random, out _);
                Assert.Equal(key, _rules.Parse(copy.Bracket()).NormalKey);
            }
        }
    }

    [Fact]
    public void SymmetricBlocksGetOneKey()
    {
        // Many twins and automorphisms: a bundle of parallel edges, a wheel-like block, a cube.
        var texts = new[]
        {
            "[B0-1,B0-1,B0-1,R0-1,R0-1,B0-1,R0-1,R0-1,B1-2,B1-2]",
            "[R0-1,R0-2,R0-3,R0-4,B1-2,B2-3,B3-4,B4-1]",
            "[B0-1,B1-2,B2-3,B3-0,B4-5,B5-6,B6-7,B7-4,R0-4,R1-5,R2-6,R3-7]",
        };
        var random = new Random(6);
        foreach (var text in texts)
        {
            var d = new Drawing();
            foreach (var part in text.Trim('[', ']').Split(','))
            {
                var ends = part[1..].Split('-');
                d.Add(part[0], int.Parse(ends[0]), int.Parse(ends[1]));
            }
            var key = _rules.Parse(text).NormalKey;
            for (int k = 0; k < 20; k++) Assert.Equal(key, _rules.Parse(d.Relabelled(random, out _).Bracket()).NormalKey);
        }
    }

    [Fact]
    public void EqualKeysMeanEqualValues()
    {
        // Keys may merge pieces with the same value (fused green parts), never pieces of different values.
        var store = new GameStore();
        var seen = new Dictionary<string, Game>();
        var random = new Random(10);
        int shared = 0;
        for (int i = 0; i < 1500; i++)
        {
            var palette = new[] { "G", "BR", "BRG", "BG" }[random.Next(4)];
            var d = random.Next(3) switch
            {
                0 => Shapes.Tree(random, 1 + random.Next(6), palette),
                1 => Shapes.Stalk(random, 1 + random.Next(5), palette),
                _ => Shapes.Graph(random, 1 + random.Next(7), palette),
            };
            var p = _rules.Parse(d.Bracket());
            if (p.Components().Count != 1) continue;
            var value = new BruteForce(d, store).Value();
            if (seen.TryGetValue(p.NormalKey, out var earlier))
            {
                shared++;
                Assert.True(earlier == value, $"{d.Bracket()} shares key {p.NormalKey} with a piece of another value");
            }
            else seen[p.NormalKey] = value;
        }
        Assert.True(shared > 100, "the sample should contain many repeated pieces");
    }

    [Fact]
    public void IsomorphicTreesShareAKeyAndDifferentTreesDoNot()
    {
        Assert.Equal(_rules.Parse("B(R,G(B,R))").NormalKey, _rules.Parse("B(G(R,B),R)").NormalKey);
        Assert.Equal(_rules.Parse("[B0-1,R1-2]").NormalKey, _rules.Parse("BR").NormalKey);
        Assert.NotEqual(_rules.Parse("BR").NormalKey, _rules.Parse("RB").NormalKey);
        Assert.NotEqual(_rules.Parse("B(R,R)").NormalKey, _rules.Parse("BRR").NormalKey);
        // A loop is a twig: cutting either removes just that edge.
        Assert.Equal(_rules.Parse("[B0-1,R1-1]").NormalKey, _rules.Parse("BR").NormalKey);
    }

    [Fact]
    public void MemoIsSharedByEqualPieces()
    {
        var context = new ValueContext();
        _rules.Value(_rules.Parse("[B0-1,R1-2,G2-0,B1-3] + [B0-5,R5-6,G6-0,B5-7]"), context);
        // Two equal pieces: one memo entry.
        Assert.Single(context.Memo);
    }
}
