using Bramble.Values;

namespace Bramble.Rules.Tests.NewRulesets;

public class KonaneTests
{
    private readonly IRuleset _rules = Rulesets.Get("konane");
    private readonly ValueContext _context = new();

    private Game V(string text) => _rules.Value(_rules.Parse(text), _context);
    private Game G(string value) => _context.Store.Parse(value);

    [Fact]
    public void SmallLinesWorkedFromTheRules()
    {
        // Derived from the definitions (the rules as stated by Ernst, "Playing Konane mathematically", UMAP
        // Journal 16(2), 1995; his tables of values were not retrieved, so none is quoted here).
        // xo. : Left's one jump leaves a lone stone (0), Right has none: {0|} = 1.
        Assert.Equal(G("1"), V("xo."));
        Assert.Equal(G("-1"), V(".xo"));
        Assert.Equal(G("0"), V("xo"));
        // xo.o. : Left may stop after one jump (..xo. = {0|0} = *) or go on (....x = 0); Right cannot move: {0,*|} = 1.
        Assert.Equal(G("*"), V("..xo."));
        Assert.Equal(G("1"), V("xo.o."));
    }

    [Fact]
    public void RandomBoardsMatchPlainSearchSplitExactlyAndImagesAgree()
    {
        var plain = new PlainGame(_context.Store, (t, s) => PlainGame.StoneOptions(t, s, konane: true));
        var random = new Random(1995);
        int split = 0;
        for (int i = 0; i < 2000; i++)
        {
            string text;
            if (i % 2 == 0)
            {
                int h = random.Next(1, 4), w = random.Next(2, 6);
                text = string.Join("/", Enumerable.Range(0, h).Select(_ => new string(Enumerable.Range(0, w).Select(_ => "xo.."[random.Next(4)]).ToArray())));
            }
            else
            {
                // Two short lines with a gap between: far enough apart, they are separate components.
                string Patch() => new(Enumerable.Range(0, random.Next(2, 5)).Select(_ => "xo."[random.Next(3)]).ToArray());
                text = Patch() + new string('.', random.Next(1, 8)) + Patch();
            }
            // Common practice: the memoised value equals plain search of the whole board, and the groups' values add up to it.
            var (position, value, splits) = plain.Check(_rules, _context, text);
            if (splits) split++;
            // Derived from the rules: a half turn keeps the game; swapping colours swaps the players.
            string turned = new(text.Reverse().ToArray());
            string swapped = new(text.Select(c => c == 'x' ? 'o' : c == 'o' ? 'x' : c).ToArray());
            Assert.Equal(position.NormalKey, _rules.Parse(turned).NormalKey);
            if (i < 500)
            {
                // A fresh memo, so the image is searched rather than read from the original's entry.
                Assert.True(value == _rules.Value(_rules.Parse(turned), new ValueContext(_context.Store)), turned);
                Assert.True(_context.Store.Negate(value) == _rules.Value(_rules.Parse(swapped), new ValueContext(_context.Store)), swapped);
            }
        }
        Assert.True(split > 40, $"only {split} boards split");
    }

