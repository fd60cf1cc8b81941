using Bramble.Rules;
using Bramble.Search;
using Bramble.Values;
using Bramble.Web.Api;

namespace Bramble.Web;

/// <summary>The computer's side of a game: a built-in strategy, or an engine named in the engines file.</summary>
public sealed class Opponents(ContextPool contexts, EngineRoster engines)
{
    public const string EnginePrefix = "engine:";

    public IReadOnlyList<ChoiceReply> Strategies => Players.Names.Select(n => new ChoiceReply(n, Levels.StrategyWords(n))).ToList();

    public IReadOnlyList<ChoiceReply> Engines => engines.Ids.Select(id => new ChoiceReply(EnginePrefix + id, $"{id} — your engine (twine/1)")).ToList();

    /// <summary>The computer's move in <paramref name="game"/> for the side to move, checked for legality.</summary>
    public async Task<(GameState Game, ReplyMove Reply)> ReplyAsync(GameState game, string opponent, TimeSpan think, CancellationToken cancel)
    {
        var side = game.ToMove;
        var clock = System.Diagnostics.Stopwatch.StartNew();
        string? text;
        bool exact = false;
        string? note = null;
        if (opponent.StartsWith(EnginePrefix, StringComparison.Ordinal))
        {
            var id = opponent[EnginePrefix.Length..];
            var seat = engines.Find(id) ?? throw ApiException.Bad(
                $"no engine '{id}' was named at start{(engines.Ids.Count == 0 ? " (start the board with --engines FILE to add some)" : $"; named: {string.Join(", ", engines.Ids)}")}", "opponent");
            text = await seat.ChooseAsync(game.Rules.Name, game.Start.Text, game.Played.Select(p => (p.Side, p.Text)).ToList(), side, think, cancel).ConfigureAwait(false);
            if (text is null) throw new ApiException(502, $"engine '{id}' answered 'pick none' while {side.Word()} has moves", "opponent");
        }
        else
        {
            if (!Players.Names.Contains(opponent, StringComparer.OrdinalIgnoreCase))
                throw ApiException.Bad($"unknown opponent '{opponent}'; known: {string.Join(", ", Players.Names.Concat(engines.Ids.Select(i => EnginePrefix + i)))}", "opponent");
            var context = contexts.Rent();
            try
            {
                var player = opponent.Equals("perfect", StringComparison.OrdinalIgnoreCase)
                    ? new PerfectPlayer(null, context)
                    : Players.Create(opponent, Random.Shared.Next());
                var decision = await Task.Run(() => BigStack.Run(() => player.Choose(game.Position, side, think, cancel), 64 * 1024 * 1024), cancel).ConfigureAwait(false);
                if (decision.Move is not { } move) throw new ApiException(500, $"{opponent} found no move for {side.Word()}");
                text = game.Position.FormatMove(move);
                exact = decision.Exact;
                note = decision.Exact
                    ? decision.Winning switch { true => "a winning move by exact analysis", false => "every move loses; this one makes it hardest", _ => null }
                    : decision.Estimated ? "out of time for exact analysis: chosen from estimated thermographs" : null;
            }
            finally
            {
                contexts.Return(context);
            }
        }
        GameState after;
        try
        {
            after = game.With(text, "opponent");
        }
        catch (ApiException e) when (opponent.StartsWith(EnginePrefix, StringComparison.Ordinal))
        {
            // The person asked nothing wrong: the engine did.
            throw new ApiException(502, $"engine '{opponent[EnginePrefix.Length..]}' picked an illegal move: {e.Message}", "opponent");
        }
        return (after, new ReplyMove(side.Word(), after.Played[^1].Text, opponent, clock.ElapsedMilliseconds, exact, note));
    }
}
