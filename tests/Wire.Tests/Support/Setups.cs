using Bramble.Search;

namespace Bramble.Wire.Tests;

/// <summary>Host setups for tests: the stalks rulesets instead of the registry, and players chosen by the test.</summary>
public static class Setups
{
    public static readonly StalksRuleset Stalks = new();
    public static readonly StalksRuleset Endless = new("endless", endless: true);

    /// <summary>The stalks rulesets, the random player plus the given ones; the first given player is the starting strategy.</summary>
    public static EngineSetup WithPlayers(params (string Name, Func<IPlayer> Make)[] players)
    {
        var names = players.Select(p => p.Name).Append("random").ToList();
        return new EngineSetup
        {
            Version = "9.9.9",
            Rulesets = [Stalks, Endless],
            Strategies = names,
            CreatePlayer = (name, seed, _) => name == "random" ? new RandomPlayer(seed) : players.First(p => p.Name == name).Make(),
            Settings = new EngineSettings(names[0], BudgetMs: 1000, Seed: 1, AssessMs: 1000),
        };
    }
}
