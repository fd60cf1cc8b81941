using System.Globalization;
using System.Text;
using Bramble.Values;

namespace Bramble.Wire;

/// <summary>What parsing one line gave: a message, or the error to report for it.</summary>
public readonly record struct Parsed<T>(T? Message, WireError? Error) where T : Message
{
    public bool IsOk => Error is null;

    public static implicit operator Parsed<T>(WireError error) => new(default, error);
}

/// <summary>
/// The twine/1 codec: lines (without their terminator) to message records and back. Strict about
/// the shape docs/protocol.md fixes (single spaces, lower-case words, whole non-negative numbers), lenient
/// where it promises to be (unknown <c>key=value</c> pairs are ignored). Stateless and thread-safe.
/// </summary>
public static class Codec
{
    /// <summary>The longest line allowed, in UTF-8 bytes without the terminator: 1 MiB.</summary>
    public const int MaxLineBytes = 1 << 20;

    /// <summary>The longest echo of the input that goes into an error text, so a huge bad line never comes back whole.</summary>
    private const int QuoteLength = 48;

    // ---- requests -------------------------------------------------------------------------------

    public static Parsed<Request> ParseRequest(string line)
    {
        // set and begin end in "the rest of the line", which keeps its own spacing.
        var word = line.IndexOf(' ') is var space and >= 0 ? line[..space] : line;
        var limit = word is "set" or "begin" ? 3 : int.MaxValue;
        if (Split(line, limit, out var tokens) is { } fault) return fault;
        return word switch
        {
            "hello" => ParseHello(tokens),
            "set" => ParseSet(line, tokens),
            "begin" => ParseBegin(line, tokens),
            "apply" => ParseApply(tokens),
            "think" => ParseThink(tokens),
            "halt" => Bare(tokens, new HaltRequest()),
            "assess" => Bare(tokens, new AssessRequest()),
            "bye" => Bare(tokens, new ByeRequest()),
            _ => Error(ErrorCodes.UnknownRequest, $"unknown request {Quote(word)}; expected hello, set, begin, apply, think, halt, assess or bye"),
        };
    }

    private static Parsed<Request> ParseHello(List<Token> tokens)
    {
        var (words, pairs) = Sort(tokens);
        if (Twice(pairs) is { } twice) return twice;
        if (words.Count != 3 || words[1].Text != "twine")
            return Error(ErrorCodes.BadRequest, "expected 'hello twine 1'");
        if (!TryNumber(words[2].Text, out var version) || version > int.MaxValue)
            return Error(ErrorCodes.BadRequest, $"column {words[2].Column + 1}: protocol version {Quote(words[2].Text)} is not a whole number");
        return new Parsed<Request>(new HelloRequest((int)version), null);
    }

    private static Parsed<Request> ParseSet(string line, List<Token> tokens)
    {
        // The value is the rest of the line, so a setting may one day take a value with spaces.
        if (tokens.Count < 3) return Error(ErrorCodes.BadRequest, "expected 'set <name> <value>'");
        return new Parsed<Request>(new SetRequest(tokens[1].Text, line[tokens[2].Column..]), null);
    }

    private static Parsed<Request> ParseBegin(string line, List<Token> tokens)
    {
        if (tokens.Count < 3) return Error(ErrorCodes.BadRequest, "expected 'begin <ruleset> <position>'");
        return new Parsed<Request>(new BeginRequest(tokens[1].Text, line[tokens[2].Column..]), null);
    }

    private static Parsed<Request> ParseApply(List<Token> tokens)
    {
        var (words, pairs) = Sort(tokens);
        if (Twice(pairs) is { } twice) return twice;
        if (words.Count != 3) return Error(ErrorCodes.BadRequest, "expected 'apply <side> <move>'");
        if (ParseSide(words[1]) is not { } side) return SideError(words[1]);
        return new Parsed<Request>(new ApplyRequest(side, words[2].Text), null);
    }

