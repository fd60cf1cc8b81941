using System.Globalization;

namespace Bramble.Wire;

/// <summary>
/// What <c>set &lt;name&gt; &lt;value&gt;</c> changes: the strategy, the per-move budget when no clock
/// is given (and the cap when one is), the seed of players that use chance, the budget of
/// <c>assess</c>, and a node limit per move (<see cref="Nodes"/>). Immutable: a <c>set</c> makes a new one.
/// </summary>
/// <param name="Nodes">
/// Work, not time, limits each decision: at most this many nodes, a fresh player (empty memo) for
/// every game, and the clock only as a safety net, so that the same game gives the same moves on any
/// machine and under any load. Null: limited by time as usual.
/// </param>
public sealed record EngineSettings(string Strategy, long BudgetMs, int Seed, long AssessMs, long? Nodes = null)
{
    /// <summary>The largest node limit a setting may ask for.</summary>
    public const long MostNodes = 1_000_000_000_000;

    public const long DefaultBudgetMs = 1000;
    public const long DefaultAssessMs = 1000;

    /// <summary>The longest budget a setting may ask for: a day, so arithmetic on it cannot overflow.</summary>
    public const long MostMs = 24L * 60 * 60 * 1000;

    public static readonly IReadOnlyList<string> Names = ["strategy", "budget-ms", "seed", "assess-ms", "nodes"];

    /// <summary>The strongest strategy on offer: perfect play when it exists, else a temperature strategy, else the first.</summary>
    public static EngineSettings Default(IReadOnlyList<string> strategies)
    {
        string[] preference = ["perfect", "thermostrat", "sentestrat", "hotstrat", "alphabeta"];
        var strategy = preference.FirstOrDefault(p => strategies.Contains(p, StringComparer.OrdinalIgnoreCase))
            ?? strategies.FirstOrDefault() ?? "random";
        return new EngineSettings(strategy, DefaultBudgetMs, Seed: 1, DefaultAssessMs);
    }

    /// <summary>Applies one <c>set</c>: the new settings, or the error to reply.</summary>
    public (EngineSettings? Settings, WireError? Error) With(string name, string value, IReadOnlyList<string> strategies)
    {
        switch (name)
        {
            case "strategy":
                var known = strategies.FirstOrDefault(s => string.Equals(s, value, StringComparison.OrdinalIgnoreCase));
                return known is null
                    ? (null, new WireError(ErrorCodes.BadRequest, $"unknown strategy {Codec.Quote(value)}; known: {string.Join(", ", strategies)}"))
                    : (this with { Strategy = known }, null);
            case "budget-ms":
                return Milliseconds(name, value) is { } budget ? (this with { BudgetMs = budget }, null) : (null, MsError(name, value));
            case "assess-ms":
                return Milliseconds(name, value) is { } assess ? (this with { AssessMs = assess }, null) : (null, MsError(name, value));
            case "seed":
                return int.TryParse(value, NumberStyles.AllowLeadingSign, CultureInfo.InvariantCulture, out var seed)
                    ? (this with { Seed = seed }, null)
                    : (null, new WireError(ErrorCodes.BadRequest, $"seed needs a whole number from {int.MinValue} to {int.MaxValue}, got {Codec.Quote(value)}"));
            case "nodes":
                if (value == "none") return (this with { Nodes = null }, null);
                return value.All(char.IsAsciiDigit) && long.TryParse(value, NumberStyles.None, CultureInfo.InvariantCulture, out var nodes) && nodes is >= 1 and <= MostNodes
                    ? (this with { Nodes = nodes }, null)
                    : (null, new WireError(ErrorCodes.BadRequest, $"nodes needs a whole number from 1 to {MostNodes}, or none, got {Codec.Quote(value)}"));
            default:
                return (null, new WireError(ErrorCodes.UnknownSetting, $"no setting {Codec.Quote(name)}; settings: {string.Join(", ", Names)}"));
        }
    }

    private static long? Milliseconds(string name, string value) =>
        value.All(char.IsAsciiDigit) && long.TryParse(value, NumberStyles.None, CultureInfo.InvariantCulture, out var ms) && ms is >= 1 and <= MostMs
            ? ms
            : null;

    private static WireError MsError(string name, string value) =>
        new(ErrorCodes.BadRequest, $"{name} needs whole milliseconds from 1 to {MostMs}, got {Codec.Quote(value)}");
}
