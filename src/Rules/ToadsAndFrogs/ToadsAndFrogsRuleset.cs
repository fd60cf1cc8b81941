using Bramble.Rules.Common;
using Bramble.Rules.Database;
using Bramble.Values;

namespace Bramble.Rules.ToadsAndFrogs;

/// <summary>
/// Toads and Frogs (Winning Ways ch. 1; Erickson, "New Toads and Frogs results", 1996): a strip
/// of squares, Left's toads moving right, Right's frogs moving left. The strip splits at squares
/// whose pieces can never move again; each stretch's value is searched once for it and for its
/// mirror image with the roles swapped.
/// </summary>
public sealed class ToadsAndFrogsRuleset : IRuleset, IComponentCatalogue, IComposable
{
    public string Name => "toads-and-frogs";

    public IPosition Parse(string text) => new ToadsAndFrogsPosition(this, StripNotation.Parse(text));

    public Game Value(IPosition position, ValueContext context)
    {
        if (position is not ToadsAndFrogsPosition)
            throw new ArgumentException($"not a toads-and-frogs position: {position.Ruleset.Name}", nameof(position));
        return new ComponentValues(this, context).ValueOf(position);
    }

    public IReadOnlyList<string> Generators => ToadsAndFrogsGenerators.Names;

    public IReadOnlyList<string> Generate(string generator, int count, int size, int seed, string? colours = null) =>
        ToadsAndFrogsGenerators.Generate(generator, count, size, seed);

    public int MaxCatalogueSize => 16;

    public string SizeUnit => "squares";

    /// <summary>Every strip of up to <paramref name="size"/> squares (toad, frog or empty on each), shorter strips first.</summary>
    public IEnumerable<IPosition> ComponentsUpTo(int size) =>
        // Strips that are their own representative: the others are images of these (negatives).
        Enumerable.Range(2, Math.Max(0, size - 1))
            .SelectMany(n => ToadsAndFrogsComposition.ComponentsOfSize(this, n))
            .Where(p => p.NormalKey[0] != '-');

    // ------------------------------------------------------------------ IComposable (bramble compose)

    public int ListingLimit => 12;

    public int DefaultSearchSize => 8;

    public IEnumerable<IPosition> ComponentsOfSize(int size) => ToadsAndFrogsComposition.ComponentsOfSize(this, size);

    public IPosition SumOf(IReadOnlyList<IPosition> components) => ToadsAndFrogsComposition.SumOf(this, components);

    public int LeastSize(Game target, GameStore store) => ToadsAndFrogsComposition.LeastSize(target, store);
}
