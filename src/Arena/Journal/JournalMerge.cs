namespace Bramble.Arena.Journal;

/// <summary>The union of several journals by game id.</summary>
/// <param name="Records">One record per game id, sorted by id.</param>
/// <param name="Conflicts">Games recorded twice with different results (or as different games): each an error.</param>
/// <param name="Notices">Ignored incomplete lines, and duplicates that agreed.</param>
public sealed record MergedJournal(IReadOnlyList<GameRecord> Records, IReadOnlyList<string> Conflicts, IReadOnlyList<string> Notices);

/// <summary>
/// Merges shard journals (or one journal with repeated lines). A game that appears more than once
/// with the same result is kept once; with different results it is a conflict, which the caller
/// must treat as an error: a tournament that cannot say who won game 17 has no standings.
/// </summary>
public static class JournalMerge
{
    public static MergedJournal Merge(IEnumerable<(string Source, JournalContents Contents)> journals)
    {
        var byId = new SortedDictionary<int, (GameRecord Record, string Source)>();
        var conflicts = new List<string>();
        var notices = new List<string>();
        var duplicates = 0;
        foreach (var (source, contents) in journals)
        {
            if (contents.Notice is not null) notices.Add(contents.Notice);
            foreach (var record in contents.Records)
            {
                if (!byId.TryGetValue(record.Game, out var kept))
                {
                    byId[record.Game] = (record, source);
                    continue;
                }
                var conflict = kept.Record.ConflictWith(record);
                if (conflict is not null) conflicts.Add($"{conflict} ({kept.Source}; {source})");
                else duplicates++;
            }
        }
        if (duplicates > 0) notices.Add($"{duplicates} game{(duplicates == 1 ? " was" : "s were")} recorded more than once with the same result and counted once");
        return new MergedJournal(byId.Values.Select(v => v.Record).ToList(), conflicts, notices);
    }
}
