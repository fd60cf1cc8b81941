using Bramble.Values;

namespace Bramble.Rules.Compose;

/// <summary>
/// Finds positions of a ruleset whose value is a given game, smallest first (see docs/compose.md).
/// Constructions the field knows come first at their size; then every position is looked at by
/// increasing size, as a multiset of listed components whose values add up to the target, each
/// one parsed again from its text and valued the ordinary way before it is reported.
/// </summary>
public sealed class Composer(IRuleset ruleset, ValueContext context)
{
    public ComposeReport Run(Game target, ComposeSettings settings, IProgress<ComposeProgress>? progress = null)
    {
        if (settings.Count < 1) throw new ArgumentException("--count must be at least 1");
        if (settings.MaxSize is < 0) throw new ArgumentException("--max-size must not be negative");
        var source = ruleset as IComposable;
        return new ComposeRun(ruleset, source ?? new SampledComposable(ruleset), sampled: source is null, context, target, settings, progress).Execute();
    }
}
