namespace Bramble.Search;

/// <summary>The published temperature strategies for sums (Winning Ways ch. 6; Berlekamp 1996).</summary>
public enum TemperatureRule
{
    /// <summary>Move in the hottest component (in a sum of numbers: the cheapest move, the least negative temperature).</summary>
    Hotstrat,

    /// <summary>Move in the component whose move maximises the compound thermograph at the ambient temperature.</summary>
    Thermostrat,

    /// <summary>Answer a move that left its component hotter than the ambient temperature; otherwise Thermostrat.</summary>
    Sentestrat,
}
