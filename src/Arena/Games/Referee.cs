using Bramble.Arena.Engines;
using Bramble.Arena.Journal;
using Bramble.Arena.Schedule;
using Bramble.Arena.Spec;
using Bramble.Rules;
using Bramble.Values;
using Bramble.Wire;
using Bramble.Wire.Client;
using Serilog;

namespace Bramble.Arena.Games;

/// <summary>
/// Plays one game between two engines. The referee holds the authoritative position: it tells both
/// engines the start (<c>begin</c>) and every move (<c>apply</c>, the mover's own included), asks
/// the side to move for a move (<c>think</c>) on that side's clock, and plays the pick only when
/// the ruleset says it is legal. A side with no legal move loses (<c>no-move</c>); it is never
/// asked. Whatever goes wrong with an engine ends the game as that engine's forfeit — late
/// (<c>timeout</c>), gone (<c>crash</c>), illegal (<c>bad-move</c>) or unreadable (<c>bad-reply</c>).
/// </summary>
public sealed class Referee(EngineTimeouts timeouts, ILogger log)
{
    /// <summary>An engine failed: the game ends as its forfeit.</summary>
    private sealed class Forfeit(Side side, GameEnd end, string detail) : Exception(detail)
    {
        public Side Side { get; } = side;
        public GameEnd End { get; } = end;
    }

    public async Task<GameResult> PlayAsync(ScheduledGame game, IRuleset rules, Engine left, Engine right,
        TimeControl control, Adjudication adjudicate, int adjudicateMs, Analyst analyst, CancellationToken cancel)
    {
        var text = game.Position.Text;
        IPosition position = rules.Parse(text);
        var positions = new List<IPosition> { position };
        var moves = new List<PlayedMove>();
        var clock = new GameClock(control);
        Engine EngineOf(Side s) => s == Side.Left ? left : right;
        try
        {
            foreach (var side in new[] { Side.Left, Side.Right })
                await Ask(side, EngineOf(side), e => e.Client.BeginAsync(rules.Name, text, timeouts.Reply, cancel)).ConfigureAwait(false);

            var mover = game.First;
            while (true)
            {
                var legal = position.Moves(mover);
                if (legal.Count == 0)
                    return new GameResult(moves, mover.Other(), GameEnd.NoMove, null, positions);
                if (adjudicate != Adjudication.Never)
                {
                    var current = position;
                    var sideToMove = mover;
                    var proven = await DeepWork.RunAsync(() => adjudicate == Adjudication.Decided
                        ? analyst.Winner(current, sideToMove, adjudicateMs)
                        : analyst.NumbersWinner(current, sideToMove, adjudicateMs)).ConfigureAwait(false);
                    if (proven is { } winner)
                        return new GameResult(moves, winner, GameEnd.Adjudicated, null, positions);
                }

                var engine = EngineOf(mover);
                var remaining = clock.Remaining(mover);
                var reply = await Ask(mover, engine, e => e.Client.ThinkAsync(mover, (long)remaining.TotalMilliseconds,
                    control.IncMs, remaining, note => log.Debug("{Player} note {Note}", e.PlayerId, string.Join(' ', note.Fields.Select(f => $"{f.Key}={f.Value}"))), cancel)).ConfigureAwait(false);
                if (!clock.Charge(mover, reply.Elapsed))
                    throw new Forfeit(mover, GameEnd.Timeout, $"{engine.PlayerId} picked after {reply.Elapsed.TotalMilliseconds:0} ms with {remaining.TotalMilliseconds:0} ms on its clock");
                var move = Legal(position, mover, legal, reply.Move, engine.PlayerId);
                var moveText = position.FormatMove(move);
                position = position.Play(mover, move);
                positions.Add(position);
                moves.Add(new PlayedMove(mover, moveText, (long)Math.Round(reply.Elapsed.TotalMilliseconds)));

                var played = mover;
                await Ask(played, EngineOf(played), e => e.Client.ApplyAsync(played, moveText, timeouts.Reply, cancel)).ConfigureAwait(false);
                await Ask(played.Other(), EngineOf(played.Other()), e => e.Client.ApplyAsync(played, moveText, timeouts.Reply, cancel)).ConfigureAwait(false);
                mover = mover.Other();
            }
        }
        catch (Forfeit forfeit)
        {
            log.Information("Game {Game}: {Player} ({Side}) forfeits by {End}: {Detail}", game.Id, game.PlayerOf(forfeit.Side), forfeit.Side.Word(), forfeit.End.Word(), forfeit.Message);
            return new GameResult(moves, forfeit.Side.Other(), forfeit.End, forfeit.Message, positions);
        }
    }

    /// <summary>The pick as a legal move of the side to move, or the forfeit that it is not.</summary>
    private static Move Legal(IPosition position, Side mover, IReadOnlyList<Move> legal, string? pick, string player)
    {
        if (pick is null)
            throw new Forfeit(mover, GameEnd.BadMove, $"{player} answered 'pick none' with {legal.Count} legal move{(legal.Count == 1 ? "" : "s")} to choose from");
        Move move;
        try
        {
            move = position.ParseMove(pick);
        }
        catch (Exception e) when (e is IllegalMoveException or FormatException or ArgumentException)
        {
            throw new Forfeit(mover, GameEnd.BadMove, $"{player} picked {Codec.Quote(pick)}, which is not a move here: {e.Message}");
        }
        if (!legal.Contains(move))
            throw new Forfeit(mover, GameEnd.BadMove, $"{player} picked {Codec.Quote(pick)}, which is not a legal move for {mover.Word()}");
        return move;
    }

    /// <summary>Runs one request and turns its failure into the engine's forfeit.</summary>
    private static async Task<T> Ask<T>(Side side, Engine engine, Func<Engine, Task<T>> request)
    {
        try
        {
            return await request(engine).ConfigureAwait(false);
        }
        catch (EngineFailureException e)
        {
            throw new Forfeit(side, EndFor(e.Kind), e.Message);
        }
    }

    private static async Task Ask(Side side, Engine engine, Func<Engine, Task> request) =>
        await Ask(side, engine, async e => { await request(e).ConfigureAwait(false); return true; }).ConfigureAwait(false);

    public static GameEnd EndFor(EngineFailureKind kind) => kind switch
    {
        EngineFailureKind.Timeout => GameEnd.Timeout,
        EngineFailureKind.Exited or EngineFailureKind.StartFailed => GameEnd.Crash,
        _ => GameEnd.BadReply,
    };
}
