using Bramble.Arena.Journal;

namespace Bramble.Arena.Standings;

/// <summary>
/// Finds the colour-swapped pairs in a set of records: two games of the same two players on the
/// same position with the same side first, each player on the other seat. Found from the records
/// alone (not from the schedule), so a merged set of shard journals pairs exactly like the match
/// that wrote them.
/// </summary>
public static class SeatPairs
{
    public static IReadOnlyList<(GameRecord First, GameRecord Second)> Find(IEnumerable<GameRecord> records)
    {
        var pairs = new List<(GameRecord, GameRecord)>();
        var groups = records.GroupBy(r => (r.Ruleset, r.Position, r.First, Key(r.Left, r.Right)));
        foreach (var group in groups)
        {
            var waiting = new List<GameRecord>();
            foreach (var record in group.OrderBy(r => r.Game))
            {
                var partner = waiting.FindIndex(w => w.Left == record.Right && w.Right == record.Left);
                if (partner < 0)
                {
                    waiting.Add(record);
                    continue;
                }
                pairs.Add((waiting[partner], record));
                waiting.RemoveAt(partner);
            }
        }
        return pairs;
    }

    private static string Key(string a, string b) => string.CompareOrdinal(a, b) <= 0 ? a + "\u0000" + b : b + "\u0000" + a;
}
