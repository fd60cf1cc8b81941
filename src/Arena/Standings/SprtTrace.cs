using Bramble.Arena.Journal;
using Bramble.Arena.Spec;

namespace Bramble.Arena.Standings;

/// <summary>The SPRT's log-likelihood ratio after each game, in game-id order, as the match computed it.</summary>
public static class SprtTrace
{
    /// <returns>(games so far, LLR) after each game; at most <paramref name="points"/> points, evenly spaced, the last always included.</returns>
    public static IReadOnlyList<(int Games, double Llr)> Compute(IReadOnlyList<GameRecord> records, string candidate, string baseline, SprtSpec spec, int points = 400)
    {
        var ordered = records.Where(r => r.Pair.Contains(candidate) && r.Pair.Contains(baseline)).OrderBy(r => r.Game).ToList();
        var step = Math.Max(1, (ordered.Count + points - 1) / points);
        var trace = new List<(int, double)>();
        for (var n = step; n <= ordered.Count; n += step)
            trace.Add((n, MatchStandings.Compute(ordered.Take(n).ToList(), [candidate, baseline], spec).Sprt!.Llr));
        if (ordered.Count > 0 && ordered.Count % step != 0)
            trace.Add((ordered.Count, MatchStandings.Compute(ordered, [candidate, baseline], spec).Sprt!.Llr));
        return trace;
    }
}
