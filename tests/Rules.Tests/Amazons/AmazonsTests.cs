using Bramble.Rules.Tests.NewRulesets;
using Bramble.Values;

namespace Bramble.Rules.Tests.Amazons;

public class AmazonsTests
{
    private readonly IRuleset _rules = Rulesets.Get("amazons");
    private readonly ValueContext _context = new();

    private Game V(string text) => _rules.Value(_rules.Parse(text), _context);
    private Game G(string value) => _context.Store.Parse(value);

    /// <summary>
    /// Amazons moves on a board text "L.#/..R", written here from the rules (Zamkauskas's rules as
    /// stated by Lieberum 2005, §1): an amazon moves like a chess queen over empty squares, then
    /// shoots an arrow like a queen from where it landed; the arrow's square is burnt.
    /// </summary>
    private static IEnumerable<string> PlainOptions(string text, Side side)
    {
        var rows = text.Split('/');
        int h = rows.Length, w = rows[0].Length;
        char mine = side == Side.Left ? 'L' : 'R';
        var seen = new HashSet<string>(StringComparer.Ordinal);
        (int, int)[] dirs = [(1, 0), (-1, 0), (0, 1), (0, -1), (1, 1), (1, -1), (-1, 1), (-1, -1)];
        for (int r = 0; r < h; r++)
            for (int c = 0; c < w; c++)
            {
                if (rows[r][c] != mine) continue;
                foreach (var (dr, dc) in dirs)
                    for (int r1 = r + dr, c1 = c + dc; r1 >= 0 && r1 < h && c1 >= 0 && c1 < w && rows[r1][c1] == '.'; r1 += dr, c1 += dc)
                    {
                        var grid = rows.Select(x => x.ToCharArray()).ToArray();
                        grid[r][c] = '.';
                        grid[r1][c1] = mine;
                        foreach (var (ar, ac) in dirs)
                            for (int r2 = r1 + ar, c2 = c1 + ac; r2 >= 0 && r2 < h && c2 >= 0 && c2 < w && grid[r2][c2] == '.'; r2 += ar, c2 += ac)
                            {
                                grid[r2][c2] = '#';
                                string s = string.Join("/", grid.Select(x => new string(x)));
                                grid[r2][c2] = '.';
                                if (seen.Add(s)) yield return s;
                            }
                    }
            }
    }

    private static string RandomBoard(Random random, int h, int w, int maxEmpty = 6)
    {
        var cells = Enumerable.Range(0, h * w).Select(_ => random.Next(10) switch { 0 or 1 => '#', 2 => 'L', 3 => 'R', _ => '.' }).ToArray();
        // Few amazons keep the plain search quick: at most two of each side.
        int left = 0, right = 0;
        for (int i = 0; i < cells.Length; i++)
        {
            if (cells[i] == 'L' && ++left > 2) cells[i] = '.';
            if (cells[i] == 'R' && ++right > 2) cells[i] = '.';
        }
        // And few empty squares: at most six (the plain search's game trees grow fast with them).
        int empty = 0;
        for (int i = 0; i < cells.Length; i++)
            if (cells[i] == '.' && ++empty > maxEmpty) cells[i] = '#';
        return string.Join("/", Enumerable.Range(0, h).Select(r => new string(cells, r * w, w)));
    }

    private static string Transpose(string text)
    {
        var rows = text.Split('/');
        return string.Join("/", Enumerable.Range(0, rows[0].Length).Select(c => new string(rows.Select(r => r[c]).ToArray())));
    }

    private static string Mirror(string text) => string.Join("/", text.Split('/').Select(r => new string(r.Reverse().ToArray())));

    private static string SwapColours(string text) => new(text.Select(c => c == 'L' ? 'R' : c == 'R' ? 'L' : c).ToArray());

