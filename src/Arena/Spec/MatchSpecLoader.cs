using System.Text.Json;
using Bramble.Rules;

namespace Bramble.Arena.Spec;

/// <summary>
/// Reads a match spec (docs/matches.md) and checks all of it before anything runs: every problem is
/// collected with its JSON path and reported together in one <see cref="MatchSpecException"/>, so
/// a user fixes a file in one go rather than one error per run. Positions are parsed with their
/// ruleset here, so a typing mistake in line 90 of a suite stops the match before game 1.
/// </summary>
public sealed class MatchSpecLoader(RulesetFinder rulesets)
{
    private static readonly string[] s_topKeys =
    [
        "title", "ruleset", "positions", "players", "format", "focus", "seats", "clock", "parallel",
        "adjudicate", "sprt", "journal", "analysis_ms", "adjudicate_ms", "seed", "analysis_nodes",
    ];

    // Spellings of earlier versions, answered with the current one rather than "unknown".
    private static readonly Dictionary<string, string> s_renamedSprtKeys = new(StringComparer.Ordinal)
    {
        ["elo0"] = "null_elo",
        ["elo1"] = "alternative_elo",
    };

    private static readonly Dictionary<string, string> s_renamedWords = new(StringComparer.Ordinal)
    {
        ["gauntlet"] = "challenger",
    };

    private static readonly JsonDocumentOptions s_json = new()
    {
        CommentHandling = JsonCommentHandling.Skip,
        AllowTrailingCommas = true,
    };

    public MatchSpec Load(string path)
    {
        var full = Path.GetFullPath(path);
        string text;
        try
        {
            text = BoundedFile.ReadText(full, BoundedFile.SpecBytes);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            throw new MatchSpecException(path, [new SpecError("$", $"cannot read the file: {e.Message}")]);
        }
        return Parse(text, full);
    }

    /// <summary>Checks spec text as if it were the file <paramref name="specPath"/> (which gives the folder and default title).</summary>
    public MatchSpec Parse(string json, string specPath)
    {
        var full = Path.GetFullPath(specPath);
        var folder = Path.GetDirectoryName(full) ?? Directory.GetCurrentDirectory();
        JsonDocument document;
        try
        {
            document = JsonDocument.Parse(json, s_json);
        }
        catch (JsonException e)
        {
            throw new MatchSpecException(specPath, [new SpecError("$", $"not valid JSON (line {e.LineNumber + 1}, byte {e.BytePositionInLine + 1}): {FirstSentence(e.Message)}")]);
        }
        using (document)
        {
            var reading = new Reading(rulesets, folder);
            var spec = reading.Spec(document.RootElement, full);
            if (reading.Errors.Count > 0 || spec is null) throw new MatchSpecException(specPath, reading.Errors);
            return spec;
        }
    }

    private static string FirstSentence(string message)
    {
        var cut = message.IndexOf(". ", StringComparison.Ordinal);
        return cut < 0 ? message : message[..cut];
    }

    /// <summary>One pass over one document, collecting errors instead of stopping at the first.</summary>
    private sealed class Reading(RulesetFinder rulesets, string folder)
    {
        public List<SpecError> Errors { get; } = [];

        private void Error(string path, string message) => Errors.Add(new SpecError(path, message));

