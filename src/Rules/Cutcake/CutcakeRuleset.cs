using Bramble.Rules.Common;
using Bramble.Rules.Database;
using Bramble.Values;

namespace Bramble.Rules.Cutcake;

/// <summary>
/// Cutcake (Winning Ways ch. 2): Left cuts pieces of cake between columns, Right between rows; a
/// player with no piece to cut loses. Every position is an integer. Pieces are independent
/// components; a piece and its transpose are searched once between them.
/// </summary>
public sealed class CutcakeRuleset : IRuleset, IComponentCatalogue, IComposable
{
    public string Name => "cutcake";

    public IPosition Parse(string text) =>
        new CutcakePosition(this, CakeNotation.Parse(text).Select((p, i) => new Piece(i + 1, p.Rows, p.Columns)).ToArray());

    public Game Value(IPosition position, ValueContext context)
    {
        if (position is not CutcakePosition)
            throw new ArgumentException($"not a cutcake position: {position.Ruleset.Name}", nameof(position));
        return new ComponentValues(this, context).ValueOf(position);
    }

    public IReadOnlyList<string> Generators => CutcakeGenerators.Names;

    public IReadOnlyList<string> Generate(string generator, int count, int size, int seed, string? colours = null) =>
        CutcakeGenerators.Generate(generator, count, size, seed);

    public int MaxCatalogueSize => 4096;

    public string SizeUnit => "cells";

    /// <summary>Every rectangle with at most <paramref name="size"/> cells, up to transposition, smaller areas first.</summary>
    public IEnumerable<IPosition> ComponentsUpTo(int size)
    {
        for (int area = 2; area <= size; area++)
            for (int rows = 1; rows * rows <= area; rows++)
                if (area % rows == 0) yield return Parse($"{rows}x{area / rows}");
    }

    // ------------------------------------------------------------------ IComposable (bramble compose)

    public int ListingLimit => 64;

    public int DefaultSearchSize => 16;

    public IEnumerable<IPosition> ComponentsOfSize(int size) => CutcakeComposition.ComponentsOfSize(this, size);

    public IPosition SumOf(IReadOnlyList<IPosition> components) => CutcakeComposition.SumOf(this, components);

    public int LeastSize(Game target, GameStore store) => CutcakeComposition.LeastSize(target, store);

    public IEnumerable<IPosition> Construct(Game target, GameStore store) => CutcakeComposition.Construct(this, target, store);

    public TargetFacts Facts(Game target, GameStore store) => CutcakeComposition.Facts(target, store);
}
