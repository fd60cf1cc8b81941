namespace Bramble.Search;

/// <summary>Creates players by their names (docs/players.md).</summary>
public static class Players
{
    public static readonly IReadOnlyList<string> Names = ["perfect", "alphabeta", "hotstrat", "thermostrat", "sentestrat", "random"];

    /// <param name="name">perfect, alphabeta, hotstrat, thermostrat, sentestrat or random.</param>
    /// <param name="seed">Seed for players that use randomness.</param>
    /// <param name="nodes">
    /// A cap on the nodes of each decision (null: none). A player limited this way decides the same
    /// move on any machine and under any load, as long as its time budget does not run out first.
    /// </param>
    public static IPlayer Create(string name, int seed = 1, long? nodes = null) => name.ToLowerInvariant() switch
    {
        "perfect" => new PerfectPlayer(new PerfectSettings { NodeCap = nodes ?? long.MaxValue }),
        "alphabeta" => new AlphaBetaPlayer(nodes ?? AlphaBetaPlayer.DefaultNodeCap),
        "hotstrat" => new TemperaturePlayer(TemperatureRule.Hotstrat) { NodeCap = nodes ?? long.MaxValue },
        "thermostrat" => new TemperaturePlayer(TemperatureRule.Thermostrat) { NodeCap = nodes ?? long.MaxValue },
        "sentestrat" => new TemperaturePlayer(TemperatureRule.Sentestrat) { NodeCap = nodes ?? long.MaxValue },
        "random" => new RandomPlayer(seed),
        _ => throw new ArgumentException($"unknown strategy '{name}'; known: {string.Join(", ", Names)}"),
    };
}
