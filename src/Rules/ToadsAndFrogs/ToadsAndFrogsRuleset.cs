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
    public IEnumerable<IPosition> ComponentsUpTo(int size)
    {
        for (int n = 2; n <= size; n++)
        {
            int total = 1;
            for (int k = 0; k < n; k++) total *= 3;
            var squares = new Square[n];
            for (int code = 0; code < total; code++)
            {
                int c = code;
                for (int k = 0; k < n; k++) { squares[k] = (Square)(c % 3); c /= 3; }
                var position = new ToadsAndFrogsPosition(this, (Square[])squares.Clone());
                // Only strips that are one live stretch and their own representative: the others are sums or images of these.
                if (position.Stretches.Count == 1 && position.Stretches[0] == (0, n) && position.NormalKey[0] != '-') yield return position;
            }
        }
    }

    // ------------------------------------------------------------------ IComposable (bramble compose)

    public int ListingLimit => 12;

    public int DefaultSearchSize => 8;

    public IEnumerable<IPosition> ComponentsOfSize(int size) => ToadsAndFrogsComposition.ComponentsOfSize(this, size);

    public IPosition SumOf(IReadOnlyList<IPosition> components) => ToadsAndFrogsComposition.SumOf(this, components);

    public int LeastSize(Game target, GameStore store) => ToadsAndFrogsComposition.LeastSize(target, store);
}
