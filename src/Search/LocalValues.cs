using Bramble.Rules;
using Bramble.Values;

namespace Bramble.Search;

/// <summary>
/// Exact values of single components, each attempt within a node cap of its own, on a player's
/// <see cref="ValueContext"/>. A component whose value could not be finished within the cap is
/// remembered as large (by ruleset and normal key, with the cap it failed at), so it is not tried
/// again at the same cap; finished values are kept for good.
/// </summary>
public sealed class LocalValues(ValueContext context)
{
    private readonly Dictionary<string, long> _failedAt = new(StringComparer.Ordinal);

    // Whole components by "ruleset:normal key". Kept apart from the context's memo, which belongs to
    // the ruleset (and to database files) and holds only the ruleset's own keys.
    private readonly Dictionary<string, Game> _values = new(StringComparer.Ordinal);

    public ValueContext Context => context;

    /// <summary>Attempts that ended at their cap (each one is remembered), for reports.</summary>
    public long Failures { get; private set; }
    public GameStore Store => context.Store;

    /// <summary>
    /// The component's exact value if it can be found within <paramref name="nodeCap"/> local nodes
    /// (and, when given, <paramref name="maxMs"/> milliseconds); null when it is larger than that. A
    /// cap of 0 asks only for what costs no search: a memoised value or a ruleset's closed form.
    /// Nodes spent are added to <paramref name="budget"/>; when the decision's own time runs out
    /// meanwhile, <see cref="BudgetExceededException"/> propagates.
    /// </summary>
    public Game? TryValue(IPosition component, long nodeCap, SearchBudget budget, long maxMs = long.MaxValue)
    {
        var ruleset = component.Ruleset;
        string key = ruleset.Name + ":" + component.NormalKey;
        if (_values.TryGetValue(key, out var memoised)) return memoised;
        if (_failedAt.TryGetValue(key, out long failed) && failed >= nodeCap) return null;
        budget.ThrowIfSpent();
        long remaining = Math.Min(budget.RemainingMs, maxMs);
        context.Cancellation = budget.Halt;
        context.ResetCounters(remaining == long.MaxValue ? null : remaining, nodeCap);
        try
        {
            var value = ruleset.Value(component, context);
            budget.Add(context.Nodes);
            // Rulesets memoise the regions they search; the whole component is memoised here too so
            // that the next look-up costs a dictionary probe, whatever the ruleset keeps.
            _values[key] = value;
            return value;
        }
        catch (BudgetExceededException)
        {
            Failures++;
            budget.Add(context.Nodes);
            budget.ThrowIfSpent();
            // A failure at the time limit says nothing about the node cap, so it is not remembered.
            if (context.Nodes > nodeCap || context.ElapsedMs < remaining) _failedAt[key] = Math.Max(nodeCap, failed);
            return null;
        }
        finally
        {
            context.EndBudget();
        }
    }

    /// <summary>The exact value with no cap but the decision's budget.</summary>
    public Game Value(IPosition component, SearchBudget budget) =>
        TryValue(component, long.MaxValue, budget) ?? throw new BudgetExceededException("budget spent on a local value");
}
