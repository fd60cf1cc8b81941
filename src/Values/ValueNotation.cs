using System.Text;

namespace Bramble.Values;

/// <summary>
/// The value notation of docs/values.md, in: numbers, nimbers, ups and downs (symbols or the ASCII
/// words), ±x, braces with the multi-bar shorthand, sums, differences and parentheses.
/// </summary>
public static class ValueNotation
{
    /// <summary>
    /// Deepest nesting read: braces, parentheses and bar levels of the multi-bar shorthand
    /// together. Reading and valuing recurse once per level, so a limit keeps a hostile text
    /// from overflowing the stack; deeper text gets a located message (docs/values.md).
    /// </summary>
    public const int MaxDepth = 1000;

    /// <summary>Largest multiple of ↑ read (n·↑ is built with about n records).</summary>
    public const int MaxUps = 100_000;

    /// <summary>Parses a value expression; throws <see cref="ValueSyntaxException"/> with the column and what was expected.</summary>
    public static ValueExpr Parse(string text)
    {
        var terms = ParseTerms(text);
        return terms.Count == 1 ? terms[0].Term : new SumExpr(terms.Select(t => t.Term).ToArray());
    }

    /// <summary>Splits a top-level sum into its terms as written (a subtracted term comes back negated), with 0-based start columns.</summary>
    public static IReadOnlyList<(ValueExpr Term, int Column)> ParseTerms(string text)
    {
        // Reading recurses once per nesting level (a few frames each): a text long enough to
        // nest deeply is read on a stack of its own, so the caller's stack size does not matter.
        if (text.Length > DeepTextLength) return BigStack.Run(() => ParseTermsHere(text), ReadingStackBytes);
        return ParseTermsHere(text);
    }

    /// <summary>Texts longer than this are read on a stack of <see cref="ReadingStackBytes"/>.</summary>
    private const int DeepTextLength = 2000;

    private const int ReadingStackBytes = 64 * 1024 * 1024;

    private static IReadOnlyList<(ValueExpr Term, int Column)> ParseTermsHere(string text)
    {
        var p = new Parser(text);
        var (terms, parts) = p.ParseScope(0, text.Length, nested: false);
        if (parts is null) return terms;
        return terms.Select(t => (SharedExpr.Around(t.Item1, parts), t.Item2)).ToList();
    }

    private sealed class Parser
    {
        private readonly string text;

        // For every bracket, the index of its partner (-1 for a ')' or '}' with none): found in one
        // pass up front, so every scan below jumps over a bracketed stretch instead of walking
        // it, and reading stays linear in the text however deep it nests.
        private readonly int[] _partner;

        // Nesting levels entered so far (braces, parentheses, bar levels): bounded by MaxDepth.
        private int _depth;

        public int Pos;

        public Parser(string text)
        {
            this.text = text;
            _partner = PairBrackets();
        }

        private int[] PairBrackets()
        {
            var partner = new int[text.Length];
            var open = new Stack<int>();
            for (int i = 0; i < text.Length; i++)
            {
                char ch = text[i];
                if (ch == '{' || ch == '(')
                {
                    if (open.Count >= MaxDepth) { Pos = i; throw Fail($"at most {MaxDepth} nested brackets (this one is {MaxDepth + 1} deep)"); }
                    open.Push(i);
                }
                else if (ch == '}' || ch == ')')
                {
                    if (open.Count == 0) { partner[i] = -1; continue; }
                    int o = open.Pop();
                    char want = text[o] == '{' ? '}' : ')';
                    if (ch != want) { Pos = i; throw Fail($"'{want}' to close the '{text[o]}' at column {o + 1}"); }
                    partner[o] = i;
                    partner[i] = o;
                }
            }
            if (open.Count > 0)
            {
                // The outermost unclosed bracket is the one the reader meets first.
                int o = open.ToArray()[^1];
                Pos = text.Length;
                throw Fail($"'{(text[o] == '{' ? '}' : ')')}' to close the '{text[o]}' at column {o + 1}");
            }
            return partner;
        }

        /// <summary>Index just past the bracketed stretch opened at i (i itself is '{' or '(').</summary>
        private int Past(int i) => _partner[i] + 1;

        private static bool Opens(char ch) => ch == '{' || ch == '(';

