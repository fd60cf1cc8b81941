using Bramble.Rules.GraphGames;

namespace Bramble.Rules.Col;

/// <summary>
/// Col (Colin Vout; Winning Ways, ch. 2): players colour vertices of a graph, Left blue and
/// Right red, never next to a vertex of their own colour. A cold game: every position is a
/// number or a number plus * (Winning Ways).
/// </summary>
public sealed class ColRuleset() : ColouringRuleset(ColouringRule.Col);
