using Bramble.Arena.Spec;
using Bramble.Values;

namespace Bramble.Arena.Games;

/// <summary>
/// Both sides' clocks, kept by the harness: each starts at the base time; a think costs the time
/// from sending the request to the pick's arrival, and the increment is added after each move made
/// in time. Time the harness spends between moves (analysis, applying moves) is on nobody's clock.
/// </summary>
public sealed class GameClock(TimeControl control)
{
    private TimeSpan _left = TimeSpan.FromMilliseconds(control.BaseMs);
    private TimeSpan _right = TimeSpan.FromMilliseconds(control.BaseMs);

    public TimeControl Control => control;

    public TimeSpan Remaining(Side side) => side == Side.Left ? _left : _right;

    /// <summary>Charges a think; false (and nothing charged) when it took longer than the time left.</summary>
    public bool Charge(Side side, TimeSpan used)
    {
        var left = Remaining(side);
        if (used > left) return false;
        var after = left - used + TimeSpan.FromMilliseconds(control.IncMs);
        if (side == Side.Left) _left = after;
        else _right = after;
        return true;
    }
}