    private static Parsed<Request> ParseThink(List<Token> tokens)
    {
        var (words, pairs) = Sort(tokens);
        if (words.Count != 2) return Error(ErrorCodes.BadRequest, "expected 'think <side> clock=<ms> inc=<ms>'");
        if (ParseSide(words[1]) is not { } side) return SideError(words[1]);
        if (Twice(pairs) is { } twice) return twice;
        long? clock = null, inc = null;
        foreach (var pair in pairs)
        {
            if (pair.Key is not ("clock" or "inc")) continue; // unknown keys are ignored (docs/protocol.md)
            if (!TryNumber(pair.Value, out var ms))
                return Error(ErrorCodes.BadRequest, $"column {pair.Column + 1}: {pair.Key}= needs whole milliseconds, got {Quote(pair.Value)}");
            if (pair.Key == "clock") clock = ms; else inc = ms;
        }
        return new Parsed<Request>(new ThinkRequest(side, clock, inc), null);
    }

    private static Parsed<Request> Bare(List<Token> tokens, Request request)
    {
        var (words, pairs) = Sort(tokens);
        if (Twice(pairs) is { } twice) return twice;
        if (words.Count != 1)
            return Error(ErrorCodes.BadRequest, $"column {words[1].Column + 1}: '{tokens[0].Text}' takes no arguments, got {Quote(words[1].Text)}");
        return new Parsed<Request>(request, null);
    }

    // ---- replies --------------------------------------------------------------------------------

    public static Parsed<Reply> ParseReply(string line)
    {
        var limit = line.StartsWith("err ", StringComparison.Ordinal) ? 3 : int.MaxValue;
        if (Split(line, limit, out var tokens) is { } fault) return new WireError(ErrorCodes.BadReply, fault.Text);
        var (words, pairs) = Sort(tokens);
        switch (tokens[0].Text)
        {
            case "welcome":
            {
                var name = Value(pairs, "name");
                if (string.IsNullOrEmpty(name)) return BadReply("welcome without name=");
                var rulesets = Value(pairs, "rulesets") is { Length: > 0 } list ? list.Split(',') : [];
                return new Parsed<Reply>(new WelcomeReply(name, Value(pairs, "version") ?? "", rulesets), null);
            }
            case "ok":
            {
                if (Value(pairs, "components") is not { } n) return new Parsed<Reply>(new OkReply(), null);
                if (!TryNumber(n, out var count) || count > int.MaxValue) return BadReply($"components= is not a whole number: {Quote(n)}");
                return new Parsed<Reply>(new OkReply((int)count), null);
            }
            case "err":
                if (tokens.Count < 2) return BadReply("err without a code");
                return new Parsed<Reply>(new ErrReply(tokens[1].Text, tokens.Count > 2 ? line[tokens[2].Column..] : ""), null);
            case "note":
                // Progress is only logged, so stray words in a note are dropped rather than failing the engine.
                return new Parsed<Reply>(new NoteReply(pairs.Select(p => KeyValuePair.Create(p.Key, p.Value)).ToList()), null);
            case "pick":
                if (words.Count != 2) return BadReply("expected 'pick <move>' or 'pick none'");
                return new Parsed<Reply>(new PickReply(words[1].Text == PickReply.NoMove ? null : words[1].Text), null);
            case "value":
            {
                // The value runs from the second token up to the first key=value token; value notation has no '='.
                var firstPair = tokens.FindIndex(1, t => t.Text.IndexOf('=') > 0);
                var end = firstPair < 0 ? tokens.Count : firstPair;
                if (end < 2) return BadReply("expected 'value <value> outcome=<L/R/N/P>'");
                if (firstPair >= 0 && tokens.Skip(firstPair).Any(t => t.Text.IndexOf('=') <= 0))
                    return BadReply("words after the key=value pairs of 'value'");
                var outcome = Value(pairs, "outcome");
                if (outcome is not ("L" or "R" or "N" or "P")) return BadReply($"outcome= must be L, R, N or P, got {Quote(outcome ?? "nothing")}");
                var value = line[tokens[1].Column..(tokens[end - 1].Column + tokens[end - 1].Text.Length)];
                return new Parsed<Reply>(new ValueReply(value, Enum.Parse<Outcome>(outcome)), null);
            }
            case "bye":
                return new Parsed<Reply>(new ByeReply(), null);
            default:
                return BadReply($"unknown reply {Quote(tokens[0].Text)}");
        }
    }

