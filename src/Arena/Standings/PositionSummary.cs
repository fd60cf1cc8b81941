using Bramble.Arena.Journal;
using Bramble.Values;

namespace Bramble.Arena.Standings;

/// <summary>
/// How one start position played out over a match: how often the side that wins it in theory
/// won (a position where that is always so decides the games, whoever plays), and each player's
/// score on it (a position where the scores differ separates the players).
/// </summary>
/// <param name="TheoryWins">Games won by the side exact analysis says wins, of <paramref name="TheoryKnown"/> games where theory is known.</param>
/// <param name="Scores">Per player: wins and games on this position.</param>
/// <param name="Spread">The best player's score minus the worst's on this position (0 to 1).</param>
public sealed record PositionSummary(string Ruleset, string Position, int Games, int LeftWins, int TheoryWins, int TheoryKnown,
    IReadOnlyDictionary<string, (int Wins, int Games)> Scores, double Spread)
{
    /// <summary>True when every game went to the side theory names: the position decided them.</summary>
    public bool Decides => TheoryKnown == Games && Games > 0 && TheoryWins == Games;

    public static IReadOnlyList<PositionSummary> Compute(IReadOnlyList<GameRecord> records)
    {
        var result = new List<PositionSummary>();
        foreach (var group in records.GroupBy(r => (r.Ruleset, r.Position)).OrderBy(g => g.Min(r => r.Game)))
        {
            var games = group.ToList();
            var scores = games.SelectMany(g => g.Pair).Distinct().ToDictionary(id => id, id =>
            {
                var mine = games.Where(g => g.Left == id || g.Right == id).ToList();
                return (mine.Count(g => g.WinnerId == id), mine.Count);
            });
            var rates = scores.Values.Where(s => s.Item2 > 0).Select(s => (double)s.Item1 / s.Item2).ToList();
            var known = games.Where(g => g.Theory is not null).ToList();
            result.Add(new PositionSummary(group.Key.Ruleset, group.Key.Position, games.Count,
                games.Count(g => g.Winner == Side.Left), known.Count(g => g.Winner == g.Theory), known.Count,
                scores, rates.Count > 0 ? rates.Max() - rates.Min() : 0));
        }
        return result;
    }
}
