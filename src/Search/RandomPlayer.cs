using System.Diagnostics;
using Bramble.Rules;
using Bramble.Values;

namespace Bramble.Search;

/// <summary>A uniform legal move, seedable so matches and tests are reproducible.</summary>
public sealed class RandomPlayer(int seed) : IPlayer
{
    private readonly Random _random = new(seed);

    public string Name => "random";

    public Decision Choose(IPosition position, Side side, TimeSpan budget, CancellationToken halt = default)
    {
        var clock = Stopwatch.StartNew();
        var moves = position.Moves(side);
        Move? pick = moves.Count == 0 ? null : moves[_random.Next(moves.Count)];
        return new Decision(pick, moves.Count, clock.ElapsedMilliseconds, Exact: false);
    }
}
