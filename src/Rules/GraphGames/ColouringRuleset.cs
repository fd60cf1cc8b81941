using Bramble.Rules.Database;
using Bramble.Values;

namespace Bramble.Rules.GraphGames;

/// <summary>
/// What Snort and Col share as rulesets: the notation, the split into tinted parts, memoised
/// exact values, the generators and the catalogue of small parts for database files. Each game
/// is this with its <see cref="ColouringRule"/>.
/// </summary>
public abstract class ColouringRuleset(ColouringRule rule) : IRuleset, IComponentCatalogue
{
    public ColouringRule Rule { get; } = rule;

    public string Name => Rule.Name();

    public IPosition Parse(string text) => new ColouringPosition(this, Rule, GraphNotationReader.Read(text));

    /// <summary>A position of this ruleset on the given graph (for generators and tests).</summary>
    public ColouringPosition On(ColouredGraph graph) => new(this, Rule, graph);

    public Game Value(IPosition position, ValueContext context)
    {
        if (position is not ColouringPosition p || p.Rule != Rule)
            throw new ArgumentException($"not a {Name} position: {position.Ruleset.Name}", nameof(position));
        return new TintedValues(this, Rule, context).ValueOf(p.Parts);
    }

    public IReadOnlyList<string> Generators => GraphGenerators.Names;

    public IReadOnlyList<string> Generate(string generator, int count, int size, int seed, string? colours = null) =>
        GraphGenerators.Generate(Name, generator, count, size, seed);

    public int MaxCatalogueSize => TintedCatalogue.MaxVertices;

    public string SizeUnit => "vertices";

    public IEnumerable<IPosition> ComponentsUpTo(int size) => TintedCatalogue.UpTo(size).Select(On);
}
