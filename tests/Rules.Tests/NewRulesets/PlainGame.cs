using Bramble.Values;

namespace Bramble.Rules.Tests.NewRulesets;

/// <summary>
/// Plain recursive search over position texts, with move rules written here from the published
/// rules (not the code under test): no split into components, no symmetry, memo by the whole
/// text only. The value of a text is { values after Left's moves | values after Right's moves }.
/// </summary>
public sealed class PlainGame(GameStore store, Func<string, Side, IEnumerable<string>> options)
{
    private readonly Dictionary<string, Game> _memo = new(StringComparer.Ordinal);

    public Game Value(string text)
    {
        if (_memo.TryGetValue(text, out var known)) return known;
        var value = store.Make(options(text, Side.Left).Select(Value).ToList(), options(text, Side.Right).Select(Value).ToList());
        _memo[text] = value;
        return value;
    }

    /// <summary>
    /// Common practice, the check every ruleset's random test makes: the memoised value of the text
    /// equals plain search of the whole, and the components' values (plain search of each) add up to
    /// it. Returns the position and its value, and whether it split into more than one component.
    /// </summary>
    public (IPosition Position, Game Value, bool Split) Check(IRuleset rules, ValueContext context, string text)
    {
        var position = rules.Parse(text);
        var value = rules.Value(position, context);
        Assert.True(Value(text) == value, text);
        var parts = position.Components();
        Assert.True(store.Sum(parts.Select(c => Value(c.Text))) == value, text);
        return (position, value, parts.Count > 1);
    }

    /// <summary>Toads and Frogs on a strip of T, F, '.', '#' (wall): toads step or jump right, frogs left.</summary>
    public static IEnumerable<string> StripOptions(string s, Side side)
    {
        char mine = side == Side.Left ? 'T' : 'F', theirs = side == Side.Left ? 'F' : 'T';
        int step = side == Side.Left ? 1 : -1;
        for (int i = 0; i < s.Length; i++)
        {
            if (s[i] != mine) continue;
            int to = -1;
            if (In(s, i + step) && s[i + step] == '.') to = i + step;
            else if (In(s, i + step) && s[i + step] == theirs && In(s, i + 2 * step) && s[i + 2 * step] == '.') to = i + 2 * step;
            if (to < 0) continue;
            var c = s.ToCharArray();
            c[i] = '.';
            c[to] = mine;
            yield return new string(c);
        }
    }

    private static bool In(string s, int i) => i >= 0 && i < s.Length;

    /// <summary>Stone boards "xo./..o" for Clobber (clobber a neighbour) or Konane (jump lines).</summary>
    public static IEnumerable<string> StoneOptions(string text, Side side, bool konane)
    {
        var rows = text.Split('/');
        int h = rows.Length, w = rows[0].Length;
        char mine = side == Side.Left ? 'x' : 'o', theirs = side == Side.Left ? 'o' : 'x';
        (int, int)[] steps = [(1, 0), (-1, 0), (0, 1), (0, -1)];
        bool Inside(int r, int c) => r >= 0 && r < h && c >= 0 && c < w;
        for (int r = 0; r < h; r++)
            for (int c = 0; c < w; c++)
            {
                if (rows[r][c] != mine) continue;
                foreach (var (dr, dc) in steps)
                {
                    if (!konane)
                    {
                        if (Inside(r + dr, c + dc) && rows[r + dr][c + dc] == theirs)
                            yield return Set(rows, (r, c, '.'), (r + dr, c + dc, mine));
                        continue;
                    }
                    var grid = rows.Select(x => x.ToCharArray()).ToArray();
                    int cr = r, cc = c;
                    while (Inside(cr + 2 * dr, cc + 2 * dc) && grid[cr + dr][cc + dc] == theirs && grid[cr + 2 * dr][cc + 2 * dc] == '.')
                    {
                        grid[cr][cc] = '.';
                        grid[cr + dr][cc + dc] = '.';
                        cr += 2 * dr;
                        cc += 2 * dc;
                        grid[cr][cc] = mine;
                        yield return string.Join("/", grid.Select(x => new string(x)));
                    }
                }
            }
    }

    private static string Set(string[] rows, params (int R, int C, char Ch)[] changes)
    {
        var grid = rows.Select(x => x.ToCharArray()).ToArray();
        foreach (var (r, c, ch) in changes) grid[r][c] = ch;
        return string.Join("/", grid.Select(x => new string(x)));
    }

    /// <summary>Cutcake as a sorted list "RxC+RxC": Left cuts between columns, Right between rows.</summary>
    public static IEnumerable<string> CakeOptions(string text, Side side)
    {
        var pieces = text == "0" ? [] : text.Split('+').Select(p => p.Split('x').Select(int.Parse).ToArray()).ToList();
        for (int i = 0; i < pieces.Count; i++)
        {
            int along = side == Side.Left ? pieces[i][1] : pieces[i][0];
            for (int k = 1; k < along; k++)
            {
                var rest = pieces.Where((_, j) => j != i).Select(p => $"{p[0]}x{p[1]}").ToList();
                if (side == Side.Left) rest.AddRange([$"{pieces[i][0]}x{k}", $"{pieces[i][0]}x{along - k}"]);
                else rest.AddRange([$"{k}x{pieces[i][1]}", $"{along - k}x{pieces[i][1]}"]);
                rest.Sort(StringComparer.Ordinal);
                yield return string.Join("+", rest);
            }
        }
    }

    /// <summary>Random text of the given alphabet and its truncations, for fuzzing readers.</summary>
    public static IEnumerable<string> FuzzTexts(Random random, string alphabet, IEnumerable<string> seeds, int count)
    {
        foreach (var seed in seeds)
            for (int cut = 0; cut <= seed.Length; cut++) yield return seed[..cut];
        for (int i = 0; i < count; i++)
            yield return new string(Enumerable.Range(0, random.Next(0, 14)).Select(_ => alphabet[random.Next(alphabet.Length)]).ToArray());
    }

    /// <summary>Runs a reader on a text: it returns a position or throws a located syntax error, nothing else.</summary>
    public static void ReadsOrPointsAtFault(IRuleset rules, string text)
    {
        try
        {
            var p = rules.Parse(text);
            // A text that reads must print as notation that reads back to the same position.
            Assert.Equal(p.Text, rules.Parse(p.Text).Text);
        }
        catch (PositionSyntaxException e)
        {
            Assert.InRange(e.Column, 0, text.Length);
            Assert.False(string.IsNullOrWhiteSpace(e.Expected));
            Assert.Contains("^", e.Pointer);
        }
    }
}
