using System.Text;

namespace Bramble.Wire.Tests;

/// <summary>One fuzz line: its bytes (no terminator), and what it was made from when it was left whole.</summary>
public sealed record FuzzLine(byte[] Bytes, string? Intact)
{
    public bool IsHalt => Intact == "halt";
}

/// <summary>
/// Reproducible random request lines for fuzzing: well-formed requests, and the same mutated
/// (bytes flipped, inserted, deleted, tokens doubled, lines truncated, a rare line grown past
/// 1 MiB). No line holds a newline byte, and no mutated line starts with "halt" or "bye", so every
/// line but the intact halts must get exactly one final reply and the session lasts to the end.
/// </summary>
public sealed class FuzzLines(int seed, IReadOnlyList<string> positions, string ruleset)
{
    private static readonly byte[] s_interesting = [0x00, 0x01, 0x09, 0x0D, 0x20, 0x20, 0x3D, 0x2B, 0x2E, 0x7F, 0x80, 0xBF, 0xC0, 0xC3, 0xE2, 0xED, 0xF0, 0xF8, 0xFF, (byte)'L', (byte)'R', (byte)'1'];

    private readonly Random _random = new(seed);

    /// <summary>A well-formed request, or a near miss of one.</summary>
    public string Request()
    {
        string Side() => _random.Next(2) == 0 ? "left" : "right";
        string Number() => _random.Next(4) switch { 0 => "0", 1 => _random.Next(100).ToString(), _ => _random.Next(100_000).ToString() };
        return _random.Next(23) switch
        {
            0 => "hello twine 1",
            1 => "hello twine " + _random.Next(3),
            2 => "set strategy random",
            3 => "set seed " + _random.Next(-50, 50),
            4 => "set budget-ms " + Number(),
            5 => "set " + (_random.Next(2) == 0 ? "colour" : "assess-ms") + " " + Number(),
            6 or 7 => $"begin {ruleset} {positions[_random.Next(positions.Count)]}",
            8 => $"begin {(_random.Next(2) == 0 ? "chess" : ruleset)} {positions[_random.Next(positions.Count)]}",
            9 or 10 or 11 => $"apply {Side()} {_random.Next(1, 5)}.{_random.Next(1, 5)}",
            12 => $"apply {Side()} e{_random.Next(1, 12)}",
            13 or 14 => $"think {Side()} clock={Number()} inc={Number()}",
            15 => $"think {Side()} inc={Number()} clock={Number()} colour=green",
            16 => "think " + Side(),
            17 => "assess",
            18 => "halt",
            19 => "ponder " + Number(),
            20 => $"apply {Side()} {_random.Next(1, 12)}.{_random.Next(1, 4)} mood=calm",
            21 => $"apply {Side()} {(char)('a' + _random.Next(5))}{_random.Next(1, 6)}",
            _ => "assess now",
        };
    }

    public FuzzLine Next()
    {
        while (true)
        {
            var request = Request();
            if (_random.Next(3) == 0) return new FuzzLine(Encoding.UTF8.GetBytes(request), request);
            var bytes = Mutate(Encoding.UTF8.GetBytes(request));
            for (var i = 0; i < bytes.Count; i++)
                if (bytes[i] == (byte)'\n') bytes[i] = (byte)'x';
            var text = bytes.ToArray();
            if (StartsWith(text, "halt") || StartsWith(text, "bye")) continue;
            return new FuzzLine(text, null);
        }
    }

    private List<byte> Mutate(byte[] original)
    {
        var bytes = original.ToList();
        var rounds = 1 + _random.Next(3);
        for (var r = 0; r < rounds; r++)
        {
            switch (_random.Next(100))
            {
                case < 25 when bytes.Count > 0:
                    bytes[_random.Next(bytes.Count)] = Pick();
                    break;
                case < 50:
                    bytes.Insert(_random.Next(bytes.Count + 1), Pick());
                    break;
                case < 65 when bytes.Count > 0:
                    bytes.RemoveAt(_random.Next(bytes.Count));
                    break;
                case < 80:
                    bytes = bytes.Take(_random.Next(bytes.Count + 1)).ToList();
                    break;
                case < 90:
                    // A token doubled, or the request words swapped: shape faults rather than byte faults.
                    var space = bytes.IndexOf((byte)' ');
                    if (space > 0) bytes.InsertRange(space, bytes.Take(space).Prepend((byte)' ').ToList());
                    break;
                case < 99:
                    bytes.AddRange(Encoding.UTF8.GetBytes(" " + Request()));
                    break;
                default:
                    if (_random.Next(200) == 0) bytes.AddRange(Enumerable.Repeat((byte)'L', Codec.MaxLineBytes + 10));
                    break;
            }
        }
        return bytes;
    }

    private byte Pick() => _random.Next(3) == 0 ? (byte)_random.Next(256) : s_interesting[_random.Next(s_interesting.Length)];

    private static bool StartsWith(byte[] bytes, string prefix) =>
        bytes.Length >= prefix.Length && bytes.AsSpan(0, prefix.Length).SequenceEqual(Encoding.ASCII.GetBytes(prefix));

    /// <summary>The session's input: a handshake, <paramref name="count"/> fuzz lines, then bye.</summary>
    public static (byte[] Input, List<FuzzLine> Lines) Session(FuzzLines source, int count)
    {
        var lines = new List<FuzzLine> { new("hello twine 1"u8.ToArray(), "hello twine 1") };
        for (var i = 0; i < count; i++) lines.Add(source.Next());
        lines.Add(new FuzzLine("bye"u8.ToArray(), "bye"));
        var input = new MemoryStream();
        foreach (var line in lines)
        {
            input.Write(line.Bytes);
            input.WriteByte((byte)'\n');
        }
        return (input.ToArray(), lines);
    }

    /// <summary>
    /// Checks the engine's output against the session: every output line is strict UTF-8 without
    /// control characters, a well-formed reply; one final reply per line except the intact halts,
    /// in order (intact hello, assess and think lines get their own kind of reply or an err); and
    /// the last line is bye.
    /// </summary>
    public static void Verify(List<FuzzLine> lines, byte[] output)
    {
        Assert.True(output.Length > 0 && output[^1] == (byte)'\n', "output ends with a newline");
        var text = new UTF8Encoding(false, throwOnInvalidBytes: true).GetString(output);
        var replies = text[..^1].Split('\n');
        var finals = new List<string>();
        foreach (var reply in replies)
        {
            Assert.DoesNotContain(reply, c => char.IsControl(c));
            var parsed = Codec.ParseReply(reply);
            Assert.True(parsed.IsOk, $"not a reply: {reply}");
            if (parsed.Message is not NoteReply) finals.Add(reply);
        }
        var requests = lines.Where(l => !l.IsHalt).ToList();
        Assert.Equal(requests.Count, finals.Count);
        for (var i = 0; i < requests.Count; i++)
        {
            var expected = requests[i].Intact switch
            {
                "hello twine 1" => "welcome ",
                "assess" => "value |err ",
                "bye" => "bye",
                { } intact when intact.StartsWith("think ", StringComparison.Ordinal) => "pick |err ",
                { } intact when intact.StartsWith("begin ", StringComparison.Ordinal) => "ok components=|err bad-position ",
                _ => null,
            };
            if (expected is null) continue;
            Assert.True(expected.Split('|').Any(e => finals[i].StartsWith(e, StringComparison.Ordinal)),
                $"request {i} '{requests[i].Intact}' got '{finals[i]}'");
        }
        Assert.Equal("bye", finals[^1]);
    }
}
