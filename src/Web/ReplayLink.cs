using Bramble.Arena.Journal;

namespace Bramble.Web;

/// <summary>
/// A link that opens one game of a match journal on the board's Replay view: the board's address
/// with the game's journal line in the fragment, <c>#ply=N&amp;journal=&lt;the line, percent-encoded&gt;</c>.
/// The fragment never reaches the server; the page reads it (replay.js) and sends the line to
/// /api/journal like a journal file opened by hand, so a link holds the whole game and needs no
/// file on the server. <c>ply</c> (optional) is the ply to show first, e.g. a blunder.
/// </summary>
public static class ReplayLink
{
    /// <summary>The board's usual address: <c>bramble serve</c>'s default port on this computer.</summary>
    public static string DefaultBoard => $"http://127.0.0.1:{DefaultPort}/";

    /// <summary>The port <c>bramble serve</c> listens on unless told otherwise.</summary>
    public const int DefaultPort = 8421;

    public static string For(string board, GameRecord game, int? ply = null)
    {
        var root = board.Contains('#') ? board[..board.IndexOf('#')] : board;
        var plyPart = ply is { } p ? $"ply={p}&" : "";
        return $"{root}#{plyPart}journal={Uri.EscapeDataString(JournalFormat.Write(game))}";
    }
}
