namespace Bramble.Values;

/// <summary>
/// A continuous piecewise-linear function of temperature t ≥ 0 with dyadic breakpoints: the
/// shape of a thermograph wall. Stored as breakpoints (t, value) starting at t = 0, plus the slope
/// after the last one. Wall slopes are 0 or ±1 and scaffolds add ±1, so every crossing point is
/// dyadic (the slope differences met here are 1 or 2).
/// </summary>
public sealed class Trajectory
{
    private readonly Dyadic[] _t;
    private readonly Dyadic[] _v;

    public Trajectory(IReadOnlyList<(Dyadic T, Dyadic V)> points, Dyadic finalSlope)
    {
        if (points.Count == 0 || !points[0].T.IsZero) throw new ArgumentException("a trajectory starts at t = 0");
        // Drop breakpoints that sit on a straight line: two trajectories with equal shape compare equal.
        var ts = new List<Dyadic>();
        var vs = new List<Dyadic>();
        for (int i = 0; i < points.Count; i++)
        {
            if (ts.Count > 0 && points[i].T == ts[^1]) continue;
            ts.Add(points[i].T);
            vs.Add(points[i].V);
            while (ts.Count >= 3 && Collinear(ts[^3], vs[^3], ts[^2], vs[^2], ts[^1], vs[^1]))
            {
                ts.RemoveAt(ts.Count - 2);
                vs.RemoveAt(vs.Count - 2);
            }
        }
        if (ts.Count >= 2 && SlopeBetween(ts[^2], vs[^2], ts[^1], vs[^1]) == finalSlope)
        {
            ts.RemoveAt(ts.Count - 1);
            vs.RemoveAt(vs.Count - 1);
        }
        _t = ts.ToArray();
        _v = vs.ToArray();
        FinalSlope = finalSlope;
    }

    public static Trajectory Constant(Dyadic value) => new([(Dyadic.Zero, value)], Dyadic.Zero);

    /// <summary>Breakpoints (t, value), first at t = 0.</summary>
    public IReadOnlyList<(Dyadic T, Dyadic V)> Points => _t.Select((t, i) => (t, _v[i])).ToArray();

    public Dyadic FinalSlope { get; }

    public Dyadic At(Dyadic t)
    {
        if (t < Dyadic.Zero) t = Dyadic.Zero;
        int i = Array.BinarySearch(_t, t);
        if (i >= 0) return _v[i];
        i = ~i - 1;
        var slope = i + 1 < _t.Length ? SlopeBetween(_t[i], _v[i], _t[i + 1], _v[i + 1]) : FinalSlope;
        return _v[i] + slope * (t - _t[i]);
    }

    /// <summary>This function plus slope·t.</summary>
    public Trajectory Tilt(Dyadic slope) => new(_t.Select((t, i) => (t, _v[i] + slope * t)).ToArray(), FinalSlope + slope);

    /// <summary>Cut at t0 and continue as a vertical mast (constant) from there.</summary>
    public Trajectory MastFrom(Dyadic t0)
    {
        var pts = new List<(Dyadic, Dyadic)>();
        for (int i = 0; i < _t.Length && _t[i] < t0; i++) pts.Add((_t[i], _v[i]));
        pts.Add((t0, At(t0)));
        return new Trajectory(pts, Dyadic.Zero);
    }

    public static Trajectory Max(Trajectory a, Trajectory b) => Combine(a, b, takeMax: true);
    public static Trajectory Min(Trajectory a, Trajectory b) => Combine(a, b, takeMax: false);

