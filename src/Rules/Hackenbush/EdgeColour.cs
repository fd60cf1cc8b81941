using Bramble.Values;

namespace Bramble.Rules.Hackenbush;

/// <summary>
/// The colour of an edge. Stored as a byte in the position's edge arrays; the numeric values are
/// fixed because normal keys and Zobrist hashes mix them in.
/// </summary>
public enum EdgeColour : byte
{
    /// <summary>Left's colour: only Left may cut it.</summary>
    Blue = 0,
    /// <summary>Right's colour: only Right may cut it.</summary>
    Red = 1,
    /// <summary>Either player may cut it.</summary>
    Green = 2,
}

public static class EdgeColourExtensions
{
    public static char Letter(this EdgeColour colour) => colour switch
    {
        EdgeColour.Blue => 'B',
        EdgeColour.Red => 'R',
        _ => 'G',
    };

    public static bool CutBy(this EdgeColour colour, Side side) =>
        colour == EdgeColour.Green || (colour == EdgeColour.Blue) == (side == Side.Left);

    /// <summary>B, R or G in either case.</summary>
    public static bool TryParse(char c, out EdgeColour colour)
    {
        switch (c)
        {
            case 'B' or 'b': colour = EdgeColour.Blue; return true;
            case 'R' or 'r': colour = EdgeColour.Red; return true;
            case 'G' or 'g': colour = EdgeColour.Green; return true;
            default: colour = EdgeColour.Green; return false;
        }
    }

    /// <summary>+1 for blue, -1 for red: the sign an edge writes into a sign expansion.</summary>
    public static int Sign(this EdgeColour colour) => colour == EdgeColour.Blue ? 1 : colour == EdgeColour.Red ? -1 : 0;
}
