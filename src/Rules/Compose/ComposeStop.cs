namespace Bramble.Rules.Compose;

/// <summary>Why a compose run ended.</summary>
public enum ComposeStop
{
    /// <summary>As many positions as were asked for were found.</summary>
    Enough,
    /// <summary>Every size up to the bound was searched.</summary>
    Bound,
    /// <summary>Sizes past the ruleset's listing limit were searched only as sums of listed components.</summary>
    ListingLimit,
    /// <summary>The time budget ran out.</summary>
    Budget,
    /// <summary>A theorem of the field says no position of the ruleset has the value.</summary>
    RuledOut,
}
