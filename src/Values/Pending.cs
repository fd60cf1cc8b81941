namespace Bramble.Values;

// Signatures the rest of the solution may code against while their bodies are being written.
public sealed partial class GameStore
{
    public Dyadic Temperature(Game g) => throw new NotImplementedException();
    public Dyadic Mean(Game g) => throw new NotImplementedException();
    public Thermograph Thermograph(Game g) => throw new NotImplementedException();
    public Game Cool(Game g, Dyadic t) => throw new NotImplementedException();
    public Game Heat(Game g, Dyadic t) => throw new NotImplementedException();
    public Game OrdinalSum(Game g, Game h) => throw new NotImplementedException();
    public Game? AtomicWeight(Game g) => throw new NotImplementedException();
    public string Format(Game g, bool ascii = false) => throw new NotImplementedException();
    public Game Parse(string text) => throw new NotImplementedException();
    public Game Evaluate(ValueExpr expr) => throw new NotImplementedException();
}

public sealed class Thermograph;

/// <summary>The value notation of SPEC.md §2, in.</summary>
public static class ValueNotation
{
    /// <summary>Parses a value expression; throws <see cref="ValueSyntaxException"/> with the column and what was expected.</summary>
    public static ValueExpr Parse(string text) => throw new NotImplementedException();

    /// <summary>Splits a top-level sum into its terms as written (for Forms), each with its 0-based start column.</summary>
    public static IReadOnlyList<(ValueExpr Term, int Column)> ParseTerms(string text) => throw new NotImplementedException();
}
