using System.Runtime.InteropServices;

namespace Bramble.Wire.Client;

/// <summary>
/// Starts engines in a session (and so a process group) of their own on Linux, through the
/// system's <c>setsid</c> program, which makes the new session and then becomes the engine (same
/// process id, no shell, no fork in between). Killing the group then reaches every process the
/// engine started, also those started after the harness last looked and those whose parent
/// (the engine) has already exited: a grandchild left holding the engine's stdout would otherwise
/// keep the harness waiting for end of output, and outlive the match. Where <c>setsid</c> is
/// missing (other systems) engines start as before and only the process tree is killed.
/// </summary>
public static class ProcessGroup
{
    private const int SigKill = 9;

    /// <summary>The <c>setsid</c> program, or null when engines cannot be given a session of their own here.</summary>
    public static string? Setsid { get; } = OperatingSystem.IsLinux()
        ? new[] { "/usr/bin/setsid", "/bin/setsid" }.FirstOrDefault(File.Exists)
        : null;

    /// <summary>
    /// The program file <paramref name="program"/> names: a path with a folder as given (relative
    /// to <paramref name="folder"/>), a bare name looked up on PATH; null when there is none, so a
    /// missing engine is still reported as a start failure rather than as an early exit of <c>setsid</c>.
    /// </summary>
    public static string? Locate(string program, string? folder)
    {
        if (program.Contains('/'))
        {
            var full = Path.GetFullPath(program, folder ?? Directory.GetCurrentDirectory());
            return File.Exists(full) ? full : null;
        }
        foreach (var dir in (Environment.GetEnvironmentVariable("PATH") ?? "").Split(':', StringSplitOptions.RemoveEmptyEntries))
        {
            var candidate = Path.Combine(dir, program);
            if (!OperatingSystem.IsWindows() && File.Exists(candidate) && (File.GetUnixFileMode(candidate) & (UnixFileMode.UserExecute | UnixFileMode.GroupExecute | UnixFileMode.OtherExecute)) != 0)
                return candidate;
        }
        return null;
    }

    /// <summary>Sends SIGKILL to every process of the group led by <paramref name="leader"/> (those still in it).</summary>
    public static void Kill(int leader)
    {
        if (leader <= 1 || !OperatingSystem.IsLinux()) return;
        // ESRCH (the group is empty) is the usual answer once everything is gone; nothing to report.
        _ = KillSignal(-leader, SigKill);
    }

    [DllImport("libc", EntryPoint = "kill", SetLastError = true)]
    private static extern int KillSignal(int pid, int signal);
}
