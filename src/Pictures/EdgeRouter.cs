namespace Bramble.Pictures;

/// <summary>
/// Chooses how each edge of a drawn graph runs and where its label sits, so that the picture
/// reads as the right graph: no edge passes through a vertex it does not touch, no two edges run
/// along each other for a stretch (parallel edges become distinct curves), nothing dips below the
/// ground line, and a label covers no edge, vertex or other label. Edges are placed one at a time,
/// each trying a straight line first and then ever wider bows to either side (loops: teardrops in
/// several directions); the first shape that breaks no rule is kept, else the one breaking fewest.
/// </summary>
public sealed class EdgeRouter(IReadOnlyList<Point> vertices, double groundY)
{
    /// <summary>Clear space kept between an edge and a vertex it does not touch, in pixels.</summary>
    public const double VertexClearance = 9;

    /// <summary>Two edges closer than this are "on each other".</summary>
    public const double TouchDistance = 5;

    /// <summary>The longest stretch two edges may run within <see cref="TouchDistance"/> (a crossing is shorter).</summary>
    public const double LongestSharedStretch = 12;

    private const int SampleCount = 48;

    private readonly List<(Curve Curve, Point[] Line)> _placed = new();
    private readonly List<Box> _labels = new();

    public IReadOnlyList<Box> Labels => _labels;

    /// <summary>Places an edge between <paramref name="a"/> and <paramref name="b"/> (equal for a loop).</summary>
    public Curve Route(Point a, Point b)
    {
        Curve best = default;
        int bestScore = int.MaxValue;
        foreach (var candidate in Candidates(a, b))
        {
            int score = Violations(candidate, a, b);
            if (score < bestScore) { best = candidate; bestScore = score; }
            if (score == 0) break;
        }
        _placed.Add((best, best.Samples(SampleCount)));
        return best;
    }

    private static IEnumerable<Curve> Candidates(Point a, Point b)
    {
        if (a.DistanceTo(b) < 0.5)
        {
            // A loop: a teardrop leaving the vertex, first upward, then turning through other directions.
            foreach (double size in new[] { 46.0, 62.0 })
                foreach (double degrees in new[] { -90.0, -60, -120, -30, -150, 0, 180, -75, -105, -45, -135 })
                {
                    double r = degrees * Math.PI / 180, spread = 0.6;
                    var c1 = a + size * new Point(Math.Cos(r - spread), Math.Sin(r - spread));
                    var c2 = a + size * new Point(Math.Cos(r + spread), Math.Sin(r + spread));
                    yield return new Curve(a, c1, c2, a);
                }
            yield break;
        }
        var mid = 0.5 * (a + b);
        var d = b - a;
        var normal = (1 / d.Length) * new Point(-d.Y, d.X);
        // Bow upward (away from the ground) first: that side is usually the emptier one.
        if (normal.Y > 0 || (normal.Y == 0 && normal.X > 0)) normal = -1 * normal;
        // The curve's widest gap from the chord is half the control point's offset.
        for (int k = 0; k <= 14; k++)
            foreach (int sign in k == 0 ? new[] { 1 } : new[] { 1, -1 })
                yield return Curve.Quadratic(a, mid + (sign * 2 * 14.0 * k) * normal, b);
    }

    private int Violations(Curve curve, Point a, Point b)
    {
        var line = curve.Samples(SampleCount);
        int bad = 0;
        foreach (var v in vertices)
        {
            if (v.DistanceTo(a) < 0.5 || v.DistanceTo(b) < 0.5) continue;
            if (Curve.DistanceToPolyline(v, line) < VertexClearance) bad += 4;
        }
        foreach (var p in line)
            if (p.Y > groundY - 3 && p.DistanceTo(a) > 14 && p.DistanceTo(b) > 14) { bad += 2; break; }
        foreach (var (_, other) in _placed)
        {
            if (SharedStretch(line, other) > LongestSharedStretch) bad += 3;
            if (DepartureAngle(line, other) < MinimumAngle) bad += 1;
        }
        return bad;
    }

    /// <summary>Edges leaving one vertex must part at least this much (degrees), or they read as one.</summary>
    public const double MinimumAngle = 20;

