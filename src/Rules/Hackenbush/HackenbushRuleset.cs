using Bramble.Values;

namespace Bramble.Rules.Hackenbush;

/// <summary>
/// Blue-red-green Hackenbush on any graph with a ground: notation of docs/hackenbush.md, exact values by
/// the fastest method that applies to each part (<see cref="PieceEvaluator"/>), generators of
/// random positions.
/// </summary>
public sealed class HackenbushRuleset : IRuleset, IComposable, Database.IComponentCatalogue
{
    /// <summary>Pieces larger than this are valued on a big stack: the store's canonical forms recurse.</summary>
    private const int DeepWorkEdges = 400;

    public string Name => "hackenbush";

    public HackenbushPosition ParsePosition(string text) => NotationReader.Read(this, text);

    public IPosition Parse(string text) => ParsePosition(text);

    /// <summary>
    /// The exact canonical value: the sum of the pieces' values, each found through the context's
    /// memo by its normal key. Green and blue-red sums are added as nimbers and dyadics.
    /// </summary>
    public Game Value(IPosition position, ValueContext context)
    {
        if (position is not HackenbushPosition p) throw new ArgumentException("not a Hackenbush position", nameof(position));
        var store = context.Store;
        int nim = 0;
        var number = Dyadic.Zero;
        var total = store.Zero;
        foreach (var part in p.Components())
        {
            var g = PieceValue((HackenbushPosition)part, context);
            if (store.TryGetNimber(g, out int n)) nim ^= n;
            else if (store.TryGetNumber(g, out var x)) number += x;
            else total = store.Add(total, g);
        }
        return store.Add(store.Add(total, store.Number(number)), store.Nimber(nim));
    }

    private Game PieceValue(HackenbushPosition piece, ValueContext context)
    {
        var key = piece.NormalKey;
        if (context.TryGetMemo(this, key, out var known)) return known;
        var evaluator = new PieceEvaluator(context);
        bool deep = piece.EdgeCount > DeepWorkEdges && !piece.IsGreen && !piece.IsBlueRed;
        var value = deep ? BigStack.Run(() => evaluator.Evaluate(piece)) : evaluator.Evaluate(piece);
        context.SetMemo(this, key, value);
        return value;
    }

    public IReadOnlyList<string> Generators => PositionGenerator.Names;

    public IReadOnlyList<string> Generate(string generator, int count, int size, int seed, string? colours = null) =>
        PositionGenerator.Generate(generator, count, size, seed, colours);

    // ------------------------------------------------------------------ IComposable (bramble compose)

    public string SizeUnit => "edges";

    public int ListingLimit => PieceCatalogue.Limit;

    public int DefaultSearchSize => 6;

    public IEnumerable<IPosition> ComponentsOfSize(int size) => PieceCatalogue.OfSize(this, size);

    // ------------------------------------------------------------------ IComponentCatalogue (bramble db build)

    public int MaxCatalogueSize => PieceCatalogue.Limit;

    /// <summary>Every piece of 1 to <paramref name="size"/> edges, one of each kind (the list <c>compose</c> walks), smaller first.</summary>
    public IEnumerable<IPosition> ComponentsUpTo(int size) => Enumerable.Range(1, size).SelectMany(ComponentsOfSize);

    public IPosition SumOf(IReadOnlyList<IPosition> components) =>
        ParsePosition(components.Count == 0 ? "0" : string.Join(" + ", components.Select(c => c.Text)));

    public int LeastSize(Game target, GameStore store) => HackenbushComposition.LeastSize(target, store);

    public IEnumerable<IPosition> Construct(Game target, GameStore store) => HackenbushComposition.Construct(this, target, store);

    public TargetFacts Facts(Game target, GameStore store) => HackenbushComposition.Facts(target, store);
}
