using System.Reflection;
using Bramble.Rules;
using Bramble.Search;
using Serilog;

namespace Bramble.Wire;

/// <summary>
/// Everything an <see cref="EngineHost"/> serves with: its name, the rulesets and players it
/// offers, how value contexts are made (so a database can be loaded into them), the starting
/// settings and the log. The defaults are the real registries; tests inject their own.
/// </summary>
public sealed record EngineSetup
{
    public string Name { get; init; } = "bramble";

    public string Version { get; init; } = VersionOf(typeof(EngineSetup).Assembly);

    public IReadOnlyList<IRuleset> Rulesets { get; init; } = Bramble.Rules.Rulesets.All;

    public IReadOnlyList<string> Strategies { get; init; } = Players.Names;

    /// <summary>Makes a player from a strategy name, a seed and a node limit per decision (null: none).</summary>
    public Func<string, int, long?, IPlayer> CreatePlayer { get; init; } = Players.Create;

    public Func<ValueContext> CreateValueContext { get; init; } = () => new ValueContext();

    /// <summary>Null: <see cref="EngineSettings.Default"/> for <see cref="Strategies"/>.</summary>
    public EngineSettings? Settings { get; init; }

    /// <summary>
    /// How long a player may overrun its budget, or ignore <c>halt</c>, before the host answers
    /// for it with a fallback move: a player bug must cost a weak move, not a lost game.
    /// </summary>
    public TimeSpan Grace { get; init; } = TimeSpan.FromMilliseconds(100);

    public ILogger Log { get; init; } = Serilog.Core.Logger.None;

    /// <summary>
    /// Ends the process when input has ended and the session is still busy after <see cref="EndGrace"/>
    /// (null: never; a host inside another program, as in tests, is not its process).
    /// </summary>
    public Action<int>? ForceExit { get; init; }

    public TimeSpan EndGrace { get; init; } = TimeSpan.FromSeconds(1);

    /// <summary>The informational version without its source-revision suffix, as one token.</summary>
    public static string VersionOf(Assembly assembly)
    {
        var version = assembly.GetCustomAttribute<AssemblyInformationalVersionAttribute>()?.InformationalVersion
            ?? assembly.GetName().Version?.ToString() ?? "0.0.0";
        var plus = version.IndexOf('+');
        if (plus >= 0) version = version[..plus];
        version = new string(version.Where(c => c > ' ' && c != '=' && !char.IsControl(c)).ToArray());
        return version.Length > 0 ? version : "0.0.0";
    }
}
