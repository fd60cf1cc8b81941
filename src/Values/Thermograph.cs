namespace Bramble.Values;

/// <summary>
/// The thermograph of a game for temperatures t ≥ 0: the Left and Right walls (the stops of the
/// game cooled by t), which meet at the temperature and continue as one vertical mast at the mean.
/// Numbers use the sub-zero convention for their temperature (an integer −1, m/2^k with m odd
/// −1/2^k); their walls for t ≥ 0 are the mast itself.
/// </summary>
public sealed class Thermograph(Trajectory leftWall, Trajectory rightWall, Dyadic temperature, Dyadic mast)
{
    public Trajectory LeftWall { get; } = leftWall;
    public Trajectory RightWall { get; } = rightWall;
    public Dyadic Temperature { get; } = temperature;

    /// <summary>The value of the mast: the mean of the game.</summary>
    public Dyadic Mast { get; } = mast;

    public Dyadic LeftWallAt(Dyadic t) => LeftWall.At(t);
    public Dyadic RightWallAt(Dyadic t) => RightWall.At(t);

    public override string ToString() => $"temperature {Temperature}, mast {Mast}; left {LeftWall}; right {RightWall}";
}