        private void Enter()
        {
            if (++_depth > MaxDepth) throw Fail($"at most {MaxDepth} levels of nesting (braces, parentheses and bar levels together)");
        }

        public ValueSyntaxException Fail(string expected) => new(text, Pos, expected);

        public void SkipSpace(int end)
        {
            while (Pos < end && char.IsWhiteSpace(text[Pos])) Pos++;
        }

        public const string WhereWord = "where";

        // The references met in the scope being parsed (a whole text, or a parenthesised
        // 'where' form): each scope's names are its own.
        private List<PartExpr> _references = new();

        /// <summary>
        /// [start, end) as a sum, with an optional 'where' clause naming parts used in it:
        /// the terms, and the parts (null without 'where').
        /// </summary>
        public (List<(ValueExpr, int)> Terms, Dictionary<int, ValueExpr>? Parts) ParseScope(int start, int end, bool nested)
        {
            int where = FindWhere(start, end);
            // Brackets without 'where' are no scope of their own: their names are the enclosing ones.
            var outer = _references;
            if (where >= 0 || !nested) _references = new List<PartExpr>();
            if (nested) Enter();
            try
            {
                Pos = start;
                int bodyEnd = where < 0 ? end : where;
                var terms = ParseSum(bodyEnd);
                SkipSpace(bodyEnd);
                if (Pos < bodyEnd) throw Fail(where >= 0 ? "'+', '-' or 'where'" : nested ? "'+', '-', 'where' or ')'" : "'+', '-', 'where' or the end of the value");
                if (where < 0)
                {
                    if (!nested && _references.Count > 0)
                    {
                        var stray = _references[0];
                        Pos = stray.Column;
                        throw Fail($"a value (#{stray.Name} is a named part, and there is no 'where' to define it)");
                    }
                    return (terms, null);
                }
                var parts = ParseParts(where + WhereWord.Length, end);
                CheckParts(parts);
                return (terms, parts);
            }
            finally
            {
                _references = outer;
                if (nested) _depth--;
            }
        }

        /// <summary>Start of the word 'where' in [start, end) outside all brackets, or -1.</summary>
        private int FindWhere(int start, int end)
        {
            for (int i = start; i + WhereWord.Length <= end; i++)
            {
                char ch = text[i];
                if (Opens(ch)) i = Past(i) - 1;
                else if (string.CompareOrdinal(text, i, WhereWord, 0, WhereWord.Length) == 0
                    && (i == 0 || !char.IsLetter(text[i - 1]))
                    && (i + WhereWord.Length == end || !char.IsLetter(text[i + WhereWord.Length])))
                    return i;
            }
            return -1;
        }

        /// <summary>The definitions after 'where': <c>#k = value</c>, separated by ';'.</summary>
        private Dictionary<int, ValueExpr> ParseParts(int start, int end)
        {
            var parts = new Dictionary<int, ValueExpr>();
            Pos = start;
            while (true)
            {
                SkipSpace(end);
                int at = Pos;
                if (Pos >= end || text[Pos] != '#') throw Fail("a named part such as '#1 = {1|0}'");
                int name = ParsePartName(end);
                SkipSpace(end);
                if (Pos >= end || text[Pos] != '=') throw Fail("'=' after the part's name");
                Pos++;
                int semi = NextSemicolon(Pos, end);
                var terms = ParseSum(semi);
                SkipSpace(semi);
                if (Pos != semi) throw Fail("'+', '-', ';' or the end of the value");
                if (!parts.TryAdd(name, terms.Count == 1 ? terms[0].Item1 : new SumExpr(terms.Select(t => t.Item1).ToArray())))
                {
                    Pos = at;
                    throw Fail($"a new part (#{name} is defined twice)");
                }
                if (semi == end) return parts;
                Pos = semi + 1;
            }
        }

        /// <summary>Every reference names a defined part, and no part is defined through itself.</summary>
        private void CheckParts(Dictionary<int, ValueExpr> parts)
        {
            foreach (var r in _references)
            {
                if (!parts.ContainsKey(r.Name)) { Pos = r.Column; throw Fail($"a defined part (#{r.Name} is not defined after 'where')"); }
            }
            var state = new Dictionary<int, int>(); // 1: being visited, 2: done
            void Visit(int name, PartExpr via)
            {
                if (state.TryGetValue(name, out int s))
                {
                    if (s == 1) { Pos = via.Column; throw Fail($"a part that does not contain itself (#{name} refers to itself)"); }
                    return;
                }
                state[name] = 1;
                foreach (var r in SharedExpr.References(parts[name])) Visit(r.Name, r);
                state[name] = 2;
            }
            foreach (var r in _references) Visit(r.Name, r);
        }

