namespace Bramble.Arena.Journal;

/// <summary>How a game ended (<c>end</c> in docs/matches.md); the last four are forfeits by the losing engine.</summary>
public enum GameEnd
{
    /// <summary>The loser had no legal move.</summary>
    NoMove,
    /// <summary>Stopped early by adjudication; the winner is the one analysis proved.</summary>
    Adjudicated,
    /// <summary>The loser's reply came too late (its clock ran out, or a request went unanswered).</summary>
    Timeout,
    /// <summary>The loser's engine exited, broke the pipe, or could not be (re)started.</summary>
    Crash,
    /// <summary>The loser picked a move that is not legal, or none while it had one.</summary>
    BadMove,
    /// <summary>The loser's engine answered something that is not the twine/1 reply asked for.</summary>
    BadReply,
}

public static class GameEndWords
{
    public static string Word(this GameEnd end) => end switch
    {
        GameEnd.NoMove => "no-move",
        GameEnd.Adjudicated => "adjudicated",
        GameEnd.Timeout => "timeout",
        GameEnd.Crash => "crash",
        GameEnd.BadMove => "bad-move",
        GameEnd.BadReply => "bad-reply",
        _ => throw new ArgumentOutOfRangeException(nameof(end)),
    };

    public static bool IsForfeit(this GameEnd end) => end is GameEnd.Timeout or GameEnd.Crash or GameEnd.BadMove or GameEnd.BadReply;

    public static bool TryParse(string word, out GameEnd end)
    {
        foreach (var candidate in Enum.GetValues<GameEnd>())
            if (candidate.Word() == word)
            {
                end = candidate;
                return true;
            }
        end = default;
        return false;
    }
}
