using Bramble.Rules;

namespace Bramble.Cli;

/// <summary>
/// The registered rulesets as help texts list them, so that a ruleset added by its registration
/// line shows up in every verb's help without touching the verbs.
/// </summary>
public static class RulesetNames
{
    public static string Listed => string.Join(", ", Rulesets.All.Select(r => r.Name));
}
