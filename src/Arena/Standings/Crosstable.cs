using Bramble.Arena.Journal;

namespace Bramble.Arena.Standings;

/// <summary>The score of each pair: how many of their games against each other each player won.</summary>
public sealed record Crosstable(IReadOnlyList<string> Players, int[,] Wins, int[,] Games)
{
    public static Crosstable Compute(IReadOnlyList<GameRecord> records, IReadOnlyList<string> players)
    {
        var index = players.Select((id, i) => (id, i)).ToDictionary(x => x.id, x => x.i);
        var wins = new int[players.Count, players.Count];
        var games = new int[players.Count, players.Count];
        foreach (var r in records)
        {
            if (!index.TryGetValue(r.Left, out var left) || !index.TryGetValue(r.Right, out var right)) continue;
            games[left, right]++;
            games[right, left]++;
            if (r.WinnerId == r.Left) wins[left, right]++;
            else wins[right, left]++;
        }
        return new Crosstable(players, wins, games);
    }

    /// <summary>Wins of <paramref name="row"/> against <paramref name="column"/>, out of their games.</summary>
    public (int Wins, int Games) Cell(int row, int column) => (Wins[row, column], Games[row, column]);
}