        public MatchSpec? Spec(JsonElement root, string specPath)
        {
            if (root.ValueKind != JsonValueKind.Object)
            {
                Error("$", "a match spec is a JSON object");
                return null;
            }
            UnknownKeys(root, "$", s_topKeys);

            var title = OptionalString(root, "title", "$") ?? Path.GetFileNameWithoutExtension(specPath);
            var ruleset = OptionalString(root, "ruleset", "$");
            if (ruleset is not null && rulesets(ruleset) is null) Error("$.ruleset", UnknownRuleset(ruleset));

            var players = Players(root);
            var positions = Positions(root, ruleset);

            var format = Choice(root, "format", "$", TournamentFormat.RoundRobin,
                ("round-robin", TournamentFormat.RoundRobin), ("challenger", TournamentFormat.Challenger));
            var focus = OptionalString(root, "focus", "$");
            if (format == TournamentFormat.Challenger && focus is null)
                Error("$.focus", "a challenger match needs \"focus\": the id of the player who meets every other");
            if (format != TournamentFormat.Challenger && focus is not null)
                Error("$.focus", "\"focus\" only goes with \"format\": \"challenger\"");
            if (focus is not null && players.Count > 0 && players.All(p => p.Id != focus))
                Error("$.focus", $"'{focus}' is not a player id (players: {string.Join(", ", players.Select(p => p.Id))})");

            var seats = Choice(root, "seats", "$", SeatPlan.AllFour, ("all-four", SeatPlan.AllFour), ("swap", SeatPlan.Swap));
            var clock = Clock(root);
            var parallel = OptionalInteger(root, "parallel", "$", min: 1, max: 1024);
            var adjudicate = Choice(root, "adjudicate", "$", Adjudication.Never,
                ("never", Adjudication.Never), ("decided", Adjudication.Decided), ("numbers", Adjudication.Numbers));
            // Count the entries as written: a player with a mistake in it is still a player.
            var entries = root.TryGetProperty("players", out var list) && list.ValueKind == JsonValueKind.Array ? list.GetArrayLength() : players.Count;
            var sprt = Sprt(root, entries);
            var journal = OptionalString(root, "journal", "$") ?? Path.Combine("results", Path.GetFileNameWithoutExtension(specPath) + ".jsonl");
            var analysisMs = OptionalInteger(root, "analysis_ms", "$", min: 0, max: 3_600_000) ?? 1000;
            var adjudicateMs = OptionalInteger(root, "adjudicate_ms", "$", min: 1, max: 3_600_000) ?? 100;
            var seed = OptionalInteger(root, "seed", "$", long.MinValue, long.MaxValue);
            var analysisNodes = OptionalInteger(root, "analysis_nodes", "$", min: 1, max: 1_000_000_000_000);

            if (Errors.Count > 0) return null;
            return new MatchSpec
            {
                Title = title,
                SpecPath = specPath,
                Folder = folder,
                Players = players,
                Positions = positions,
                Format = format,
                Focus = focus,
                Seats = seats,
                Clock = clock,
                Parallel = (int?)parallel,
                Adjudicate = adjudicate,
                Sprt = sprt,
                JournalPath = Path.GetFullPath(Path.Combine(folder, journal)),
                AnalysisMs = (int)analysisMs,
                AdjudicateMs = (int)adjudicateMs,
                Seed = seed,
                AnalysisNodes = analysisNodes,
            };
        }

        private List<PlayerSpec> Players(JsonElement root)
        {
            var players = new List<PlayerSpec>();
            if (!root.TryGetProperty("players", out var list))
            {
                Error("$.players", "missing: the list of players, each { \"id\": …, \"run\": [argv…] }");
                return players;
            }
            if (list.ValueKind != JsonValueKind.Array)
            {
                Error("$.players", $"expected an array of players, found {Kind(list)}");
                return players;
            }
            var index = 0;
            var seen = new HashSet<string>(StringComparer.Ordinal);
            foreach (var item in list.EnumerateArray())
            {
                var path = $"$.players[{index++}]";
                if (item.ValueKind != JsonValueKind.Object)
                {
                    Error(path, $"expected an object {{ \"id\": …, \"run\": […] }}, found {Kind(item)}");
                    continue;
                }
                UnknownKeys(item, path, ["id", "run", "settings"]);
                var id = RequiredString(item, "id", path);
                if (id is not null)
                {
                    if (id.Length == 0 || id.Any(char.IsWhiteSpace) || id.Any(char.IsControl))
                        Error(path + ".id", $"'{id}': a player id is one word, without spaces");
                    else if (!seen.Add(id))
                        Error(path + ".id", $"'{id}' is used by two players");
                }
                var run = Argv(item, path);
                var settings = Settings(item, path);
                if (id is not null && run is not null) players.Add(new PlayerSpec(id, run, settings));
            }
            if (index < 2) Error("$.players", $"a match needs at least two players, found {index}");
            return players;
        }

