using Bramble.Values;

namespace Bramble.Search;

/// <summary>
/// What play in a sum comes to when both sides play only in its non-number components until
/// every component is a number: that number, and who is to move at that moment. Ordered as Left
/// sees it: a larger number is better, and at equal numbers it is better that Right is to move
/// (in normal play the side to move at 0 loses). Left moving first wins a sum with this score plus
/// a number x exactly when <c>score + x ≥ (0, Right to move)</c>. Because the score does not
/// depend on x, one memo entry per set of components serves every number it is added to.
/// </summary>
public readonly struct StopScore : IComparable<StopScore>, IEquatable<StopScore>
{
    // Layout: Infinity is −1, 0 or +1 (the search window's open ends); when it is 0 the score is
    // (Value, RightToMove). Two consecutive scores such as (v, Left to move) < (v, Right to move)
    // have nothing between them, which is what makes a null-window win/loss test possible.
    private readonly sbyte _infinity;

    private StopScore(Dyadic value, bool rightToMove, sbyte infinity)
    {
        Value = value;
        RightToMove = rightToMove;
        _infinity = infinity;
    }

    public Dyadic Value { get; }
    public bool RightToMove { get; }

    public static readonly StopScore MinusInfinity = new(Dyadic.Zero, false, -1);
    public static readonly StopScore PlusInfinity = new(Dyadic.Zero, true, 1);

    public static StopScore Of(Dyadic value, Side toMove) => new(value, toMove == Side.Right, 0);

    /// <summary>The least score with this number.</summary>
    public static StopScore Lowest(Dyadic value) => new(value, false, 0);

    /// <summary>The greatest score with this number.</summary>
    public static StopScore Highest(Dyadic value) => new(value, true, 0);

    public bool IsFinite => _infinity == 0;

    public static StopScore operator +(StopScore s, Dyadic x) => s._infinity != 0 ? s : new StopScore(s.Value + x, s.RightToMove, 0);
    public static StopScore operator -(StopScore s, Dyadic x) => s + (-x);

    /// <summary>The least score at which Left wins when <paramref name="offset"/> is added: (−offset, Right to move).</summary>
    public static StopScore LeftWinThreshold(Dyadic offset) => Highest(-offset);

    public int CompareTo(StopScore other)
    {
        if (_infinity != other._infinity) return _infinity.CompareTo(other._infinity);
        if (_infinity != 0) return 0;
        int c = Value.CompareTo(other.Value);
        return c != 0 ? c : RightToMove.CompareTo(other.RightToMove);
    }

    public bool Equals(StopScore other) => CompareTo(other) == 0;
    public override bool Equals(object? obj) => obj is StopScore s && Equals(s);
    public override int GetHashCode() => HashCode.Combine(_infinity, Value, RightToMove);

    public static bool operator <(StopScore a, StopScore b) => a.CompareTo(b) < 0;
    public static bool operator >(StopScore a, StopScore b) => a.CompareTo(b) > 0;
    public static bool operator <=(StopScore a, StopScore b) => a.CompareTo(b) <= 0;
    public static bool operator >=(StopScore a, StopScore b) => a.CompareTo(b) >= 0;
    public static bool operator ==(StopScore a, StopScore b) => a.Equals(b);
    public static bool operator !=(StopScore a, StopScore b) => !a.Equals(b);

    public static StopScore Max(StopScore a, StopScore b) => a >= b ? a : b;
    public static StopScore Min(StopScore a, StopScore b) => a <= b ? a : b;

    public override string ToString() => _infinity switch
    {
        < 0 => "-inf",
        > 0 => "+inf",
        _ => $"{Value} ({(RightToMove ? "right" : "left")} to move)",
    };
}
