namespace Bramble.Rules;

/// <summary>
/// Facts of the field about a target value in one ruleset, each a sentence that names its source
/// ("blue-red positions are numbers (Winning Ways, ch. 2)"). <see cref="RuledOut"/> is true only
/// when one of them proves that no position of the ruleset, of any size, has the value.
/// </summary>
public sealed record TargetFacts(bool RuledOut, IReadOnlyList<string> Notes)
{
    public static readonly TargetFacts None = new(false, []);

    public static TargetFacts Impossible(string why) => new(true, [why]);

    public static TargetFacts Remarks(IReadOnlyList<string> notes) => new(false, notes);
}
