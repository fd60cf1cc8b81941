using Bramble.Arena.Journal;
using Bramble.Arena.Statistics;

namespace Bramble.Arena.Standings;

/// <summary>One player's joint rating (Elo scale, the players with games averaging 0).</summary>
/// <param name="Superiority">Likelihood that this player is stronger than the next one down the table; null for the last.</param>
public sealed record PlayerRating(string Id, double Rating, double Low, double High, double StandardError, double? Superiority);

/// <summary>
/// The joint ratings of the players who have games (<see cref="JointRatings"/>), strongest first,
/// with the likelihood of superiority between neighbours. The two games of a seat-swapped pair
/// (<see cref="SeatPairs"/>) form one cluster of the interval; every other game is one of its own.
/// </summary>
public sealed record RatingTable(IReadOnlyList<PlayerRating> Players, bool Regularised)
{
    public static RatingTable Compute(IReadOnlyList<GameRecord> records, IReadOnlyList<string> players, IReadOnlyList<(GameRecord First, GameRecord Second)> pairs)
    {
        var rated = players.Where(id => records.Any(r => r.Left == id || r.Right == id)).ToList();
        if (rated.Count < 2) return new RatingTable([], false);
        var index = rated.Select((id, i) => (id, i)).ToDictionary(x => x.id, x => x.i);
        var cluster = new Dictionary<int, int>();
        foreach (var (first, second) in pairs)
        {
            cluster[first.Game] = cluster.Count;
            cluster[second.Game] = cluster[first.Game];
        }
        var games = new List<PairedGame>();
        var next = pairs.Count;
        foreach (var r in records)
        {
            if (!index.TryGetValue(r.Left, out var left) || !index.TryGetValue(r.Right, out var right)) continue;
            var c = cluster.TryGetValue(r.Game, out var shared) ? shared : next++;
            games.Add(new PairedGame(left, right, r.WinnerId == r.Left ? 1 : 0, c));
        }
        var fit = JointRatings.Fit(rated.Count, games);
        var order = Enumerable.Range(0, rated.Count).OrderByDescending(i => fit.Ratings[i]).ThenBy(i => i).ToList();
        var rows = new List<PlayerRating>();
        for (var k = 0; k < order.Count; k++)
        {
            var i = order[k];
            var (low, high) = fit.Interval(i);
            double? los = k + 1 < order.Count ? fit.Superiority(i, order[k + 1]) : null;
            rows.Add(new PlayerRating(rated[i], fit.Ratings[i], low, high, fit.StandardError(i), los));
        }
        return new RatingTable(rows, fit.Regularised);
    }

    public PlayerRating? Of(string id) => Players.FirstOrDefault(p => p.Id == id);
}
