namespace Bramble.Web.Api;

// The request shapes of the JSON API (docs/web.md). Fields are snake_case on the wire. A game is
// always sent whole (start position, first mover, moves so far): the server keeps no game state,
// so every browser tab holds its own game and a reload loses nothing the tab still shows.

/// <summary>A game so far: the start position, who moved first, and the moves played since, alternating.</summary>
public record GameRequest
{
    public string? Ruleset { get; init; }
    public string? Start { get; init; }
    public string? First { get; init; }
    public IReadOnlyList<string>? Moves { get; init; }
}

/// <summary>
/// A move by the person (optional), then, when it is the computer's turn, its reply.
/// <c>Opponent</c> is a strategy name or <c>engine:&lt;id&gt;</c>; <c>Computer</c> the side it plays.
/// </summary>
public sealed record PlayRequest : GameRequest
{
    public string? Move { get; init; }
    public string? Opponent { get; init; }
    public string? Computer { get; init; }
    public string? Level { get; init; }
}

/// <summary>A game plus a time budget for exact analysis (milliseconds; capped by the server).</summary>
public sealed record AnalyseRequest : GameRequest
{
    public int? BudgetMs { get; init; }
}

/// <summary>One position (a component's notation) or one value whose thermograph is wanted.</summary>
public sealed record ThermographRequest
{
    public string? Ruleset { get; init; }
    public string? Position { get; init; }
    public string? Value { get; init; }
}

/// <summary>A position to take apart for the editor.</summary>
public sealed record DescribeRequest
{
    public string? Ruleset { get; init; }
    public string? Position { get; init; }
}

/// <summary>The text of a match journal (JSON Lines), as the page read it from a file.</summary>
public sealed record JournalRequest
{
    public string? Text { get; init; }
}

/// <summary>
/// A value to find positions of: the ruleset, the target in value notation, and optional bounds
/// (largest size, how many positions, a time budget in milliseconds; all capped by the server).
/// </summary>
public sealed record ComposeRequest
{
    public string? Ruleset { get; init; }
    public string? Value { get; init; }
    public int? MaxSize { get; init; }
    public int? Count { get; init; }
    public int? BudgetMs { get; init; }
}
