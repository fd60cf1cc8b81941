using Bramble.Rules;
using Bramble.Values;

namespace Bramble.Search;

/// <summary>
/// Hotstrat, Thermostrat or Sentestrat as a player. Each instance owns its value context. For
/// Sentestrat it remembers the components it left after its own last move and the ambient
/// temperature then, to recognise the opponent's threats on the next call.
/// </summary>
public sealed class TemperaturePlayer : IPlayer
{
    private readonly TemperatureStrategy _strategy;
    private (List<string> Texts, Dyadic Ambient, Side Side)? _left;

    /// <param name="exactCap">Node cap for a component's exact value; larger components get an estimated thermograph.</param>
    public TemperaturePlayer(TemperatureRule rule, ValueContext? context = null, long exactCap = 20_000)
    {
        Rule = rule;
        Context = context ?? new ValueContext();
        _strategy = new TemperatureStrategy(new ThermalReader(new LocalValues(Context)) { ExactCap = exactCap });
    }

    public TemperatureRule Rule { get; }

    /// <summary>Node cap of one decision; past it the player answers with its last resort (the most mobile move).</summary>
    public long NodeCap { get; init; } = long.MaxValue;
    public ValueContext Context { get; }

    public string Name => Rule.ToString().ToLowerInvariant();

    /// <summary>Texts of the components whose thermographs were estimated in the last decision.</summary>
    public IReadOnlyList<string> LastEstimates { get; private set; } = [];

    public Decision Choose(IPosition position, Side side, TimeSpan budget, CancellationToken halt = default)
    {
        var b = new SearchBudget(budget, halt, NodeCap);
        (IReadOnlySet<string>, Dyadic)? threat = null;
        if (Rule == TemperatureRule.Sentestrat && _left is { } before && before.Side == side)
        {
            // Components present now but not in the position this player left were made by the
            // opponent's move; one move replaces exactly one component, otherwise this is another game.
            var now = position.Components().Select(c => c.Text).ToList();
            var remaining = new List<string>(before.Texts);
            var created = new HashSet<string>(StringComparer.Ordinal);
            foreach (var t in now) if (!remaining.Remove(t)) created.Add(t);
            if (remaining.Count == 1) threat = (created, before.Ambient);
        }
        TemperatureStrategy.Choice choice;
        try
        {
            choice = _strategy.Choose(position, side, Rule, b, threat);
        }
        catch (BudgetExceededException)
        {
            // Out of time (or halted) before every component was read: the cheap last resort beats no move.
            Move? resort = position.Moves(side).Count > 0 ? PerfectPlayer.MostMobile(position, side) : null;
            return new Decision(resort, b.Nodes, b.ElapsedMs, Exact: false, Estimated: true);
        }
        LastEstimates = choice.Readings.Where(r => r.Estimated).Select(r => r.Position.Text).ToList();
        if (Rule == TemperatureRule.Sentestrat && choice.Move is { } played) Remember(position.Play(side, played), side, b);
        var line = choice.Move is { } m ? new[] { position.FormatMove(m) } : [];
        return new Decision(choice.Move, b.Nodes, b.ElapsedMs, Exact: false, Line: line, Estimated: choice.Estimated);
    }

    private void Remember(IPosition after, Side side, SearchBudget budget)
    {
        try
        {
            var readings = _strategy.ReadAll(after, budget);
            var ambient = new Compound(readings.Select(r => r.Thermograph).ToList()).Ambient;
            _left = (readings.Select(r => r.Position.Text).ToList(), ambient, side);
        }
        catch (BudgetExceededException)
        {
            _left = null;
        }
    }
}
