using Bramble.Values;

namespace Bramble.Search;

/// <summary>
/// The compound thermograph of a sum, built from its components' walls as in Thermostrat. At
/// temperature t, Left's best single move is worth LW_i(t) + Σ_{j≠i} RW_j(t) (move in i, the rest
/// valued at Right's walls), and Right's RW_i(t) + Σ_{j≠i} LW_j(t). The compound's walls are the
/// best of these; their gap is 2·W(t) − Σ w_j(t), with w the widths and W the largest. The
/// <b>ambient temperature</b> is the top of the range where the compound's walls cross — the
/// highest t at which the widest component is narrower than all the others together (0 when that
/// never happens); above it one component dominates the sum. Thermostrat moves in the component
/// whose move maximises the compound value there, that is, the widest one just below the ambient
/// temperature (docs/players.md).
/// </summary>
public sealed class Compound
{
    private readonly IReadOnlyList<Thermograph> _parts;

    public Compound(IReadOnlyList<Thermograph> parts)
    {
        _parts = parts;
        var candidates = Candidates();
        int k = -1;
        for (int i = candidates.Count - 1; i >= 0 && k < 0; i--) if (Gap(candidates[i]).Sign < 0) k = i;
        if (k < 0)
        {
            Ambient = Dyadic.Zero;
            Probe = Dyadic.Zero;
            return;
        }
        // The gap is linear between consecutive candidates; below the top crossing it is negative.
        var lo = candidates[k];
        var hi = candidates[k + 1];
        Probe = (lo + hi).Shift(1);
        // Bisection to 2^-20 of the segment: the root need not be dyadic, and a close one is all that is read.
        var a = lo;
        var b = hi;
        for (int i = 0; i < 20; i++)
        {
            var mid = (a + b).Shift(1);
            if (Gap(mid).Sign < 0) a = mid; else b = mid;
        }
        Ambient = a;
    }

    /// <summary>The ambient temperature (rounded down to within 2^-20 of its segment).</summary>
    public Dyadic Ambient { get; }

    /// <summary>A temperature just below the ambient one at which the components' widths are ordered as there.</summary>
    public Dyadic Probe { get; }

    public Dyadic Width(int i, Dyadic t) => _parts[i].LeftWallAt(t) - _parts[i].RightWallAt(t);

    /// <summary>2·(largest width) − (sum of widths): negative where the compound's walls cross.</summary>
    public Dyadic Gap(Dyadic t)
    {
        Dyadic max = Dyadic.Zero, sum = Dyadic.Zero;
        for (int i = 0; i < _parts.Count; i++)
        {
            var w = Width(i, t);
            sum += w;
            if (w > max) max = w;
        }
        return max + max - sum;
    }

    /// <summary>Every breakpoint of every wall, and every crossing of two widths, so the gap is linear in between.</summary>
    private List<Dyadic> Candidates()
    {
        var ts = new SortedSet<Dyadic> { Dyadic.Zero };
        foreach (var p in _parts)
        {
            foreach (var (t, _) in p.LeftWall.Points) ts.Add(t);
            foreach (var (t, _) in p.RightWall.Points) ts.Add(t);
            if (p.Temperature.Sign > 0) ts.Add(p.Temperature);
        }
        var basic = ts.ToList();
        // Widths at every breakpoint, read once: between breakpoints each width is linear.
        var widths = new Dyadic[_parts.Count][];
        for (int i = 0; i < _parts.Count; i++)
        {
            widths[i] = new Dyadic[basic.Count];
            for (int s = 0; s < basic.Count; s++) widths[i][s] = Width(i, basic[s]);
        }
        for (int s = 0; s + 1 < basic.Count; s++)
        {
            var span = basic[s + 1] - basic[s];
            for (int i = 0; i < _parts.Count; i++)
            {
                for (int j = i + 1; j < _parts.Count; j++)
                {
                    var da = widths[i][s] - widths[j][s];
                    var db = widths[i][s + 1] - widths[j][s + 1];
                    if (da.Sign * db.Sign >= 0) continue;
                    // Widths have slopes 0, −1 or −2, so (da − db) is span or 2·span in size: the crossing is dyadic.
                    var q = (da - db).Abs();
                    var step = q == span ? da.Abs() : q == span + span ? da.Abs().Shift(1) : Dyadic.Zero;
                    if (step.Sign > 0 && step < span) ts.Add(basic[s] + step);
                }
            }
        }
        return ts.ToList();
    }
}
