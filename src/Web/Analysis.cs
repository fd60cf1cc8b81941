using System.Diagnostics;
using Bramble.Pictures;
using Bramble.Rules;
using Bramble.Search;
using Bramble.Values;
using Bramble.Web.Api;

namespace Bramble.Web;

/// <summary>
/// Exact analysis for the page, always within a budget and stopped when the page gives up on the
/// request: values and outcome classes of the whole and of each component, the winning moves of
/// the side to move, thermographs. Components the budget does not cover get an estimate, marked as such.
/// </summary>
public sealed class Analysis(ContextPool contexts)
{
    public const int DefaultBudgetMs = 2000;
    public const int MaxBudgetMs = 30_000;

    public static int Budget(int? requested)
    {
        int ms = requested ?? DefaultBudgetMs;
        if (ms < 1 || ms > MaxBudgetMs) throw ApiException.Bad($"budget_ms must be between 1 and {MaxBudgetMs}", "budget_ms");
        return ms;
    }

    public AnalysisReply Analyse(GameState game, int budgetMs, CancellationToken cancel) => contexts.Lend(cancel, context =>
    {
        var clock = Stopwatch.StartNew();
        var store = context.Store;
        var parts = new List<ComponentReply>();
        var values = new List<Game>();
        int index = 0;
        bool stopped = false;
        foreach (var c in game.Position.Components())
        {
            index++;
            var moves = c.Moves(Side.Left).Concat(c.Moves(Side.Right)).Select(c.FormatMove).Distinct().ToList();
            if (!stopped && TryValue(game.Rules, c, context, budgetMs - clock.ElapsedMilliseconds) is { } v)
            {
                values.Add(v);
                parts.Add(new ComponentReply(index, c.Text, moves, true, store.Format(v), store.OutcomeOf(v).ToString(), store.Temperature(v).ToString(), null));
                continue;
            }
            stopped |= cancel.IsCancellationRequested;
            parts.Add(new ComponentReply(index, c.Text, moves, false, null, null, null, stopped ? null : Estimate(context, c)));
        }
        if (values.Count < parts.Count)
        {
            var estimates = parts.Where(p => !p.Exact && p.Estimate is not null).Select(p => $"component {p.Index}: {p.Estimate}");
            return new AnalysisReply(false, null, null, null, null, null, string.Join("; ", estimates), parts, clock.ElapsedMilliseconds,
                stopped ? "stopped" : $"not exact within {budgetMs} ms: {parts.Count - values.Count} of {parts.Count} components have no exact value yet");
        }
        var total = store.Sum(values);
        var outcome = store.OutcomeOf(total);
        return new AnalysisReply(true, store.Format(total), outcome.ToString(), Describe(outcome),
            outcome.WinnerMovingFirst(Side.Left).Word(), outcome.WinnerMovingFirst(Side.Right).Word(), null, parts, clock.ElapsedMilliseconds, null);
    });

    /// <summary>
    /// The moves of the side to move that win: after such a move the opponent, moving first,
    /// loses. Only the component a move touches changes, so with the memo each move costs one
    /// component's value and one sum.
    /// </summary>
    public HintReply Hint(GameState game, int budgetMs, CancellationToken cancel) => contexts.Lend(cancel, context =>
    {
        var side = game.ToMove;
        var clock = Stopwatch.StartNew();
        var winning = new List<string>();
        foreach (var move in game.Position.Moves(side))
        {
            var after = game.Position.Play(side, move);
            if (TryValue(game.Rules, after, context, budgetMs - clock.ElapsedMilliseconds) is not { } v)
                return new HintReply(side.Word(), false, [], cancel.IsCancellationRequested ? "stopped" : $"not exact within {budgetMs} ms: no hint");
            if (context.Store.OutcomeOf(v).WinnerMovingFirst(side.Other()) == side) winning.Add(game.Position.FormatMove(move));
        }
        string note = game.Over ? $"{side.Word()} has no move" : winning.Count == 0
            ? $"{side.Word()} loses against best play: every move loses"
            : $"{winning.Count} winning move{(winning.Count == 1 ? "" : "s")} for {side.Word()}";
        return new HintReply(side.Word(), true, winning, note);
    });

    public ThermographReply Thermograph(ThermographRequest request, int budgetMs, CancellationToken cancel) => contexts.Lend(cancel, context =>
    {
        var store = context.Store;
        Game g;
        bool exact = true;
        string label;
        if (request.Value is { } valueText)
        {
            g = store.Parse(valueText);
            label = store.Format(g);
        }
        else
        {
            var rules = GameReplay.Ruleset(request.Ruleset);
            var position = GameReplay.Parse(rules, request.Position, "position");
            if (TryValue(rules, position, context, budgetMs) is { } v) g = v;
            else
            {
                var reading = Reader(context).Read(position, new SearchBudget(TimeSpan.FromMilliseconds(300), cancel));
                g = reading.Value;
                exact = !reading.Estimated;
            }
            label = (exact ? "" : "≈ ") + store.Format(g);
        }
        var th = store.Thermograph(g);
        var svg = ThermographPicture.Draw(th, label);
        svg = svg.StartsWith("<?xml", StringComparison.Ordinal) ? svg[(svg.IndexOf("?>", StringComparison.Ordinal) + 2)..].TrimStart() : svg;
        return new ThermographReply(label, exact, svg, th.Temperature.ToString(), th.Mast.ToString());
    });

    /// <summary>The exact value within the time left, or null when the budget (or the page) stopped it.</summary>
    public static Game? TryValue(IRuleset rules, IPosition position, ValueContext context, long msLeft)
    {
        if (msLeft <= 0 || context.Cancellation.IsCancellationRequested) return null;
        context.ResetCounters(budgetMs: msLeft);
        try
        {
            return rules.Value(position, context);
        }
        catch (BudgetExceededException)
        {
            return null;
        }
    }

    private static string Estimate(ValueContext context, IPosition component)
    {
        try
        {
            var reading = Reader(context).Read(component, new SearchBudget(TimeSpan.FromMilliseconds(300), context.Cancellation));
            var th = reading.Thermograph;
            return $"≈ {context.Store.Format(reading.Value)} (mean ≈ {th.Mast}, temperature ≈ {th.Temperature})";
        }
        catch (BudgetExceededException)
        {
            return "no estimate in time";
        }
    }

    private static ThermalReader Reader(ValueContext context) => new(new LocalValues(context));

    public static string Describe(Outcome o) => o switch
    {
        Outcome.L => "Left wins whoever starts",
        Outcome.R => "Right wins whoever starts",
        Outcome.N => "whoever moves next wins",
        _ => "whoever moves next loses",
    };
}
