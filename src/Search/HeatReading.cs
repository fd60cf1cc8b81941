using Bramble.Rules;
using Bramble.Values;

namespace Bramble.Search;

/// <summary>A component with the value its thermograph is read from, and whether that value is only an estimate.</summary>
public sealed record HeatReading(IPosition Position, Game Value, Thermograph Thermograph, bool Estimated)
{
    public Dyadic Temperature => Thermograph.Temperature;

    /// <summary>Width of the thermograph at temperature t: how much moving first there is worth to the two sides together.</summary>
    public Dyadic WidthAt(Dyadic t) => Thermograph.LeftWallAt(t) - Thermograph.RightWallAt(t);
}
