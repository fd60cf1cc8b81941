using Bramble.Rules.Hackenbush;
using Bramble.Values;

namespace Bramble.Rules.Tests.Hackenbush;

/// <summary>Moves, cuts, components and hashes against the tests' own model of the rules.</summary>
public sealed class PlayTests
{
    private readonly HackenbushRuleset _rules = new();

    /// <summary>The model's edges still grounded, by the same plain fixpoint as the brute force.</summary>
    private static HashSet<int> Grounded(Drawing d, HashSet<int> alive)
    {
        var nodes = new HashSet<int> { 0 };
        var kept = new HashSet<int>();
        bool grew = true;
        while (grew)
        {
            grew = false;
            foreach (int i in alive)
            {
                if (kept.Contains(i)) continue;
                var (_, a, b) = d.Edges[i];
                if (nodes.Contains(a) || nodes.Contains(b)) { kept.Add(i); nodes.Add(a); nodes.Add(b); grew = true; }
            }
        }
        return kept;
    }

    [Fact]
    public void RandomGamesFollowTheModel()
    {
        var random = new Random(8);
        for (int game = 0; game < 300; game++)
        {
            var d = Shapes.Sum(random, 1 + random.Next(14), "BRG");
            IPosition p = _rules.Parse(d.Bracket());
            var alive = Enumerable.Range(0, d.Count).ToHashSet();
            var side = random.Next(2) == 0 ? Side.Left : Side.Right;
            while (true)
            {
                var expectedMoves = alive.Where(i => Drawing.MayCut(d.Edges[i].Colour, side == Side.Left)).Select(i => new Move(i + 1)).OrderBy(m => m.A);
                var moves = p.Moves(side);
                Assert.Equal(expectedMoves, moves);
                if (moves.Count == 0) break;
                var move = moves[random.Next(moves.Count)];
                p = p.Play(side, move);
                alive.Remove(move.A - 1);
                alive = Grounded(d, alive);
                Assert.Equal(alive.Select(i => i + 1).OrderBy(x => x), ((HackenbushPosition)p).Edges.Select(e => e.Id.Value));
                side = side.Other();
            }
        }
    }

    [Fact]
    public void IllegalMovesAreRefused()
    {
        var p = _rules.Parse("BRG");
        Assert.Throws<IllegalMoveException>(() => p.Play(Side.Left, new Move(2)));   // red
        Assert.Throws<IllegalMoveException>(() => p.Play(Side.Right, new Move(1)));  // blue
        Assert.Throws<IllegalMoveException>(() => p.Play(Side.Left, new Move(9)));   // no such edge
        var q = p.Play(Side.Left, new Move(1));
        Assert.Throws<IllegalMoveException>(() => q.Play(Side.Right, new Move(3)));  // gone with its support
    }

    [Theory]
    [InlineData("e7", 7)]
    [InlineData(" E12 ", 12)]
    public void MovesParse(string text, int id)
    {
        var p = _rules.Parse("B");
        Assert.Equal(new Move(id), p.ParseMove(text));
        Assert.Equal($"e{id}", p.FormatMove(new Move(id)));
    }

    [Theory]
    [InlineData("7")]
    [InlineData("e")]
    [InlineData("e-1")]
    [InlineData("x7")]
    [InlineData("e0")]
    public void BadMoveTextIsRefused(string text) =>
        Assert.Throws<IllegalMoveException>(() => _rules.Parse("B").ParseMove(text));

    [Fact]
    public void ComponentsAreThePiecesMeetingOnlyAtTheGround()
    {
        var p = _rules.Parse("BR + G(B,R) + [B0-1,R1-2,G2-0,B1-3,G0-0]");
        var parts = p.Components();
        var ids = parts.Select(c => string.Join(",", c.Moves(Side.Left).Concat(c.Moves(Side.Right)).Select(m => m.A).Distinct().OrderBy(x => x))).ToList();
        Assert.Equal(["1,2", "3,4,5", "6,7,8,9", "10"], ids);
    }

    [Fact]
    public void AMoveFoundInAComponentPlaysOnTheWholePosition()
    {
        var random = new Random(31);
        var context = new ValueContext();
        for (int i = 0; i < 100; i++)
        {
            var p = _rules.Parse(Shapes.Sum(random, 3 + random.Next(10), "BRG").Bracket());
            var parts = p.Components();
            var part = parts[random.Next(parts.Count)];
            var moves = part.Moves(Side.Right);
            if (moves.Count == 0) continue;
            var move = moves[random.Next(moves.Count)];
            var whole = p.Play(Side.Right, move);
            // The whole after the move is the other pieces plus the piece after the move.
            var expected = context.Store.Sum(parts.Where(c => c != part).Select(c => _rules.Value(c, context)).Append(_rules.Value(part.Play(Side.Right, move), context)));
            Assert.Equal(expected, _rules.Value(whole, context));
        }
    }

    [Fact]
    public void HashIsIncrementalAndOrderIndependent()
    {
        var p = _rules.Parse("[G0-1,G1-2,G2-0,B1-3,R3-4,G0-5]");
        var a = p.Play(Side.Left, new Move(4)).Play(Side.Right, new Move(6));
        var b = p.Play(Side.Right, new Move(6)).Play(Side.Left, new Move(4));
        Assert.Equal(a.Hash, b.Hash);
        Assert.NotEqual(p.Hash, a.Hash);
        // Same edges reached another way (cutting e4 also drops e5) hash alike too.
        var c = p.Play(Side.Left, new Move(4));
        Assert.DoesNotContain(new Move(5), c.Moves(Side.Right));
        Assert.Equal(c.Hash, p.Play(Side.Right, new Move(5)).Play(Side.Left, new Move(4)).Hash);
    }
}
