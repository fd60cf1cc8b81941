using Bramble.Values;

namespace Bramble.Pictures;

/// <summary>
/// Draws a thermograph the way the literature does: value on the horizontal axis increasing to
/// the LEFT (Left's gains are drawn on Left's side), temperature upward; the Left wall, the Right
/// wall, the mast above the temperature, and the temperature and mean marked.
/// </summary>
public static class ThermographPicture
{
    private const string Style =
        "text{font-family:sans-serif;font-size:12px;fill:#222}" +
        ".axis{stroke:#444;stroke-width:1}.tick{stroke:#999;stroke-width:0.5}" +
        ".left{stroke:#1f5fbf;stroke-width:2.5}.right{stroke:#c0392b;stroke-width:2.5}" +
        ".mast{stroke:#333;stroke-width:2.5}.temp{stroke:#8e44ad;stroke-width:1;stroke-dasharray:5,4}" +
        ".title{font-size:14px;font-weight:bold}.note{fill:#8e44ad}";

    public static string Draw(Thermograph th, string label)
    {
        double temp = Math.Max(0, ToDouble(th.Temperature));
        double top = Math.Max(1, temp * 1.5 + 0.5);
        // Values along the walls between t = 0 and the temperature, to size the picture.
        var samples = th.LeftWall.Points.Select(p => ToDouble(p.V))
            .Concat(th.RightWall.Points.Select(p => ToDouble(p.V)))
            .Append(ToDouble(th.Mast)).ToList();
        double vmax = samples.Max(), vmin = samples.Min();
        double span = Math.Max(1, vmax - vmin);
        vmax += span * 0.15; vmin -= span * 0.15;

        const double W = 560, H = 420, margin = 56;
        double plotW = W - 2 * margin, plotH = H - 2 * margin - 20;
        double X(double v) => margin + (vmax - v) / (vmax - vmin) * plotW; // larger values to the left
        double Y(double t) => H - margin - t / top * plotH;

        var svg = new Svg(W, H);
        svg.Text(W / 2, 24, $"thermograph of {label}", "title");
        // axes: t = 0 line and the value 0 line (when in view)
        svg.Line(margin, Y(0), W - margin, Y(0), "axis");
        foreach (var v in Ticks(vmin, vmax))
        {
            svg.Line(X(v), Y(0), X(v), Y(0) + 5, "axis");
            svg.Text(X(v), Y(0) + 18, Format(v));
        }
        if (0 >= vmin && 0 <= vmax) svg.Line(X(0), Y(0), X(0), Y(top), "tick");
        foreach (var t in Ticks(0, top))
        {
            svg.Line(margin - 5, Y(t), margin, Y(t), "axis");
            svg.Text(margin - 8, Y(t) + 4, Format(t), null, "end");
        }
        svg.Line(margin, Y(0), margin, Y(top), "axis");
        svg.Text(margin - 30, Y(top) - 8, "t", null, "start");
        svg.Text(W - margin, Y(0) + 36, "value (Left's side is on the left)", null, "end");

        // walls up to the temperature, then the mast
        svg.Polyline(WallPoints(th.LeftWall, th.Temperature).Select(p => (X(p.V), Y(p.T))), "left");
        svg.Polyline(WallPoints(th.RightWall, th.Temperature).Select(p => (X(p.V), Y(p.T))), "right");
        double mast = ToDouble(th.Mast);
        svg.Line(X(mast), Y(temp), X(mast), Y(top), "mast");
        svg.Line(margin, Y(temp), W - margin, Y(temp), "temp");
        svg.Text(W - margin, Y(temp) - 6, $"temperature {th.Temperature}", "note", "end");
        svg.Text(X(mast), Y(top) - 6, $"mean {th.Mast}", "note");
        svg.Text(X(ToDouble(th.LeftWall.At(Dyadic.Zero))), Y(0) - 8, "Left wall", null, "end");
        svg.Text(X(ToDouble(th.RightWall.At(Dyadic.Zero))), Y(0) - 8, "Right wall", null, "start");
        return svg.Render(Style, $"thermograph of {label}");
    }

    private static IEnumerable<(double T, double V)> WallPoints(Trajectory wall, Dyadic temperature)
    {
        var top = temperature.Sign < 0 ? Dyadic.Zero : temperature;
        foreach (var (t, v) in wall.Points)
        {
            if (t >= top) break;
            yield return (ToDouble(t), ToDouble(v));
        }
        yield return (ToDouble(top), ToDouble(wall.At(top)));
    }

    internal static double ToDouble(Dyadic d) => Math.ScaleB((double)d.Numerator, -d.Exponent);

    private static IEnumerable<double> Ticks(double lo, double hi)
    {
        double step = Math.Pow(2, Math.Ceiling(Math.Log2(Math.Max(hi - lo, 1e-9) / 8)));
        for (double v = Math.Ceiling(lo / step) * step; v <= hi + 1e-9; v += step) yield return v;
    }

    private static string Format(double v) => Math.Abs(v - Math.Round(v)) < 1e-9 ? ((long)Math.Round(v)).ToString() : Svg.Num(v);
}
