namespace Bramble.Values;

/// <summary>Bad value notation: carries the text, the 0-based column and what was expected there.</summary>
public sealed class ValueSyntaxException(string text, int column, string expected)
    : FormatException($"column {column + 1}: expected {expected}")
{
    public string Text { get; } = text;
    public int Column { get; } = column;
    public string Expected { get; } = expected;

    /// <summary>The text with a caret under the offending character, for people.</summary>
    public string Pointer => $"{Text}\n{new string(' ', Math.Min(Column, Text.Length))}^ expected {Expected}";
}
