using Bramble.Rules.Hackenbush;

namespace Bramble.Pictures;

/// <summary>
/// Places a Hackenbush position standing on the ground: each piece (the parts that meet only at
/// the ground) gets its own band; inside it a breadth-first spanning forest from the ground
/// fixes heights (distance to the ground) and a tidy left-to-right order fixes widths, so trees
/// stand upright and circuits show as the extra edges between placed nodes.
/// </summary>
public sealed class HackenbushLayout
{
    public IReadOnlyList<HackenbushEdge> Edges { get; }

    /// <summary>Node positions in layout units (x grows right, y is the height above the ground).</summary>
    public Dictionary<int, (double X, double Y)> Nodes { get; } = new();

    /// <summary>Where each ground edge touches the ground (x), by edge id.</summary>
    public Dictionary<int, double> Feet { get; } = new();

    public double Width { get; private set; }
    public double Height { get; private set; }

    public HackenbushLayout(HackenbushPosition position)
    {
        Edges = position.Edges;
        var adjacent = new Dictionary<int, List<(int Other, int Edge)>>();
        void Link(int a, int b, int e)
        {
            if (!adjacent.TryGetValue(a, out var l)) adjacent[a] = l = new();
            l.Add((b, e));
        }
        for (int i = 0; i < Edges.Count; i++)
        {
            var e = Edges[i];
            Link(e.From, e.To, i);
            if (e.From != e.To) Link(e.To, e.From, i);
        }
        // Breadth-first from the ground gives every node a parent and a height.
        var parent = new Dictionary<int, int>();
        var depth = new Dictionary<int, int> { [0] = 0 };
        var children = new Dictionary<int, List<int>>();
        var queue = new Queue<int>();
        queue.Enqueue(0);
        while (queue.Count > 0)
        {
            int n = queue.Dequeue();
            if (!adjacent.TryGetValue(n, out var list)) continue;
            foreach (var (m, _) in list.OrderBy(p => Edges[p.Edge].Id.Value))
            {
                if (depth.ContainsKey(m)) continue;
                depth[m] = depth[n] + 1;
                parent[m] = n;
                if (!children.TryGetValue(n, out var c)) children[n] = c = new();
                c.Add(m);
                queue.Enqueue(m);
            }
        }
        // Leaves get consecutive slots; an inner node sits over the middle of its children.
        double next = 0.5;
        double Place(int n)
        {
            double x;
            if (!children.TryGetValue(n, out var c) || c.Count == 0) { x = next; next += 1; }
            else
            {
                var xs = c.Select(Place).ToList();
                x = (xs.Min() + xs.Max()) / 2;
            }
            Nodes[n] = (x, depth[n]);
            return x;
        }
        if (children.TryGetValue(0, out var roots))
            foreach (var r in roots) { Place(r); next += 0.4; }
        // Ground edges stand on their own foot under the upper node; several from one node spread out.
        var perNode = new Dictionary<int, int>();
        foreach (var e in Edges.Where(e => e.From == 0 || e.To == 0))
        {
            int top = e.From == 0 ? e.To : e.From;
            if (top == 0) { Feet[e.Id.Value] = next; next += 1; continue; }
            int k = perNode.TryGetValue(top, out var v) ? v : 0;
            perNode[top] = k + 1;
            Feet[e.Id.Value] = Nodes[top].X + (k == 0 ? 0 : (k % 2 == 1 ? -1 : 1) * 0.45 * ((k + 1) / 2));
        }
        Width = Math.Max(1, next);
        Height = Math.Max(1, Nodes.Values.Select(p => p.Y).DefaultIfEmpty(1).Max());
    }
}
