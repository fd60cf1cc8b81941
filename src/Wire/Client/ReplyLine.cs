namespace Bramble.Wire.Client;

/// <summary>
/// One engine → harness line split the twine/1 way: the reply word, then positional words and
/// <c>key=value</c> pairs in any order. Keys the harness does not know are kept but never looked
/// at, which is what "unknown keys are ignored" means on this side of the pipe.
/// </summary>
public sealed record ReplyLine(string Word, IReadOnlyList<string> Words, IReadOnlyDictionary<string, string> Keys, string Rest)
{
    private static readonly HashSet<string> s_replyWords = new(StringComparer.Ordinal)
    {
        "welcome", "ok", "err", "note", "pick", "value", "bye",
    };

    public string? Key(string name) => Keys.TryGetValue(name, out var value) ? value : null;

    /// <summary>Splits a line; false (with the reason) when it is not a twine/1 reply at all.</summary>
    public static bool TryParse(string line, out ReplyLine reply, out string problem)
    {
        reply = null!;
        var tokens = line.Split(' ', StringSplitOptions.RemoveEmptyEntries);
        if (tokens.Length == 0)
        {
            problem = "an empty line";
            return false;
        }
        var word = tokens[0];
        if (!s_replyWords.Contains(word))
        {
            problem = $"'{Shorten(word)}' is not a twine/1 reply";
            return false;
        }
        var words = new List<string>();
        var keys = new Dictionary<string, string>(StringComparer.Ordinal);
        foreach (var token in tokens.Skip(1))
        {
            var eq = token.IndexOf('=');
            if (eq > 0 && IsKey(token.AsSpan(0, eq))) keys.TryAdd(token[..eq], token[(eq + 1)..]);
            else words.Add(token);
        }
        var rest = line.TrimStart(' ');
        rest = rest.Length > word.Length ? rest[word.Length..].Trim(' ') : "";
        reply = new ReplyLine(word, words, keys, rest);
        problem = "";
        return true;
    }

    /// <summary>A line cut to a length fit for a message.</summary>
    public static string Shorten(string text, int max = 80) => text.Length <= max ? text : text[..max] + "…";

    private static bool IsKey(ReadOnlySpan<char> key)
    {
        foreach (var c in key)
            if (!(char.IsAsciiLetterLower(c) || char.IsAsciiDigit(c) || c == '_' || c == '-')) return false;
        return true;
    }
}
