namespace Bramble.Values;

public sealed partial class GameStore
{
    private readonly Dictionary<int, Dyadic> _leftStop = new();
    private readonly Dictionary<int, Dyadic> _rightStop = new();

    /// <summary>The number reached when Left moves first and both play to reach a number as well as they can.</summary>
    public Dyadic LeftStop(Game g)
    {
        if (_number[g.Id] is { } x) return x;
        if (_leftStop.TryGetValue(g.Id, out var s)) return s;
        Dyadic? best = null;
        foreach (int o in LeftIds(g.Id))
        {
            var v = RightStop(new Game(o));
            if (best is null || v > best.Value) best = v;
        }
        // A canonical non-number has options on both sides.
        s = best ?? throw new InvalidOperationException("non-number without left options");
        _leftStop[g.Id] = s;
        return s;
    }

    public Dyadic RightStop(Game g)
    {
        if (_number[g.Id] is { } x) return x;
        if (_rightStop.TryGetValue(g.Id, out var s)) return s;
        Dyadic? best = null;
        foreach (int o in RightIds(g.Id))
        {
            var v = LeftStop(new Game(o));
            if (best is null || v < best.Value) best = v;
        }
        s = best ?? throw new InvalidOperationException("non-number without right options");
        _rightStop[g.Id] = s;
        return s;
    }

    public Dyadic Stop(Game g, Side side) => side == Side.Left ? LeftStop(g) : RightStop(g);
}
