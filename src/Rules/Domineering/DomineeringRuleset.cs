using Bramble.Rules.Database;
using Bramble.Values;

namespace Bramble.Rules.Domineering;

/// <summary>
/// Domineering: two players place dominoes on the empty cells of a board, Left vertically and
/// Right horizontally; whoever cannot place one loses. The board splits into its 4-connected
/// regions, and each region's exact canonical value comes from <see cref="RegionValues"/>.
/// </summary>
public sealed class DomineeringRuleset : IRuleset, IComponentCatalogue, IComposable
{
    public string Name => "domineering";

    public IPosition Parse(string text) => new DomineeringPosition(this, BoardNotation.Parse(text));

    /// <summary>A position on the given board (for code that builds boards rather than text).</summary>
    public DomineeringPosition FromBoard(Board board) => new(this, board);

    public Game Value(IPosition position, ValueContext context)
    {
        if (position is not DomineeringPosition board)
            throw new ArgumentException($"not a domineering position: {position.Ruleset.Name}", nameof(position));
        var values = new RegionValues(this, context);
        var total = context.Store.Zero;
        foreach (var cells in board.Regions)
        {
            var region = Board.ToRegion(cells)
                ?? throw new BudgetExceededException(
                    $"a region of {cells.Length} cells spreads over more than {Region.MaxArea} cells of the board; its exact value is not computed");
            total = context.Store.Add(total, values.ValueOfConnected(NormalRegion.Of(region)));
        }
        return total;
    }

    public IReadOnlyList<string> Generators => DomineeringGenerators.Names;

    public IReadOnlyList<string> Generate(string generator, int count, int size, int seed, string? colours = null) =>
        DomineeringGenerators.Generate(generator, count, size, seed);

    public int MaxCatalogueSize => Polyominoes.MaxCells;

    public string SizeUnit => "cells";

    public IEnumerable<IPosition> ComponentsUpTo(int size)
    {
        // Single cells are 0 and never stored; every bigger region has a move.
        foreach (var shape in Polyominoes.UpTo(size))
        {
            if (shape.CellCount < 2) continue;
            yield return FromBoard(ToBoard(shape));
        }
    }

    /// <summary>The region's bounding box as a board, cells outside the region filled.</summary>
    public static Board ToBoard(Region region)
    {
        var rows = new uint[region.Height];
        for (int r = 0; r < region.Height; r++)
            for (int c = 0; c < region.Width; c++)
                if (region.Contains(r, c)) rows[r] |= 1u << c;
        return new Board(region.Height, region.Width, rows);
    }

    // ------------------------------------------------------------------ IComposable (bramble compose)

    public int ListingLimit => Polyominoes.MaxCells;

    public int DefaultSearchSize => 10;

    public IEnumerable<IPosition> ComponentsOfSize(int size) => DomineeringComposition.ComponentsOfSize(this, size);

    public IPosition SumOf(IReadOnlyList<IPosition> components) => DomineeringComposition.SumOf(this, components);

    public int LeastSize(Game target, GameStore store) => DomineeringComposition.LeastSize(target, store);

    public IEnumerable<IPosition> Construct(Game target, GameStore store) => DomineeringComposition.Construct(this, target, store);

    public TargetFacts Facts(Game target, GameStore store) => DomineeringComposition.Facts(target, store);
}
