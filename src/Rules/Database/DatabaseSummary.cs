using Bramble.Values;

namespace Bramble.Rules.Database;

/// <summary>One ruleset's part of a database: how many components, of which sizes, and what kinds of value.</summary>
public sealed record RulesetSummary(
    string Ruleset,
    int Entries,
    int DistinctValues,
    int Numbers,
    int Nimbers,
    int OtherValues,
    IReadOnlyDictionary<int, int> EntriesBySize,
    string SizeUnit);

/// <summary>What <c>bramble db info</c> reports about a database file.</summary>
public sealed record DatabaseSummary(
    string Path,
    int Version,
    string Description,
    long FileBytes,
    int GameNodes,
    int Entries,
    IReadOnlyList<RulesetSummary> Rulesets)
{
    /// <summary>Reads the file (throws <see cref="DatabaseFormatException"/> if it is not a valid database) and sums it up.</summary>
    public static DatabaseSummary Of(string path)
    {
        var store = new GameStore();
        var contents = ComponentDatabase.Read(path, store);
        var parts = new List<RulesetSummary>();
        foreach (var group in contents.Entries.GroupBy(e => e.Key[..e.Key.IndexOf(':')]).OrderBy(g => g.Key, StringComparer.Ordinal))
        {
            var ruleset = Bramble.Rules.Rulesets.Find(group.Key);
            var catalogue = ruleset as IComponentCatalogue;
            var bySize = new SortedDictionary<int, int>();
            int numbers = 0, nimbers = 0, others = 0;
            foreach (var (key, game) in group)
            {
                if (store.IsNumber(game)) numbers++;
                else if (store.IsNimber(game)) nimbers++;
                else others++;
                // A normal key of a grid ruleset is itself a position; sizes are reported when it parses.
                if (ruleset is null) continue;
                try
                {
                    var component = ruleset.Parse(key[(group.Key.Length + 1)..].TrimStart('-'));
                    int size = catalogue?.CatalogueSize(component) ?? component.Size;
                    bySize[size] = bySize.GetValueOrDefault(size) + 1;
                }
                catch (PositionSyntaxException)
                {
                }
            }
            string unit = catalogue?.SizeUnit ?? "size";
            parts.Add(new RulesetSummary(group.Key, group.Count(), group.Select(e => e.Value).Distinct().Count(), numbers, nimbers, others, bySize, unit));
        }
        return new DatabaseSummary(path, contents.Version, contents.Description, contents.FileBytes, contents.GameNodes, contents.Entries.Count, parts);
    }
}
