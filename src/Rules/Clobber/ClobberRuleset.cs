using Bramble.Rules.Common;
using Bramble.Rules.Database;
using Bramble.Values;

namespace Bramble.Rules.Clobber;

/// <summary>
/// Clobber (Albert, Grossman, Nowakowski, Wolfe, "An introduction to Clobber", 2005): a player
/// moves a stone of their own onto an orthogonally adjacent opposing stone, removing it. Every
/// position is all-small, so every value has an atomic weight. Groups of stones are independent;
/// each is searched once for its eight images and their colour swaps (negatives).
/// </summary>
public sealed class ClobberRuleset : IRuleset, IComponentCatalogue, IComposable
{
    public string Name => "clobber";

    internal const string Example = "a board such as xox/o.x (x Left, o Right, . empty) or 5x6";

    public IPosition Parse(string text) => new ClobberPosition(this, StoneGrid.Parse(text, Example));

    public Game Value(IPosition position, ValueContext context)
    {
        if (position is not ClobberPosition)
            throw new ArgumentException($"not a clobber position: {position.Ruleset.Name}", nameof(position));
        return new ComponentValues(this, context).ValueOf(position);
    }

    public IReadOnlyList<string> Generators => StoneGenerators.Names;

    public IReadOnlyList<string> Generate(string generator, int count, int size, int seed, string? colours = null) =>
        StoneGenerators.Generate("clobber", generator, count, size, seed);

    public int MaxCatalogueSize => 12;

    public string SizeUnit => "stones";

    /// <summary>Every polyomino of up to <paramref name="size"/> cells with every colouring of its stones, fewer stones first.</summary>
    public IEnumerable<IPosition> ComponentsUpTo(int size)
    {
        foreach (var shape in Domineering.Polyominoes.UpTo(size))
        {
            if (shape.CellCount < 2) continue;
            var cells = new List<int>();
            for (int r = 0; r < shape.Height; r++)
                for (int c = 0; c < shape.Width; c++)
                    if (shape.Contains(r, c)) cells.Add(r * shape.Width + c);
            for (int colouring = 0; colouring < 1 << cells.Count; colouring++)
            {
                var stones = new Stone[shape.Height * shape.Width];
                for (int k = 0; k < cells.Count; k++) stones[cells[k]] = (colouring >> k & 1) == 0 ? Stone.Left : Stone.Right;
                var position = new ClobberPosition(this, new StoneGrid(shape.Height, shape.Width, stones));
                if (position.Groups.Count == 1 && position.NormalKey[0] != '-') yield return position;
            }
        }
    }

    // ------------------------------------------------------------------ IComposable (bramble compose)

    public int ListingLimit => 12;

    public int DefaultSearchSize => 8;

    public IEnumerable<IPosition> ComponentsOfSize(int size) => ClobberComposition.ComponentsOfSize(this, size);

    public IPosition SumOf(IReadOnlyList<IPosition> components) => ClobberComposition.SumOf(this, components);

    public int LeastSize(Game target, GameStore store) => ClobberComposition.LeastSize(target, store);

    public TargetFacts Facts(Game target, GameStore store) => ClobberComposition.Facts(target, store);
}