    private static WireError BadReply(string text) => new(ErrorCodes.BadReply, text);

    // ---- formatting -----------------------------------------------------------------------------

    /// <summary>
    /// The line for a message, without terminator. Throws <see cref="ArgumentException"/> when a
    /// field would break the line (control characters, or spaces where a single token is needed),
    /// so a bug can never put a malformed line on the wire.
    /// </summary>
    public static string Format(Message message)
    {
        var line = message switch
        {
            HelloRequest m => $"hello twine {m.Version.ToString(CultureInfo.InvariantCulture)}",
            SetRequest m => $"set {Word(m.Name)} {Rest(m.Value)}",
            BeginRequest m => $"begin {Word(m.Ruleset)} {Rest(m.Position)}",
            ApplyRequest m => $"apply {m.Side.Word()} {Word(m.Move)}",
            ThinkRequest m => "think " + m.Side.Word()
                + (m.ClockMs is { } c ? " clock=" + Ms(c) : "")
                + (m.IncMs is { } i ? " inc=" + Ms(i) : ""),
            HaltRequest => "halt",
            AssessRequest => "assess",
            ByeRequest => "bye",
            WelcomeReply m => $"welcome name={Word(m.Name)} version={Word(m.Version)} rulesets={string.Join(',', m.Rulesets.Select(Word))}",
            OkReply m => m.Components is { } n ? "ok components=" + n.ToString(CultureInfo.InvariantCulture) : "ok",
            ErrReply m => $"err {Word(m.Code)} {Clean(m.Text)}".TrimEnd(),
            NoteReply m => string.Join(' ', m.Fields.Select(f => $"{Key(f.Key)}={Word(f.Value)}").Prepend("note")),
            PickReply m => "pick " + (m.Move is null ? PickReply.NoMove : Word(m.Move)),
            ValueReply m => $"value {Rest(m.Value)} outcome={m.Outcome}",
            ByeReply => "bye",
            _ => throw new ArgumentException($"not a twine/1 message: {message.GetType().Name}", nameof(message)),
        };
        if (Encoding.UTF8.GetByteCount(line) > MaxLineBytes)
            throw new ArgumentException("the formatted line is longer than 1 MiB", nameof(message));
        return line;
    }

    private static string Ms(long ms) =>
        ms >= 0 ? ms.ToString(CultureInfo.InvariantCulture) : throw new ArgumentException("milliseconds must not be negative");

    private static string Word(string text)
    {
        if (text.Length == 0 || text.Any(c => c == ' ' || char.IsControl(c)))
            throw new ArgumentException($"not a single token: {Quote(text)}");
        return text;
    }

    private static string Key(string text) =>
        text.Contains('=') ? throw new ArgumentException($"a key may not hold '=': {Quote(text)}") : Word(text);

    private static string Rest(string text)
    {
        if (text.Length == 0 || text.Any(char.IsControl))
            throw new ArgumentException($"not a line remainder: {Quote(text)}");
        return text;
    }

    /// <summary>Error texts are for people and may quote input: control characters become spaces so the reply stays one line.</summary>
    private static string Clean(string text) => new(text.Select(c => char.IsControl(c) ? ' ' : c).ToArray());

    // ---- tokens ---------------------------------------------------------------------------------

    private readonly record struct Token(string Text, int Column);

    private readonly record struct Pair(string Key, string Value, int Column);

