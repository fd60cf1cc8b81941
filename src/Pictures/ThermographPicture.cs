using Bramble.Values;

namespace Bramble.Pictures;

/// <summary>
/// Draws a thermograph the way the literature does: value on the horizontal axis increasing to
/// the LEFT (Left's gains are drawn on Left's side), temperature upward; the Left wall, the Right
/// wall, the mast above the temperature, and the temperature and mean marked. Every number in the
/// picture is exact (7/8, never 0.88), and the text is laid out so that nothing is cut off or
/// written over anything else.
/// </summary>
public static class ThermographPicture
{
    private const string Style =
        "text{font-family:sans-serif;font-size:12px;fill:#222}" +
        ".axis{stroke:#444;stroke-width:1}.tick{stroke:#999;stroke-width:0.5}" +
        ".left{stroke:#1f5fbf;stroke-width:2.5}.right{stroke:#c0392b;stroke-width:2.5;stroke-dasharray:8,4}" +
        ".mast{stroke:#333;stroke-width:2.5}.temp{stroke:#8e44ad;stroke-width:1;stroke-dasharray:5,4}" +
        ".title{font-size:14px;font-weight:bold}.title-small{font-size:11px;font-weight:bold}.note{fill:#8e44ad}";

    private const double W = 560, PlotHeight = 300, Margin = 56;

    /// <summary>Room kept on each side of the walls for their labels, in pixels.</summary>
    private const double WallLabelRoom = 84;

    /// <summary>Width assumed per character of 12px text (generous, so estimates never undershoot much).</summary>
    public const double CharWidth = 7;

    /// <param name="canonical">The value as Bramble writes it.</param>
    /// <param name="typed">What the user typed, when it differs; shown first, with the canonical value under it.</param>
    public static string Draw(Thermograph th, string canonical, string? typed = null)
    {
        var title = TitleLines(canonical, typed, out bool small);
        double lineHeight = small ? 14 : 18;
        double titleBand = 16 + title.Count * lineHeight;
        double H = titleBand + PlotHeight + 2 * Margin;

        double temp = Math.Max(0, ToDouble(th.Temperature));
        double top = Math.Max(1, temp * 1.5 + 0.5);
        // The values the walls and the mast reach, then room on both sides for the wall labels.
        var samples = th.LeftWall.Points.Select(p => ToDouble(p.V))
            .Concat(th.RightWall.Points.Select(p => ToDouble(p.V)))
            .Append(ToDouble(th.Mast)).ToList();
        double hi = samples.Max(), lo = samples.Min();
        double plotW = W - 2 * Margin;
        double range = Math.Max(1, (hi - lo) / (1 - 2 * WallLabelRoom / plotW));
        double pad = (range - (hi - lo)) / 2;
        double vmax = hi + pad, vmin = lo - pad;

        double X(double v) => Margin + (vmax - v) / (vmax - vmin) * plotW; // larger values to the left
        double Y(double t) => titleBand + Margin + PlotHeight - t / top * PlotHeight;

        var svg = new Svg(W, H);
        for (int i = 0; i < title.Count; i++) svg.Text(W / 2, 22 + i * lineHeight, title[i], small ? "title-small" : "title");
        svg.Line(Margin, Y(0), W - Margin, Y(0), "axis");
        foreach (var v in Ticks(vmin, vmax, plotW))
        {
            double x = X(ToDouble(v));
            svg.Line(x, Y(0), x, Y(0) + 5, "axis");
            svg.Text(x, Y(0) + 18, v.ToString());
        }
        if (0 >= vmin && 0 <= vmax) svg.Line(X(0), Y(0), X(0), Y(top), "tick");
        foreach (var t in Ticks(0, top, PlotHeight * 3))
        {
            svg.Line(Margin - 5, Y(ToDouble(t)), Margin, Y(ToDouble(t)), "axis");
            svg.Text(Margin - 8, Y(ToDouble(t)) + 4, t.ToString(), null, "end");
        }
        svg.Line(Margin, Y(0), Margin, Y(top), "axis");
        svg.Text(Margin - 30, Y(top) - 8, "t", null, "start");
        svg.Text(W - Margin, Y(0) + 36, "value (Left's side is on the left)", null, "end");

        // walls up to the temperature, then the mast
        svg.Polyline(WallPoints(th.LeftWall, th.Temperature).Select(p => (X(p.V), Y(p.T))), "left");
        svg.Polyline(WallPoints(th.RightWall, th.Temperature).Select(p => (X(p.V), Y(p.T))), "right");
        double mast = ToDouble(th.Mast);
        svg.Line(X(mast), Y(temp), X(mast), Y(top), "mast");
        svg.Text(X(mast), Y(top) - 6, $"mean {th.Mast}", "note");
        // The wall labels sit outside their walls (Left's foot is never right of Right's), so they cannot meet.
        double wallLabelY = Y(0) - 8;
        svg.Text(X(ToDouble(th.LeftWall.At(Dyadic.Zero))) - 6, wallLabelY, "Left wall", null, "end");
        svg.Text(X(ToDouble(th.RightWall.At(Dyadic.Zero))) + 6, wallLabelY, "Right wall", null, "start");
        if (th.Temperature.Sign > 0)
        {
            svg.Line(Margin, Y(temp), W - Margin, Y(temp), "temp");
            // Above its line, but never down among the wall labels when the temperature is small.
            svg.Text(W - Margin, Math.Min(Y(temp) - 6, wallLabelY - 18), $"temperature {th.Temperature}", "note", "end");
        }
        else
        {
            // A number's walls meet at or below t = 0, so its temperature has no line in the picture.
            svg.Text(W - Margin, Y(top) + 14, $"temperature {th.Temperature} (at or below t = 0)", "note", "end");
        }
        return svg.Render(Style, typed is null ? $"thermograph of {canonical}" : $"thermograph of {typed} = {canonical}");
    }

