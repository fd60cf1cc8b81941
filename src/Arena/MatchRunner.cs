using System.Diagnostics;
using Bramble.Arena.Engines;
using Bramble.Arena.Games;
using Bramble.Arena.Journal;
using Bramble.Arena.Schedule;
using Bramble.Arena.Spec;
using Bramble.Arena.Standings;
using Bramble.Arena.Statistics;
using Bramble.Rules;
using Bramble.Rules.Database;
using Bramble.Values;
using Bramble.Wire.Client;

namespace Bramble.Arena;

/// <summary>
/// Runs a match: works out which games of the shard are still to play (a resumed run skips those in
/// the journal), plays them N at a time on reused engine processes, writes each finished game to
/// the journal at once, stops early when the SPRT decides, and reports standings. Every engine
/// process it started is gone when it returns, also when it returns by an exception or a cancel.
/// </summary>
public sealed class MatchRunner(MatchSpec spec, MatchOptions options)
{
    private readonly Lock _gate = new();

    public async Task<MatchReport> RunAsync(CancellationToken cancel = default)
    {
        var log = options.Log;
        var notes = new List<string>();
        var journalPath = options.Shard.JournalPath(spec.JournalPath);
        JournalPlace.Prepare(journalPath, spec.Folder, options.CreateFolders);
        // Held until the run ends: a second run on the same journal refuses at once rather than
        // interleaving its lines with this one's.
        using var journalLock = TakeLock(journalPath);
        var contents = ReadJournal(journalPath);
        if (options.Fresh) contents = JournalContents.Empty with { ValidBytes = 0 };
        else if (!options.Resume && (contents.Records.Count > 0 || contents.Notice is not null))
            throw new MatchInputException($"the journal {journalPath} already holds {contents.Records.Count} game{(contents.Records.Count == 1 ? "" : "s")}: run with --resume to continue it, or move it away to start over");
        if (contents.Notice is not null) notes.Add(contents.Notice);

        var mine = Scheduler.Build(spec).Where(g => options.Shard.Contains(g.Id)).ToList();
        var recorded = Recorded(contents, mine, notes);
        var records = recorded.Values.ToList();
        var players = spec.Players.Select(p => p.Id).ToList();
        var todo = mine.Where(g => !recorded.ContainsKey(g.Id)).ToList();
        var stop = MatchStop.Finished;
        if (spec.Sprt is not null && MatchStandings.Compute(records, players, spec.Sprt).Sprt?.Decision != SprtDecision.Continue)
        {
            todo.Clear();
            stop = MatchStop.SprtDecided;
        }
        var played = 0;
        if (todo.Count > 0)
        {
            JournalWriter writer;
            try
            {
                writer = JournalWriter.Open(journalPath, contents);
            }
            catch (Exception e) when (e is IOException or UnauthorizedAccessException)
            {
                throw new MatchJobException($"cannot write the journal {journalPath}: {e.Message}", e);
            }
            using (writer)
            {
                var run = new Run(this, spec, options, writer, records, mine.Count, todo);
                (stop, played) = await run.PlayAsync(cancel).ConfigureAwait(false);
                // Not after a cancel: the user wants the harness gone, and the values are not lost, only not yet saved.
                if (stop != MatchStop.Cancelled) run.SaveDatabase(notes);
                if (stop == MatchStop.SprtDecided) notes.Add("the SPRT reached a decision: the match stopped early");
            }
        }
        records = records.OrderBy(r => r.Game).ToList();
        log.Information("Match {Title}: {Played} games played this run, {Done}/{Total} in the journal, {Stop}", spec.Title, played, records.Count, mine.Count, stop);
        return new MatchReport(spec, journalPath, records, MatchStandings.Compute(records, players, spec.Sprt), stop, played, mine.Count, notes);
    }

    private static JournalLock TakeLock(string path)
    {
        try
        {
            return JournalLock.Take(path);
        }
        catch (JournalInUseException e)
        {
            throw new MatchJobException(e.Message, e);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            throw new MatchJobException($"cannot lock the journal {path} (its lock file is {JournalLock.LockPathOf(path)}): {e.Message}", e);
        }
    }

