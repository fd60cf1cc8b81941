using Bramble.Rules.GraphGames;

namespace Bramble.Rules.Snort;

/// <summary>
/// Snort (Simon Norton; Winning Ways, ch. 6): players colour vertices of a graph, Left blue and
/// Right red, never next to a vertex of the opponent's colour. A hot game: moving first gains.
/// </summary>
public sealed class SnortRuleset() : ColouringRuleset(ColouringRule.Snort);
