using Bramble.Values;

namespace Bramble.Rules;

/// <summary>
/// Optional for a ruleset: what <c>bramble compose</c> needs to find positions of a given value.
/// Its small components listed by size, a way to set components side by side as one position, a
/// proved lower bound on the size of any position of a value, the constructions the field knows,
/// and the field's facts about which values the ruleset can reach. A ruleset without it is
/// composed from its generators instead (sampled, so "none found" proves nothing there).
/// </summary>
public interface IComposable
{
    /// <summary>What <see cref="IPosition.Size"/> counts, for messages: "edges", "cells", "terms".</summary>
    string SizeUnit { get; }

    /// <summary>The largest size <see cref="ComponentsOfSize"/> accepts (the lists grow exponentially).</summary>
    int ListingLimit { get; }

    /// <summary>How far the search goes unless the user sets a bound: the size listed in seconds, not minutes.</summary>
    int DefaultSearchSize { get; }

    /// <summary>
    /// Every single component of exactly <paramref name="size"/>, one of each kind up to the
    /// renamings that keep the value (so a shape and its negating mirror image both appear).
    /// Lazily enumerated: a caller may stop at any point.
    /// </summary>
    IEnumerable<IPosition> ComponentsOfSize(int size);

    /// <summary>One position whose components are the given ones (an empty list: the empty position).</summary>
    IPosition SumOf(IReadOnlyList<IPosition> components);

    /// <summary>
    /// False when <see cref="ComponentsOfSize"/> lists only some kinds of components (its
    /// <see cref="Facts"/> then say which): a search that finds nothing proves nothing beyond them.
    /// </summary>
    bool ListsEveryComponent => true;

    /// <summary>
    /// A proved lower bound on the size of any position whose value is <paramref name="target"/>
    /// (for instance from the target's birthday: a game lasting at most n moves has birthday at most n).
    /// </summary>
    int LeastSize(Game target, GameStore store) => target == store.Zero ? 0 : 1;

    /// <summary>Positions built for the target by a rule of the field, when one applies; each is re-evaluated before use.</summary>
    IEnumerable<IPosition> Construct(Game target, GameStore store) => [];

    /// <summary>What the field knows about positions of this ruleset with the target's value, each fact with its source.</summary>
    TargetFacts Facts(Game target, GameStore store) => TargetFacts.None;
}
