using Bramble.Rules.Common;
using Bramble.Rules.Database;
using Bramble.Values;

namespace Bramble.Rules.Konane;

/// <summary>
/// Konane (Ernst, "Playing Konane mathematically", 1995): a player jumps a stone of their own
/// over an orthogonally adjacent opposing stone into an empty square, possibly several times in
/// one straight line, removing the jumped stones. Groups of stones too far apart to ever meet are
/// independent; each is searched once for its images under the symmetries of the square and the
/// exchange of colours (negatives). Positions are given as they stand: the opening removals of
/// the traditional game are made by the players before the position is written down.
/// </summary>
public sealed class KonaneRuleset : IRuleset, IComponentCatalogue, IComposable
{
    public string Name => "konane";

    internal const string Example = "a board such as xo./..x (x Left, o Right, . empty)";

    public IPosition Parse(string text) => new KonanePosition(this, StoneGrid.Parse(text, Example));

    public Game Value(IPosition position, ValueContext context)
    {
        if (position is not KonanePosition)
            throw new ArgumentException($"not a konane position: {position.Ruleset.Name}", nameof(position));
        return new ComponentValues(this, context).ValueOf(position);
    }

    public IReadOnlyList<string> Generators => StoneGenerators.Names;

    public IReadOnlyList<string> Generate(string generator, int count, int size, int seed, string? colours = null) =>
        StoneGenerators.Generate("konane", generator, count, size, seed);

    public int MaxCatalogueSize => 12;

    public string SizeUnit => "squares";

    /// <summary>
    /// Every filling (x, o or empty on each square) of every rectangle of up to
    /// <paramref name="size"/> squares where somebody can move, up to symmetry and colour swap;
    /// smaller rectangles first.
    /// </summary>
    public IEnumerable<IPosition> ComponentsUpTo(int size)
    {
        var seen = new HashSet<string>(StringComparer.Ordinal);
        for (int area = 3; area <= size; area++)
            for (int rows = 1; rows <= area; rows++)
            {
                if (area % rows != 0) continue;
                int columns = area / rows;
                if (rows > columns || columns > StoneGrid.MaxColumns) continue;
                int total = 1;
                for (int k = 0; k < area; k++) total *= 3;
                for (int code = 0; code < total; code++)
                {
                    var cells = new Stone[area];
                    int c = code;
                    for (int k = 0; k < area; k++) { cells[k] = (Stone)(c % 3); c /= 3; }
                    var position = new KonanePosition(this, new StoneGrid(rows, columns, cells));
                    if (position.Components().Count == 0) continue;
                    if (seen.Add(position.NormalKey)) yield return position;
                }
            }
    }

    /// <summary>A stored key is the part of the board its group can use: counted by its squares, as the list is.</summary>
    public int CatalogueSize(IPosition component) => component is KonanePosition k ? k.Grid.Rows * k.Grid.Columns : component.Size;

    // ------------------------------------------------------------------ IComposable (bramble compose)

    // Compose counts stones (a position's size); the database lists boards by squares.
    string IComposable.SizeUnit => "stones";

    public int ListingLimit => 8;

    public bool ListsEveryComponent => false;

    public int DefaultSearchSize => 6;

    public IEnumerable<IPosition> ComponentsOfSize(int size) => KonaneComposition.ComponentsOfSize(this, size);

    public IPosition SumOf(IReadOnlyList<IPosition> components) => KonaneComposition.SumOf(this, components);

    public int LeastSize(Game target, GameStore store) => KonaneComposition.LeastSize(target, store);

    public TargetFacts Facts(Game target, GameStore store) => KonaneComposition.Facts();
}
