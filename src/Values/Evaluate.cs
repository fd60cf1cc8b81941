namespace Bramble.Values;

public sealed partial class GameStore
{
    /// <summary>The canonical value of an expression as written.</summary>
    public Game Evaluate(ValueExpr expr) => expr switch
    {
        NumberExpr n => Number(n.Value),
        UpStarExpr u => UpStar(u.X, u.Ups, u.Star),
        SwitchExpr s => Make([Number(s.X)], [Number(-s.X)]),
        OptionsExpr o => Make(o.Left.Select(Evaluate).ToArray(), o.Right.Select(Evaluate).ToArray()),
        SumExpr s => Sum(s.Terms.Select(Evaluate)),
        NegateExpr n => Negate(Evaluate(n.Inner)),
        _ => throw new ArgumentException($"unknown expression {expr}"),
    };

    /// <summary>Parses SPEC.md §2 notation to a canonical game; throws <see cref="ValueSyntaxException"/>.</summary>
    public Game Parse(string text) => Evaluate(ValueNotation.Parse(text));

    /// <summary>The published notation; <paramref name="ascii"/> uses words for the symbols.</summary>
    public string Format(Game g, bool ascii = false) => ValueNotation.Format(this, g, ascii);
}