    [Fact]
    public void TinyRegionsWorkedFromTheRules()
    {
        // Derived from the rules: on L. the amazon steps over and shoots back where it stood (1 move), then nothing: {0|} = 1.
        Assert.Equal(G("1"), V("L."));
        Assert.Equal(G("-1"), V("R."));
        // L.R: either side's one move (step to the middle, shoot back) ends the game: {0|0} = *.
        Assert.Equal(G("*"), V("L.R"));
        // L.. in a row: step one and shoot back, then step again (2 moves); or jump two and shoot back, leaving L# + 1 more? Derived: 2.
        Assert.Equal(G("2"), V("L.."));
        // A region without amazons or without an empty square counts for nothing.
        Assert.Equal(G("0"), V("..#/###/#LR"));
        Assert.Empty(_rules.Parse("..#/###/#LR").Components());
    }

    [Fact]
    public void StartLayoutIsTheStandardTenByTen()
    {
        // The standard opening (Lieberum 2005, Fig. 1; from memory as squares): white amazons on a4, d1, g1, j4 and
        // black on a7, d10, g10, j7 in chess-style names (row 1 at White's side). Bramble counts rows from the top,
        // so Left (White, moving first in the tournament game) stands on rows 7 and 10.
        var p = (Bramble.Rules.Amazons.AmazonsPosition)_rules.Parse("start");
        var b = p.Board;
        string Letter(string cell) { int i = 0; return b[b.ReadCell(cell, ref i)!.Value].ToString(); }
        foreach (var cell in new[] { "a7", "d10", "g10", "j7" }) Assert.Equal("LeftAmazon", Letter(cell));
        foreach (var cell in new[] { "a4", "d1", "g1", "j4" }) Assert.Equal("RightAmazon", Letter(cell));
        // From memory (a figure widely quoted for the standard start): the first player has 2176 legal moves.
        Assert.Equal(2176, p.Moves(Side.Left).Count);
        Assert.Equal(2176, p.Moves(Side.Right).Count);
        // Müller's 6x5 diagram (webdocs.cs.ualberta.ca/~mmueller/amazons/6x5-solution.html, six columns, five rows):
        // "5 . B . . B . / 4 B . . . . B / 3 . . . . . . / 2 W . . . . W / 1 . W . . W ." — rows from its top down.
        Assert.Equal(".RR./R..R/L..L/.LL.".Length, _rules.Parse("start 4x4").Text.Length);
        Assert.Equal(".R..R./R....R/....../L....L/.L..L.", _rules.Parse("start 5x6").Text);
    }

    [Fact]
    public void FourByFourStartIsASecondPlayerWin()
    {
        // Müller, "Solving 5x5 Amazons" (2001 talk slides): "4x4 too easy, 2nd player win ❙ Proof needs only about
        // 6000 nodes". The 4x4 layout used there is not quoted; Bramble's start 4x4 follows the published 6x5 pattern.
        var start = _rules.Parse("start 4x4");
        var memo = new Dictionary<(string, Side), bool>();
        // A plain win/loss search over the position's own moves, memoised by text (no values, no regions).
        bool Wins(IPosition p, Side toMove)
        {
            if (memo.TryGetValue((p.Text, toMove), out bool known)) return known;
            bool win = p.Moves(toMove).Any(m => !Wins(p.Play(toMove, m), toMove.Other()));
            memo[(p.Text, toMove)] = win;
            return win;
        }
        Assert.False(Wins(start, Side.Left));
        Assert.False(Wins(start, Side.Right));
    }

    [Fact]
    public void RandomBoardsMatchPlainSearchSplitExactlyAndImagesAgree()
    {
        var plain = new PlainGame(_context.Store, PlainOptions);
        var random = new Random(2005);
        int split = 0, hot = 0;
        for (int i = 0; i < 700; i++)
        {
            string text;
            if (i % 2 == 0)
            {
                int h = random.Next(1, 4), w = random.Next(2, 5);
                text = RandomBoard(random, h, w);
            }
            else
            {
                // Two small patches side by side with a burnt column between: separate regions.
                int h = random.Next(1, 3);
                var a = RandomBoard(random, h, random.Next(1, 4), maxEmpty: 3).Split('/');
                var b = RandomBoard(random, h, random.Next(1, 3), maxEmpty: 3).Split('/');
                text = string.Join("/", a.Zip(b, (x, y) => x + "#" + y));
            }
            var position = _rules.Parse(text);
            var value = _rules.Value(position, _context);
            // Common practice: the memoised value (regions, one-sided counts, symmetry) equals plain search of the whole board.
            Assert.True(plain.Value(text) == value, text);
            var parts = position.Components();
            if (parts.Count > 1) split++;
            if (!_context.Store.IsNumber(value)) hot++;
            // Common practice: the regions' values add up to the whole searched as one.
            Assert.True(_context.Store.Sum(parts.Select(c => plain.Value(c.Text))) == value, text);
            // Derived from the rules: the board's symmetries keep the game; swapping colours swaps the players.
            foreach (var image in new[] { Mirror(text), Transpose(text), Mirror(Transpose(text)) })
                Assert.Equal(position.NormalKey, _rules.Parse(image).NormalKey);
            if (i < 100)
            {
                Assert.True(value == _rules.Value(_rules.Parse(Transpose(text)), new ValueContext(_context.Store)), text);
                Assert.True(_context.Store.Negate(value) == _rules.Value(_rules.Parse(SwapColours(text)), new ValueContext(_context.Store)), text);
            }
        }
        Assert.True(split > 20 && hot > 20, $"{split} boards split, {hot} were not numbers");
    }

