using Bramble.Arena.Journal;
using Bramble.Arena.Spec;
using Bramble.Arena.Statistics;
using Bramble.Values;

namespace Bramble.Arena.Standings;

/// <summary>
/// The standings of a set of game records (docs/matches.md), computed from the records alone so that a
/// finished match, its journal and the merge of its shards all give the same table.
/// </summary>
/// <param name="Players">Strongest first: by joint rating, then score.</param>
/// <param name="Ratings">The joint ratings, with intervals and likelihoods of superiority.</param>
/// <param name="Crosstable">The score of each pair, players in the order of <paramref name="Players"/>.</param>
public sealed record MatchStandings(IReadOnlyList<PlayerStanding> Players, int Games, SprtResult? Sprt, RatingTable Ratings, Crosstable Crosstable)
{
    /// <param name="playerOrder">Players to list (those without games too), e.g. the spec's; null: every player in the records.</param>
    /// <param name="sprt">The test to evaluate for the first player of <paramref name="playerOrder"/> against the second.</param>
    public static MatchStandings Compute(IReadOnlyList<GameRecord> records, IReadOnlyList<string>? playerOrder = null, SprtSpec? sprt = null)
    {
        var ids = playerOrder?.ToList() ?? records.SelectMany(r => r.Pair).Distinct().ToList();
        var pairs = SeatPairs.Find(records);
        var ratings = RatingTable.Compute(records, ids, pairs);
        var players = ids.Select(id => Standing(id, records, pairs))
            .OrderByDescending(p => p.Games > 0)
            .ThenByDescending(p => ratings.Of(p.Id)?.Rating ?? 0)
            .ThenByDescending(p => p.Score)
            .ThenByDescending(p => p.Wins)
            .ThenBy(p => ids.IndexOf(p.Id))
            .ToList();
        var test = sprt is not null && ids.Count == 2 ? Test(sprt, ids[0], ids[1], records, pairs) : null;
        return new MatchStandings(players, records.Count, test, ratings, Crosstable.Compute(records, players.Select(p => p.Id).ToList()));
    }

    /// <summary>The player at the top of the table (with at least one game), or null before any game.</summary>
    public PlayerStanding? Leader => Players.FirstOrDefault(p => p.Games > 0);

    private static PlayerStanding Standing(string id, IReadOnlyList<GameRecord> records, IReadOnlyList<(GameRecord First, GameRecord Second)> pairs)
    {
        var games = records.Where(r => r.Left == id || r.Right == id).ToList();
        var wins = games.Count(g => g.WinnerId == id);
        var forfeits = games.Count(g => g.End.IsForfeit() && g.LoserId == id);
        var blunders = games.Sum(g => g.Blunders.Count(b => b.By == id));
        int moves = 0, analysed = 0;
        foreach (var game in games)
        {
            var side = game.Left == id ? Side.Left : Side.Right;
            for (var ply = 1; ply <= game.Moves.Count; ply++)
            {
                if (game.Moves[ply - 1].Side != side) continue;
                moves++;
                if (ply <= game.Analysed) analysed++;
            }
        }
        var mine = pairs.Where(p => p.First.Left == id || p.First.Right == id).ToList();
        // Pairs carry the variance only when every game of the player is in one; otherwise the
        // pairs would speak for part of the games and the rest would be dropped.
        var elo = mine.Count > 0 && mine.Count * 2 == games.Count
            ? EloInterval.FromPairs(mine.Aggregate(new PentanomialCounts(), (c, p) => c.Add(p.First.ScoreOf(id) + p.Second.ScoreOf(id))))
            : EloInterval.FromGames(wins, 0, games.Count - wins);
        return new PlayerStanding(id, games.Count, wins, games.Count - wins, elo, forfeits, blunders, moves, analysed);
    }

    /// <summary>
    /// The log-likelihood ratio from the complete seat-swapped pairs (normal model with the
    /// pentanomial variance); when there are none, or every pair ended alike (zero variance, where
    /// the normal model has no answer), Wald's exact ratio over single games, which ignores the
    /// pairing and so moves more cautiously.
    /// </summary>
    private static SprtResult Test(SprtSpec spec, string candidate, string baseline, IReadOnlyList<GameRecord> records, IReadOnlyList<(GameRecord First, GameRecord Second)> pairs)
    {
        var bounds = SprtBounds.From(spec.Alpha, spec.Beta);
        var between = pairs.Where(p => p.First.Pair.Contains(candidate) && p.First.Pair.Contains(baseline)).ToList();
        if (between.Count > 0)
        {
            var counts = between.Aggregate(new PentanomialCounts(), (c, p) => c.Add(p.First.ScoreOf(candidate) + p.Second.ScoreOf(candidate)));
            var llr = Statistics.Sprt.LlrPentanomial(counts, spec.NullElo, spec.AlternativeElo);
            if (!double.IsNaN(llr))
                return new SprtResult(spec, candidate, baseline, llr, bounds, bounds.Decide(llr), ScoreModel.Pentanomial, counts.Pairs);
        }
        var games = records.Where(r => r.Pair.Contains(candidate) && r.Pair.Contains(baseline)).ToList();
        var wins = games.Count(g => g.WinnerId == candidate);
        var single = Statistics.Sprt.LlrBernoulli(wins, games.Count - wins, spec.NullElo, spec.AlternativeElo);
        return new SprtResult(spec, candidate, baseline, single, bounds, bounds.Decide(single), ScoreModel.Trinomial, games.Count);
    }
}