    /// <summary>
    /// The title: what the user typed, then "= canonical" when that reads differently, each
    /// wrapped to the picture's width (and set smaller when long), so nothing is cropped.
    /// </summary>
    internal static List<string> TitleLines(string canonical, string? typed, out bool small)
    {
        var parts = new List<string>();
        string Squeeze(string s) => string.Concat(s.Where(c => !char.IsWhiteSpace(c)));
        if (typed is not null && Squeeze(typed) != Squeeze(canonical))
        {
            parts.Add("thermograph of " + typed.Trim());
            parts.Add("= " + canonical);
        }
        else parts.Add("thermograph of " + canonical);
        int wide = (int)((W - 20) / 8.5);
        small = parts.Sum(p => (p.Length + wide - 1) / wide) > 2;
        int width = small ? (int)((W - 20) / 6.8) : wide;
        return parts.SelectMany(p => Wrap(p, width)).ToList();
    }

    /// <summary>Breaks text into lines of at most <paramref name="width"/> characters, after a space, bar or comma when possible.</summary>
    internal static IEnumerable<string> Wrap(string text, int width)
    {
        while (text.Length > width)
        {
            int cut = text.LastIndexOfAny([' ', '|', ','], width - 1);
            cut = cut <= width / 3 ? width : cut + 1;
            yield return text[..cut].TrimEnd();
            text = text[cut..].TrimStart();
        }
        yield return text;
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

    /// <summary>
    /// Tick values as exact dyadic fractions: multiples of a power of two, about eight over the
    /// range, spaced further apart until their labels fit in <paramref name="pixels"/>.
    /// </summary>
    internal static IEnumerable<Dyadic> Ticks(double lo, double hi, double pixels)
    {
        int power = (int)Math.Ceiling(Math.Log2(Math.Max(hi - lo, 1e-9) / 8));
        while (true)
        {
            var ticks = TicksAt(lo, hi, power);
            double each = pixels / Math.Max(1, (hi - lo) / Math.Pow(2, power));
            if (ticks.Count < 2 || ticks.Max(t => t.ToString().Length) * CharWidth + 8 <= each) return ticks;
            power++;
        }
    }

    private static List<Dyadic> TicksAt(double lo, double hi, int power)
    {
        double step = Math.Pow(2, power);
        var result = new List<Dyadic>();
        for (long k = (long)Math.Ceiling(lo / step - 1e-9); k * step <= hi + 1e-9; k++)
            result.Add(power >= 0 ? Dyadic.FromInteger(k << power) : Dyadic.Create(k, -power));
        return result;
    }
}
