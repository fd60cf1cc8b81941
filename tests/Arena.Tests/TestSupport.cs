using System.Text.Json;
using Bramble.Arena.Engines;
using Bramble.Arena.Fixture;
using Bramble.Arena.Spec;
using Bramble.Wire.Client;

namespace Bramble.Arena.Tests;

/// <summary>Where the fixture program is, and specs and options that use it.</summary>
public static class FixtureProgram
{
    /// <summary>The fixture's app host, copied next to the tests by the project reference.</summary>
    public static string Program { get; } = Path.Combine(AppContext.BaseDirectory, OperatingSystem.IsWindows() ? "ArenaFixture.exe" : "ArenaFixture");

    public static RulesetFinder Rulesets { get; } = RulesetFinders.With(new HeapsRuleset());

    public static string[] Engine(params string[] options) => [Program, "engine", .. options];

    public static EngineLaunch Launch(params string[] options) => new(Engine(options), null, "test-engine");

    /// <summary>Short time-outs so tests of stuck engines stay quick.</summary>
    public static EngineTimeouts Timeouts { get; } = new() { Start = TimeSpan.FromSeconds(30), Reply = TimeSpan.FromSeconds(5), Recover = TimeSpan.FromSeconds(2) };

    public static MatchOptions Options(MatchOptions? with = null) => (with ?? new MatchOptions()) with
    {
        Rulesets = Rulesets,
        Self = [Program],
        Timeouts = Timeouts,
        Log = Serilog.Core.Logger.None,
    };

    /// <summary>Every process id recorded in a fixture pid folder that is still running.</summary>
    public static IReadOnlyList<int> Survivors(string pidFolder) =>
        Directory.GetFiles(pidFolder).Select(f => int.Parse(Path.GetFileName(f))).Where(ProcessTree.IsRunning).ToList();

    /// <summary>Waits (up to a few seconds) for processes to be gone; returns those still running.</summary>
    public static IReadOnlyList<int> SurvivorsAfterWait(string pidFolder)
    {
        var deadline = DateTime.UtcNow + TimeSpan.FromSeconds(10);
        while (true)
        {
            var alive = Survivors(pidFolder);
            if (alive.Count == 0 || DateTime.UtcNow > deadline) return alive;
            Thread.Sleep(50);
        }
    }
}

/// <summary>A fresh folder under the temp folder, removed afterwards.</summary>
public sealed class TempFolder : IDisposable
{
    public TempFolder()
    {
        Path = System.IO.Path.Combine(System.IO.Path.GetTempPath(), "bramble-arena-" + Guid.NewGuid().ToString("N")[..12]);
        Directory.CreateDirectory(Path);
    }

    public string Path { get; }

    public string File(string name) => System.IO.Path.Combine(Path, name);

    public string Write(string name, string text)
    {
        var path = File(name);
        Directory.CreateDirectory(System.IO.Path.GetDirectoryName(path)!);
        System.IO.File.WriteAllText(path, text);
        return path;
    }

    /// <summary>A folder for fixture engines to drop their process ids in.</summary>
    public string PidFolder()
    {
        var folder = File("pids");
        Directory.CreateDirectory(folder);
        return folder;
    }

    /// <summary>Writes a spec from an object (serialised as JSON) and returns its path.</summary>
    public string Spec(object spec, string name = "match.json") =>
        Write(name, JsonSerializer.Serialize(spec, new JsonSerializerOptions { WriteIndented = true }));

    public void Dispose()
    {
        try { Directory.Delete(Path, recursive: true); }
        catch (IOException) { }
        catch (UnauthorizedAccessException) { }
    }
}
