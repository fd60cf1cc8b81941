namespace Bramble.Search.Board;

/// <summary>
/// A flag every thread of one whole-board solve polls: set when a root thread found the answer,
/// or the budget is spent. Searches then unwind by returning, storing nothing, with no exception.
/// </summary>
public sealed class StopSignal
{
    private volatile bool _set;

    public bool IsSet => _set;

    public void Set() => _set = true;
}
