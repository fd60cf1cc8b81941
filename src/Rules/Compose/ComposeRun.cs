using System.Diagnostics;
using Bramble.Values;

namespace Bramble.Rules.Compose;

/// <summary>
/// One compose run. Sizes are taken in increasing order from the proved lower bound. At size n,
/// constructions of size n are checked first; then every component of size n is listed and
/// valued, and every multiset of listed components of total size n whose values add up to the
/// target becomes a position (the multisets are walked in a fixed order, largest parts first, so
/// each comes once). Whether the rest of a multiset can still be completed is memoised by
/// (value still missing, size still free); the birthday bound prunes it too. Components of value
/// 0 are left out of sums: a position with one has a smaller one of the same value inside.
/// </summary>
internal sealed class ComposeRun(
    IRuleset ruleset, IComposable source, bool sampled, ValueContext context, Game target, ComposeSettings settings,
    IProgress<ComposeProgress>? progress)
{
    private readonly GameStore _store = context.Store;
    private readonly Stopwatch _clock = Stopwatch.StartNew();
    private readonly List<ComposedPosition> _found = [];
    private readonly HashSet<string> _foundKeys = new(StringComparer.Ordinal);
    private readonly List<string> _notes = [];

    // By size: the distinct nonzero values of the listed components, in the order first met, and
    // up to Count example components of each value.
    private readonly List<List<Game>> _values = [[]];
    private readonly List<Dictionary<Game, List<IPosition>>> _examples = [[]];
    private readonly List<Dictionary<Game, int>> _indexOf = [[]];
    private readonly Dictionary<(int Missing, int Free), bool> _completable = [];
    private int _listed;
    private long _componentsTried;
    private long _sumsTried;
    private long _lastReportMs;
    private int _round;

    public ComposeReport Execute()
    {
        var facts = source.Facts(target, _store);
        _notes.AddRange(facts.Notes);
        int least = Math.Max(0, source.LeastSize(target, _store));
        if (facts.RuledOut) return Report(least, least - 1, -1, ComposeStop.RuledOut);

        var built = source.Construct(target, _store).OrderBy(p => p.Size).ToList();
        int bound = settings.MaxSize ?? Math.Max(source.DefaultSearchSize, built.Count == 0 ? 0 : built[^1].Size);
        int listingLimit = Math.Min(source.ListingLimit, bound);
        int searched = least - 1;
        var stop = ComposeStop.Bound;
        context.ResetCounters(settings.BudgetMs);
        try
        {
            for (int n = least; n <= bound; n++)
            {
                foreach (var p in built.Where(p => p.Size <= n)) Accept(p, ComposeRoute.Construction);
                built.RemoveAll(p => p.Size <= n);
                if (Enough) { stop = ComposeStop.Enough; break; }
                CheckBudget();
                if (n == 0 && target == _store.Zero && !sampled) Accept(source.SumOf([]), ComposeRoute.Search);
                while (_listed < Math.Min(n, listingLimit)) List(_listed + 1);
                _round = n;
                if (n > 0) SearchSums(n);
                // A search cut short by having found enough did not look at all of size n.
                if (Enough) { stop = ComposeStop.Enough; break; }
                if (n <= listingLimit || n == 0) searched = n;
                else stop = ComposeStop.ListingLimit;
            }
        }
        catch (BudgetExceededException)
        {
            stop = ComposeStop.Budget;
        }
        // A construction beyond the sizes searched is still an answer: it comes last, and the
        // report says up to which size smaller ones were ruled out.
        if (!Enough && built.Count > 0)
        {
            context.ResetCounters();
            foreach (var p in built.Where(p => p.Size <= bound))
            {
                if (Enough) break;
                Accept(p, ComposeRoute.Construction);
            }
        }
        return Report(least, bound, searched, stop);
    }

    private bool Enough => _found.Count >= settings.Count;

    private ComposeReport Report(int least, int bound, int searched, ComposeStop stop) => new(
        ruleset, target, _found.OrderBy(p => p.Size).ToList(), source.SizeUnit, least, bound, searched, sampled, !source.ListsEveryComponent,
        _componentsTried, _sumsTried, _clock.ElapsedMilliseconds, stop, _notes);

    /// <summary>Lists and values every component of one size.</summary>
    private void List(int size)
    {
        var values = new List<Game>();
        var examples = new Dictionary<Game, List<IPosition>>();
        foreach (var component in source.ComponentsOfSize(size))
        {
            if ((++_componentsTried & 255) == 0) { CheckBudget(); Tell(size); }
            var value = ruleset.Value(component, context);
            if (value == _store.Zero) continue;
            if (!examples.TryGetValue(value, out var list))
            {
                examples[value] = list = [];
                values.Add(value);
            }
            if (list.Count < settings.Count) list.Add(component);
        }
        _values.Add(values);
        _examples.Add(examples);
        _indexOf.Add(values.Select((v, i) => (v, i)).ToDictionary(p => p.v, p => p.i));
        _listed = size;
        Tell(size, force: true);
    }

    /// <summary>Every multiset of listed components of total size n with the target's value.</summary>
    private void SearchSums(int n)
    {
        var parts = new List<(int Size, int Index)>();
        Walk(target, n, Math.Min(n, _listed), int.MaxValue, parts);
    }

    private void Walk(Game missing, int free, int largest, int lastIndex, List<(int Size, int Index)> parts)
    {
        if (Enough) return;
        if (free == 0)
        {
            if (missing == _store.Zero) Realise(parts);
            return;
        }
        for (int s = Math.Min(free, largest); s >= 1; s--)
        {
            // Sampled components cannot be set side by side: a position is then one component.
            if (sampled && (s != free || parts.Count > 0)) continue;
            var values = _values[s];
            int top = s == largest ? Math.Min(lastIndex, values.Count - 1) : values.Count - 1;
            if (s == free)
            {
                // The last part must be the missing value itself.
                _sumsTried++;
                if (_indexOf[s].TryGetValue(missing, out int at) && at <= top)
                {
                    parts.Add((s, at));
                    Realise(parts);
                    parts.RemoveAt(parts.Count - 1);
                }
                continue;
            }
            for (int i = top; i >= 0; i--)
            {
                var rest = _store.Subtract(missing, values[i]);
                _sumsTried++;
                if ((_sumsTried & 1023) == 0) { CheckBudget(); Tell(_round); }
                if (!Completable(rest, free - s)) continue;
                parts.Add((s, i));
                Walk(rest, free - s, s, i, parts);
                parts.RemoveAt(parts.Count - 1);
                if (Enough) return;
            }
        }
    }

    /// <summary>Whether listed nonzero components of total size exactly <paramref name="free"/> can add up to <paramref name="missing"/>.</summary>
    private bool Completable(Game missing, int free)
    {
        if (free == 0) return missing == _store.Zero;
        if (source.LeastSize(missing, _store) > free) return false;
        if (_completable.TryGetValue((missing.Id, free), out bool known)) return known;
        bool result = false;
        for (int s = Math.Min(free, _listed); s >= 1 && !result; s--)
        {
            if (sampled && s != free) continue;
            if (s == free) { result = _examples[s].ContainsKey(missing); continue; }
            foreach (var v in _values[s])
            {
                if ((++_sumsTried & 1023) == 0) CheckBudget();
                if (Completable(_store.Subtract(missing, v), free - s)) { result = true; break; }
            }
        }
        _completable[(missing.Id, free)] = result;
        return result;
    }

    /// <summary>Turns one multiset of (size, value) classes into positions, with every choice of examples.</summary>
    private void Realise(List<(int Size, int Index)> parts)
    {
        var chosen = new IPosition[parts.Count];
        Choose(0, 0);

        void Choose(int k, int from)
        {
            if (Enough) return;
            if (k == parts.Count)
            {
                Accept(chosen.Length == 1 ? chosen[0] : source.SumOf(chosen), ComposeRoute.Search);
                return;
            }
            var (size, index) = parts[k];
            var list = _examples[size][_values[size][index]];
            // A class used twice in a row takes its examples in order, so each choice comes once.
            int start = k > 0 && parts[k - 1] == parts[k] ? from : 0;
            for (int j = start; j < list.Count && !Enough; j++)
            {
                chosen[k] = list[j];
                Choose(k + 1, j);
            }
        }
    }

    /// <summary>Parses the position again from its text and values it the ordinary way; keeps it when that is the target.</summary>
    private void Accept(IPosition position, ComposeRoute route)
    {
        if (Enough) return;
        var again = ruleset.Parse(position.Text);
        var key = string.Join(" + ", again.Components().Select(c => c.NormalKey).Order(StringComparer.Ordinal));
        if (!_foundKeys.Add(key)) return;
        var value = ruleset.Value(again, context);
        if (value != target)
        {
            _notes.Add($"skipped {again.Text}: its value is {_store.Format(value)}, not the target");
            return;
        }
        _found.Add(new ComposedPosition(again, again.Size, route, _clock.ElapsedMilliseconds));
    }

    private void CheckBudget()
    {
        if (settings.BudgetMs is { } budget && _clock.ElapsedMilliseconds > budget) throw new BudgetExceededException("time budget spent");
        if (context.Cancellation.IsCancellationRequested) throw new BudgetExceededException("cancelled");
    }

    private void Tell(int size, bool force = false)
    {
        if (progress is null) return;
        long now = _clock.ElapsedMilliseconds;
        // Quick runs stay quiet; long ones say where they are about once a second.
        if (now < 1000 || (!force && now - _lastReportMs < 1000)) return;
        _lastReportMs = now;
        progress.Report(new ComposeProgress(size, source.SizeUnit, _componentsTried, _sumsTried, _found.Count, now));
    }
}