        private int ParsePartName(int end)
        {
            Pos++;
            int digits = Pos;
            while (Pos < end && char.IsAsciiDigit(text[Pos])) Pos++;
            if (Pos == digits || !int.TryParse(text.AsSpan(digits, Pos - digits), out int name)) { Pos = digits; throw Fail("the part's number after '#'"); }
            return name;
        }

        private int NextSemicolon(int from, int end) => NextAtThisLevel(from, end, ';');

        /// <summary>The first <paramref name="mark"/> in [from, end) outside brackets, or end.</summary>
        private int NextAtThisLevel(int from, int end, char mark)
        {
            for (int i = from; i < end; i++)
            {
                char ch = text[i];
                if (Opens(ch)) i = Past(i) - 1;
                else if (ch == mark) return i;
            }
            return end;
        }

        private bool Peek(int end, string s) => Pos + s.Length <= end && string.CompareOrdinal(text, Pos, s, 0, s.Length) == 0;

        public List<(ValueExpr, int)> ParseSum(int end)
        {
            var terms = new List<(ValueExpr, int)>();
            SkipSpace(end);
            if (Pos >= end) throw Fail("a value");
            int column = Pos;
            // A leading '+' is dropped; '+-' is ± (read by ParseAtom); a leading '-' is read
            // there too, as the negative of whatever term follows.
            if (text[Pos] == '+' && !StartsSwitch(end)) Pos++;
            while (true)
            {
                SkipSpace(end);
                bool negate = false;
                if (terms.Count > 0)
                {
                    // After the first term: '+', '-', or '±' / '+-' (a ± b is a + ±b).
                    if (StartsSwitch(end)) { }
                    else if (text[Pos] == '+') Pos++;
                    else { negate = true; Pos++; }
                    SkipSpace(end);
                }
                var term = ParseAtom(end);
                terms.Add((negate ? new NegateExpr(term) : term, column));
                SkipSpace(end);
                if (Pos >= end || (text[Pos] != '+' && text[Pos] != '-' && text[Pos] != '±')) break;
                column = Pos;
            }
            return terms;
        }

        /// <summary>± or its ASCII spelling '+-' at the reading position.</summary>
        private bool StartsSwitch(int end) => Pos < end && (text[Pos] == '±' || Peek(end, "+-"));

        private bool StartsNumber(int i, int end) => i < end && char.IsAsciiDigit(text[i]);

        private ValueExpr ParseAtom(int end)
        {
            if (Pos >= end) throw Fail("a value");
            // A minus before any term but a number negates it; a run of them is read in a loop,
            // not by recursion, so '- - - … x' cannot run the stack out.
            int minuses = 0;
            while (Pos < end && text[Pos] == '-' && !StartsNumber(Pos + 1, end))
            {
                minuses++;
                Pos++;
                SkipSpace(end);
                if (Pos >= end) throw Fail("a value after '-'");
            }
            var atom = ParseSignlessAtom(end);
            return minuses % 2 == 0 ? atom : new NegateExpr(atom);
        }

