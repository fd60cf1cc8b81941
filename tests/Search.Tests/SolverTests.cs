using Bramble.Rules;
using Bramble.Values;

namespace Bramble.Search.Tests;

/// <summary>
/// How <see cref="Solver"/> puts the two first players' answers together: a side that ran out of
/// budget is asked once more when the other side was solved after it (the other side's search
/// may have settled it, as on a square Domineering board), and the work of both tries is counted.
/// </summary>
public class SolverTests
{
    private static readonly IRuleset Domineering = Rulesets.Get("domineering");

    /// <summary>A player whose answers are scripted: each call takes the next decision for that side.</summary>
    private sealed class Scripted(Dictionary<Side, Queue<Decision>> script) : IPlayer
    {
        public List<(Side Side, TimeSpan Budget)> Calls { get; } = [];

        public string Name => "scripted";

        public Decision Choose(IPosition position, Side side, TimeSpan budget, CancellationToken halt = default)
        {
            Calls.Add((side, budget));
            return script[side].Dequeue();
        }
    }

    [Fact]
    public void ALeftFirstThatRanOutIsAskedAgainOnceRightFirstIsSolved()
    {
        var position = Domineering.Parse("4x4");
        var a1 = position.Moves(Side.Left)[0];
        // Scripted figures: the answer counts the work of both tries, and the report that of all three calls.
        Decision[] leftTries = [new Decision(a1, 1_000, 60_000, Exact: false), new Decision(a1, 5, 1, Exact: true, Winning: true)];
        var rightTry = new Decision(position.Moves(Side.Right)[0], 200, 9_000, Exact: true, Winning: true);
        var player = new Scripted(new()
        {
            [Side.Left] = new(leftTries),
            [Side.Right] = new([rightTry]),
        });
        var report = Solver.Solve(position, [Side.Left, Side.Right], player, TimeSpan.FromMinutes(1));
        Assert.Equal([Side.Left, Side.Right, Side.Left], player.Calls.Select(c => c.Side));
        Assert.True(player.Calls[2].Budget <= TimeSpan.FromSeconds(2), "the second try should be brief");
        Assert.Equal(Side.Left, report.LeftFirst!.Winner);
        Assert.Equal(leftTries.Sum(d => d.Nodes), report.LeftFirst.Nodes);
        Assert.Equal(leftTries.Sum(d => d.Nodes) + rightTry.Nodes, report.Nodes);
        Assert.True(report.Exact);
        Assert.Equal(Outcome.N, report.Outcome);
    }

    [Fact]
    public void WhicheverSideWasAskedFirstIsTheOneAskedAgain()
    {
        var position = Domineering.Parse("4x4");
        var b1 = position.Moves(Side.Right)[0];
        var player = new Scripted(new()
        {
            [Side.Right] = new([new Decision(b1, 10, 5, Exact: false), new Decision(b1, 3, 1, Exact: true, Winning: true)]),
            [Side.Left] = new([new Decision(position.Moves(Side.Left)[0], 20, 5, Exact: true, Winning: true)]),
        });
        var report = Solver.Solve(position, [Side.Right, Side.Left], player, TimeSpan.FromMinutes(1));
        Assert.Equal([Side.Right, Side.Left, Side.Right], player.Calls.Select(c => c.Side));
        Assert.Equal(Side.Right, report.RightFirst!.Winner);
        Assert.Equal(Outcome.N, report.Outcome);
    }

    [Fact]
    public void NoSecondTryWhenTheOtherSideWasNotSolvedEither()
    {
        var position = Domineering.Parse("4x4");
        var player = new Scripted(new()
        {
            [Side.Left] = new([new Decision(position.Moves(Side.Left)[0], 10, 60_000, Exact: false)]),
            [Side.Right] = new([new Decision(position.Moves(Side.Right)[0], 10, 60_000, Exact: false)]),
        });
        var report = Solver.Solve(position, [Side.Left, Side.Right], player, TimeSpan.FromMinutes(1));
        Assert.Equal(2, player.Calls.Count);
        Assert.Null(report.LeftFirst!.Winner);
        Assert.False(report.Exact);
    }

    [Fact]
    public void AProofOnlyPlayerOutOfBudgetAnswersALegalMoveAndNoProof()
    {
        // 8×8 takes tens of millions of nodes (bench/README.md): far beyond a millisecond.
        var position = Domineering.Parse("8x8");
        var player = new PerfectPlayer(new PerfectSettings { ProofOnly = true });
        var d = player.Choose(position, Side.Left, TimeSpan.FromMilliseconds(1));
        Assert.False(d.Exact);
        Assert.Null(d.Winning);
        Assert.Contains(d.Move!.Value, position.Moves(Side.Left));
    }
}