        private List<string>? Argv(JsonElement player, string path)
        {
            if (!player.TryGetProperty("run", out var run))
            {
                Error(path + ".run", "missing: the engine's argv, e.g. [\"bramble\", \"engine\", \"--strategy\", \"perfect\"]");
                return null;
            }
            if (run.ValueKind == JsonValueKind.String)
            {
                Error(path + ".run", "a command line string is not accepted (it would need a shell): write an argv array, e.g. [\"./my-engine\", \"--fast\"]");
                return null;
            }
            if (run.ValueKind != JsonValueKind.Array)
            {
                Error(path + ".run", $"expected an argv array of strings, found {Kind(run)}");
                return null;
            }
            var argv = new List<string>();
            var i = 0;
            foreach (var arg in run.EnumerateArray())
            {
                if (arg.ValueKind != JsonValueKind.String) Error($"{path}.run[{i}]", $"expected a string, found {Kind(arg)}");
                else argv.Add(arg.GetString()!);
                i++;
            }
            if (i == 0) Error(path + ".run", "the argv is empty: it needs at least the program");
            else if (argv.Count > 0 && string.IsNullOrWhiteSpace(argv[0])) Error(path + ".run[0]", "the program name is empty");
            return argv.Count == i && i > 0 ? argv : null;
        }

        private List<KeyValuePair<string, string>> Settings(JsonElement player, string path)
        {
            var settings = new List<KeyValuePair<string, string>>();
            if (!player.TryGetProperty("settings", out var object_)) return settings;
            if (object_.ValueKind != JsonValueKind.Object)
            {
                Error(path + ".settings", $"expected an object of engine settings, found {Kind(object_)}");
                return settings;
            }
            foreach (var setting in object_.EnumerateObject())
            {
                var at = $"{path}.settings.{setting.Name}";
                if (setting.Name.Length == 0 || setting.Name.Any(c => char.IsWhiteSpace(c) || char.IsControl(c)))
                {
                    Error(at, "a setting name is one word");
                    continue;
                }
                string? value = setting.Value.ValueKind switch
                {
                    JsonValueKind.String => setting.Value.GetString(),
                    JsonValueKind.Number => setting.Value.GetRawText(),
                    JsonValueKind.True => "true",
                    JsonValueKind.False => "false",
                    _ => null,
                };
                if (value is null || value.Contains('\n') || value.Length == 0)
                    Error(at, "a setting value is a non-empty string, number or boolean on one line");
                else
                    settings.Add(new(setting.Name, value));
            }
            return settings;
        }

        private List<StartPosition> Positions(JsonElement root, string? ruleset)
        {
            var positions = new List<StartPosition>();
            if (!root.TryGetProperty("positions", out var sources))
            {
                Error("$.positions", "missing: { \"file\": \"suites/….txt\" } or { \"generate\": …, \"count\": …, \"size\": …, \"seed\": … }");
                return positions;
            }
            if (sources.ValueKind == JsonValueKind.Object)
                Source(sources, "$.positions", ruleset, positions);
            else if (sources.ValueKind == JsonValueKind.Array)
            {
                var i = 0;
                foreach (var source in sources.EnumerateArray())
                {
                    var path = $"$.positions[{i++}]";
                    if (source.ValueKind != JsonValueKind.Object) Error(path, $"expected a position source object, found {Kind(source)}");
                    else Source(source, path, ruleset, positions);
                }
                if (i == 0) Error("$.positions", "the list of position sources is empty");
            }
            else
                Error("$.positions", $"expected a position source object or a list of them, found {Kind(sources)}");
            return positions;
        }

