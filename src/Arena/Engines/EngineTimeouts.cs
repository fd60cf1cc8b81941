namespace Bramble.Arena.Engines;

/// <summary>
/// Time-outs for requests that are not on the clock. They are generous (a cold .NET start on a
/// busy machine takes seconds) but finite, so a stuck engine can never hang the match.
/// </summary>
public sealed record EngineTimeouts
{
    /// <summary>From starting the process to its <c>welcome</c>, settings included.</summary>
    public TimeSpan Start { get; init; } = TimeSpan.FromSeconds(30);

    /// <summary>For <c>begin</c> and <c>apply</c>.</summary>
    public TimeSpan Reply { get; init; } = TimeSpan.FromSeconds(10);

    /// <summary>After a think ran out of time: how long the owed pick may take once <c>halt</c> is sent.</summary>
    public TimeSpan Recover { get; init; } = TimeSpan.FromSeconds(2);

    public static EngineTimeouts Default { get; } = new();
}
