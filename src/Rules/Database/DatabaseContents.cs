using Bramble.Values;

namespace Bramble.Rules.Database;

/// <summary>What a database file holds, its games read into one store.</summary>
public sealed record DatabaseContents(
    string Description,
    int Version,
    IReadOnlyDictionary<string, Game> Entries,
    int GameNodes,
    long FileBytes);
