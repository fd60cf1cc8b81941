using Bramble.Values;

namespace Bramble.Rules.Tests.GraphGames;

/// <summary>What the Snort and Col tests share: the ruleset, a value context, and the value of a text.</summary>
public abstract class GraphGameFixture(string ruleset)
{
    protected IRuleset Rules { get; } = Rulesets.Get(ruleset);

    protected ValueContext Context { get; } = new();

    protected GameStore Store => Context.Store;

    protected Game V(string text) => Rules.Value(Rules.Parse(text), Context);
}
