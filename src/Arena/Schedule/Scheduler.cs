using Bramble.Arena.Spec;
using Bramble.Values;

namespace Bramble.Arena.Schedule;

/// <summary>
/// Lays out every game of a match in a fixed order and numbers them from 1: for each position (in
/// suite order), for each pair (round-robin: every pair in spec order; challenger: the focus against
/// each other player), the seatings. The two games of a seat-swapped pair are neighbours, so a run
/// that stops early (or an SPRT decision) leaves few half pairs.
/// </summary>
public static class Scheduler
{
    public static IReadOnlyList<ScheduledGame> Build(MatchSpec spec)
    {
        var pairs = Pairs(spec);
        var games = new List<ScheduledGame>();
        for (var p = 0; p < spec.Positions.Count; p++)
        {
            var position = spec.Positions[p];
            foreach (var (a, b) in pairs)
            foreach (var (left, right, first) in Seatings(spec.Seats, a, b, p))
                games.Add(new ScheduledGame(games.Count + 1, [a, b], left, right, first, position));
        }
        return games;
    }

    public static IReadOnlyList<(string A, string B)> Pairs(MatchSpec spec)
    {
        var ids = spec.Players.Select(p => p.Id).ToList();
        var pairs = new List<(string, string)>();
        if (spec.Format == TournamentFormat.Challenger)
        {
            foreach (var id in ids)
                if (id != spec.Focus) pairs.Add((spec.Focus!, id));
            return pairs;
        }
        for (var i = 0; i < ids.Count; i++)
        for (var j = i + 1; j < ids.Count; j++)
            pairs.Add((ids[i], ids[j]));
        return pairs;
    }

    /// <summary>
    /// <c>all-four</c>: both seatings with Left first, then both with Right first. <c>swap</c>: both
    /// seatings with the same side first, Left on even-numbered positions (0-based) and Right on
    /// odd ones, so over a suite each side starts equally often.
    /// </summary>
    private static IEnumerable<(string Left, string Right, Side First)> Seatings(SeatPlan seats, string a, string b, int positionIndex)
    {
        if (seats == SeatPlan.AllFour)
        {
            yield return (a, b, Side.Left);
            yield return (b, a, Side.Left);
            yield return (a, b, Side.Right);
            yield return (b, a, Side.Right);
            yield break;
        }
        var first = positionIndex % 2 == 0 ? Side.Left : Side.Right;
        yield return (a, b, first);
        yield return (b, a, first);
    }
}
