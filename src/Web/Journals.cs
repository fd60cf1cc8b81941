using Bramble.Arena.Journal;
using Bramble.Rules;
using Bramble.Values;
using Bramble.Web.Api;

namespace Bramble.Web;

/// <summary>Match journals for the replay view: the games they hold, and every position of one game.</summary>
public sealed class Journals(ContextPool contexts)
{
    /// <summary>
    /// Reads a journal's text as the harness does: an incomplete last line (an interrupted write)
    /// is ignored and reported; any other line that is not a game record is a 400 naming its line.
    /// </summary>
    public static JournalReply Read(string? text)
    {
        if (text is null) throw ApiException.Bad("the journal's text is needed", "text");
        var games = new List<JournalGameReply>();
        string? notice = null;
        var lines = text.Split('\n');
        for (int i = 0; i < lines.Length; i++)
        {
            var line = lines[i].TrimEnd('\r');
            if (line.Trim().Length == 0) continue;
            GameRecord r;
            try
            {
                r = JournalFormat.Parse(line);
            }
            catch (JournalFormatException e)
            {
                bool last = i == lines.Length - 1;
                if (!last) throw ApiException.Bad($"line {i + 1}: {e.Message}", $"text (line {i + 1})");
                notice = $"line {i + 1} is incomplete (an interrupted write) and was left out";
                continue;
            }
            games.Add(new JournalGameReply(r.Game, r.Ruleset, r.Left, r.Right, r.First.Word(), r.Position,
                r.Moves.Select(m => m.Move).ToList(), r.Winner.Word(), r.WinnerId, r.End.Word(), r.Theory?.Word(),
                r.Blunders.Select(b => new BlunderReply(b.Ply, b.By)).ToList()));
        }
        return new JournalReply(games, notice);
    }

    /// <summary>Every position of a game with its picture and, within the budget, its exact value.</summary>
    public ReplayReply Replay(AnalyseRequest request, CancellationToken cancel)
    {
        var game = GameReplay.Rebuild(request);
        int budgetMs = Analysis.Budget(request.BudgetMs ?? 5000);
        return contexts.Lend(cancel, context =>
        {
            var clock = System.Diagnostics.Stopwatch.StartNew();
            var plies = new List<ReplayPlyReply>();
            var position = game.Start;
            var mover = game.First;
            bool exact = true;
            for (int ply = 0; ply <= game.Played.Count; ply++)
            {
                var last = ply == 0 ? null : game.Played[ply - 1];
                if (last is not null)
                {
                    position = position.Play(last.Side, last.Move);
                    mover = last.Side.Other();
                }
                // A value per ply: the memo makes each one cost the component that changed.
                var v = Analysis.TryValue(game.Rules, position, context, budgetMs - clock.ElapsedMilliseconds);
                exact &= v is not null;
                var outcome = v is { } g ? context.Store.OutcomeOf(g) : (Outcome?)null;
                plies.Add(new ReplayPlyReply(ply, last?.Side.Word(), last?.Text, position.Text, mover.Word(), BoardView.Picture(position),
                    v is { } value ? context.Store.Format(value) : null, outcome?.ToString(), outcome?.WinnerMovingFirst(mover).Word()));
            }
            return new ReplayReply(plies, exact);
        });
    }
}
