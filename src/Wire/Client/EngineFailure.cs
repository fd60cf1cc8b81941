namespace Bramble.Wire.Client;

/// <summary>The ways an engine can let a request down, each mapped by the harness to a game end.</summary>
public enum EngineFailureKind
{
    /// <summary>No final reply within the request's time-out.</summary>
    Timeout,
    /// <summary>The process exited, closed its output or broke the pipe.</summary>
    Exited,
    /// <summary>The reply is not twine/1: garbage, the wrong kind of line, too long, or too much output.</summary>
    BadReply,
    /// <summary>A well-formed <c>err</c> reply.</summary>
    Refused,
    /// <summary>The process could not be started at all (missing program, no permission).</summary>
    StartFailed,
}

/// <summary>An engine request failed; <see cref="Kind"/> says how, the message says what was seen.</summary>
public sealed class EngineFailureException(EngineFailureKind kind, string message, string? errorCode = null)
    : Exception(message)
{
    public EngineFailureKind Kind { get; } = kind;

    /// <summary>For <see cref="EngineFailureKind.Refused"/>: the code after <c>err</c>, e.g. <c>bad-position</c>.</summary>
    public string? ErrorCode { get; } = errorCode;
}
