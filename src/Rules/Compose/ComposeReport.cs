using Bramble.Values;

namespace Bramble.Rules.Compose;

/// <summary>
/// What a compose run found and how far it went. <see cref="SearchedThrough"/> is the largest
/// size n such that every position of size at most n was looked at (−1: none); with
/// <see cref="Sampled"/> the components came from random generators, so even those sizes were
/// only sampled; with <see cref="Restricted"/> the ruleset listed only some kinds of components
/// (the notes say which), so "every position" means every listed one.
/// </summary>
public sealed record ComposeReport(
    IRuleset Ruleset,
    Game Target,
    IReadOnlyList<ComposedPosition> Positions,
    string SizeUnit,
    int LeastSize,
    int Bound,
    int SearchedThrough,
    bool Sampled,
    bool Restricted,
    long ComponentsTried,
    long SumsTried,
    long ElapsedMs,
    ComposeStop Stop,
    IReadOnlyList<string> Notes)
{
    /// <summary>Milliseconds to the first position, or null when none was found.</summary>
    public long? FirstMs => Positions.Count == 0 ? null : Positions.Min(p => p.FoundMs);
}
