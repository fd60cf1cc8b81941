namespace Bramble.Web.Api;

// The answer shapes of the JSON API (docs/web.md).

/// <summary>What the page offers: rulesets (with a start position each), strategies, levels and engines.</summary>
public sealed record SetupReply(
    IReadOnlyList<RulesetReply> Rulesets,
    IReadOnlyList<ChoiceReply> Strategies,
    IReadOnlyList<ChoiceReply> Levels,
    IReadOnlyList<ChoiceReply> Engines);

/// <summary>
/// How the page turns clicks into moves for a ruleset: <c>point</c> (click the element carrying the
/// move's name) or <c>domino</c> (click two neighbouring cells).
/// </summary>
public sealed record RulesetReply(string Name, string Example, string MoveHint, string LeftIs, string RightIs, string Pick = "point");

public sealed record ChoiceReply(string Name, string Words);

/// <summary>One move of a game: its 1-based ply, who made it and its text.</summary>
public sealed record PlyReply(int Ply, string Side, string Move);

/// <summary>A game's current position: notation, picture, whose turn, the legal moves, and the result when over.</summary>
public sealed record BoardReply(
    string Ruleset,
    string Start,
    string First,
    string Text,
    string ToMove,
    bool Over,
    string? Winner,
    IReadOnlyList<PlyReply> Moves,
    IReadOnlyList<string> Legal,
    string? Svg,
    IReadOnlyList<string> Components);

/// <summary>The computer's move: who made it, which strategy or engine, and how it was found.</summary>
public sealed record ReplyMove(string Side, string Move, string By, long Ms, bool Exact, string? Note);

public sealed record PlayReply(BoardReply Board, ReplyMove? Reply);

/// <summary>
/// Exact analysis of a position, or as much as the budget allowed. When <c>Exact</c> is false the
/// fields that need every component's exact value are null and <c>Estimate</c> says what is guessed.
/// </summary>
public sealed record AnalysisReply(
    bool Exact,
    string? Value,
    string? Outcome,
    string? OutcomeWords,
    string? LeftFirstWins,
    string? RightFirstWins,
    string? Estimate,
    IReadOnlyList<ComponentReply> Components,
    long ElapsedMs,
    string? Note);

/// <summary>One component: its notation, its moves (both sides, so a click on the board finds it) and its value.</summary>
public sealed record ComponentReply(
    int Index,
    string Text,
    IReadOnlyList<string> Moves,
    bool Exact,
    string? Value,
    string? Outcome,
    string? Temperature,
    string? Estimate);

/// <summary>The moves of the side to move that win against any defence, by exact analysis.</summary>
public sealed record HintReply(string Side, bool Exact, IReadOnlyList<string> Winning, string Note);

public sealed record ThermographReply(string Label, bool Exact, string Svg, string? Temperature, string? Mean);

/// <summary>A position taken apart for the editor; only the part of its ruleset is set.</summary>
public sealed record DescribeReply(
    string Ruleset,
    string Text,
    IReadOnlyList<EdgeReply>? Edges,
    GridReply? Grid,
    IReadOnlyList<string>? Terms);

public sealed record EdgeReply(int Id, string Colour, int From, int To);

public sealed record GridReply(int Rows, int Columns, IReadOnlyList<string> Filled);

/// <summary>A journal's games, and a notice when an incomplete last line was ignored.</summary>
public sealed record JournalReply(IReadOnlyList<JournalGameReply> Games, string? Notice);

public sealed record JournalGameReply(
    int Game,
    string Ruleset,
    string Left,
    string Right,
    string First,
    string Start,
    IReadOnlyList<string> Moves,
    string Winner,
    string WinnerId,
    string End,
    string? Theory,
    IReadOnlyList<BlunderReply> Blunders);

public sealed record BlunderReply(int Ply, string By);

/// <summary>Every position of a game, from the start (ply 0), with its picture and exact value where known.</summary>
public sealed record ReplayReply(IReadOnlyList<ReplayPlyReply> Plies, bool Exact);

public sealed record ReplayPlyReply(int Ply, string? Side, string? Move, string Text, string ToMove, string? Svg, string? Value, string? Outcome, string? Winner);

/// <summary>One position found for a target value: its notation, its size and whether a construction or the search gave it.</summary>
public sealed record ComposedReply(string Text, int Size, string Route, long FoundMs);

/// <summary>
/// What compose found for a target, and how far it went, in the words the command line prints:
/// <c>None</c> says why nothing was found (null when something was), <c>Notes</c> the facts of
/// the field about the target, each with its source.
/// </summary>
public sealed record ComposeReply(
    string Ruleset,
    string Target,
    IReadOnlyList<ComposedReply> Positions,
    string SizeUnit,
    string? None,
    string Searched,
    string Stopped,
    string Stop,
    IReadOnlyList<string> Notes,
    long ElapsedMs);
