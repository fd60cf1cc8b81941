namespace Bramble.Rules;

/// <summary>The registered rulesets, by name. One line per ruleset.</summary>
public static class Rulesets
{
    private static readonly IRuleset[] s_all =
    [
        new Hackenbush.HackenbushRuleset(),
        new Domineering.DomineeringRuleset(),
        new Forms.FormsRuleset(),
        new Cutcake.CutcakeRuleset(),
        new ToadsAndFrogs.ToadsAndFrogsRuleset(),
        new Clobber.ClobberRuleset(),
        new Konane.KonaneRuleset(),
        new Amazons.AmazonsRuleset(),
        new Snort.SnortRuleset(),
        new Col.ColRuleset(),
    ];

    public static IReadOnlyList<IRuleset> All => s_all;

    public static IRuleset? Find(string name) =>
        s_all.FirstOrDefault(r => string.Equals(r.Name, name, StringComparison.OrdinalIgnoreCase));

    public static IRuleset Get(string name) => Find(name)
        ?? throw new ArgumentException($"unknown ruleset '{name}'; known: {string.Join(", ", s_all.Select(r => r.Name))}");
}