    /// <summary>
    /// The smallest angle at which two edges leave a vertex they share, measured to the points
    /// 16 px along each; 180 when they share none.
    /// </summary>
    public static double DepartureAngle(Point[] line, Point[] other)
    {
        double smallest = 180;
        foreach (var (end, ownFrom) in new[] { (line[0], true), (line[^1], false) })
            foreach (var (otherEnd, otherFrom) in new[] { (other[0], true), (other[^1], false) })
            {
                if (end.DistanceTo(otherEnd) > 0.5) continue;
                var u = Away(line, ownFrom) - end;
                var v = Away(other, otherFrom) - end;
                double cos = (u.X * v.X + u.Y * v.Y) / Math.Max(1e-9, u.Length * v.Length);
                smallest = Math.Min(smallest, Math.Acos(Math.Clamp(cos, -1, 1)) * 180 / Math.PI);
            }
        return smallest;
    }

    private static Point Away(Point[] line, bool fromStart)
    {
        var start = fromStart ? line[0] : line[^1];
        for (int i = 1; i < line.Length; i++)
        {
            var p = fromStart ? line[i] : line[^(i + 1)];
            if (p.DistanceTo(start) >= 16) return p;
        }
        return fromStart ? line[^1] : line[0];
    }

    /// <summary>
    /// The longest run of <paramref name="line"/> lying within <see cref="TouchDistance"/> of
    /// <paramref name="other"/>, not counting the parts near a vertex both share (edges meeting at a
    /// vertex are close there by necessity).
    /// </summary>
    public static double SharedStretch(Point[] line, Point[] other)
    {
        var shared = new List<Point>();
        foreach (var end in new[] { line[0], line[^1] })
            if (end.DistanceTo(other[0]) < 0.5 || end.DistanceTo(other[^1]) < 0.5) shared.Add(end);
        double longest = 0, run = 0;
        for (int i = 0; i < line.Length; i++)
        {
            bool nearShared = shared.Any(s => s.DistanceTo(line[i]) < 16);
            bool close = !nearShared && Curve.DistanceToPolyline(line[i], other) < TouchDistance;
            if (close && i > 0) run += line[i].DistanceTo(line[i - 1]);
            else if (!close) run = 0;
            longest = Math.Max(longest, run);
        }
        return longest;
    }

    /// <summary>
    /// Finds a spot for a label of the given size beside <paramref name="curve"/> (the edge the
    /// label names): near its middle when free, else further along or further out.
    /// </summary>
    public Box PlaceLabel(Curve curve, double width, double height)
    {
        Box best = default;
        int bestScore = int.MaxValue;
        foreach (double offset in new[] { 8.0, 14, 22, 32, 44, 58, 74 })
            foreach (double t in new[] { 0.5, 0.4, 0.6, 0.3, 0.7, 0.22, 0.78, 0.14, 0.86 })
                foreach (int side in new[] { 1, -1 })
                {
                    var p = curve.At(t);
                    var tangent = curve.At(Math.Min(1, t + 0.01)) - curve.At(Math.Max(0, t - 0.01));
                    var normal = tangent.Length < 1e-9 ? new Point(1, 0) : (1 / tangent.Length) * new Point(-tangent.Y, tangent.X);
                    // Push the box out along the normal until its nearest corner clears the curve by the offset.
                    var centre = p + (side * (offset + Math.Abs(normal.X) * width / 2 + Math.Abs(normal.Y) * height / 2)) * normal;
                    var box = new Box(centre.X - width / 2, centre.Y - height / 2, centre.X + width / 2, centre.Y + height / 2);
                    int score = LabelViolations(box);
                    if (score < bestScore) { best = box; bestScore = score; }
                    if (score == 0) { _labels.Add(box); return box; }
                }
        _labels.Add(best);
        return best;
    }

    private int LabelViolations(Box box)
    {
        int bad = 0;
        var grown = box.Inflate(3);
        foreach (var (_, line) in _placed)
            for (int i = 0; i + 1 < line.Length; i++)
                if (grown.Touches(line[i], line[i + 1])) { bad++; break; }
        foreach (var v in vertices) if (box.Inflate(5).Contains(v)) bad++;
        foreach (var other in _labels) if (box.Inflate(2).Overlaps(other)) bad++;
        if (box.Bottom > groundY - 3) bad++;
        return bad;
    }
}
