using Bramble.Arena.Spec;
using Bramble.Values;

namespace Bramble.Arena.Schedule;

/// <summary>
/// One game of the schedule. <see cref="Id"/> depends only on the spec (players, positions,
/// format, seats), so every shard and every resumed run agrees on which game is which.
/// </summary>
/// <param name="Pair">The two players in the order the spec lists them.</param>
public sealed record ScheduledGame(int Id, IReadOnlyList<string> Pair, string Left, string Right, Side First, StartPosition Position)
{
    public string PlayerOf(Side side) => side == Side.Left ? Left : Right;
}