    [Fact]
    public void MovesAreNamedFromToArrow()
    {
        var p = _rules.Parse("L.#/...");
        var moves = p.Moves(Side.Left).Select(p.FormatMove).ToList();
        Assert.Contains("a1-b1/a1", moves);
        Assert.Contains("a1-b2/c2", moves);
        Assert.Equal(moves.Count, moves.Distinct().Count());
        var after = p.Play(Side.Left, p.ParseMove("a1-b2/c2"));
        Assert.Equal("..#/.L#", after.Text);
        Assert.Equal(p.ParseMove("a1-b2/c2"), p.ParseMove("a1 b2 c2"));
        Assert.Equal(p.ParseMove("a1-b2/c2"), p.ParseMove("A1-B2(C2)"));
        // Through a burnt square, onto an occupied one, and the wrong side's amazon are refused.
        Assert.Throws<IllegalMoveException>(() => p.Play(Side.Left, p.ParseMove("a1-c1/c2")));
        Assert.Throws<IllegalMoveException>(() => p.Play(Side.Right, p.ParseMove("a1-b1/a1")));
        Assert.Throws<IllegalMoveException>(() => p.Play(Side.Left, p.ParseMove("a1-b1/d1")));
        Assert.Throws<IllegalMoveException>(() => p.ParseMove("a1-b1"));
        Assert.Throws<IllegalMoveException>(() => p.ParseMove("a1-b1/z9"));
    }

    [Fact]
    public void ReaderPointsAtFaults()
    {
        var e = Assert.Throws<PositionSyntaxException>(() => _rules.Parse("L./..x"));
        Assert.Equal(5, e.Column);
        e = Assert.Throws<PositionSyntaxException>(() => _rules.Parse("L./."));
        Assert.Equal(4, e.Column);
        e = Assert.Throws<PositionSyntaxException>(() => _rules.Parse("start 3x5"));
        Assert.Equal(6, e.Column);
        e = Assert.Throws<PositionSyntaxException>(() => _rules.Parse("..........."));
        Assert.Equal(10, e.Column);
        foreach (var text in PlainGame.FuzzTexts(new Random(88), "LR#./lr start5x9", ["L.#/..R", "start 5x5", "start"], 3000))
            PlainGame.ReadsOrPointsAtFault(_rules, text);
    }

    [Fact]
    public void GeneratorsMakeReadableBoardsAndHotEndgames()
    {
        foreach (var name in _rules.Generators)
        {
            int size = name switch { "starts" => 6, "endgames" => 3, "regions" => 8, _ => 10 };
            var texts = _rules.Generate(name, 4, size, seed: 7);
            Assert.Equal(texts, _rules.Generate(name, 4, size, seed: 7));
            foreach (var t in texts) Assert.Equal(t, _rules.Parse(t).Text);
        }
        foreach (var t in _rules.Generate("endgames", 3, 4, seed: 11))
        {
            var parts = _rules.Parse(t).Components();
            Assert.Equal(4, parts.Count);
            Assert.Contains(parts, c => _context.Store.Temperature(_rules.Value(c, _context)) > Dyadic.Zero);
        }
    }
}
