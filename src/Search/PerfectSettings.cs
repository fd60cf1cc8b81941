namespace Bramble.Search;

/// <summary>Knobs of <see cref="PerfectPlayer"/>; the defaults suit interactive play and <c>bramble solve</c>.</summary>
public sealed record PerfectSettings
{
    /// <summary>Node cap for the exact value of each component of the position to decide.</summary>
    public long ComponentCap { get; init; } = 400_000;

    /// <summary>Node cap for the exact value of a piece made by a move inside the search of large components.</summary>
    public long PieceCap { get; init; } = 20_000;

    /// <summary>Total node cap of one decision (local values and searches together).</summary>
    public long NodeCap { get; init; } = long.MaxValue;
}
