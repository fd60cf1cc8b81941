namespace Bramble.Values;

public sealed partial class GameStore
{
    private readonly Dictionary<int, Thermograph> _thermographs = new();
    private readonly Dictionary<(int, Dyadic), int> _cooled = new();
    private readonly Dictionary<(int, Dyadic), int> _heated = new();

    /// <summary>
    /// The thermograph, by the published construction: the Left scaffold is the maximum over Left
    /// options of their right walls tilted by −t, the Right scaffold the minimum over Right options
    /// of their left walls tilted by +t; they meet at the temperature, and above it the mast stands
    /// at the meeting value.
    /// </summary>
    public Thermograph Thermograph(Game g)
    {
        if (_thermographs.TryGetValue(g.Id, out var known)) return known;
        Thermograph result;
        if (TryGetNumber(g, out var x))
        {
            var wall = Trajectory.Constant(x);
            result = new Thermograph(wall, wall, NumberTemperature(x), x);
        }
        else if (_tag[g.Id] is { } tag)
        {
            // x plus an infinitesimal: temperature 0, both walls the mast at x (no need to walk
            // the options, which for *m are m nimbers).
            var wall = Trajectory.Constant(tag.X);
            result = new Thermograph(wall, wall, Dyadic.Zero, tag.X);
        }
        else
        {
            Trajectory? ls = null, rs = null;
            foreach (var o in LeftOptions(g))
            {
                var w = Thermograph(o).RightWall.Tilt(Dyadic.MinusOne);
                ls = ls is null ? w : Trajectory.Max(ls, w);
            }
            foreach (var o in RightOptions(g))
            {
                var w = Thermograph(o).LeftWall.Tilt(Dyadic.One);
                rs = rs is null ? w : Trajectory.Min(rs, w);
            }
            var t = Trajectory.FirstMeet(ls!, rs!);
            var mast = ls!.At(t);
            result = new Thermograph(ls.MastFrom(t), rs!.MastFrom(t), t, mast);
        }
        _thermographs[g.Id] = result;
        return result;
    }

    /// <summary>Sub-zero convention: an integer has temperature −1, m/2^k (m odd, k ≥ 1) has −1/2^k.</summary>
    private static Dyadic NumberTemperature(Dyadic x) => x.IsInteger ? Dyadic.MinusOne : -Dyadic.PowerOfHalf(x.Exponent);

    public Dyadic Temperature(Game g) => TryGetNumber(g, out var x) ? NumberTemperature(x) : Thermograph(g).Temperature;

    public Dyadic Mean(Game g) => TryGetNumber(g, out var x) ? x : Thermograph(g).Mast;

    /// <summary>
    /// G cooled by t ≥ 0: {G^L_t − t | G^R_t + t}, except that once G is infinitely close to a
    /// number at some temperature below t (that is, t is above G's temperature) it is that number.
    /// </summary>
    public Game Cool(Game g, Dyadic t)
    {
        if (t.Sign < 0) throw new ArgumentOutOfRangeException(nameof(t), "cooling is defined here for t ≥ 0");
        if (IsNumber(g) || t.IsZero) return g;
        if (_cooled.TryGetValue((g.Id, t), out int id)) return new Game(id);
        var th = Thermograph(g);
        Game result;
        if (t > th.Temperature) result = Number(th.Mast);
        else
        {
            var shift = Number(t);
            var shiftDown = Number(-t);
            result = Make(LeftOptions(g).Select(o => Add(Cool(o, t), shiftDown)).ToArray(),
                          RightOptions(g).Select(o => Add(Cool(o, t), shift)).ToArray());
        }
        _cooled[(g.Id, t)] = result.Id;
        return result;
    }

    /// <summary>G heated by t: G itself for a number, else {t + ∫G^L | ∫G^R − t}.</summary>
    public Game Heat(Game g, Dyadic t)
    {
        if (IsNumber(g) || t.IsZero) return g;
        if (_heated.TryGetValue((g.Id, t), out int id)) return new Game(id);
        var up = Number(t);
        var down = Number(-t);
        var result = Make(LeftOptions(g).Select(o => Add(Heat(o, t), up)).ToArray(),
                          RightOptions(g).Select(o => Add(Heat(o, t), down)).ToArray());
        _heated[(g.Id, t)] = result.Id;
        return result;
    }
}