        private void Source(JsonElement source, string path, string? matchRuleset, List<StartPosition> positions)
        {
            UnknownKeys(source, path, ["file", "generate", "count", "size", "seed", "colours", "ruleset"]);
            var ruleset = OptionalString(source, "ruleset", path);
            if (ruleset is not null && rulesets(ruleset) is null)
            {
                Error(path + ".ruleset", UnknownRuleset(ruleset));
                return;
            }
            ruleset ??= matchRuleset;
            var hasFile = source.TryGetProperty("file", out _);
            var hasGenerate = source.TryGetProperty("generate", out _);
            if (hasFile == hasGenerate)
            {
                Error(path, hasFile ? "give either \"file\" or \"generate\", not both" : "needs \"file\" (a suite) or \"generate\" (a generator)");
                return;
            }
            if (hasFile) SuiteFile(source, path, ruleset, positions);
            else Generated(source, path, ruleset, positions);
        }

        /// <summary>Errors listed for one suite file before the rest of it is skipped.</summary>
        private const int MaxSuiteErrors = 5;

        private void SuiteFile(JsonElement source, string path, string? ruleset, List<StartPosition> positions)
        {
            foreach (var key in new[] { "count", "size", "seed", "colours" })
                if (source.TryGetProperty(key, out _)) Error($"{path}.{key}", "only goes with \"generate\"");
            var file = RequiredString(source, "file", path);
            if (file is null) return;
            var full = Path.GetFullPath(Path.Combine(folder, file));
            string text;
            try
            {
                text = BoundedFile.ReadText(full, BoundedFile.SuiteBytes);
            }
            catch (Exception e) when (e is IOException or UnauthorizedAccessException)
            {
                Error(path + ".file", $"cannot read '{file}' (looked at {full}): {e.Message}");
                return;
            }
            var lines = SuiteLine.Split(text);
            if (lines.Count == 0) Error(path + ".file", $"'{file}' holds no positions");
            var before = Errors.Count;
            foreach (var line in lines)
            {
                // A file that is not a suite at all (a path typed wrong, or a match file from someone
                // else pointing at a private file) would otherwise be echoed line by line.
                if (Errors.Count - before >= MaxSuiteErrors)
                {
                    var failing = lines.Count(l => l.Number >= line.Number);
                    Error(path + ".file", $"'{file}': {failing} more line{(failing == 1 ? "" : "s")} not checked; is it a position suite?");
                    break;
                }
                var where = $"{file} line {line.Number}";
                var name = line.Ruleset ?? ruleset;
                if (name is null)
                {
                    Error(path + ".file", $"{where}: no ruleset: give \"ruleset\" in the spec or start the line with one, e.g. 'hackenbush: BRR'");
                    continue;
                }
                var rules = rulesets(name);
                if (rules is null)
                {
                    Error(path + ".file", $"{where}: {UnknownRuleset(name)}");
                    continue;
                }
                if (line.Text.Length == 0)
                {
                    Error(path + ".file", $"{where}: no position after '{name}:'");
                    continue;
                }
                if (CheckPosition(rules, line.Text, path + ".file", where))
                    positions.Add(new StartPosition(rules.Name, line.Text, where));
            }
        }

        private void Generated(JsonElement source, string path, string? ruleset, List<StartPosition> positions)
        {
            var generator = RequiredString(source, "generate", path);
            var count = RequiredInteger(source, "count", path, 1, 1_000_000);
            var size = RequiredInteger(source, "size", path, 1, 1_000_000);
            var seed = RequiredInteger(source, "seed", path, int.MinValue, int.MaxValue);
            var colours = OptionalString(source, "colours", path);
            if (ruleset is null)
            {
                Error(path, "a generator needs a ruleset: give \"ruleset\" here or for the whole match");
                return;
            }
            if (generator is null || count is null || size is null || seed is null) return;
            var rules = rulesets(ruleset)!;
            if (!rules.Generators.Contains(generator, StringComparer.OrdinalIgnoreCase))
            {
                Error(path + ".generate", $"'{generator}' is not a {rules.Name} generator (known: {string.Join(", ", rules.Generators)})");
                return;
            }
            IReadOnlyList<string> texts;
            try
            {
                texts = rules.Generate(generator, (int)count, (int)size, (int)seed, colours);
            }
            catch (Exception e) when (e is not OutOfMemoryException)
            {
                Error(path, $"the {rules.Name} generator '{generator}' failed: {e.Message}");
                return;
            }
            var i = 0;
            foreach (var text in texts)
            {
                var where = $"{generator} #{++i} (seed {seed})";
                if (CheckPosition(rules, text, path, where)) positions.Add(new StartPosition(rules.Name, text, where));
            }
        }

