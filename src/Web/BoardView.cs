using Bramble.Pictures;
using Bramble.Rules;
using Bramble.Rules.Domineering;
using Bramble.Values;
using Bramble.Web.Api;

namespace Bramble.Web;

/// <summary>Turns a game into what the page shows: notation, picture, turn, legal moves, result.</summary>
public static class BoardView
{
    public static BoardReply Of(GameState game)
    {
        var p = game.Position;
        bool over = game.Over;
        return new BoardReply(
            game.Rules.Name,
            game.Start.Text,
            game.First.Word(),
            p.Text,
            game.ToMove.Word(),
            over,
            over ? game.ToMove.Other().Word() : null,
            game.Played.Select((m, i) => new PlyReply(i + 1, m.Side.Word(), m.Text)).ToList(),
            p.Moves(game.ToMove).Select(p.FormatMove).ToList(),
            Picture(p, game),
            p.Components().Select(c => c.Text).ToList());
    }

    /// <summary>
    /// The SVG from src/Pictures, or null for a ruleset that has no picture yet (the page then
    /// shows the notation). With the game at hand, Domineering's laid dominoes are drawn in their
    /// players' colours rather than as plain filled cells.
    /// </summary>
    public static string? Picture(IPosition position, GameState? game = null)
    {
        try
        {
            var svg = BigStack.Run(() => position is DomineeringPosition d && game is not null
                ? DomineeringPicture.Svg(d, game.Played.Select(m => PlacedDomino.Of(m.Side, m.Move)).ToList())
                : PositionPicture.Draw(position), 16 * 1024 * 1024);
            // The XML declaration is for files; inside the page it would be text.
            return svg.StartsWith("<?xml", StringComparison.Ordinal) ? svg[(svg.IndexOf("?>", StringComparison.Ordinal) + 2)..].TrimStart() : svg;
        }
        catch (ArgumentException)
        {
            return null;
        }
    }
}