    private static JournalContents ReadJournal(string path)
    {
        try
        {
            return JournalFile.Read(path);
        }
        catch (JournalFormatException e)
        {
            throw new MatchInputException($"the journal is damaged: {e.Message}");
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            throw new MatchJobException($"cannot read the journal {path}: {e.Message}", e);
        }
    }

    /// <summary>The journal's games by id, each checked against the game of that id in this match's schedule.</summary>
    private static Dictionary<int, GameRecord> Recorded(JournalContents contents, IReadOnlyList<ScheduledGame> mine, List<string> notes)
    {
        var merged = JournalMerge.Merge([("journal", contents with { Notice = null })]);
        if (merged.Conflicts.Count > 0) throw new MatchInputException("the journal contradicts itself: " + string.Join("; ", merged.Conflicts));
        notes.AddRange(merged.Notices);
        var byId = mine.ToDictionary(g => g.Id);
        var recorded = new Dictionary<int, GameRecord>();
        foreach (var record in merged.Records)
        {
            if (!byId.TryGetValue(record.Game, out var game))
                throw new MatchInputException($"the journal holds game {record.Game}, which is not a game of this match (or of this shard)");
            if (game.Left != record.Left || game.Right != record.Right || game.First != record.First || game.Position.Text != record.Position
                || (record.Ruleset.Length > 0 && record.Ruleset != game.Position.Ruleset))
                throw new MatchInputException($"game {record.Game} in the journal ({record.Left} against {record.Right} on '{record.Position}') is not game {record.Game} of this match ({game.Left} against {game.Right} on '{game.Position.Text}'): the spec has changed since the journal was written");
            recorded[record.Game] = record;
        }
        return recorded;
    }

