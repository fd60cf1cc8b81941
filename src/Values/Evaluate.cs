namespace Bramble.Values;

public sealed partial class GameStore
{
    /// <summary>The canonical value of an expression as written.</summary>
    public Game Evaluate(ValueExpr expr) => Evaluate(expr, null);

    private Game Evaluate(ValueExpr expr, SharedParts? shared) => expr switch
    {
        SharedExpr s => Evaluate(s.Body, new SharedParts(s.Parts)),
        PartExpr p => shared is null
            ? throw new ArgumentException($"#{p.Name} is a named part outside a shared form")
            : shared.Value(this, p.Name),
        NumberExpr n => Number(n.Value),
        UpStarExpr u => UpStar(u.X, u.Ups, u.Star),
        SwitchExpr s => Make([Number(s.X)], [Number(-s.X)]),
        OptionsExpr o => Make(o.Left.Select(x => Evaluate(x, shared)).ToArray(), o.Right.Select(x => Evaluate(x, shared)).ToArray()),
        SumExpr s => Sum(s.Terms.Select(x => Evaluate(x, shared))),
        NegateExpr n => Negate(Evaluate(n.Inner, shared)),
        _ => throw new ArgumentException($"unknown expression {expr}"),
    };

    /// <summary>The parts of a shared form, each evaluated once.</summary>
    private sealed class SharedParts(IReadOnlyDictionary<int, ValueExpr> parts)
    {
        private readonly Dictionary<int, Game> _values = new();

        public Game Value(GameStore store, int name)
        {
            if (_values.TryGetValue(name, out var known)) return known;
            if (!parts.TryGetValue(name, out var expr)) throw new ArgumentException($"#{name} is not defined");
            var g = store.Evaluate(expr, this);
            _values[name] = g;
            return g;
        }
    }

    /// <summary>Parses the value notation (docs/values.md) to a canonical game; throws <see cref="ValueSyntaxException"/>.</summary>
    public Game Parse(string text) => Evaluate(ValueNotation.Parse(text));

    /// <summary>The published notation; <paramref name="ascii"/> uses words for the symbols.</summary>
    public string Format(Game g, bool ascii = false) => ValueNotation.Format(this, g, ascii);
}
