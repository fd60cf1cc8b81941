using Bramble.Rules;
using Bramble.Rules.Domineering;
using Bramble.Values;

namespace Bramble.Pictures;

/// <summary>
/// A domino laid during a game: the side that laid it and its top or left cell (the move's cell
/// index). A board alone cannot tell a laid domino from a hole in the start position, so the
/// game keeps this list and hands it to the pictures.
/// </summary>
public readonly record struct PlacedDomino(Side Side, int Cell)
{
    /// <summary>The second cell: below for Left's vertical domino, to the right for Right's.</summary>
    public int OtherCell => Cell + (Side == Side.Left ? Board.MaxColumns : 1);

    public static PlacedDomino Of(Side side, Move move) => new(side, move.A);
}
