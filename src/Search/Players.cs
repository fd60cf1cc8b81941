namespace Bramble.Search;

/// <summary>Creates players by their names (docs/players.md).</summary>
public static class Players
{
    public static readonly IReadOnlyList<string> Names = ["perfect", "alphabeta", "hotstrat", "thermostrat", "sentestrat", "random"];

    /// <param name="name">perfect, alphabeta, hotstrat, thermostrat, sentestrat or random.</param>
    /// <param name="seed">Seed for players that use randomness.</param>
    public static IPlayer Create(string name, int seed = 1) => name.ToLowerInvariant() switch
    {
        "perfect" => new PerfectPlayer(),
        "alphabeta" => new AlphaBetaPlayer(),
        "hotstrat" => new TemperaturePlayer(TemperatureRule.Hotstrat),
        "thermostrat" => new TemperaturePlayer(TemperatureRule.Thermostrat),
        "sentestrat" => new TemperaturePlayer(TemperatureRule.Sentestrat),
        "random" => new RandomPlayer(seed),
        _ => throw new ArgumentException($"unknown strategy '{name}'; known: {string.Join(", ", Names)}"),
    };
}
