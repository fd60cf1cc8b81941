namespace Bramble.Arena.Spec;

/// <summary>A loaded, checked match specification (docs/matches.md). Paths are absolute.</summary>
public sealed record MatchSpec
{
    public required string Title { get; init; }

    /// <summary>The spec file, or null for a spec built in code.</summary>
    public string? SpecPath { get; init; }

    /// <summary>The folder relative paths are resolved against (and engines run in).</summary>
    public required string Folder { get; init; }

    public required IReadOnlyList<PlayerSpec> Players { get; init; }

    public required IReadOnlyList<StartPosition> Positions { get; init; }

    public TournamentFormat Format { get; init; } = TournamentFormat.RoundRobin;

    /// <summary>The player every game of a challenger match involves.</summary>
    public string? Focus { get; init; }

    public SeatPlan Seats { get; init; } = SeatPlan.AllFour;

    public TimeControl Clock { get; init; } = new(10_000, 100);

    /// <summary>Games at once; null leaves it to the command line or the number of cores.</summary>
    public int? Parallel { get; init; }

    public Adjudication Adjudicate { get; init; } = Adjudication.Never;

    public SprtSpec? Sprt { get; init; }

    public required string JournalPath { get; init; }

    /// <summary>
    /// When set, every player is sent <c>set seed</c> before each game, with a seed made from this one,
    /// the game's id and the player's id (<see cref="Schedule.PerGameChance"/>); null sends none.
    /// </summary>
    public long? Seed { get; init; }

    /// <summary>Budget of the exact analysis behind <c>theory</c> and <c>blunders</c>, per game; 0 turns it off.</summary>
    public int AnalysisMs { get; init; } = 1000;

    /// <summary>
    /// When set, the analysis behind <c>theory</c> and <c>blunders</c> is limited to this many nodes
    /// per game (in a fresh value context) instead of <see cref="AnalysisMs"/>: the same on every run.
    /// </summary>
    public long? AnalysisNodes { get; init; }

    /// <summary>Budget of each adjudication check.</summary>
    public int AdjudicateMs { get; init; } = 100;

    public PlayerSpec Player(string id) => Players.First(p => p.Id == id);
}

/// <summary>One player: an id for the standings and the argv that starts its engine.</summary>
/// <param name="Settings">Sent as <c>set &lt;name&gt; &lt;value&gt;</c> after the handshake, in order.</param>
public sealed record PlayerSpec(string Id, IReadOnlyList<string> Run, IReadOnlyList<KeyValuePair<string, string>> Settings);

/// <summary>A start position with its ruleset and where it came from (for messages).</summary>
public sealed record StartPosition(string Ruleset, string Text, string Source);

public enum TournamentFormat { RoundRobin, Challenger }

/// <summary>How each pair meets on each position (<c>seats</c> in docs/matches.md).</summary>
public enum SeatPlan
{
    /// <summary>Each player as Left and as Right, each side moving first: four games.</summary>
    AllFour,
    /// <summary>Seats swapped, the same side first: two games.</summary>
    Swap,
}

public enum Adjudication { Never, Decided, Numbers }

/// <summary>Base time plus increment per side, in milliseconds, kept by the harness.</summary>
public readonly record struct TimeControl(long BaseMs, long IncMs);

/// <summary>
/// Wald's test of the null hypothesis Δ = <paramref name="NullElo"/> against the alternative
/// Δ = <paramref name="AlternativeElo"/>, Δ being the first player's rating over the second's.
/// </summary>
public sealed record SprtSpec(double NullElo, double AlternativeElo, double Alpha, double Beta);

public static class SpecWords
{
    public static string Word(this TournamentFormat format) => format == TournamentFormat.Challenger ? "challenger" : "round-robin";
    public static string Word(this SeatPlan seats) => seats == SeatPlan.Swap ? "swap" : "all-four";

    public static string Word(this Adjudication adjudication) => adjudication switch
    {
        Adjudication.Decided => "decided",
        Adjudication.Numbers => "numbers",
        _ => "never",
    };
}
