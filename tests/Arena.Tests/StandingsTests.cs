using Bramble.Arena.Journal;
using Bramble.Arena.Spec;
using Bramble.Arena.Standings;
using Bramble.Arena.Statistics;
using Bramble.Values;

namespace Bramble.Arena.Tests;

public class StandingsTests
{
    /// <summary>A swapped pair on one position: (a left, b right) then (b left, a right), same side first.</summary>
    private static IEnumerable<GameRecord> Pair(int id, string position, string a, string b, bool aWinsFirst, bool aWinsSecond) =>
    [
        JournalTests.Record(id, a, b, aWinsFirst ? Side.Left : Side.Right, position: position) with { Pair = [a, b] },
        JournalTests.Record(id + 1, b, a, aWinsSecond ? Side.Right : Side.Left, position: position) with { Pair = [a, b] },
    ];

    [Fact]
    public void SeatSwappedPairsAreFoundFromTheRecordsAlone()
    {
        var records = Pair(1, "L1", "a", "b", true, false).Concat(Pair(3, "L2", "a", "b", true, true)).ToList();
        records.Add(JournalTests.Record(5, "a", "b", position: "L3") with { Pair = ["a", "b"] });
        var pairs = SeatPairs.Find(records);
        Assert.Equal(2, pairs.Count);
        Assert.All(pairs, p => Assert.Equal(p.First.Left, p.Second.Right));
    }

    [Fact]
    public void StandingsCountGamesWinsForfeitsAndBlunders()
    {
        var records = new List<GameRecord>
        {
            JournalTests.Record(1, "a", "b", Side.Left) with { Pair = ["a", "b"] },
            JournalTests.Record(2, "b", "a", Side.Left, GameEnd.Timeout) with { Pair = ["a", "b"] },
            JournalTests.Record(3, "a", "c", Side.Right, GameEnd.BadMove) with { Pair = ["a", "c"] },
        };
        var standings = MatchStandings.Compute(records, ["a", "b", "c"]);
        var a = standings.Players.Single(p => p.Id == "a");
        // Derived from the definitions: a won game 1, lost 2 (a timeout: its forfeit) and 3 (a bad move: its forfeit).
        Assert.Equal((3, 1, 2, 2), (a.Games, a.Wins, a.Losses, a.Forfeits));
        // JournalTests.Record gives every game one blunder at ply 2, by the Right player: a was Right in game 2.
        Assert.Equal(1, a.Blunders);
        var b = standings.Players.Single(p => p.Id == "b");
        Assert.Equal((2, 1, 0), (b.Games, b.Wins, b.Forfeits));
        Assert.Equal("c", standings.Players[0].Id); // 1 of 1
    }

    [Fact]
    public void CompletePairsGiveThePentanomialModel()
    {
        var records = Pair(1, "L1", "a", "b", true, false).Concat(Pair(3, "L2", "a", "b", true, true)).Concat(Pair(5, "L3", "a", "b", false, false)).ToList();
        var a = MatchStandings.Compute(records, ["a", "b"]).Players.Single(p => p.Id == "a");
        // Source: M. Van den Bergh, "Normalized Elo" §4: pair scores ½, 1, 0 for a.
        Assert.Equal(ScoreModel.Pentanomial, a.Elo.Model);
        Assert.Equal(EloInterval.FromPairs(new PentanomialCounts(1, 0, 1, 0, 1)), a.Elo);
        records.RemoveAt(5);
        // A half pair: the games are taken one by one.
        Assert.Equal(ScoreModel.Trinomial, MatchStandings.Compute(records, ["a", "b"]).Players.Single(p => p.Id == "a").Elo.Model);
    }

    [Fact]
    public void SprtDecisionsOnSyntheticResultsMatchWaldsFormula()
    {
        // Source: A. Wald 1945 (bounds ln((1−β)/α), ln(β/(1−α))), pentanomial variance per M. Van den
        // Bergh, "Normalized Elo" §4. Synthetic pairs where a is ~100 Elo stronger; the independent
        // computation below (pair scores one by one, normal-model ratio) must agree with the standings
        // after every pair, and both must stop at the same pair.
        var spec = new SprtSpec(0, 30, 0.05, 0.05);
        var random = new Random(2024);
        var records = new List<GameRecord>();
        var pairScores = new List<double>();
        int? decidedAt = null;
        for (var i = 0; i < 400 && decidedAt is null; i++)
        {
            bool first = random.NextDouble() < 0.64, second = random.NextDouble() < 0.64;
            records.AddRange(Pair(2 * i + 1, $"L{i}", "a", "b", first, second));
            pairScores.Add(((first ? 1 : 0) + (second ? 1 : 0)) / 2.0);
            var standings = MatchStandings.Compute(records, ["a", "b"], spec);
            var mean = pairScores.Average();
            var variance = pairScores.Sum(x => (x - mean) * (x - mean)) / pairScores.Count;
            double s0 = 0.5, s1 = 1 / (1 + Math.Pow(10, -30 / 400.0));
            double expected;
            if (variance > 0)
            {
                expected = pairScores.Sum(x => ((x - s0) * (x - s0) - (x - s1) * (x - s1)) / (2 * variance));
                Assert.Equal(ScoreModel.Pentanomial, standings.Sprt!.Model);
            }
            else
            {
                // The documented fallback: Wald's Bernoulli ratio over single games.
                var wins = records.Count(r => r.WinnerId == "a");
                expected = wins * Math.Log(s1 / s0) + (records.Count - wins) * Math.Log((1 - s1) / (1 - s0));
            }
            Assert.Equal(expected, standings.Sprt!.Llr, 9);
            var decided = expected >= Math.Log(0.95 / 0.05) || expected <= Math.Log(0.05 / 0.95);
            Assert.Equal(decided, standings.Sprt.Decision != SprtDecision.Continue);
            if (decided) decidedAt = i;
        }
        Assert.NotNull(decidedAt);
        Assert.Equal(SprtDecision.Alternative, MatchStandings.Compute(records, ["a", "b"], spec).Sprt!.Decision);
    }

    [Fact]
    public void TheTableShowsEveryPlayerAndTheModel()
    {
        var records = Pair(1, "L1", "pruner", "gardener", true, true).ToList();
        var table = StandingsText.Table(MatchStandings.Compute(records, ["pruner", "gardener"]), "Orchard");
        Assert.Contains("Orchard: 2 games", table);
        Assert.Contains("pruner", table);
        // pruner won both games: no finite maximum-likelihood rating, so the table says the virtual games were used.
        Assert.Contains("Bradley and Terry", table);
        Assert.Contains("virtual win and loss", table);
        var json = StandingsJson.Write(MatchStandings.Compute(records, ["pruner", "gardener"]), "Orchard", []);
        // The score against the field is still +inf (written null); the joint rating is finite and marked.
        Assert.Contains("\"elo\": null", json);
        Assert.Contains("\"ratings_regularised\": true", json);
        Assert.Contains("\"rating\": ", json);
    }
}