    [Fact]
    public void NoStoneEverLeavesItsGroupsBoxWidenedByHalfItsStones()
    {
        // Derived from the rules (the proof is in docs/konane.md): a group of n stones left to itself
        // never puts a stone more than ⌊n/2⌋ rows or columns beyond its bounding box. Checked here by
        // walking every sequence of moves of either side (a player may always play elsewhere in a sum),
        // with the jumps written in the test, on random groups in the middle of a wide empty board.
        var random = new Random(95);
        int attained = 0;
        for (int i = 0; i < 300; i++)
        {
            int n = random.Next(2, 8), h = random.Next(1, 4), w = random.Next(1, 4);
            int margin = n;
            int rows = h + 2 * margin, columns = w + 2 * margin;
            var grid = Enumerable.Range(0, rows).Select(_ => new char[columns].Select(_ => '.').ToArray()).ToArray();
            for (int k = 0; k < n; k++) grid[margin + random.Next(h)][margin + random.Next(w)] = "xo"[random.Next(2)];
            int stones = grid.Sum(r => r.Count(c => c != '.'));
            int top = int.MaxValue, bottom = -1, left = int.MaxValue, right = -1;
            for (int r = 0; r < rows; r++)
                for (int c = 0; c < columns; c++)
                    if (grid[r][c] != '.') { top = Math.Min(top, r); bottom = Math.Max(bottom, r); left = Math.Min(left, c); right = Math.Max(right, c); }
            string start = string.Join("/", grid.Select(r => new string(r)));
            var seen = new HashSet<string> { start };
            var queue = new Queue<string>([start]);
            int farthest = 0;
            while (queue.Count > 0)
            {
                var text = queue.Dequeue();
                var lines = text.Split('/');
                for (int r = 0; r < rows; r++)
                    for (int c = 0; c < columns; c++)
                        if (lines[r][c] != '.')
                            farthest = Math.Max(farthest, Math.Max(Math.Max(top - r, r - bottom), Math.Max(left - c, c - right)));
                foreach (var side in new[] { Side.Left, Side.Right })
                    foreach (var next in PlainGame.StoneOptions(text, side, konane: true))
                        if (seen.Add(next)) queue.Enqueue(next);
            }
            Assert.True(farthest <= stones / 2, $"{start}: a stone went {farthest} beyond the box with {stones} stones");
            if (farthest == stones / 2 && farthest > 0) attained++;
        }
        // The bound is reached by some groups (so it is not loose by a wide margin).
        Assert.True(attained > 0);
    }

    [Fact]
    public void GroupsNearEachOtherOnBoardsWithEdgesMatchPlainSearch()
    {
        // Common practice: the split and the keys, which use the reach bounds, checked against plain search
        // of the whole board on random two-dimensional boards with groups at every distance from each other and
        // from the edges.
        var plain = new PlainGame(_context.Store, (t, s) => PlainGame.StoneOptions(t, s, konane: true));
        var random = new Random(1993);
        int split = 0;
        for (int i = 0; i < 2000; i++)
        {
            int h = random.Next(2, 6), w = random.Next(5, 11);
            var grid = Enumerable.Range(0, h).Select(_ => Enumerable.Repeat('.', w).ToArray()).ToArray();
            int groups = random.Next(2, 4);
            for (int g = 0; g < groups; g++)
            {
                // A pair of opposing stones side by side (often able to jump), and sometimes a third stone by them.
                int r0 = random.Next(h), c0 = random.Next(w - 1);
                bool across = random.Next(2) == 0 || h < 2;
                if (!across) r0 = random.Next(h - 1);
                char first = "xo"[random.Next(2)];
                grid[r0][c0] = first;
                grid[across ? r0 : r0 + 1][across ? c0 + 1 : c0] = first == 'x' ? 'o' : 'x';
                if (random.Next(2) == 0)
                    grid[Math.Clamp(r0 + random.Next(-1, 2), 0, h - 1)][Math.Clamp(c0 + random.Next(-1, 3), 0, w - 1)] = "xo"[random.Next(2)];
            }
            if (plain.Check(_rules, _context, string.Join("/", grid.Select(r => new string(r)))).Split) split++;
        }
        Assert.True(split > 150, $"only {split} boards split");
    }

    [Fact]
    public void MovesJumpAlongALineAndMayStopAfterAnyJump()
    {
        var p = _rules.Parse("xo.o.");
        Assert.Equal(["a1-c1", "a1-e1"], p.Moves(Side.Left).Select(p.FormatMove));
        Assert.Equal("....x", p.Play(Side.Left, p.ParseMove("a1-e1")).Text);
        Assert.Equal("..xo.", p.Play(Side.Left, p.ParseMove("a1-c1")).Text);
        Assert.Throws<IllegalMoveException>(() => p.Play(Side.Left, p.ParseMove("a1-d1")));
        Assert.Throws<IllegalMoveException>(() => p.Play(Side.Right, p.ParseMove("b1-c1")));
        Assert.Throws<IllegalMoveException>(() => p.ParseMove("a1"));
    }

    [Fact]
    public void ReaderPointsAtFaults()
    {
        var e = Assert.Throws<PositionSyntaxException>(() => _rules.Parse("xo./x"));
        Assert.Equal(5, e.Column);
        foreach (var text in PlainGame.FuzzTexts(new Random(13), "xo./#4 x", ["xo./..x", "4x4"], 3000))
            PlainGame.ReadsOrPointsAtFault(_rules, text);
    }
}