        private ValueExpr ParseSignlessAtom(int end)
        {
            char c = text[Pos];
            if (c == '(')
            {
                int close = Matching(Pos, end, '(', ')');
                var (inner, parts) = ParseScope(Pos + 1, close, nested: true);
                Pos = close + 1;
                var body = inner.Count == 1 ? inner[0].Item1 : new SumExpr(inner.Select(t => t.Item1).ToArray());
                return parts is null ? body : SharedExpr.Around(body, parts);
            }
            if (c == '{')
            {
                int close = Matching(Pos, end, '{', '}');
                int open = Pos;
                var game = ParseBraced(open + 1, close);
                Pos = close + 1;
                return game;
            }
            if (c == '#')
            {
                int column = Pos;
                var part = new PartExpr(ParsePartName(end), column);
                _references.Add(part);
                return part;
            }
            if (StartsSwitch(end))
            {
                string sign = c == '±' ? "±" : "+-";
                Pos += sign.Length;
                SkipSpace(end);
                var x = ParseNumber(end) ?? throw Fail($"a number after '{sign}' (±x and its ASCII spelling +-x are {{x|-x}})");
                return new SwitchExpr(x);
            }
            // number, then optional ups multiplier or star
            Dyadic? number = null;
            if (c == '-' || char.IsAsciiDigit(c)) number = ParseNumber(end) ?? throw Fail("a number");
            int ups = ParseUps(end, number, out bool multiplied);
            if (multiplied) number = null;
            int star = ParseStar(end, out bool hasStar);
            if (number is null && ups == 0 && !hasStar) throw Fail("a value (number, *, ↑, ↓, up, down, ±x or +-x, '{' or '(')");
            var x0 = number ?? Dyadic.Zero;
            if (ups == 0 && !hasStar) return new NumberExpr(x0);
            return new UpStarExpr(x0, ups, star);
        }

        private int ParseUps(int end, Dyadic? number, out bool multiplied)
        {
            multiplied = false;
            int sign = 0, count = 1;
            if (Peek(end, "↑")) { sign = 1; Pos++; }
            else if (Peek(end, "↓")) { sign = -1; Pos++; }
            else if (Peek(end, "⇑")) { sign = 1; count = 2; Pos++; }
            else if (Peek(end, "⇓")) { sign = -1; count = 2; Pos++; }
            else if (Peek(end, "up")) { sign = 1; Pos += 2; }
            else if (Peek(end, "down")) { sign = -1; Pos += 4; }
            if (sign == 0) return 0;
            if (number is { } n)
            {
                if (!n.IsInteger || n.Sign <= 0 || count != 1) { Pos--; throw Fail("a whole number of ups such as 3↑"); }
                if (n.Numerator > MaxUps) { Pos = _numberStart; throw Fail($"at most {MaxUps:N0} ups in one term"); }
                multiplied = true;
                count = (int)n.Numerator;
            }
            return sign * count;
        }

        private int ParseStar(int end, out bool hasStar)
        {
            hasStar = false;
            if (!Peek(end, "*")) return 0;
            hasStar = true;
            Pos++;
            int start = Pos;
            while (Pos < end && char.IsAsciiDigit(text[Pos])) Pos++;
            if (Pos == start) return 1;
            if (!int.TryParse(text.AsSpan(start, Pos - start), out int m)) { Pos = start; throw Fail("a nimber size that fits an int"); }
            return m;
        }

        // Where the last number read began, for messages about what follows it.
        private int _numberStart;

        private Dyadic? ParseNumber(int end)
        {
            int start = Pos;
            _numberStart = start;
            if (Pos < end && text[Pos] == '-') Pos++;
            int digits = Pos;
            while (Pos < end && char.IsAsciiDigit(text[Pos])) Pos++;
            if (Pos == digits) { Pos = start; return null; }
            if (Pos < end && text[Pos] == '/')
            {
                Pos++;
                int den = Pos;
                while (Pos < end && char.IsAsciiDigit(text[Pos])) Pos++;
                if (Pos == den) throw Fail("a denominator (a power of two)");
            }
            else if (Pos + 1 < end && text[Pos] == '.' && char.IsAsciiDigit(text[Pos + 1])) throw DecimalPoint(start, end);
            var span = text.AsSpan(start, Pos - start);
            if (!Dyadic.TryParse(span, out var value))
            {
                Pos = start;
                throw Fail("a dyadic number (its denominator must be a power of two)");
            }
            return value;
        }

        /// <summary>A decimal such as 1.5: the notation has fractions only, so say which one it is.</summary>
        private ValueSyntaxException DecimalPoint(int start, int end)
        {
            int point = text.IndexOf('.', start);
            int stop = point + 1;
            while (stop < end && char.IsAsciiDigit(text[stop])) stop++;
            string written = text[start..stop];
            var whole = System.Numerics.BigInteger.Parse(text.AsSpan(start, point - start).ToString().Replace("-", "") + text[(point + 1)..stop]);
            int places = stop - point - 1;
            var ten = System.Numerics.BigInteger.Pow(10, places);
            var gcd = System.Numerics.BigInteger.GreatestCommonDivisor(whole, ten);
            var num = whole / gcd;
            var den = ten / gcd;
            bool dyadic = !den.IsZero && (den & (den - 1)).IsZero;
            string sign = text[start] == '-' ? "-" : "";
            Pos = start;
            return Fail(dyadic
                ? $"a fraction, not a decimal point: write {sign}{num}{(den.IsOne ? "" : "/" + den)} for {written}"
                : $"a dyadic fraction (a whole number over a power of two, such as 3/8); {written} is not one");
        }

