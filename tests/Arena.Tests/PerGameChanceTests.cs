using Bramble.Arena.Schedule;

namespace Bramble.Arena.Tests;

public class PerGameChanceTests
{
    [Fact]
    public void ASeedDependsOnTheMatchSeedTheGameAndThePlayerOnly()
    {
        // Derived from the definitions: the same inputs give the same seed (in any process: no
        // string hashing that changes per run); a different game, player or match seed gives another.
        Assert.Equal(PerGameChance.For(7, 12, "pruner"), PerGameChance.For(7, 12, "pruner"));
        var seeds = new HashSet<int>();
        for (var game = 1; game <= 200; game++)
            foreach (var player in new[] { "pruner", "windfall" })
                seeds.Add(PerGameChance.For(7, game, player));
        Assert.Equal(400, seeds.Count);
        Assert.NotEqual(PerGameChance.For(7, 12, "pruner"), PerGameChance.For(8, 12, "pruner"));
    }
}
