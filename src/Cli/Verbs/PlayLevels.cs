namespace Bramble.Cli;

/// <summary>
/// Difficulty words for <c>bramble play --level</c>, each naming one of the engine's strategies,
/// so a player can pick an opponent without knowing the strategies' names.
/// </summary>
public static class PlayLevels
{
    public static readonly IReadOnlyList<(string Word, string Strategy, string Meaning)> All =
    [
        ("easy", "random", "picks any legal move"),
        ("fair", "hotstrat", "plays in the hottest component"),
        ("strong", "thermostrat", "reads thermographs of the whole sum"),
        ("perfect", "perfect", "exact analysis, Thermostrat when over budget"),
    ];

    public static string StrategyFor(string word) =>
        All.FirstOrDefault(l => l.Word.Equals(word, StringComparison.OrdinalIgnoreCase)).Strategy
        ?? throw new InputException($"unknown level '{word}'; known: {string.Join(", ", All.Select(l => l.Word))}");

    public static string Describe() => string.Join("; ", All.Select(l => $"{l.Word} = {l.Strategy} ({l.Meaning})"));
}