        private bool CheckPosition(IRuleset rules, string text, string path, string where)
        {
            try
            {
                rules.Parse(text);
                return true;
            }
            catch (PositionSyntaxException e)
            {
                Error(path, $"{where}: {e.Message}\n{e.Pointer}");
            }
            catch (Exception e) when (e is not OutOfMemoryException)
            {
                Error(path, $"{where}: not a {rules.Name} position: {e.Message}");
            }
            return false;
        }

        private TimeControl Clock(JsonElement root)
        {
            var clock = new TimeControl(10_000, 100);
            if (!root.TryGetProperty("clock", out var value)) return clock;
            if (value.ValueKind != JsonValueKind.Object)
            {
                Error("$.clock", $"expected {{ \"base_ms\": …, \"inc_ms\": … }}, found {Kind(value)}");
                return clock;
            }
            UnknownKeys(value, "$.clock", ["base_ms", "inc_ms"]);
            var baseMs = RequiredInteger(value, "base_ms", "$.clock", 1, 86_400_000);
            var incMs = OptionalInteger(value, "inc_ms", "$.clock", 0, 3_600_000) ?? 0;
            return new TimeControl(baseMs ?? clock.BaseMs, incMs);
        }

        private SprtSpec? Sprt(JsonElement root, int playerCount)
        {
            if (!root.TryGetProperty("sprt", out var value) || value.ValueKind == JsonValueKind.Null) return null;
            if (value.ValueKind != JsonValueKind.Object)
            {
                Error("$.sprt", $"expected {{ \"null_elo\", \"alternative_elo\", \"alpha\", \"beta\" }}, found {Kind(value)}");
                return null;
            }
            UnknownKeys(value, "$.sprt", ["null_elo", "alternative_elo", "alpha", "beta"], s_renamedSprtKeys);
            // A key written in its old spelling has had its message already; "missing" would only repeat it.
            double? Hypothesis(string key) =>
                !value.TryGetProperty(key, out _) && s_renamedSprtKeys.Any(r => r.Value == key && value.TryGetProperty(r.Key, out _))
                    ? null
                    : RequiredNumber(value, key, "$.sprt", -2000, 2000);
            var nullElo = Hypothesis("null_elo");
            var alternativeElo = Hypothesis("alternative_elo");
            var alpha = OptionalNumber(value, "alpha", "$.sprt", 1e-9, 0.5) ?? 0.05;
            var beta = OptionalNumber(value, "beta", "$.sprt", 1e-9, 0.5) ?? 0.05;
            if (nullElo is not null && alternativeElo is not null && alternativeElo <= nullElo)
                Error("$.sprt.alternative_elo", $"must be greater than null_elo ({nullElo})");
            if (playerCount != 2) Error("$.sprt", $"a sequential test compares exactly two players; this match has {playerCount}");
            return nullElo is null || alternativeElo is null ? null : new SprtSpec(nullElo.Value, alternativeElo.Value, alpha, beta);
        }

