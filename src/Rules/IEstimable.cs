using Bramble.Values;

namespace Bramble.Rules;

/// <summary>
/// Optional for a ruleset's position: a static estimate of what the position is worth to Left, in
/// moves (positive favours Left), with <paramref name="toMove"/> about to move. A whole-board
/// player uses it to play components far too big for an exact value (an Amazons opening); a
/// ruleset without it is played by exact values and the temperature strategies alone.
/// </summary>
public interface IEstimable
{
    double Estimate(Side toMove);
}
