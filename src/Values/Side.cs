namespace Bramble.Values;

/// <summary>The two players. Left is blue in Hackenbush, vertical in Domineering; positive values favour Left.</summary>
public enum Side { Left, Right }

public static class SideExtensions
{
    public static Side Other(this Side side) => side == Side.Left ? Side.Right : Side.Left;
    public static string Word(this Side side) => side == Side.Left ? "left" : "right";

    public static bool TryParse(string text, out Side side)
    {
        switch (text.Trim().ToLowerInvariant())
        {
            case "left" or "l": side = Side.Left; return true;
            case "right" or "r": side = Side.Right; return true;
            default: side = Side.Left; return false;
        }
    }
}

/// <summary>Outcome classes with the field's usual letters.</summary>
public enum Outcome
{
    /// <summary>Left wins whoever starts (G &gt; 0).</summary>
    L,
    /// <summary>Right wins whoever starts (G &lt; 0).</summary>
    R,
    /// <summary>The player to move wins (G fuzzy with 0).</summary>
    N,
    /// <summary>The player to move loses (G = 0).</summary>
    P,
}

/// <summary>How two games compare.</summary>
public enum Relation { Equal, Greater, Less, Confused }

public static class OutcomeExtensions
{
    /// <summary>Who wins when <paramref name="first"/> moves first.</summary>
    public static Side WinnerMovingFirst(this Outcome outcome, Side first) => outcome switch
    {
        Outcome.L => Side.Left,
        Outcome.R => Side.Right,
        Outcome.N => first,
        _ => first.Other(),
    };

    public static Outcome FromWinners(Side leftFirstWinner, Side rightFirstWinner) => (leftFirstWinner, rightFirstWinner) switch
    {
        (Side.Left, Side.Left) => Outcome.L,
        (Side.Right, Side.Right) => Outcome.R,
        (Side.Left, Side.Right) => Outcome.N,
        _ => Outcome.P,
    };
}
