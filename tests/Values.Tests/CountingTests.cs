namespace Bramble.Values.Tests;

/// <summary>Canonical simplification checked by counting the games born by each day.</summary>
public class CountingTests
{
    private static List<Game> NextDay(GameStore store, IReadOnlyList<Game> previous) => GamesByDay.NextDay(store, previous);

    [Fact]
    public void GamesBornByDaysZeroToThreeNumber1_4_22_1474()
    {
        var store = new GameStore();
        var day = new List<Game> { store.Zero };
        var counts = new List<int> { day.Count };
        for (int n = 1; n <= 3; n++)
        {
            day = NextDay(store, day);
            counts.Add(day.Count);
        }
        // Wolfe & Fraser, "Counting the number of games", TCS 313 (2004); OEIS A065401.
        Assert.Equal([1, 4, 22, 1474], counts);
    }

    [Fact]
    public void NumbersBornByDayNAre2ToTheNPlus1Minus1()
    {
        var store = new GameStore();
        var day = new List<Game> { store.Zero };
        for (int n = 1; n <= 3; n++)
        {
            day = NextDay(store, day);
            // Wolfe & Fraser 2004: 2^(n+1) - 1 numbers are born by day n.
            Assert.Equal((1 << (n + 1)) - 1, day.Count(store.IsNumber));
            Assert.All(day, g => Assert.True(store.Birthday(g) <= n));
        }
    }

    [Fact]
    public void DayTwoValuesAndOutcomeClasses()
    {
        var store = new GameStore();
        var day2 = NextDay(store, NextDay(store, [store.Zero]));
        // the published sources, derived from the definitions: the 22 day-2 values.
        string[] expected = ["-2", "-1", "-1/2", "0", "1/2", "1", "2", "*", "↑", "↓", "↑*", "↓*", "*2", "1*", "-1*", "±1",
            "{1|0}", "{0|-1}", "{1|*}", "{*|-1}", "{1|0,*}", "{0,*|-1}"];
        var names = day2.Select(g => store.Format(g)).ToHashSet();
        Assert.Equal(expected.Order(), names.Order());
        var parsed = expected.Select(store.Parse).ToHashSet();
        Assert.Equal(day2.ToHashSet(), parsed);
        // Outcome classes (derived from the definitions): 6 L, 6 R, 1 P, 9 N.
        var classes = day2.GroupBy(store.OutcomeOf).ToDictionary(g => g.Key, g => g.Count());
        Assert.Equal(6, classes[Outcome.L]);
        Assert.Equal(6, classes[Outcome.R]);
        Assert.Equal(1, classes[Outcome.P]);
        Assert.Equal(9, classes[Outcome.N]);
    }
}
