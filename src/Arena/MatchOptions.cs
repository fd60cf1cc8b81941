using Bramble.Arena.Engines;
using Bramble.Arena.Schedule;
using Bramble.Arena.Spec;
using Bramble.Arena.Journal;
using Bramble.Arena.Standings;
using Bramble.Wire.Client;
using Serilog;

namespace Bramble.Arena;

/// <summary>How to run a match: the command line's choices plus what tests need to swap.</summary>
public sealed record MatchOptions
{
    /// <summary>Continue the journal, skipping the games it holds.</summary>
    public bool Resume { get; init; }

    /// <summary>Start over even when the journal holds games (the built-in demo does this).</summary>
    public bool Fresh { get; init; }

    public Shard Shard { get; init; } = Shard.Whole;

    /// <summary>
    /// A component-value database (or null): the referee's analysis starts from its values and adds
    /// what it learns at the end of the run, and built-in engines (argv[0] <c>bramble</c>, verb
    /// <c>engine</c>) are started with <c>--db</c> on it unless their run names one already.
    /// </summary>
    public string? Database { get; init; }

    /// <summary>Let the match make a missing journal folder outside the match file's folder.</summary>
    public bool CreateFolders { get; init; }

    /// <summary>Games at once; null: the spec's, else the number of cores.</summary>
    public int? Parallel { get; init; }

    /// <summary>The argv that starts this program, for players whose argv[0] is <c>bramble</c>.</summary>
    public IReadOnlyList<string> Self { get; init; } = EngineCommand.ThisProgram();

    public RulesetFinder Rulesets { get; init; } = RulesetFinders.Registry;

    public EngineTimeouts Timeouts { get; init; } = EngineTimeouts.Default;

    public ClientLimits Limits { get; init; } = ClientLimits.Default;

    public IProgress<MatchProgress>? Progress { get; init; }

    public ILogger Log { get; init; } = Serilog.Log.Logger;
}

/// <summary>Where a running match stands, reported after every game.</summary>
/// <param name="Done">Games of this shard in the journal (earlier runs included).</param>
/// <param name="Total">Games of this shard.</param>
/// <param name="GamesPerMinute">Games finished per minute in this run.</param>
/// <param name="TimeLeft">Estimated from this run's pace; null until enough games of the run are done to judge it.</param>
/// <param name="Leader">The player ahead on score, with its standing.</param>
public sealed record MatchProgress(int Done, int Total, double GamesPerMinute, TimeSpan? TimeLeft, PlayerStanding? Leader);

/// <summary>Why a run ended.</summary>
public enum MatchStop { Finished, SprtDecided, Cancelled }

/// <summary>The outcome of a run.</summary>
/// <param name="Records">Every game of this shard in the journal, by id.</param>
/// <param name="Played">Games played (and recorded) by this run.</param>
/// <param name="Notes">Things the user should know: ignored incomplete lines, early stops.</param>
public sealed record MatchReport(MatchSpec Spec, string JournalPath, IReadOnlyList<GameRecord> Records, MatchStandings Standings,
    MatchStop Stop, int Played, int Total, IReadOnlyList<string> Notes);

/// <summary>The match could not be carried out (no engine starts, the journal cannot be written): exit 1.</summary>
public sealed class MatchJobException(string message, Exception? inner = null) : Exception(message, inner);

/// <summary>The input does not fit (a damaged journal, one from another spec): exit 2.</summary>
public sealed class MatchInputException(string message) : Exception(message);
