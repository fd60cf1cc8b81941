using Bramble.Values;

namespace Bramble.Rules;

/// <summary>Bad position text: the text, the 0-based column of the fault and what was expected there.</summary>
public sealed class PositionSyntaxException(string text, int column, string expected)
    : FormatException($"column {column + 1}: expected {expected}")
{
    public string Text { get; } = text;
    public int Column { get; } = column;
    public string Expected { get; } = expected;

    /// <summary>The faulty line (a window of it around the fault, escaped) with a caret under the fault, for people.</summary>
    public string Pointer => PrintableText.Caret(Text, Column, Expected);
}

/// <summary>A move that does not parse or is not legal in the position for that side.</summary>
public sealed class IllegalMoveException(string message) : InvalidOperationException(message);

/// <summary>A local-value or search computation ran past its time or node budget.</summary>
public sealed class BudgetExceededException(string message) : Exception(message);
