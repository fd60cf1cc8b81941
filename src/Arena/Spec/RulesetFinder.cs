using Bramble.Rules;

namespace Bramble.Arena.Spec;

/// <summary>
/// Looks up a ruleset by name. The harness uses the registry (<see cref="Rulesets.Find"/>); tests
/// hand in rulesets of their own so the referee can be checked without the real ones.
/// </summary>
public delegate IRuleset? RulesetFinder(string name);

public static class RulesetFinders
{
    public static RulesetFinder Registry { get; } = Rulesets.Find;

    /// <summary>The registry plus some extra rulesets (which win on a name clash).</summary>
    public static RulesetFinder With(params IRuleset[] extra) => name =>
        extra.FirstOrDefault(r => string.Equals(r.Name, name, StringComparison.OrdinalIgnoreCase)) ?? Rulesets.Find(name);
}
