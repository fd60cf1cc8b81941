using Bramble.Values;

namespace Bramble.Wire.Client;

/// <summary>What an engine said about itself in its <c>welcome</c> reply.</summary>
public sealed record Welcome(string Name, string Version, IReadOnlyList<string> Rulesets)
{
    /// <summary>True when the engine listed the ruleset (an engine that lists none is taken at its word later, by <c>begin</c>).</summary>
    public bool Supports(string ruleset) =>
        Rulesets.Count == 0 || Rulesets.Contains(ruleset, StringComparer.OrdinalIgnoreCase);
}

/// <summary>An engine's answer to <c>think</c>: the move text (null for <c>pick none</c>) and the time
/// from sending the request to the arrival of the pick, as the harness measured it.</summary>
public sealed record ThinkResult(string? Move, TimeSpan Elapsed);

/// <summary>An engine's answer to <c>assess</c>.</summary>
public sealed record Assessment(string Value, Outcome Outcome);

/// <summary>One line off the engine's stdout: its text, or the reason it is not a line of text, with its size and arrival time.</summary>
internal readonly record struct ReceivedLine(string? Text, WireError? Error, int Bytes, long Timestamp);
