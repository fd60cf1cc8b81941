namespace Bramble.Pictures;

/// <summary>A point of a drawing, in picture pixels (y grows downward as in SVG).</summary>
public readonly record struct Point(double X, double Y)
{
    public static Point operator +(Point a, Point b) => new(a.X + b.X, a.Y + b.Y);
    public static Point operator -(Point a, Point b) => new(a.X - b.X, a.Y - b.Y);
    public static Point operator *(double k, Point a) => new(k * a.X, k * a.Y);

    public double Length => Math.Sqrt(X * X + Y * Y);

    public double DistanceTo(Point other) => (this - other).Length;
}

/// <summary>An axis-aligned box, used for text labels.</summary>
public readonly record struct Box(double Left, double Top, double Right, double Bottom)
{
    public Box Inflate(double d) => new(Left - d, Top - d, Right + d, Bottom + d);

    public bool Contains(Point p) => p.X >= Left && p.X <= Right && p.Y >= Top && p.Y <= Bottom;

    public bool Overlaps(Box o) => Left < o.Right && o.Left < Right && Top < o.Bottom && o.Top < Bottom;

    /// <summary>True when the segment a–b touches the box (an end inside, or a crossing of a side).</summary>
    public bool Touches(Point a, Point b)
    {
        if (Contains(a) || Contains(b)) return true;
        // Clip the segment's parameter range against the four slabs (Liang–Barsky).
        double t0 = 0, t1 = 1, dx = b.X - a.X, dy = b.Y - a.Y;
        foreach (var (p, q) in new[] { (-dx, a.X - Left), (dx, Right - a.X), (-dy, a.Y - Top), (dy, Bottom - a.Y) })
        {
            if (p == 0) { if (q < 0) return false; continue; }
            double r = q / p;
            if (p < 0) t0 = Math.Max(t0, r);
            else t1 = Math.Min(t1, r);
            if (t0 > t1) return false;
        }
        return true;
    }
}

/// <summary>
/// A cubic Bézier curve (a straight edge is the cubic whose controls lie on the chord), sampled
/// into a polyline for the overlap and clearance checks.
/// </summary>
public readonly record struct Curve(Point Start, Point Control1, Point Control2, Point End)
{
    public static Curve Quadratic(Point a, Point control, Point b) =>
        new(a, a + (2.0 / 3) * (control - a), b + (2.0 / 3) * (control - b), b);

    public Point At(double t)
    {
        double u = 1 - t;
        return (u * u * u) * Start + (3 * u * u * t) * Control1 + (3 * u * t * t) * Control2 + (t * t * t) * End;
    }

    public Point[] Samples(int n)
    {
        var points = new Point[n + 1];
        for (int i = 0; i <= n; i++) points[i] = At((double)i / n);
        return points;
    }

    public string PathData() =>
        $"M {Svg.Num(Start.X)} {Svg.Num(Start.Y)} C {Svg.Num(Control1.X)} {Svg.Num(Control1.Y)} {Svg.Num(Control2.X)} {Svg.Num(Control2.Y)} {Svg.Num(End.X)} {Svg.Num(End.Y)}";

    public static double DistanceToSegment(Point p, Point a, Point b)
    {
        var ab = b - a;
        double len2 = ab.X * ab.X + ab.Y * ab.Y;
        double t = len2 == 0 ? 0 : Math.Clamp(((p.X - a.X) * ab.X + (p.Y - a.Y) * ab.Y) / len2, 0, 1);
        return p.DistanceTo(a + t * ab);
    }

    public static double DistanceToPolyline(Point p, Point[] line)
    {
        double best = double.MaxValue;
        for (int i = 0; i + 1 < line.Length; i++) best = Math.Min(best, DistanceToSegment(p, line[i], line[i + 1]));
        return best;
    }
}
