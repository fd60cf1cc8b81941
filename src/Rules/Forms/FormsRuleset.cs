using Bramble.Values;

namespace Bramble.Rules.Forms;

/// <summary>
/// Explicit game forms: a position is a sum of value-notation terms (docs/forms.md, docs/values.md), each term a
/// component whose value is the canonical form of its expression.
/// </summary>
public sealed class FormsRuleset : IRuleset, IComposable
{
    public string Name => "forms";

    /// <summary>Texts longer than this may nest deeply: they are read, and their terms written, on a stack of their own.</summary>
    private const int DeepTextLength = 2000;

    public IPosition Parse(string text) =>
        text.Length > DeepTextLength ? BigStack.Run(() => ParseHere(text), 64 * 1024 * 1024) : ParseHere(text);

    private FormsPosition ParseHere(string text)
    {
        IReadOnlyList<(ValueExpr Term, int Column)> terms;
        try
        {
            terms = ValueNotation.ParseTerms(text);
        }
        catch (ValueSyntaxException e)
        {
            throw new PositionSyntaxException(text, e.Column, e.Expected);
        }
        return new FormsPosition(this, terms.Select((t, i) => (i + 1, new FormsTerm(t.Term))).ToArray());
    }

    public Game Value(IPosition position, ValueContext context)
    {
        if (position is not FormsPosition forms)
            throw new ArgumentException($"not a forms position: {position.Ruleset.Name}", nameof(position));
        var total = context.Store.Zero;
        foreach (var (_, term) in forms.Terms)
        {
            if (!context.TryGetMemo(this, term.Text, out var value))
            {
                context.Tick();
                value = context.Store.Evaluate(term.Expression);
                context.SetMemo(this, term.Text, value);
            }
            total = context.Store.Add(total, value);
        }
        return total;
    }

    public IReadOnlyList<string> Generators => FormsGenerators.Names;

    public IReadOnlyList<string> Generate(string generator, int count, int size, int seed, string? colours = null) =>
        FormsGenerators.Generate(generator, count, size, seed);

    // ------------------------------------------------------------------ IComposable (bramble compose)

    public string SizeUnit => "terms";

    // A value is one term of its own canonical form: nothing to list.
    public int ListingLimit => 0;

    public int DefaultSearchSize => 1;

    public IEnumerable<IPosition> ComponentsOfSize(int size) => [];

    public IPosition SumOf(IReadOnlyList<IPosition> components) =>
        Parse(components.Count == 0 ? "0" : string.Join(" + ", components.Select(c => c.Text)));

    public IEnumerable<IPosition> Construct(Game target, GameStore store) => [Parse(store.Format(target))];
}
