using Bramble.Rules.Compose;
using Bramble.Values;
using Bramble.Web.Api;

namespace Bramble.Web;

/// <summary>
/// Compose for the page: positions of a ruleset whose value is a target, found by the same
/// search as <c>bramble compose</c>, within a budget the server caps and stopped when the page
/// gives up on the request. The component values it works out stay in the pooled context's memo.
/// </summary>
public sealed class Composing(ContextPool contexts)
{
    public const int DefaultBudgetMs = 5000;
    public const int MaxBudgetMs = 30_000;
    public const int MaxCount = 10;
    public const int MaxSize = 40;

    public ComposeReply Compose(ComposeRequest request, CancellationToken cancel)
    {
        var rules = GameReplay.Ruleset(request.Ruleset);
        if (string.IsNullOrWhiteSpace(request.Value)) throw ApiException.Bad("value is missing: the target in value notation, e.g. ↑ or {1|-1}", "value");
        int budget = request.BudgetMs ?? DefaultBudgetMs;
        if (budget < 1 || budget > MaxBudgetMs) throw ApiException.Bad($"budget_ms must be between 1 and {MaxBudgetMs}", "budget_ms");
        int count = request.Count ?? 1;
        if (count < 1 || count > MaxCount) throw ApiException.Bad($"count must be between 1 and {MaxCount}", "count");
        if (request.MaxSize is < 0 or > MaxSize) throw ApiException.Bad($"max_size must be between 0 and {MaxSize}", "max_size");

        return contexts.Lend(cancel, context =>
        {
            var store = context.Store;
            var target = store.Parse(request.Value);
            var report = new Composer(rules, context).Run(target, new ComposeSettings(request.MaxSize, count, budget));
            if (cancel.IsCancellationRequested) throw new OperationCanceledException(cancel);
            return new ComposeReply(
                rules.Name,
                store.Format(report.Target),
                report.Positions.Select(p => new ComposedReply(p.Position.Text, p.Size, p.RouteWord(), p.FoundMs)).ToList(),
                report.SizeUnit,
                report.Positions.Count == 0 ? "none" + report.NoneReason() : null,
                report.Searched(),
                report.Stopped(),
                report.StopWord(),
                report.Notes,
                report.ElapsedMs);
        });
    }
}