    /// <summary>The state of one run of games; the workers share it under the runner's lock.</summary>
    private sealed class Run(MatchRunner runner, MatchSpec spec, MatchOptions options, JournalWriter writer,
        List<GameRecord> records, int total, IReadOnlyList<ScheduledGame> todo)
    {
        private readonly Stopwatch _clock = Stopwatch.StartNew();
        private readonly CancellationTokenSource _stop = new();
        private int _next = -1;
        private int _played;
        private bool _decided;
        private Exception? _fatal;
        // No time-left estimate before this many games of the run are done: the first games pay
        // for warming up (and finish together when played in parallel), so their pace misleads.
        private const int EstimateAfterGames = 3;
        private int _estimateAfter = EstimateAfterGames;
        private readonly List<Analyst> _analysts = [];

        /// <summary>A value context for analysis, with the match's database loaded when it has one.</summary>
        private ValueContext NewValueContext()
        {
            var context = new ValueContext();
            if (options.Database is { } path)
            {
                try
                {
                    ComponentDatabase.Load(path, context);
                }
                catch (Exception e) when (e is DatabaseFormatException or IOException or UnauthorizedAccessException)
                {
                    options.Log.Warning("The database {Path} could not be read ({Error}); analysis goes on without it", path, e.Message);
                }
            }
            return context;
        }

        /// <summary>Adds what analysis learnt to the match's database; a failure is a note, not a failed match.</summary>
        public void SaveDatabase(List<string> notes)
        {
            if (options.Database is not { } path) return;
            foreach (var analyst in _analysts)
            {
                try
                {
                    ComponentDatabase.Save(path, analyst.Context, "component values saved by bramble match");
                }
                catch (Exception e) when (e is DatabaseFormatException or IOException or UnauthorizedAccessException)
                {
                    notes.Add($"the database {path} was not updated: {e.Message}");
                    return;
                }
            }
        }

        public async Task<(MatchStop, int)> PlayAsync(CancellationToken cancel)
        {
            using var linked = CancellationTokenSource.CreateLinkedTokenSource(cancel, _stop.Token);
            var token = linked.Token;
            var pool = new EnginePool(spec, options.Self, options.Timeouts, options.Limits, options.Log, options.Database);
            // Ctrl-C (or an SPRT decision, or a fatal error) kills every engine at once rather than
            // waiting for the games in progress; those games are abandoned, not recorded.
            using var killer = token.Register(pool.KillAll);
            try
            {
                await RollCallAsync(pool, token).ConfigureAwait(false);
                var parallel = Math.Clamp(options.Parallel ?? spec.Parallel ?? Environment.ProcessorCount, 1, todo.Count);
                // The pace is measured from here: starting the engines is paid once, not per game.
                _clock.Restart();
                _estimateAfter = Math.Min(todo.Count, Math.Max(EstimateAfterGames, 2 * parallel));
                options.Log.Information("Playing {Count} games, {Parallel} at a time", todo.Count, parallel);
                var workers = Enumerable.Range(0, parallel).Select(_ => Task.Run(() => WorkAsync(pool, token))).ToList();
                await Task.WhenAll(workers).ConfigureAwait(false);
            }
            catch (OperationCanceledException) when (token.IsCancellationRequested)
            {
                // Handled below: the reason decides what the caller hears.
            }
            finally
            {
                await pool.DisposeAsync().ConfigureAwait(false);
            }
            if (_fatal is not null) throw _fatal is MatchJobException ? _fatal : new MatchJobException(_fatal.Message, _fatal);
            if (_decided) return (MatchStop.SprtDecided, _played);
            if (cancel.IsCancellationRequested) return (MatchStop.Cancelled, _played);
            return (MatchStop.Finished, _played);
        }

        /// <summary>
        /// Starts one engine of every player before any game: a player whose engine cannot start
        /// or does not play a ruleset of the match makes the match impossible, and that is better
        /// said once at the start than as a forfeit in every game.
        /// </summary>
        private async Task RollCallAsync(EnginePool pool, CancellationToken cancel)
        {
            var needed = todo.SelectMany(g => g.Pair).Distinct().ToList();
            var rulesets = todo.Select(g => g.Position.Ruleset).Distinct().ToList();
            await Task.WhenAll(needed.Select(async id =>
            {
                Engine engine;
                try
                {
                    engine = await pool.RentAsync(id, cancel).ConfigureAwait(false);
                }
                catch (EngineFailureException e)
                {
                    throw new MatchJobException($"player {id}: the engine could not be started: {e.Message}", e);
                }
                var missing = rulesets.Where(r => !engine.Welcome.Supports(r)).ToList();
                if (missing.Count > 0)
                {
                    await pool.DiscardAsync(engine).ConfigureAwait(false);
                    throw new MatchJobException($"player {id}: the engine ({engine.Welcome.Name} {engine.Welcome.Version}) does not play {string.Join(", ", missing)}; it plays {string.Join(", ", engine.Welcome.Rulesets)}");
                }
                options.Log.Information("Player {Player}: {Name} {Version}, process {Pid}", id, engine.Welcome.Name, engine.Welcome.Version, engine.Client.ProcessId);
                await pool.ReturnAsync(engine).ConfigureAwait(false);
            })).ConfigureAwait(false);
        }

        private async Task WorkAsync(EnginePool pool, CancellationToken cancel)
        {
            var analyst = new Analyst(options.Log, cancel, NewValueContext);
            lock (_analysts) _analysts.Add(analyst);
            var referee = new Referee(options.Timeouts, options.Log);
            while (!cancel.IsCancellationRequested)
            {
                var index = Interlocked.Increment(ref _next);
                if (index >= todo.Count) return;
                var game = todo[index];
                GameRecord record;
                try
                {
                    record = await PlayOneAsync(game, pool, referee, analyst, cancel).ConfigureAwait(false);
                }
                catch (OperationCanceledException) when (cancel.IsCancellationRequested)
                {
                    return;
                }
                // Killing engines on a cancel makes requests fail as crashes: such a game is abandoned, not a result.
                if (cancel.IsCancellationRequested) return;
                Record(record);
            }
        }

        private async Task<GameRecord> PlayOneAsync(ScheduledGame game, EnginePool pool, Referee referee, Analyst analyst, CancellationToken cancel)
        {
            var rules = options.Rulesets(game.Position.Ruleset)
                ?? throw new MatchJobException($"ruleset {game.Position.Ruleset} went missing");
            Engine? left = null, right = null;
            try
            {
                GameResult result;
                try
                {
                    left = await pool.RentAsync(game.Left, cancel).ConfigureAwait(false);
                    right = await pool.RentAsync(game.Right, cancel).ConfigureAwait(false);
                }
                catch (EngineFailureException e)
                {
                    // A player whose engine cannot be restarted forfeits the game as a crash.
                    var side = left is null ? Side.Left : Side.Right;
                    result = new GameResult([], side.Other(),
                        GameEnd.Crash, $"{game.PlayerOf(side)}: the engine could not be restarted: {e.Message}", [rules.Parse(game.Position.Text)]);
                    return await ToRecordAsync(game, result, analyst).ConfigureAwait(false);
                }
                if (spec.Seed is { } seed) await SeedAsync(game, seed, [left, right], cancel).ConfigureAwait(false);
                result = await referee.PlayAsync(game, rules, left, right, spec.Clock, spec.Adjudicate, spec.AdjudicateMs, analyst, cancel).ConfigureAwait(false);
                cancel.ThrowIfCancellationRequested();
                return await ToRecordAsync(game, result, analyst).ConfigureAwait(false);
            }
            finally
            {
                foreach (var engine in new[] { left, right })
                {
                    if (engine is null) continue;
                    if (cancel.IsCancellationRequested) await pool.DiscardAsync(engine).ConfigureAwait(false);
                    else
                    {
                        // An engine whose think ran out of time may still be brought back in step.
                        if (!engine.IsUsable) await engine.Client.RecoverAsync(options.Timeouts.Recover).ConfigureAwait(false);
                        await pool.ReturnAsync(engine).ConfigureAwait(false);
                    }
                }
            }
        }

        /// <summary>
        /// <c>set seed</c> for this game to both engines. An engine that refuses it has no chance in
        /// it to seed (or no such setting) and plays on; one that fails otherwise fails again at
        /// <c>begin</c>, where the referee turns it into a forfeit.
        /// </summary>
        private async Task SeedAsync(ScheduledGame game, long matchSeed, Engine[] engines, CancellationToken cancel)
        {
            foreach (var engine in engines)
            {
                var seed = PerGameChance.For(matchSeed, game.Id, engine.PlayerId);
                try
                {
                    await engine.Client.SetAsync("seed", seed.ToString(System.Globalization.CultureInfo.InvariantCulture), options.Timeouts.Reply, cancel).ConfigureAwait(false);
                }
                catch (EngineFailureException e)
                {
                    options.Log.Debug("Game {Game}: {Player} did not take seed {Seed}: {Error}", game.Id, engine.PlayerId, seed, e.Message);
                }
            }
        }

        private async Task<GameRecord> ToRecordAsync(ScheduledGame game, GameResult result, Analyst analyst)
        {
            var review = await DeepWork.RunAsync(() => analyst.Review(result.Positions, game.First, game.Left, game.Right, spec.AnalysisMs, spec.AnalysisNodes)).ConfigureAwait(false);
            return new GameRecord
            {
                Game = game.Id,
                Pair = game.Pair,
                Left = game.Left,
                Right = game.Right,
                First = game.First,
                Ruleset = game.Position.Ruleset,
                Position = game.Position.Text,
                Moves = result.Moves,
                Winner = result.Winner,
                End = result.End,
                Theory = review.Theory,
                Blunders = review.Blunders,
                Analysed = review.Analysed,
                Detail = result.Detail,
            };
        }

        private void Record(GameRecord record)
        {
            MatchProgress progress;
            lock (runner._gate)
            {
                if (_decided || _fatal is not null) return;
                try
                {
                    writer.Append(record);
                }
                catch (Exception e) when (e is IOException or UnauthorizedAccessException)
                {
                    _fatal = new MatchJobException($"cannot write the journal {writer.Path}: {e.Message}", e);
                    _stop.Cancel();
                    return;
                }
                records.Add(record);
                _played++;
                var players = spec.Players.Select(p => p.Id).ToList();
                var standings = MatchStandings.Compute(records, players, spec.Sprt);
                if (standings.Sprt is { Decision: not SprtDecision.Continue } sprt)
                {
                    options.Log.Information("SPRT: {Decision} after {Games} games (LLR {Llr:0.000})", sprt.DecisionText, records.Count, sprt.Llr);
                    _decided = true;
                    _stop.Cancel();
                }
                var minutes = _clock.Elapsed.TotalMinutes;
                var rate = minutes > 0 ? _played / minutes : 0;
                var left = total - records.Count;
                progress = new MatchProgress(records.Count, total, rate, rate > 0 && _played >= _estimateAfter ? TimeSpan.FromMinutes(left / rate) : null, standings.Leader);
            }
            options.Progress?.Report(progress);
        }
    }
}
