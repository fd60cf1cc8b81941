using System.Globalization;
using System.Xml.Linq;
using Bramble.Rules;
using Bramble.Rules.Hackenbush;

namespace Bramble.Pictures.Tests;

/// <summary>
/// Reads Hackenbush pictures back from their SVG coordinates and checks the rules that make a
/// drawing read as the right graph: every edge ends on the vertices it joins and passes through
/// no other vertex, no two edges run along each other, nothing goes under the ground, and a label
/// covers no other edge, vertex or label. The checks sample the curves here, independently of
/// the drawing code.
/// </summary>
public class HackenbushGeometryTests
{
    private static readonly XNamespace Ns = "http://www.w3.org/2000/svg";

    // Drawn sizes: vertex discs have radius 3.5 and edges are at most 5 wide, so an edge closer
    // than 6 px to a vertex's centre visibly touches it (common practice for legible drawings).
    private const double VertexClear = 6;
    private const double Touch = 3;
    private const double LongestAllowedStretch = 14;

    private sealed record Edge(int Id, (double X, double Y)[] Line);

    private sealed record Drawing(List<Edge> Edges, List<(double X, double Y)> Nodes, List<(double X, double Y)> Feet,
        List<(int Id, double L, double T, double R, double B)> Labels, double GroundY);

    public static TheoryData<string, int, int> Sets() => new()
    {
        { "graphs", 6, 1 }, { "graphs", 9, 2 }, { "graphs", 12, 3 }, { "graphs", 16, 4 },
        { "trees", 10, 5 }, { "mixed", 12, 6 }, { "stalks", 8, 7 },
    };

    [Theory]
    [MemberData(nameof(Sets))]
    public void GeneratedGraphsAreDrawnLegibly(string generator, int size, int seed)
    {
        var rules = Rulesets.Get("hackenbush");
        foreach (var text in rules.Generate(generator, 25, size, seed))
            CheckAll((HackenbushPosition)rules.Parse(text));
    }

    [Theory]
    // The example from the report of a picture that read as another graph.
    [InlineData("[G0-1,B1-2,R2-3,G3-1,R2-4,B4-5,G5-0]")]
    // Parallel edges, a ground loop, a loop up in the air, several ground edges from one vertex.
    [InlineData("[G0-1,G0-1,G0-1,R1-2,R1-2,B2-0,G2-2] + [B0-0] + BRB")]
    [InlineData("[B0-1,B1-2,B2-3,R3-1,R3-0,G1-4,G4-3,B2-4]")]
    public void HandPickedGraphsAreDrawnLegibly(string text) =>
        CheckAll((HackenbushPosition)Rulesets.Get("hackenbush").Parse(text));

    private static void CheckAll(HackenbushPosition position)
    {
        var d = Read(PositionPicture.Draw(position));
        string where = position.Text;
        ReadsAsTheSameGraph(position, d, where);
        foreach (var e in d.Edges)
        {
            var (first, last) = (e.Line[0], e.Line[^1]);
            foreach (var v in d.Nodes.Concat(d.Feet))
            {
                if (Dist(v, first) < 1 || Dist(v, last) < 1) continue;
                Assert.True(e.Line.Min(p => Dist(p, v)) >= VertexClear, $"{where}: e{e.Id} passes through the vertex at {v}");
            }
            Assert.True(e.Line.All(p => p.Y <= d.GroundY + 0.5), $"{where}: e{e.Id} goes under the ground");
        }
        for (int i = 0; i < d.Edges.Count; i++)
            for (int j = 0; j < d.Edges.Count; j++)
                if (i != j)
                    Assert.True(Stretch(d.Edges[i].Line, d.Edges[j].Line) <= LongestAllowedStretch,
                        $"{where}: e{d.Edges[i].Id} runs along e{d.Edges[j].Id}");
        foreach (var label in d.Labels)
        {
            foreach (var e in d.Edges.Where(e => e.Id != label.Id))
                Assert.False(e.Line.Any(p => Inside(p, label)), $"{where}: the label of e{label.Id} sits on e{e.Id}");
            foreach (var v in d.Nodes.Concat(d.Feet)) Assert.False(Inside(v, label), $"{where}: the label of e{label.Id} covers a vertex");
            foreach (var other in d.Labels.Where(o => o.Id != label.Id))
                Assert.False(label.L < other.R && other.L < label.R && label.T < other.B && other.T < label.B,
                    $"{where}: the labels of e{label.Id} and e{other.Id} overlap");
        }
    }