        private int Matching(int open, int end, char o, char c)
        {
            int close = _partner[open];
            if (close >= end)
            {
                // The partner lies beyond the stretch being read (a ',' '|' or ';' split it).
                Pos = end;
                throw Fail($"'{c}' to close the '{o}' at column {open + 1}");
            }
            return close;
        }

        /// <summary>The inside of braces, [start, end): split at the longest run of bars.</summary>
        private ValueExpr ParseBraced(int start, int end)
        {
            Enter();
            int bestAt = -1, bestLen = 0;
            for (int i = start; i < end; i++)
            {
                char ch = text[i];
                if (Opens(ch)) i = Past(i) - 1;
                else if (ch == '|')
                {
                    int j = i;
                    while (j < end && text[j] == '|') j++;
                    int len = j - i;
                    if (len > bestLen) { bestLen = len; bestAt = i; }
                    else if (len == bestLen) { Pos = i; throw Fail($"a longer bar run than the one at column {bestAt + 1} (the same number of bars twice is ambiguous)"); }
                    i = j - 1;
                }
            }
            if (bestAt < 0) { Pos = start; throw Fail("'|' between the Left and Right options"); }
            var left = ParseSide(start, bestAt);
            var right = ParseSide(bestAt + bestLen, end);
            _depth--;
            return new OptionsExpr(left, right);
        }

        private IReadOnlyList<ValueExpr> ParseSide(int start, int end)
        {
            // A side that still holds bars is one game written without its own braces.
            if (NextAtThisLevel(start, end, '|') < end) return [ParseBraced(start, end)];
            var options = new List<ValueExpr>();
            Pos = start;
            SkipSpace(end);
            if (Pos >= end) return options;
            while (true)
            {
                int comma = NextComma(Pos, end);
                var terms = ParseSum(comma);
                SkipSpace(comma);
                if (Pos != comma) throw Fail(comma == end ? "'|', '}' or ','" : "','");
                options.Add(terms.Count == 1 ? terms[0].Item1 : new SumExpr(terms.Select(t => t.Item1).ToArray()));
                if (comma == end) break;
                Pos = comma + 1;
            }
            return options;
        }

        private int NextComma(int from, int end) => NextAtThisLevel(from, end, ',');
    }

    // ------------------------------------------------------------------ out

    /// <summary>
    /// Longest bar run written: an option that would need more bars is written in braces instead
    /// (<c>{0|{0||||0|||0||0|0}}</c>), so a deep form's text grows linearly with its depth
    /// rather than with its square.
    /// </summary>
    public const int MaxBars = 4;

    /// <summary>Longest written form printed in full; larger values are written with shared parts.</summary>
    public const int PlainLimit = 4000;

    /// <summary>Parts written out longer than this get a name in the shared form.</summary>
    private const int NameAbove = 60;

    /// <summary>
    /// Writes a canonical game in the published notation (Unicode, or words with
    /// <paramref name="ascii"/>). Written out in full, a game's text can grow exponentially with
    /// its birthday even when it has few distinct subgames, so when the full text would exceed
    /// <see cref="PlainLimit"/> characters the game is written in a shared form instead: every
    /// long part appears once, under a name, e.g. <c>{#1,#2|#3} where #1 = {1|#3}; #2 = …</c>
    /// (docs/values.md).
    /// </summary>
    public static string Format(GameStore store, Game g, bool ascii = false)
    {
        var lengths = new Dictionary<Game, long>();
        if (EstimateLength(store, g, lengths) <= PlainLimit) return FormatPlain(store, g, ascii);
        return FormatShared(store, g, ascii, lengths);
    }

    private static string FormatPlain(GameStore store, Game g, bool ascii) => new Writer(store, ascii, _ => null).Whole(g);

    private static bool IsAtom(GameStore store, Game g) =>
        store.IsNumber(g) || store.TryGetUpStar(g, out _, out _, out _) || store.IsSwitch(g);

