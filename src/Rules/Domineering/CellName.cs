namespace Bramble.Rules.Domineering;

/// <summary>
/// Cell names of docs/domineering.md: column letter a–z from the left, row number from 1 at the top
/// (<c>c4</c>). Internally a cell is <c>row * 26 + column</c>, 0-based, which is also the
/// <see cref="Move.A"/> of the domino whose top or left cell it is.
/// </summary>
public static class CellName
{
    public static int Index(int row, int column) => row * Board.MaxColumns + column;

    public static string Format(int cell) => $"{(char)('a' + cell % Board.MaxColumns)}{cell / Board.MaxColumns + 1}";

    /// <summary>Parses <c>c4</c> (any letter case); throws <see cref="IllegalMoveException"/> on anything else.</summary>
    public static int Parse(string text)
    {
        var t = text.Trim();
        if (t.Length < 2 || !char.IsAsciiLetter(t[0]))
            throw new IllegalMoveException($"bad move '{text}': expected a cell such as c4 (column letter, then row number)");
        int column = char.ToLowerInvariant(t[0]) - 'a';
        int row = 0;
        for (int i = 1; i < t.Length; i++)
        {
            if (!char.IsAsciiDigit(t[i]) || (i == 1 && t[i] == '0'))
                throw new IllegalMoveException($"bad move '{text}': expected a cell such as c4 (column letter, then row number from 1)");
            row = row * 10 + (t[i] - '0');
            if (row > Board.MaxRows) throw new IllegalMoveException($"bad move '{text}': boards have at most {Board.MaxRows} rows");
        }
        return Index(row - 1, column);
    }
}
