namespace Bramble.Rules.Cutcake;

/// <summary>
/// One rectangle of cake, <see cref="Rows"/> high and <see cref="Columns"/> wide, with the number
/// it has in the position (1-based, in text order), which is how moves name it.
/// </summary>
public readonly record struct Piece(int Number, int Rows, int Columns)
{
    /// <summary>Left cuts along the grid lines between columns; a piece one column wide is finished for Left.</summary>
    public int LeftCuts => Columns - 1;

    public int RightCuts => Rows - 1;

    public bool HasMoves => Rows > 1 || Columns > 1;

    public string Text => $"{Rows}x{Columns}";
}
