using System.Diagnostics;

namespace Bramble.Wire.Client;

/// <summary>
/// The descendants of a process, found on Linux from /proc (elsewhere: none). The harness takes a
/// snapshot while an engine is alive, because once the engine itself has exited its children are
/// re-parented and no longer findable as its tree; <see cref="Process.Kill(bool)"/> alone would
/// then leave them running. Each member carries its start time, so a recycled process id is never
/// mistaken for it.
/// </summary>
public static class ProcessTree
{
    public readonly record struct Member(int Pid, ulong StartTicks);

    public static IReadOnlyList<Member> Descendants(int root)
    {
        if (!OperatingSystem.IsLinux()) return [];
        var children = new Dictionary<int, List<Member>>();
        foreach (var dir in EnumerateProcFolders())
        {
            if (!int.TryParse(Path.GetFileName(dir), out var pid)) continue;
            if (Read(pid) is not { } stat) continue;
            if (!children.TryGetValue(stat.Parent, out var list)) children[stat.Parent] = list = [];
            list.Add(new Member(pid, stat.StartTicks));
        }
        var found = new List<Member>();
        var queue = new Queue<int>([root]);
        while (queue.Count > 0)
        {
            if (!children.TryGetValue(queue.Dequeue(), out var list)) continue;
            foreach (var child in list)
            {
                found.Add(child);
                queue.Enqueue(child.Pid);
            }
        }
        return found;
    }

    /// <summary>Kills the members that are still the same processes and still running.</summary>
    public static void KillSurvivors(IEnumerable<Member> members)
    {
        foreach (var member in members)
        {
            if (Read(member.Pid) is not { } stat || stat.StartTicks != member.StartTicks || stat.State == 'Z') continue;
            try
            {
                using var process = Process.GetProcessById(member.Pid);
                process.Kill();
            }
            catch (Exception e) when (e is ArgumentException or InvalidOperationException or System.ComponentModel.Win32Exception or NotSupportedException)
            {
                // Gone in the meantime.
            }
        }
    }

    /// <summary>True when the process exists and is not a zombie (Linux; elsewhere asks the OS).</summary>
    public static bool IsRunning(int pid)
    {
        if (OperatingSystem.IsLinux()) return Read(pid) is { State: not 'Z' and not 'X' };
        try
        {
            using var process = Process.GetProcessById(pid);
            return !process.HasExited;
        }
        catch (ArgumentException)
        {
            return false;
        }
    }

    private readonly record struct Stat(char State, int Parent, ulong StartTicks);

    private static IEnumerable<string> EnumerateProcFolders()
    {
        try
        {
            return Directory.EnumerateDirectories("/proc").ToList();
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            return [];
        }
    }

    /// <summary>Fields of /proc/&lt;pid&gt;/stat: state (3), parent (4), start time (22). The command name
    /// (2) is in parentheses and may hold spaces and parentheses itself, so fields are counted from the last ')'.</summary>
    private static Stat? Read(int pid)
    {
        string text;
        try
        {
            text = File.ReadAllText($"/proc/{pid}/stat");
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            return null;
        }
        var close = text.LastIndexOf(')');
        if (close < 0) return null;
        var fields = text[(close + 2)..].Split(' ');
        if (fields.Length < 20 || fields[0].Length == 0) return null;
        return int.TryParse(fields[1], out var parent) && ulong.TryParse(fields[19], out var start)
            ? new Stat(fields[0][0], parent, start)
            : null;
    }
}
