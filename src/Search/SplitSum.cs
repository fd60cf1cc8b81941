using Bramble.Rules;
using Bramble.Values;

namespace Bramble.Search;

/// <summary>
/// A position as the perfect player searches it: the components too large for an exact value, kept
/// as positions, and everything else as one normalised sum of canonical values (non-number part
/// and number part).
/// </summary>
public sealed record SplitSum(IReadOnlyList<IPosition> Large, SumKey Small, Dyadic Offset)
{
    public bool AllSmall => Large.Count == 0;
}

/// <summary>A position's components with their exact values where known (null: too large so far).</summary>
public sealed record ValuedComponent(IPosition Position, Game? Value);
