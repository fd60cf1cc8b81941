using System.Text.Json;
using Bramble.Arena.Engines;
using Bramble.Arena.Spec;

namespace Bramble.Web;

/// <summary>A file given with <c>--engines</c> that cannot be used: the message names the JSON path at fault.</summary>
public sealed class EngineListException(string message) : Exception(message);

/// <summary>
/// The engines of the user's own that the board may start: exactly those named in the file given
/// at start (<c>--engines engines.json</c>), and nothing else. Each is started on first use and
/// kept running until the board stops.
/// </summary>
public sealed class EngineRoster : IAsyncDisposable
{
    private readonly Dictionary<string, EngineSeat> _seats;

    private EngineRoster(Dictionary<string, EngineSeat> seats) => _seats = seats;

    public static EngineRoster None { get; } = new(new Dictionary<string, EngineSeat>());

    public IReadOnlyCollection<string> Ids => _seats.Keys;

    public EngineSeat? Find(string id) => _seats.GetValueOrDefault(id);

    /// <summary>
    /// Reads <c>{"engines":[{"id":"…","run":["program","arg",…],"settings":{"name":"value"}}]}</c>.
    /// A relative program path with a slash is taken from the file's folder, which is also the
    /// engines' working folder (as in match files).
    /// </summary>
    public static EngineRoster Load(string path)
    {
        string text;
        try
        {
            text = File.ReadAllText(path);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            throw new EngineListException($"{path}: cannot read it: {e.Message}");
        }
        JsonDocument doc;
        try
        {
            doc = JsonDocument.Parse(text, new JsonDocumentOptions { CommentHandling = JsonCommentHandling.Skip, AllowTrailingCommas = true });
        }
        catch (JsonException e)
        {
            throw new EngineListException($"{path}: not JSON: {e.Message}");
        }
        var folder = Path.GetDirectoryName(Path.GetFullPath(path))!;
        var seats = new Dictionary<string, EngineSeat>(StringComparer.Ordinal);
        using (doc)
        {
            if (doc.RootElement.ValueKind != JsonValueKind.Object || !doc.RootElement.TryGetProperty("engines", out var list) || list.ValueKind != JsonValueKind.Array)
                throw new EngineListException($"{path}: $.engines: expected an array of engines");
            int i = 0;
            foreach (var item in list.EnumerateArray())
            {
                var at = $"$.engines[{i++}]";
                if (item.ValueKind != JsonValueKind.Object) throw new EngineListException($"{path}: {at}: expected an object");
                if (!item.TryGetProperty("id", out var id) || id.ValueKind != JsonValueKind.String || string.IsNullOrWhiteSpace(id.GetString()))
                    throw new EngineListException($"{path}: {at}.id: expected a name");
                if (!item.TryGetProperty("run", out var run) || run.ValueKind != JsonValueKind.Array || run.GetArrayLength() == 0
                    || run.EnumerateArray().Any(a => a.ValueKind != JsonValueKind.String || string.IsNullOrEmpty(a.GetString())))
                    throw new EngineListException($"{path}: {at}.run: expected an array of words (program first, no shell)");
                var settings = new List<KeyValuePair<string, string>>();
                if (item.TryGetProperty("settings", out var s))
                {
                    if (s.ValueKind != JsonValueKind.Object) throw new EngineListException($"{path}: {at}.settings: expected an object");
                    foreach (var p in s.EnumerateObject())
                        settings.Add(new(p.Name, p.Value.ValueKind == JsonValueKind.String ? p.Value.GetString()! : p.Value.GetRawText()));
                }
                var name = id.GetString()!.Trim();
                if (seats.ContainsKey(name)) throw new EngineListException($"{path}: {at}.id: '{name}' is named twice");
                var player = new PlayerSpec(name, run.EnumerateArray().Select(a => a.GetString()!).ToList(), settings);
                seats[name] = new EngineSeat(EngineCommand.Resolve(player, folder, EngineCommand.ThisProgram()), settings);
            }
        }
        return new EngineRoster(seats);
    }

    public async ValueTask DisposeAsync()
    {
        foreach (var seat in _seats.Values) await seat.DisposeAsync().ConfigureAwait(false);
    }
}