    private static Trajectory Combine(Trajectory a, Trajectory b, bool takeMax)
    {
        var ts = a._t.Concat(b._t).Distinct().OrderBy(t => t).ToList();
        var pts = new List<(Dyadic, Dyadic)>();
        for (int i = 0; i < ts.Count; i++)
        {
            var t = ts[i];
            var va = a.At(t);
            var vb = b.At(t);
            pts.Add((t, takeMax ? Dyadic.Max(va, vb) : Dyadic.Min(va, vb)));
            // A crossing strictly inside the next segment (or on the final ray) adds a breakpoint.
            Dyadic sa, sb;
            if (i + 1 < ts.Count)
            {
                var next = ts[i + 1];
                var dNow = va - vb;
                var dNext = a.At(next) - b.At(next);
                if (dNow.Sign * dNext.Sign < 0)
                {
                    sa = (a.At(next) - va);
                    sb = (b.At(next) - vb);
                    var cross = t + DivideExact(dNow * (next - t), sb - sa);
                    pts.Add((cross, a.At(cross)));
                }
            }
            else
            {
                sa = a.SlopeAfter(t);
                sb = b.SlopeAfter(t);
                var d = va - vb;
                var ds = sa - sb;
                if (!d.IsZero && !ds.IsZero && d.Sign != ds.Sign)
                {
                    var cross = t + DivideExact(d, -ds);
                    pts.Add((cross, a.At(cross)));
                }
            }
        }
        var last = ts[^1];
        var lastPts = pts[^1].Item1;
        var tail = Dyadic.Max(last, lastPts);
        var fa = a.SlopeAfter(tail);
        var fb = b.SlopeAfter(tail);
        var at = a.At(tail);
        var bt = b.At(tail);
        Dyadic final = at == bt ? (takeMax ? Dyadic.Max(fa, fb) : Dyadic.Min(fa, fb)) : ((at > bt) == takeMax ? fa : fb);
        pts.Sort((x, y) => x.Item1.CompareTo(y.Item1));
        return new Trajectory(pts, final);
    }

    /// <summary>The least t ≥ 0 where a(t) ≤ b(t), given a − b non-increasing and eventually ≤ 0.</summary>
    public static Dyadic FirstMeet(Trajectory a, Trajectory b)
    {
        var ts = a._t.Concat(b._t).Distinct().OrderBy(t => t).ToList();
        Dyadic prev = ts[0];
        if (a.At(prev) <= b.At(prev)) return prev;
        for (int i = 1; i < ts.Count; i++)
        {
            var t = ts[i];
            if (a.At(t) <= b.At(t))
            {
                var d0 = a.At(prev) - b.At(prev);
                var d1 = a.At(t) - b.At(t);
                return prev + DivideExact(d0 * (t - prev), d0 - d1);
            }
            prev = t;
        }
        var d = a.At(prev) - b.At(prev);
        var rate = b.SlopeAfter(prev) - a.SlopeAfter(prev);
        if (rate.Sign <= 0) throw new InvalidOperationException("the walls never meet");
        return prev + DivideExact(d, rate);
    }

    private Dyadic SlopeAfter(Dyadic t)
    {
        int i = Array.BinarySearch(_t, t);
        if (i < 0) i = ~i - 1;
        return i + 1 < _t.Length ? SlopeBetween(_t[i], _v[i], _t[i + 1], _v[i + 1]) : FinalSlope;
    }

    private static Dyadic SlopeBetween(Dyadic t0, Dyadic v0, Dyadic t1, Dyadic v1) => DivideExact(v1 - v0, t1 - t0);

    private static bool Collinear(Dyadic t0, Dyadic v0, Dyadic t1, Dyadic v1, Dyadic t2, Dyadic v2) =>
        (v1 - v0) * (t2 - t1) == (v2 - v1) * (t1 - t0);

    /// <summary>a / b where the quotient is known to be dyadic (b is ± a dyadic times a power of two... checked).</summary>
    private static Dyadic DivideExact(Dyadic a, Dyadic b)
    {
        if (b.IsZero) throw new DivideByZeroException();
        // b = (odd · 2^j) / 2^k, so a / b = (a · 2^k / odd) / 2^j: exact when odd divides the numerator.
        var m = b.Numerator;
        int j = (int)System.Numerics.BigInteger.TrailingZeroCount(System.Numerics.BigInteger.Abs(m));
        var odd = m >> j;
        var scaled = a.Shift(-b.Exponent);
        var q = System.Numerics.BigInteger.DivRem(scaled.Numerator, odd, out var rem);
        if (!rem.IsZero) throw new InvalidOperationException($"non-dyadic quotient {a} / {b}");
        return Dyadic.FromInteger(q).Shift(scaled.Exponent + j);
    }

    public override string ToString() =>
        string.Join(" ", _t.Select((t, i) => $"({t},{_v[i]})")) + $" then slope {FinalSlope}";
}
