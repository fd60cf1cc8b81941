using Bramble.Arena.Journal;
using Bramble.Rules;
using Bramble.Values;

namespace Bramble.Arena.Games;

/// <summary>How a game went, as the referee saw it.</summary>
/// <param name="Positions">The start position and the position after each move, for the review.</param>
/// <param name="Detail">For forfeits: what the losing engine did.</param>
public sealed record GameResult(IReadOnlyList<PlayedMove> Moves, Side Winner, GameEnd End, string? Detail, IReadOnlyList<IPosition> Positions);
