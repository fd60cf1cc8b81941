using Bramble.Rules;
using Bramble.Values;
using Bramble.Web.Api;

namespace Bramble.Web;

/// <summary>A game rebuilt from a request: the start, each move played, and where it stands now.</summary>
public sealed record GameState(IRuleset Rules, IPosition Start, Side First, IReadOnlyList<PlayedPly> Played, IPosition Position, Side ToMove)
{
    public bool Over => Position.Moves(ToMove).Count == 0;

    /// <summary>Plays one more move; a move that does not parse or is not legal is a 400 naming <paramref name="path"/>.</summary>
    public GameState With(string text, string path)
    {
        var move = GameReplay.ParseLegal(Position, ToMove, text, path);
        return this with
        {
            Played = [.. Played, new PlayedPly(ToMove, move, Position.FormatMove(move))],
            Position = Position.Play(ToMove, move),
            ToMove = ToMove.Other(),
        };
    }
}

/// <summary>One move made: by whom, the move, and its text.</summary>
public sealed record PlayedPly(Side Side, Move Move, string Text);

/// <summary>
/// Rebuilds a game from the start position by playing its moves again. Replaying keeps move
/// names stable for the whole game (Hackenbush edge ids stay those of the start position) and
/// lets the server keep no state between requests.
/// </summary>
public static class GameReplay
{
    public static IRuleset Ruleset(string? name, string path = "ruleset")
    {
        if (string.IsNullOrWhiteSpace(name)) throw ApiException.Bad("a ruleset is needed", path);
        return Rulesets.Find(name.Trim()) ?? throw ApiException.Bad(
            $"unknown ruleset '{name}'; known: {string.Join(", ", Rulesets.All.Select(r => r.Name))}", path);
    }

    public static Side Side(string? word, string path, Side? fallback = null)
    {
        if (string.IsNullOrWhiteSpace(word) && fallback is { } f) return f;
        if (word is not null && SideExtensions.TryParse(word, out var side)) return side;
        throw ApiException.Bad($"'{word}' is not a side: say left or right", path);
    }

    public static IPosition Parse(IRuleset rules, string? text, string path)
    {
        if (text is null) throw ApiException.Bad("a position is needed", path);
        if (text.Length > 200_000) throw ApiException.Bad("the position is longer than 200,000 characters", path);
        return rules.Parse(text);
    }

    public static GameState Rebuild(GameRequest request)
    {
        var rules = Ruleset(request.Ruleset);
        var start = Parse(rules, request.Start, "start");
        var first = Side(request.First, "first", Values.Side.Left);
        var state = new GameState(rules, start, first, [], start, first);
        var moves = request.Moves ?? [];
        for (int i = 0; i < moves.Count; i++) state = state.With(moves[i], $"moves[{i}]");
        return state;
    }

    public static Move ParseLegal(IPosition position, Side side, string? text, string path)
    {
        if (string.IsNullOrWhiteSpace(text)) throw ApiException.Bad("a move is needed", path);
        Move move;
        try
        {
            move = position.ParseMove(text.Trim());
        }
        catch (Exception e) when (e is IllegalMoveException or FormatException or ArgumentException)
        {
            throw ApiException.Bad($"'{text}' is not a move here: {e.Message}", path);
        }
        var legal = position.Moves(side);
        if (legal.Contains(move)) return move;
        var said = position.FormatMove(move);
        throw ApiException.Bad(legal.Count == 0
            ? $"{said} is not legal: {side.Word()} has no move left"
            : $"{said} is not a legal move for {side.Word()}; legal: {string.Join(" ", legal.Take(40).Select(position.FormatMove))}{(legal.Count > 40 ? " …" : "")}", path);
    }
}
