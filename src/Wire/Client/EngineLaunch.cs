namespace Bramble.Wire.Client;

/// <summary>
/// How to start one engine: an argv array run directly (never through a shell, so no quoting,
/// globbing or variable expansion can change what runs), and the folder it runs in.
/// </summary>
/// <param name="Argv">Program path or name (looked up on PATH) followed by its arguments.</param>
/// <param name="WorkingDirectory">The engine's working folder; null keeps the harness's.</param>
/// <param name="Label">A name for logs and messages, e.g. the player id.</param>
public sealed record EngineLaunch(IReadOnlyList<string> Argv, string? WorkingDirectory, string Label)
{
    public override string ToString() => $"{Label} ({string.Join(' ', Argv)})";
}