    /// <summary>Roughly how long the full text of g is (saturating, so huge forms do not overflow).</summary>
    private static long EstimateLength(GameStore store, Game g, Dictionary<Game, long> lengths)
    {
        if (lengths.TryGetValue(g, out long known)) return known;
        long n;
        if (IsAtom(store, g)) n = FormatPlain(store, g, ascii: true).Length;
        else
        {
            n = 3;
            foreach (var o in store.LeftOptions(g)) n = Math.Min(n + EstimateLength(store, o, lengths) + 1, long.MaxValue / 4);
            foreach (var o in store.RightOptions(g)) n = Math.Min(n + EstimateLength(store, o, lengths) + 1, long.MaxValue / 4);
        }
        lengths[g] = n;
        return n;
    }

    private static string FormatShared(GameStore store, Game root, bool ascii, Dictionary<Game, long> lengths)
    {
        var names = new Dictionary<Game, int>();
        var order = new List<Game>();
        string? NameOf(Game g)
        {
            if (IsAtom(store, g) || lengths[g] <= NameAbove) return null;
            if (!names.TryGetValue(g, out int k))
            {
                k = names.Count + 1;
                names[g] = k;
                order.Add(g);
            }
            return "#" + k;
        }
        var writer = new Writer(store, ascii, NameOf);
        var sb = new StringBuilder(writer.Whole(root));
        // Definitions in order of first use; writing one may name further parts.
        for (int i = 0; i < order.Count; i++)
        {
            sb.Append(i == 0 ? " where " : "; ");
            sb.Append('#').Append(i + 1).Append(" = ").Append(writer.Whole(order[i]));
        }
        return sb.ToString();
    }

    /// <summary>
    /// Writes games with the multi-bar shorthand; an option that <c>nameOf</c> names is written
    /// as that name (the plain form names nothing).
    /// </summary>
    private sealed class Writer(GameStore store, bool ascii, Func<Game, string?> nameOf)
    {
        public string Whole(Game g)
        {
            var (text, bars) = Part(g);
            return bars > 0 ? "{" + text + "}" : text;
        }

        /// <summary>Text of g, and for brace forms the text inside the braces with its number of bars (0 for atoms).</summary>
        private (string Text, int Bars) Part(Game g)
        {
            if (store.TryGetNumber(g, out var x)) return (x.ToString(), 0);
            if (store.TryGetUpStar(g, out var ux, out int n, out int m)) return (FormatUpStar(ux, n, m, ascii), 0);
            var left = store.LeftOptions(g);
            var right = store.RightOptions(g);
            if (left.Count == 1 && right.Count == 1 && store.TryGetNumber(left[0], out var a)
                && store.TryGetNumber(right[0], out var b) && a == -b && a.Sign > 0)
                return ((ascii ? "+-" : "±") + a, 0);
            var (lt, lb) = Side(left);
            var (rt, rb) = Side(right);
            int bars = Math.Max(lb, rb) + 1;
            return (lt + new string('|', bars) + rt, bars);
        }

        private (string Text, int Bars) Side(IReadOnlyList<Game> options)
        {
            if (options.Count == 1 && nameOf(options[0]) is null)
            {
                var (text, bars) = Part(options[0]);
                return bars < MaxBars ? (text, bars) : ("{" + text + "}", 0);
            }
            return (string.Join(",", options.Select(o => nameOf(o) ?? Whole(o))), 0);
        }
    }

    private static string FormatUpStar(Dyadic x, int n, int m, bool ascii)
    {
        string star = m == 0 ? "" : m == 1 ? "*" : "*" + m;
        if (n == 0) return (x.IsZero ? "" : x.ToString()) + star;
        string ups;
        int k = Math.Abs(n);
        if (ascii) ups = (k == 1 ? "" : k.ToString()) + (n > 0 ? "up" : "down");
        else if (k == 1) ups = n > 0 ? "↑" : "↓";
        else if (k == 2) ups = n > 0 ? "⇑" : "⇓";
        else ups = k + (n > 0 ? "↑" : "↓");
        string inf = ups + star;
        return x.IsZero ? inf : x + " + " + inf;
    }
}

