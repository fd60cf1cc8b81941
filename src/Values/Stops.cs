namespace Bramble.Values;

public sealed partial class GameStore
{
    // Stops per id, filled on first request (numbers at creation). The order test reads them
    // before it recurses, so they live in flat lists beside the other per-id records.
    private readonly List<Dyadic> _ls = new();
    private readonly List<Dyadic> _rs = new();
    private readonly List<bool> _stopsKnown = new();

    /// <summary>The number reached when Left moves first and both play to reach a number as well as they can.</summary>
    public Dyadic LeftStop(Game g)
    {
        EnsureStops(g.Id);
        return _ls[g.Id];
    }

    public Dyadic RightStop(Game g)
    {
        EnsureStops(g.Id);
        return _rs[g.Id];
    }

    public Dyadic Stop(Game g, Side side) => side == Side.Left ? LeftStop(g) : RightStop(g);

    private void EnsureStops(int id)
    {
        if (_stopsKnown[id]) return;
        // A canonical non-number has options on both sides.
        var left = LeftIds(id);
        var right = RightIds(id);
        if (left.Length == 0 || right.Length == 0) throw new InvalidOperationException("non-number without options on both sides");
        Dyadic best = default;
        for (int i = 0; i < left.Length; i++)
        {
            EnsureStops(left[i]);
            var v = _rs[left[i]];
            if (i == 0 || v > best) best = v;
        }
        _ls[id] = best;
        for (int i = 0; i < right.Length; i++)
        {
            EnsureStops(right[i]);
            var v = _ls[right[i]];
            if (i == 0 || v < best) best = v;
        }
        _rs[id] = best;
        _stopsKnown[id] = true;
    }
}
