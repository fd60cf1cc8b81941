namespace Bramble.Rules.Compose;

/// <summary>
/// One position whose value was checked to be the target: parsed again from its text and valued
/// by the ruleset's ordinary value path. <see cref="FoundMs"/> is the time since the run began.
/// </summary>
public sealed record ComposedPosition(IPosition Position, int Size, ComposeRoute Route, long FoundMs);