/// <summary>
/// Writes value expressions back as text, as written (no simplification), into one buffer, so
/// the work is linear in the length of the text however deep the expression nests.
/// </summary>
public static class ValueExprWriter
{
    public static string Write(ValueExpr expr, bool ascii = false)
    {
        var sb = new StringBuilder();
        new Writing(sb, ascii).Write(expr);
        return sb.ToString();
    }

    private sealed class Writing(StringBuilder sb, bool ascii)
    {
        // Bar counts of brace expressions, worked out once each (by reference: equal records may
        // stand in different places).
        private readonly Dictionary<OptionsExpr, int> _bars = new(ReferenceEqualityComparer.Instance);

        public void Write(ValueExpr expr)
        {
            switch (expr)
            {
                case NumberExpr n: sb.Append(n.Value.ToString()); break;
                case UpStarExpr u: sb.Append(WriteUpStar(u, ascii)); break;
                case SwitchExpr s: sb.Append(ascii ? "+-" : "±").Append(s.X.ToString()); break;
                case OptionsExpr o: sb.Append('{'); Inside(o); sb.Append('}'); break;
                case SumExpr s:
                    for (int i = 0; i < s.Terms.Count; i++)
                    {
                        if (i > 0) sb.Append(" + ");
                        if (s.Terms[i] is SumExpr) { sb.Append('('); Write(s.Terms[i]); sb.Append(')'); }
                        else Write(s.Terms[i]);
                    }
                    break;
                case PartExpr p: sb.Append('#').Append(p.Name); break;
                case SharedExpr s:
                    sb.Append('(');
                    Write(s.Body);
                    sb.Append(" where ");
                    bool first = true;
                    foreach (var kv in s.Parts.OrderBy(kv => kv.Key))
                    {
                        if (!first) sb.Append("; ");
                        first = false;
                        sb.Append('#').Append(kv.Key).Append(" = ");
                        Write(kv.Value);
                    }
                    sb.Append(')');
                    break;
                case NegateExpr n:
                    bool bare = n.Inner is NumberExpr or OptionsExpr || (n.Inner is UpStarExpr u2 && (u2.X.IsZero || u2.Ups == 0));
                    sb.Append(bare ? "-" : "-(");
                    Write(n.Inner);
                    if (!bare) sb.Append(')');
                    break;
                default: throw new ArgumentException($"unknown expression {expr}");
            }
        }

        /// <summary>The bars between o's sides: one more than the longest run written inside a side without braces.</summary>
        private int Bars(OptionsExpr o)
        {
            if (_bars.TryGetValue(o, out int known)) return known;
            int bars = Math.Max(SideBars(o.Left), SideBars(o.Right)) + 1;
            _bars[o] = bars;
            return bars;
        }

        /// <summary>The bar run a side brings: a lone brace option is written without braces while its run stays under <see cref="ValueNotation.MaxBars"/>.</summary>
        private int SideBars(IReadOnlyList<ValueExpr> side) =>
            side is [OptionsExpr only] && Bars(only) is var b && b < ValueNotation.MaxBars ? b : 0;

        private void Inside(OptionsExpr o)
        {
            Side(o.Left);
            sb.Append('|', Bars(o));
            Side(o.Right);
        }

        private void Side(IReadOnlyList<ValueExpr> options)
        {
            if (options is [OptionsExpr only] && Bars(only) < ValueNotation.MaxBars)
            {
                Inside(only);
                return;
            }
            for (int i = 0; i < options.Count; i++)
            {
                if (i > 0) sb.Append(',');
                Write(options[i]);
            }
        }
    }

    private static string WriteUpStar(UpStarExpr u, bool ascii)
    {
        string star = u.Star == 0 ? "" : u.Star == 1 ? "*" : "*" + u.Star;
        if (u.Ups == 0) return (u.X.IsZero && star.Length > 0 ? "" : u.X.ToString()) + star;
        int k = Math.Abs(u.Ups);
        string ups = ascii ? (k == 1 ? "" : k.ToString()) + (u.Ups > 0 ? "up" : "down")
            : k == 1 ? (u.Ups > 0 ? "↑" : "↓") : k == 2 ? (u.Ups > 0 ? "⇑" : "⇓") : k + (u.Ups > 0 ? "↑" : "↓");
        return u.X.IsZero ? ups + star : $"{u.X} + {ups}{star}";
    }
}
