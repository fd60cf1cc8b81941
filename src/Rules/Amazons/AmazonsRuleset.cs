using Bramble.Rules.Database;
using Bramble.Values;

namespace Bramble.Rules.Amazons;

/// <summary>
/// The Game of the Amazons (W. Zamkauskas, 1988): each move takes one of the mover's amazons along
/// a queen line and then shoots an arrow, also along a queen line, from where it landed; the arrow
/// burns its square for good. The player who cannot move loses. Burnt squares cut the board into
/// independent regions; a region with one side's amazons only is the integer count of the moves
/// that side can make there, any other is searched. Regions are keyed under the board's eight
/// symmetries and the exchange of colours (docs/amazons.md).
/// </summary>
public sealed class AmazonsRuleset : IRuleset, IComponentCatalogue
{
    public string Name => "amazons";

    public IPosition Parse(string text) => new AmazonsPosition(this, AmazonsBoard.Parse(text));

    public Game Value(IPosition position, ValueContext context)
    {
        if (position is not AmazonsPosition)
            throw new ArgumentException($"not an amazons position: {position.Ruleset.Name}", nameof(position));
        return new AmazonsValues(this, context).ValueOf(position);
    }

    public IReadOnlyList<string> Generators => AmazonsGenerators.Names;

    public IReadOnlyList<string> Generate(string generator, int count, int size, int seed, string? colours = null) =>
        AmazonsGenerators.Generate(this, generator, count, size, seed);

    // ------------------------------------------------------------------ IComponentCatalogue (bramble db build)

    public int MaxCatalogueSize => 8;

    public string SizeUnit => "squares";

    /// <summary>The squares of the region's bounding box: the list holds rectangles, and a region's key is its box.</summary>
    public int CatalogueSize(IPosition component) => ((AmazonsPosition)component).BoxArea;

    /// <summary>
    /// Every filling (empty, Left's amazon, Right's amazon or burnt on each square) of every
    /// rectangle of up to <paramref name="size"/> squares that is one live region, up to symmetry
    /// and colour swap; smaller rectangles first.
    /// </summary>
    public IEnumerable<IPosition> ComponentsUpTo(int size)
    {
        var seen = new HashSet<string>(StringComparer.Ordinal);
        for (int area = 2; area <= Math.Min(size, MaxCatalogueSize); area++)
            for (int rows = 1; rows <= area; rows++)
            {
                if (area % rows != 0) continue;
                int columns = area / rows;
                if (rows > columns || columns > AmazonsBoard.MaxSide) continue;
                int total = 1;
                for (int k = 0; k < area; k++) total *= 4;
                for (int code = 0; code < total; code++)
                {
                    var cells = new Square[area];
                    int c = code;
                    for (int k = 0; k < area; k++) { cells[k] = (Square)(c % 4); c /= 4; }
                    var position = new AmazonsPosition(this, new AmazonsBoard(rows, columns, cells));
                    if (position.Regions.Length != 1) continue;
                    if (seen.Add(position.NormalKey)) yield return position;
                }
            }
    }
}
