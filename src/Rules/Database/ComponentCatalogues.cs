namespace Bramble.Rules.Database;

/// <summary>The registered rulesets that can list their components, for <c>bramble db build</c>'s help and messages.</summary>
public static class ComponentCatalogues
{
    /// <summary>The rulesets with a component list, each with what its size counts.</summary>
    public static IEnumerable<(IRuleset Ruleset, IComponentCatalogue Catalogue)> All =>
        Rulesets.All.OfType<IComponentCatalogue>().Select(c => ((IRuleset)c, c));

    /// <summary>"domineering (N cells), hackenbush (N edges), …": one phrase for help text.</summary>
    public static string Describe() =>
        string.Join(", ", All.Select(e => $"{e.Ruleset.Name} (up to N {e.Catalogue.SizeUnit})"));
}
