using System.Text;

namespace Bramble.Rules.ToadsAndFrogs;

/// <summary>
/// Toads and Frogs notation: one letter per square from left to right — <c>T</c> a toad (Left),
/// <c>F</c> a frog (Right), <c>.</c> an empty square, <c>#</c> a wall — as in <c>TT.FF</c>. The
/// papers' way of writing is read too: <c>□</c> (or <c>_</c>) for an empty square, a power for
/// repetition (<c>T^3□F^2</c>, <c>T³□F²</c>, <c>(TF)^2</c>), and '+' between strips (read as a
/// wall). Spaces are ignored; letters may be lower case.
/// </summary>
public static class StripNotation
{
    public const int MaxSquares = 400;
    private const string Example = "squares such as TT.FF (T toad, F frog, . empty, # wall)";
    private const string Superscripts = "⁰¹²³⁴⁵⁶⁷⁸⁹";

    public static Square[] Parse(string text)
    {
        int i = 0;
        var squares = ReadItems(text, ref i, nested: false);
        if (squares.Count == 0) throw new PositionSyntaxException(text, i, Example);
        if (squares.All(s => s == Square.Wall)) throw new PositionSyntaxException(text, 0, Example + "; walls alone make no strip");
        return squares.ToArray();
    }

    private static List<Square> ReadItems(string text, ref int i, bool nested)
    {
        var result = new List<Square>();
        while (true)
        {
            Skip(text, ref i);
            if (i == text.Length)
            {
                if (nested) throw new PositionSyntaxException(text, i, "')' to close the group");
                return result;
            }
            char ch = text[i];
            if (ch == ')')
            {
                if (!nested) throw new PositionSyntaxException(text, i, "a square (T, F, ., #) — this ')' closes no group");
                if (result.Count == 0) throw new PositionSyntaxException(text, i, "squares inside the parentheses");
                i++;
                return result;
            }
            List<Square> item;
            if (ch == '(')
            {
                i++;
                item = ReadItems(text, ref i, nested: true);
            }
            else
            {
                Square? s = ch switch
                {
                    'T' or 't' => Square.Toad,
                    'F' or 'f' => Square.Frog,
                    '.' or '□' or '_' => Square.Empty,
                    '#' or '|' or '+' => Square.Wall,
                    _ => null,
                };
                if (s is null)
                    throw new PositionSyntaxException(text, i, result.Count == 0 && !nested ? Example : "T, F, '.', '#', '(' or a power such as ^3");
                item = [s.Value];
                i++;
            }
            int times = ReadPower(text, ref i);
            for (int k = 0; k < times; k++)
            {
                result.AddRange(item);
                if (result.Count > MaxSquares) throw new PositionSyntaxException(text, Math.Min(i, text.Length), $"at most {MaxSquares} squares");
            }
        }
    }

    private static int ReadPower(string text, ref int i)
    {
        int j = i;
        Skip(text, ref j);
        if (j < text.Length && text[j] == '^')
        {
            j++;
            Skip(text, ref j);
            int from = j;
            long n = 0;
            while (j < text.Length && char.IsAsciiDigit(text[j])) { n = Math.Min(n * 10 + (text[j] - '0'), int.MaxValue); j++; }
            if (j == from) throw new PositionSyntaxException(text, j, "a number of repetitions after '^'");
            if (n > MaxSquares) throw new PositionSyntaxException(text, from, $"at most {MaxSquares} repetitions");
            i = j;
            return (int)n;
        }
        if (i < text.Length && Superscripts.Contains(text[i]))
        {
            long n = 0;
            while (i < text.Length && Superscripts.IndexOf(text[i]) is int d and >= 0) { n = Math.Min(n * 10 + d, int.MaxValue); i++; }
            if (n > MaxSquares) throw new PositionSyntaxException(text, i - 1, $"at most {MaxSquares} repetitions");
            return (int)n;
        }
        return 1;
    }

    private static void Skip(string text, ref int i)
    {
        while (i < text.Length && char.IsWhiteSpace(text[i])) i++;
    }

    public static char Letter(Square s) => s switch
    {
        Square.Toad => 'T',
        Square.Frog => 'F',
        Square.Wall => '#',
        _ => '.',
    };

    public static string Format(ReadOnlySpan<Square> squares)
    {
        var sb = new StringBuilder(squares.Length);
        foreach (var s in squares) sb.Append(Letter(s));
        return sb.ToString();
    }
}
