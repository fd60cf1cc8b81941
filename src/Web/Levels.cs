using Bramble.Web.Api;

namespace Bramble.Web;

/// <summary>How long the computer thinks per move, named in plain words for the page.</summary>
public static class Levels
{
    private static readonly (string Name, string Words, int Ms)[] s_levels =
    [
        ("quick", "quick — a fifth of a second a move", 200),
        ("steady", "steady — one second a move", 1000),
        ("patient", "patient — five seconds a move", 5000),
    ];

    public static IReadOnlyList<ChoiceReply> Choices => s_levels.Select(l => new ChoiceReply(l.Name, l.Words)).ToList();

    public static TimeSpan Budget(string? name)
    {
        if (string.IsNullOrWhiteSpace(name)) return TimeSpan.FromMilliseconds(s_levels[1].Ms);
        foreach (var l in s_levels)
            if (l.Name.Equals(name.Trim(), StringComparison.OrdinalIgnoreCase)) return TimeSpan.FromMilliseconds(l.Ms);
        throw ApiException.Bad($"unknown level '{name}'; known: {string.Join(", ", s_levels.Select(l => l.Name))}", "level");
    }

    /// <summary>Plain words for each built-in strategy; a strategy added later shows under its own name.</summary>
    public static string StrategyWords(string name) => name switch
    {
        "perfect" => "perfect — exact analysis, the strongest",
        "alphabeta" => "alphabeta — plain whole-board search",
        "hotstrat" => "hotstrat — plays in the hottest component",
        "thermostrat" => "thermostrat — reads the thermographs",
        "sentestrat" => "sentestrat — answers threats, then thermostrat",
        "random" => "random — any legal move, for a first game",
        _ => name,
    };
}