        private T Choice<T>(JsonElement obj, string key, string path, T fallback, params (string Word, T Value)[] choices)
        {
            var word = OptionalString(obj, key, path);
            if (word is null) return fallback;
            foreach (var (w, v) in choices)
                if (w == word) return v;
            if (s_renamedWords.TryGetValue(word, out var renamed) && choices.Any(c => c.Word == renamed))
            {
                Error($"{path}.{key}", $"'{word}' is now called '{renamed}': write \"{key}\": \"{renamed}\"");
                // Read on as the new word, so that fields depending on it are not also reported.
                return choices.First(c => c.Word == renamed).Value;
            }
            Error($"{path}.{key}", $"'{word}' is not one of {string.Join(", ", choices.Select(c => c.Word))}");
            return fallback;
        }

        private void UnknownKeys(JsonElement obj, string path, string[] known, IReadOnlyDictionary<string, string>? renamed = null)
        {
            foreach (var property in obj.EnumerateObject())
                if (known.Contains(property.Name)) continue;
                else if (renamed is not null && renamed.TryGetValue(property.Name, out var now))
                    Error($"{path}.{property.Name}", $"this field is now called \"{now}\": write \"{now}\": {property.Value.GetRawText()}");
                else
                    Error($"{path}.{property.Name}", $"unknown field (known here: {string.Join(", ", known)})");
        }

        private string? RequiredString(JsonElement obj, string key, string path)
        {
            if (obj.TryGetProperty(key, out _)) return OptionalString(obj, key, path);
            Error($"{path}.{key}", "missing");
            return null;
        }

        private string? OptionalString(JsonElement obj, string key, string path)
        {
            if (!obj.TryGetProperty(key, out var value)) return null;
            if (value.ValueKind == JsonValueKind.String) return value.GetString();
            Error($"{path}.{key}", $"expected a string, found {Kind(value)}");
            return null;
        }

        private long? RequiredInteger(JsonElement obj, string key, string path, long min, long max)
        {
            if (obj.TryGetProperty(key, out _)) return OptionalInteger(obj, key, path, min, max);
            Error($"{path}.{key}", "missing");
            return null;
        }

        private long? OptionalInteger(JsonElement obj, string key, string path, long min, long max)
        {
            if (!obj.TryGetProperty(key, out var value)) return null;
            if (value.ValueKind != JsonValueKind.Number || !value.TryGetInt64(out var n))
            {
                Error($"{path}.{key}", $"expected a whole number, found {Kind(value)}");
                return null;
            }
            if (n < min || n > max)
            {
                Error($"{path}.{key}", $"{n} is out of range ({min} to {max})");
                return null;
            }
            return n;
        }

        private double? RequiredNumber(JsonElement obj, string key, string path, double min, double max)
        {
            if (obj.TryGetProperty(key, out _)) return OptionalNumber(obj, key, path, min, max);
            Error($"{path}.{key}", "missing");
            return null;
        }

        private double? OptionalNumber(JsonElement obj, string key, string path, double min, double max)
        {
            if (!obj.TryGetProperty(key, out var value)) return null;
            if (value.ValueKind != JsonValueKind.Number)
            {
                Error($"{path}.{key}", $"expected a number, found {Kind(value)}");
                return null;
            }
            var x = value.GetDouble();
            if (x < min || x > max)
            {
                Error($"{path}.{key}", $"{x} is out of range ({min} to {max})");
                return null;
            }
            return x;
        }

        private string UnknownRuleset(string name)
        {
            var known = Rulesets.All.Select(r => r.Name).ToList();
            return $"unknown ruleset '{(name.Length > 40 ? name[..40] + "…" : name)}'" + (known.Count > 0 ? $" (known: {string.Join(", ", known)})" : "");
        }

        private static string Kind(JsonElement value) => value.ValueKind switch
        {
            JsonValueKind.Object => "an object",
            JsonValueKind.Array => "an array",
            JsonValueKind.String => $"the string \"{value.GetString()}\"",
            JsonValueKind.Number => $"the number {value.GetRawText()}",
            JsonValueKind.True or JsonValueKind.False => $"{value.GetRawText()}",
            _ => "null",
        };
    }
}
