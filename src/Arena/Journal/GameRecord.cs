using Bramble.Values;

namespace Bramble.Arena.Journal;

/// <summary>One move as played: who, the move in the ruleset's notation, and the think time the harness measured.</summary>
public sealed record PlayedMove(Side Side, string Move, long Ms);

/// <summary>A ply (1-based) where a player moved from a position it could win to one it cannot.</summary>
public sealed record Blunder(int Ply, string By);

/// <summary>
/// One finished game, as one journal line (docs/matches.md, "Journal"). Beyond the first fields the line carries
/// <c>ruleset</c> (a match may mix rulesets), <c>analysed</c> (how many plies the exact analysis
/// could judge, so blunder rates have an honest denominator) and, for forfeits, <c>detail</c>
/// (what the engine did wrong).
/// </summary>
public sealed record GameRecord
{
    public required int Game { get; init; }
    public required IReadOnlyList<string> Pair { get; init; }
    public required string Left { get; init; }
    public required string Right { get; init; }
    public required Side First { get; init; }
    public required string Ruleset { get; init; }
    public required string Position { get; init; }
    public required IReadOnlyList<PlayedMove> Moves { get; init; }
    public required Side Winner { get; init; }
    public required GameEnd End { get; init; }

    /// <summary>Who wins the start position with perfect play, when analysis finished in budget.</summary>
    public Side? Theory { get; init; }

    public IReadOnlyList<Blunder> Blunders { get; init; } = [];

    /// <summary>Plies whose blunder status analysis decided.</summary>
    public int Analysed { get; init; }

    public string? Detail { get; init; }

    public string PlayerOf(Side side) => side == Side.Left ? Left : Right;

    public string WinnerId => PlayerOf(Winner);

    public string LoserId => PlayerOf(Winner.Other());

    /// <summary>Points for <paramref name="player"/> in this game (there are no draws): 1 or 0.</summary>
    public double ScoreOf(string player) => WinnerId == player ? 1.0 : 0.0;

    /// <summary>
    /// Why two records of the same game id cannot both stand, or null when they agree: a different
    /// game under the same id (the journals come from different specs) or a different result.
    /// Think times and, for the same result, the moves may differ (a game played twice).
    /// </summary>
    public string? ConflictWith(GameRecord other)
    {
        if (Left != other.Left || Right != other.Right || First != other.First || Ruleset != other.Ruleset || Position != other.Position)
            return $"game {Game} is a different game in each (seats, first mover or position differ): were they made from the same spec?";
        if (Winner != other.Winner || End != other.End)
            return $"game {Game} has two results: {Winner.Word()} by {End.Word()} and {other.Winner.Word()} by {other.End.Word()}";
        return null;
    }
}
