using System.Reflection;
using Bramble.Arena.Spec;
using Bramble.Wire.Client;

namespace Bramble.Arena.Engines;

/// <summary>
/// Turns a player's <c>run</c> argv into what is started. Nothing passes through a shell. A
/// relative program path (one with a slash, like <c>./engines/mine</c>) is taken from the spec's
/// folder, and the engine runs in that folder so its own relative arguments mean the same. An
/// argv[0] of <c>bramble</c> that is not on PATH is this very program (docs/matches.md), so the demo
/// runs from a fresh checkout.
/// </summary>
public static class EngineCommand
{
    public static EngineLaunch Resolve(PlayerSpec player, string folder, IReadOnlyList<string> self, string? path = null, string? database = null)
    {
        var program = player.Run[0];
        var rest = player.Run.Skip(1);
        // A built-in engine shares the match's database unless its run chose one itself.
        if (database is not null && program == "bramble" && player.Run.Count > 1 && player.Run[1] == "engine"
            && !player.Run.Any(a => a == "--db" || a.StartsWith("--db=", StringComparison.Ordinal)))
            rest = rest.Concat(["--db", database]);
        IEnumerable<string> argv;
        if (program == "bramble" && FindOnPath(program, path ?? Environment.GetEnvironmentVariable("PATH")) is null)
            argv = self.Concat(rest);
        else if (!Path.IsPathRooted(program) && (program.Contains('/') || program.Contains(Path.DirectorySeparatorChar)))
            argv = rest.Prepend(Path.GetFullPath(Path.Combine(folder, program)));
        else
            argv = player.Run;
        return new EngineLaunch(argv.ToList(), folder, player.Id);
    }

    /// <summary>The argv that starts this process again: the app host, or <c>dotnet &lt;dll&gt;</c> when run that way.</summary>
    public static IReadOnlyList<string> ThisProgram()
    {
        var process = Environment.ProcessPath ?? "dotnet";
        var name = Path.GetFileNameWithoutExtension(process);
        if (name.Equals("dotnet", StringComparison.OrdinalIgnoreCase) && Assembly.GetEntryAssembly()?.Location is { Length: > 0 } dll)
            return [process, dll];
        return [process];
    }

    /// <summary>The first executable file called <paramref name="program"/> on a PATH string, or null.</summary>
    public static string? FindOnPath(string program, string? path)
    {
        if (string.IsNullOrEmpty(path)) return null;
        var names = OperatingSystem.IsWindows() ? new[] { program + ".exe", program + ".cmd", program } : new[] { program };
        foreach (var folder in path.Split(Path.PathSeparator, StringSplitOptions.RemoveEmptyEntries))
        foreach (var candidate in names)
        {
            var full = Path.Combine(folder, candidate);
            if (File.Exists(full) && (OperatingSystem.IsWindows() || (File.GetUnixFileMode(full) & (UnixFileMode.UserExecute | UnixFileMode.GroupExecute | UnixFileMode.OtherExecute)) != 0))
                return full;
        }
        return null;
    }
}
