namespace Bramble.Rules.Common;

/// <summary>
/// Square names on the grid boards that store cells as row * columns + column (Clobber, Konane,
/// Amazons): column letter from the left, row number from 1 at the top, as in <c>c4</c>.
/// </summary>
public static class SquareNames
{
    public static string Format(int cell, int columns) => $"{(char)('a' + cell % columns)}{cell / columns + 1}";

    /// <summary>Reads a square name at <paramref name="i"/> and moves past it; null (and <paramref name="i"/> unmoved) when there is none or it is off the board.</summary>
    public static int? Read(string text, ref int i, int rows, int columns)
    {
        if (i >= text.Length || !char.IsAsciiLetter(text[i])) return null;
        int column = char.ToLowerInvariant(text[i]) - 'a';
        int j = i + 1, row = 0;
        while (j < text.Length && char.IsAsciiDigit(text[j]) && row <= rows) { row = row * 10 + (text[j] - '0'); j++; }
        if (j == i + 1 || row < 1 || row > rows || column < 0 || column >= columns) return null;
        i = j;
        return (row - 1) * columns + column;
    }
}
