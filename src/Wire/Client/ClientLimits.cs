namespace Bramble.Wire.Client;

/// <summary>
/// Bounds that keep a misbehaving engine from exhausting the harness: the protocol's 1 MiB line
/// limit, a cap on everything one request may produce (so a flood of notes cannot fill memory
/// while a think is pending), and how much of the engine's stderr is kept for the log.
/// </summary>
public sealed record ClientLimits
{
    /// <summary>docs/protocol.md: a line longer than 1 MiB is an error.</summary>
    public int MaxLineBytes { get; init; } = 1 << 20;

    /// <summary>Bytes one request may produce, notes included, before the reply counts as bad.</summary>
    public long MaxRequestOutputBytes { get; init; } = 16L << 20;

    /// <summary>Bytes of stderr passed on to the log per process; the rest is read and dropped.</summary>
    public long MaxStderrBytes { get; init; } = 1L << 20;

    /// <summary>Lines buffered between the pipe reader and the request in progress (back-pressure beyond that).</summary>
    public int LineBuffer { get; init; } = 1024;

    /// <summary>How long a process gets to exit after <c>bye</c> or a kill before the harness stops waiting.</summary>
    public TimeSpan ExitGrace { get; init; } = TimeSpan.FromSeconds(2);

    public static ClientLimits Default { get; } = new();
}
