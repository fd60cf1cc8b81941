using System.Buffers;
using System.Text;
using System.Text.Encodings.Web;
using System.Text.Json;
using Bramble.Values;

namespace Bramble.Arena.Journal;

/// <summary>A journal line that is not a game record.</summary>
public sealed class JournalFormatException(string message) : FormatException(message);

/// <summary>
/// A game record as one JSON line and back, with the field order of docs/matches.md (people read these
/// files). Non-ASCII stays readable (<c>↑</c>, not <c>\u2191</c>); the line never contains a
/// newline, so one line is exactly one game.
/// </summary>
public static class JournalFormat
{
    private static readonly JsonWriterOptions s_writer = new()
    {
        Encoder = JavaScriptEncoder.UnsafeRelaxedJsonEscaping,
        Indented = false,
    };

    public static string Write(GameRecord record)
    {
        var buffer = new ArrayBufferWriter<byte>(512);
        using (var json = new Utf8JsonWriter(buffer, s_writer))
        {
            json.WriteStartObject();
            json.WriteNumber("game", record.Game);
            json.WriteStartArray("pair");
            foreach (var id in record.Pair) json.WriteStringValue(id);
            json.WriteEndArray();
            json.WriteString("left", record.Left);
            json.WriteString("right", record.Right);
            json.WriteString("first", record.First.Word());
            json.WriteString("ruleset", record.Ruleset);
            json.WriteString("position", record.Position);
            json.WriteStartArray("moves");
            foreach (var move in record.Moves)
            {
                json.WriteStartObject();
                json.WriteString("side", move.Side.Word());
                json.WriteString("move", move.Move);
                json.WriteNumber("ms", move.Ms);
                json.WriteEndObject();
            }
            json.WriteEndArray();
            json.WriteString("winner", record.Winner.Word());
            json.WriteString("end", record.End.Word());
            if (record.Theory is { } theory) json.WriteString("theory", theory.Word());
            json.WriteStartArray("blunders");
            foreach (var blunder in record.Blunders)
            {
                json.WriteStartObject();
                json.WriteNumber("ply", blunder.Ply);
                json.WriteString("by", blunder.By);
                json.WriteEndObject();
            }
            json.WriteEndArray();
            json.WriteNumber("analysed", record.Analysed);
            if (record.Detail is not null) json.WriteString("detail", record.Detail);
            json.WriteEndObject();
        }
        return Encoding.UTF8.GetString(buffer.WrittenSpan);
    }

    /// <summary>Reads one line; throws <see cref="JournalFormatException"/> saying what is wrong.</summary>
    public static GameRecord Parse(string line)
    {
        JsonDocument document;
        try
        {
            document = JsonDocument.Parse(line);
        }
        catch (JsonException e)
        {
            throw new JournalFormatException($"not JSON ({e.Message.Split(". ")[0]})");
        }
        using (document)
        {
            var root = document.RootElement;
            if (root.ValueKind != JsonValueKind.Object) throw new JournalFormatException("not a JSON object");
            var moves = new List<PlayedMove>();
            foreach (var move in Array(root, "moves"))
                moves.Add(new PlayedMove(SideOf(move, "side"), String(move, "move"), move.TryGetProperty("ms", out var ms) && ms.TryGetInt64(out var m) ? m : 0));
            var blunders = new List<Blunder>();
            if (root.TryGetProperty("blunders", out _))
                foreach (var blunder in Array(root, "blunders"))
                    blunders.Add(new Blunder(Integer(blunder, "ply"), String(blunder, "by")));
            var endWord = String(root, "end");
            if (!GameEndWords.TryParse(endWord, out var end)) throw new JournalFormatException($"unknown end '{endWord}'");
            Side? theory = root.TryGetProperty("theory", out var t) && t.ValueKind == JsonValueKind.String ? SideOf(root, "theory") : null;
            var record = new GameRecord
            {
                Game = Integer(root, "game"),
                Pair = Array(root, "pair").Select(p => p.ValueKind == JsonValueKind.String ? p.GetString()! : throw new JournalFormatException("'pair' holds a non-string")).ToList(),
                Left = String(root, "left"),
                Right = String(root, "right"),
                First = SideOf(root, "first"),
                // Journals written before mixed-ruleset matches have no ruleset field.
                Ruleset = root.TryGetProperty("ruleset", out var r) && r.ValueKind == JsonValueKind.String ? r.GetString()! : "",
                Position = String(root, "position"),
                Moves = moves,
                Winner = SideOf(root, "winner"),
                End = end,
                Theory = theory,
                Blunders = blunders,
                Analysed = root.TryGetProperty("analysed", out var a) && a.TryGetInt32(out var n) ? n : 0,
                Detail = root.TryGetProperty("detail", out var d) && d.ValueKind == JsonValueKind.String ? d.GetString() : null,
            };
            if (record.Pair.Count != 2) throw new JournalFormatException("'pair' must name two players");
            return record;
        }
    }

    private static JsonElement Field(JsonElement obj, string key) =>
        obj.TryGetProperty(key, out var value) ? value : throw new JournalFormatException($"no '{key}' field");

    private static string String(JsonElement obj, string key)
    {
        var value = Field(obj, key);
        return value.ValueKind == JsonValueKind.String ? value.GetString()! : throw new JournalFormatException($"'{key}' is not a string");
    }

    private static int Integer(JsonElement obj, string key)
    {
        var value = Field(obj, key);
        return value.ValueKind == JsonValueKind.Number && value.TryGetInt32(out var n) ? n : throw new JournalFormatException($"'{key}' is not a whole number");
    }

    private static Side SideOf(JsonElement obj, string key)
    {
        var word = String(obj, key);
        return word switch
        {
            "left" => Side.Left,
            "right" => Side.Right,
            _ => throw new JournalFormatException($"'{key}' is '{word}', not left or right"),
        };
    }

    private static JsonElement.ArrayEnumerator Array(JsonElement obj, string key)
    {
        var value = Field(obj, key);
        return value.ValueKind == JsonValueKind.Array ? value.EnumerateArray() : throw new JournalFormatException($"'{key}' is not an array");
    }
}