    /// <summary>Each edge's two ends land on one drawn point per node (the ground's feet on the ground line), one-to-one.</summary>
    private static void ReadsAsTheSameGraph(HackenbushPosition position, Drawing d, string where)
    {
        var pointOf = new Dictionary<int, (double X, double Y)>();
        foreach (var e in position.Edges)
        {
            var drawn = d.Edges.Single(x => x.Id == e.Id.Value);
            foreach (var (node, end) in new[] { (e.From, drawn.Line[0]), (e.To, drawn.Line[^1]) })
            {
                if (node == 0)
                {
                    Assert.True(Math.Abs(end.Y - d.GroundY) < 0.5, $"{where}: e{e.Id.Value} does not reach the ground");
                    continue;
                }
                Assert.Contains(d.Nodes, v => Dist(v, end) < 0.5);
                if (pointOf.TryGetValue(node, out var p)) Assert.True(Dist(p, end) < 0.5, $"{where}: node {node} is drawn in two places");
                else pointOf[node] = end;
            }
        }
        var distinct = pointOf.Values.Distinct().Count();
        Assert.True(distinct == pointOf.Count, $"{where}: two nodes are drawn at one point");
    }

    private static bool Inside((double X, double Y) p, (int Id, double L, double T, double R, double B) box) =>
        p.X > box.L && p.X < box.R && p.Y > box.T && p.Y < box.B;

    private static double Dist((double X, double Y) a, (double X, double Y) b) => Math.Sqrt((a.X - b.X) * (a.X - b.X) + (a.Y - b.Y) * (a.Y - b.Y));

    /// <summary>The longest stretch of a lying within Touch of b, leaving out 14 px round a shared end.</summary>
    private static double Stretch((double X, double Y)[] a, (double X, double Y)[] b)
    {
        var shared = new[] { a[0], a[^1] }.Where(p => Dist(p, b[0]) < 0.5 || Dist(p, b[^1]) < 0.5).ToList();
        double best = 0, run = 0;
        for (int i = 0; i < a.Length; i++)
        {
            bool close = !shared.Any(s => Dist(s, a[i]) < 14) && b.Min(q => Dist(q, a[i])) < Touch;
            run = close && i > 0 ? run + Dist(a[i], a[i - 1]) : 0;
            best = Math.Max(best, run);
        }
        return best;
    }

    private static Drawing Read(string svg)
    {
        var doc = XDocument.Parse(svg);
        double N(XElement e, string a) => double.Parse((string)e.Attribute(a)!, CultureInfo.InvariantCulture);
        var edges = new List<Edge>();
        var labels = new List<(int, double, double, double, double)>();
        foreach (var g in doc.Descendants(Ns + "g").Where(g => g.Attribute("data-edge") is not null))
        {
            int id = int.Parse((string)g.Attribute("data-edge")!, CultureInfo.InvariantCulture);
            var path = g.Elements(Ns + "path").Single(p => (string?)p.Attribute("class") is "blue" or "red" or "green");
            edges.Add(new Edge(id, SampleCubic((string)path.Attribute("d")!)));
            var text = g.Elements(Ns + "text").Single();
            // Label box from the font: 11 px sans-serif, at most 7 px a character, 10 px above the baseline and 3 below.
            double x = N(text, "x"), y = N(text, "y");
            labels.Add((id, x, y - 10, x + text.Value.Length * HackenbushPicture.LabelCharWidth, y + 3));
        }
        var circles = doc.Descendants(Ns + "circle").ToList();
        var nodes = circles.Where(c => (string?)c.Attribute("class") == "node").Select(c => (N(c, "cx"), N(c, "cy"))).ToList();
        var feet = circles.Where(c => (string?)c.Attribute("class") == "foot").Select(c => (N(c, "cx"), N(c, "cy"))).ToList();
        double ground = N(doc.Descendants(Ns + "line").Single(l => (string?)l.Attribute("class") == "ground"), "y1");
        return new Drawing(edges, nodes, feet, labels, ground);
    }

    /// <summary>Reads "M x y C x1 y1 x2 y2 x y" and evaluates the Bernstein form at 160 steps.</summary>
    private static (double X, double Y)[] SampleCubic(string d)
    {
        var n = d.Split(' ', StringSplitOptions.RemoveEmptyEntries).Where(t => t is not ("M" or "C"))
            .Select(t => double.Parse(t, CultureInfo.InvariantCulture)).ToArray();
        Assert.Equal(8, n.Length);
        var result = new (double, double)[161];
        for (int i = 0; i <= 160; i++)
        {
            double t = i / 160.0, u = 1 - t;
            double[] w = [u * u * u, 3 * u * u * t, 3 * u * t * t, t * t * t];
            result[i] = (w[0] * n[0] + w[1] * n[2] + w[2] * n[4] + w[3] * n[6], w[0] * n[1] + w[1] * n[3] + w[2] * n[5] + w[3] * n[7]);
        }
        return result;
    }
}
