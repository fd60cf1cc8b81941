using Bramble.Values;

namespace Bramble.Rules.Forms;

/// <summary>
/// One term of a Forms position: a value expression as written, and the options each side has
/// in it. In braces the options are the ones written there (dominated and reversible ones
/// included: the game is played as written); a negated expression has the negatives of the
/// other side's options; anything else (numbers, *n, ↑, ±x, a parenthesised sum) has the
/// options of its canonical form. Immutable, and it holds no <see cref="GameStore"/>: canonical
/// options are worked out once, on first use, in a store made for the purpose, and kept as
/// expressions, so a term can be read from several threads.
/// </summary>
public sealed class FormsTerm
{
    private readonly Lazy<IReadOnlyList<ValueExpr>> _left;
    private readonly Lazy<IReadOnlyList<ValueExpr>> _right;

    public FormsTerm(ValueExpr expression)
    {
        Expression = expression;
        Text = TextOf(expression);
        _left = new Lazy<IReadOnlyList<ValueExpr>>(() => OptionsOf(expression, Side.Left));
        _right = new Lazy<IReadOnlyList<ValueExpr>>(() => OptionsOf(expression, Side.Right));
    }

    public ValueExpr Expression { get; }

    /// <summary>
    /// The expression in the published notation, in parentheses when it would otherwise read as
    /// several terms (<c>(1/2 + ↑)</c>); also the term's normal key.
    /// </summary>
    public string Text { get; }

    public IReadOnlyList<ValueExpr> Options(Side side) => side == Side.Left ? _left.Value : _right.Value;

    public bool HasMoves => Options(Side.Left).Count > 0 || Options(Side.Right).Count > 0;

    public static string TextOf(ValueExpr e)
    {
        string written = ValueExprWriter.Write(e);
        bool readsAsSum = e is SumExpr || (e is UpStarExpr u && !u.X.IsZero && u.Ups != 0);
        return readsAsSum ? "(" + written + ")" : written;
    }

    private static IReadOnlyList<ValueExpr> OptionsOf(ValueExpr expression, Side side) => expression switch
    {
        OptionsExpr written => side == Side.Left ? written.Left : written.Right,
        // A shared form plays as its body written out: the options are the body's, each
        // carrying the named parts it still uses.
        SharedExpr shared => OptionsOf(shared.Body, side, shared.Parts),
        NegateExpr negated => OptionsOf(negated.Inner, side.Other()).Select(Negated).ToArray(),
        _ => CanonicalOptions(expression, side),
    };

    /// <summary>Options of a body that refers to <paramref name="parts"/>.</summary>
    private static IReadOnlyList<ValueExpr> OptionsOf(ValueExpr body, Side side, IReadOnlyDictionary<int, ValueExpr> parts) => body switch
    {
        PartExpr named => OptionsOf(SharedExpr.Around(parts[named.Name], parts), side),
        OptionsExpr written => (side == Side.Left ? written.Left : written.Right).Select(o => SharedExpr.Around(o, parts)).ToArray(),
        NegateExpr negated => OptionsOf(SharedExpr.Around(negated.Inner, parts), side.Other()).Select(Negated).ToArray(),
        _ => CanonicalOptions(SharedExpr.Around(body, parts), side),
    };

    private static IReadOnlyList<ValueExpr> CanonicalOptions(ValueExpr expression, Side side)
    {
        var store = new GameStore();
        return store.Options(store.Evaluate(expression), side).Select(g => GameExpressions.Of(store, g)).ToArray();
    }

    /// <summary>−e, written as simply as the expression allows.</summary>
    public static ValueExpr Negated(ValueExpr e) => e switch
    {
        NumberExpr n => new NumberExpr(-n.Value),
        UpStarExpr u => new UpStarExpr(-u.X, -u.Ups, u.Star),
        SwitchExpr s => s,
        NegateExpr n => n.Inner,
        _ => new NegateExpr(e),
    };
}
