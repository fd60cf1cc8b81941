namespace Bramble.Values;

/// <summary>The games born by day n, built day by day from pairs of antichains of the previous day's games.</summary>
public static class GamesByDay
{
    /// <summary>Every canonical game born by day <paramref name="day"/> (1, 4, 22, 1474 of them for days 0–3).</summary>
    public static List<Game> BornBy(GameStore store, int day)
    {
        var games = new List<Game> { store.Zero };
        for (int n = 1; n <= day; n++) games = NextDay(store, games);
        return games;
    }

    /// <summary>{A | B} for every pair of antichains A, B of <paramref name="previous"/> (a left or right option set need only be an antichain: dominated options go).</summary>
    public static List<Game> NextDay(GameStore store, IReadOnlyList<Game> previous)
    {
        var antichains = Antichains(store, previous);
        var seen = new HashSet<Game>();
        var result = new List<Game>();
        foreach (var l in antichains)
            foreach (var r in antichains)
            {
                var g = store.Make(l, r);
                if (seen.Add(g)) result.Add(g);
            }
        return result;
    }

    /// <summary>All sets of pairwise incomparable games from <paramref name="games"/>, the empty set included.</summary>
    public static List<Game[]> Antichains(GameStore store, IReadOnlyList<Game> games)
    {
        var result = new List<Game[]>();
        var current = new List<Game>();
        void Extend(int from)
        {
            result.Add(current.ToArray());
            for (int i = from; i < games.Count; i++)
            {
                var g = games[i];
                if (current.Any(c => store.Leq(c, g) || store.Leq(g, c))) continue;
                current.Add(g);
                Extend(i + 1);
                current.RemoveAt(current.Count - 1);
            }
        }
        Extend(0);
        return result;
    }
}
