namespace Bramble.Values;

/// <summary>Bad value notation: carries the text, the 0-based column and what was expected there.</summary>
public sealed class ValueSyntaxException(string text, int column, string expected)
    : FormatException($"column {column + 1}: expected {expected}")
{
    public string Text { get; } = text;
    public int Column { get; } = column;
    public string Expected { get; } = expected;

    /// <summary>The faulty line (a window of it around the fault, escaped) with a caret under the fault, for people.</summary>
    public string Pointer => PrintableText.Caret(Text, Column, Expected);
}