    /// <summary>
    /// Splits on single spaces into at most <paramref name="limit"/> tokens (the last one then takes
    /// the rest of the line as it is); returns the error when the line is empty, has a control
    /// character or an empty token.
    /// </summary>
    private static WireError? Split(string line, int limit, out List<Token> tokens)
    {
        tokens = [];
        if (line.Length == 0) return new WireError(ErrorCodes.BadRequest, "empty line");
        for (var i = 0; i < line.Length; i++)
        {
            if (char.IsControl(line[i]))
                return new WireError(ErrorCodes.BadRequest, $"column {i + 1}: control character U+{(int)line[i]:X4} is not allowed");
            if (char.IsSurrogate(line[i]) && !(char.IsHighSurrogate(line[i]) && i + 1 < line.Length && char.IsLowSurrogate(line[i + 1])) && !(char.IsLowSurrogate(line[i]) && i > 0 && char.IsHighSurrogate(line[i - 1])))
                return new WireError(ErrorCodes.BadRequest, $"column {i + 1}: lone surrogate U+{(int)line[i]:X4} is not text");
        }
        var start = 0;
        while (true)
        {
            var space = tokens.Count == limit - 1 ? -1 : line.IndexOf(' ', start);
            var end = space < 0 ? line.Length : space;
            if (end == start)
                return new WireError(ErrorCodes.BadRequest, $"column {start + 1}: tokens are separated by single spaces");
            tokens.Add(new Token(line[start..end], start));
            if (space < 0) return null;
            start = space + 1;
        }
    }

    /// <summary>Separates positional words from <c>key=value</c> pairs (any token after the first with an '=').</summary>
    private static (List<Token> Words, List<Pair> Pairs) Sort(List<Token> tokens)
    {
        var words = new List<Token> { tokens[0] };
        var pairs = new List<Pair>();
        foreach (var token in tokens.Skip(1))
        {
            var eq = token.Text.IndexOf('=');
            if (eq > 0) pairs.Add(new Pair(token.Text[..eq], token.Text[(eq + 1)..], token.Column));
            else words.Add(token);
        }
        return (words, pairs);
    }

    private static Pair? Duplicate(List<Pair> pairs)
    {
        var seen = new HashSet<string>(StringComparer.Ordinal);
        foreach (var pair in pairs)
            if (!seen.Add(pair.Key)) return pair;
        return null;
    }

    /// <summary>A repeated key is a bad request on every request that takes keys (unknown keys included): which one would count is anyone's guess.</summary>
    private static WireError? Twice(List<Pair> pairs) =>
        Duplicate(pairs) is { } twice ? Error(ErrorCodes.BadRequest, $"column {twice.Column + 1}: key {Quote(twice.Key)} given twice") : null;

    private static string? Value(List<Pair> pairs, string key)
    {
        foreach (var pair in pairs)
            if (pair.Key == key) return pair.Value;
        return null;
    }

    private static Side? ParseSide(Token token) => token.Text switch
    {
        "left" => Side.Left,
        "right" => Side.Right,
        _ => null,
    };

    private static WireError SideError(Token token) =>
        new(ErrorCodes.BadRequest, $"column {token.Column + 1}: expected a side, left or right, got {Quote(token.Text)}");

    /// <summary>Whole non-negative numbers in plain digits, as the protocol writes milliseconds.</summary>
    private static bool TryNumber(string text, out long value)
    {
        value = 0;
        return text.Length is > 0 and <= 18 && text.All(char.IsAsciiDigit)
            && long.TryParse(text, NumberStyles.None, CultureInfo.InvariantCulture, out value);
    }

    private static WireError Error(string code, string text) => new(code, text);

    /// <summary>A short, one-line, quoted echo of input for error texts.</summary>
    public static string Quote(string text)
    {
        var cut = QuoteLength;
        if (text.Length > cut && char.IsHighSurrogate(text[cut - 1])) cut--; // never split a surrogate pair
        var shown = text.Length > QuoteLength ? text[..cut] + "…" : text;
        return "'" + Clean(shown) + "'";
    }
}
