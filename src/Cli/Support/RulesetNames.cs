using Bramble.Rules;
using Bramble.Rules.Database;

namespace Bramble.Cli;

/// <summary>
/// The registered rulesets as help texts list them, so that a ruleset added by its registration
/// line shows up in every verb's help without touching the verbs.
/// </summary>
public static class RulesetNames
{
    public static string Listed => string.Join(", ", Rulesets.All.Select(r => r.Name));

    /// <summary>Each ruleset with its generators: "hackenbush: stalks, trees; domineering: …".</summary>
    public static string Generators => string.Join("; ", Rulesets.All.Select(r => $"{r.Name}: {string.Join(", ", r.Generators)}"));

    /// <summary>The rulesets a database can be built for, each with what its size counts: "domineering (cells), …".</summary>
}
