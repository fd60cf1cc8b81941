using Bramble.Rules;
using Bramble.Values;

namespace Bramble.Search;

/// <summary>Who wins with one side moving first, and a winning first move when that side wins.</summary>
/// <param name="Winner">The winner, or null when the search ran out of budget.</param>
/// <param name="Move">A winning first move for <paramref name="First"/> when it wins, else null.</param>
/// <param name="Line">The principal line the search reported (winning moves for the winner, stubborn defence for the loser), when it has one.</param>
/// <param name="Theorem">The published theorem that gave the winner without search, when one did (<see cref="Board.KnownRectangles"/>).</param>
public sealed record SolveAnswer(Side First, Side? Winner, string? Move, long Nodes, long ElapsedMs, bool Exact, IReadOnlyList<string>? Line = null,
    Board.RectangleTheorem? Theorem = null);

/// <summary>What <c>bramble solve</c> reports (docs/cli.md).</summary>
/// <param name="Outcome">The outcome class, when both sides were solved exactly.</param>
public sealed record SolveReport(Outcome? Outcome, SolveAnswer? LeftFirst, SolveAnswer? RightFirst, long Nodes, long ElapsedMs, string Strategy, bool Exact);

/// <summary>Solves a position for one or both first players with one player instance (so its memo carries over).</summary>
public static class Solver
{
    /// <param name="budget">The budget of each first player's search.</param>
    public static SolveReport Solve(IPosition position, IReadOnlyCollection<Side> firsts, IPlayer player, TimeSpan budget, CancellationToken halt = default)
    {
        var answers = new Dictionary<Side, SolveAnswer>();
        foreach (var first in firsts) answers[first] = Ask(position, first, player, budget, halt);
        // The side asked first, when it ran out of budget and the other was then solved, is asked
        // once more, briefly: the other side's search may have settled it on the way (on a square
        // Domineering board the two are one search, transposed, sharing the player's table).
        if (firsts.Count == 2 && !halt.IsCancellationRequested)
        {
            Side early = firsts.First(), late = early.Other();
            if (answers[early] is { Winner: null } unknown && answers.TryGetValue(late, out var other) && other.Exact)
                answers[early] = Again(unknown, Ask(position, early, player, Shorter(budget), halt));
        }
        return Report(answers.GetValueOrDefault(Side.Left), answers.GetValueOrDefault(Side.Right), player.Name);
    }

    private static TimeSpan Shorter(TimeSpan budget) => budget == Timeout.InfiniteTimeSpan || budget > TimeSpan.FromSeconds(2) ? TimeSpan.FromSeconds(2) : budget;

    private static SolveAnswer Ask(IPosition position, Side first, IPlayer player, TimeSpan budget, CancellationToken halt)
    {
        var d = player.Choose(position, first, budget, halt);
        Side? winner = d.Exact && d.Winning is { } w ? (w ? first : first.Other()) : null;
        string? move = winner == first && d.Move is { } m ? position.FormatMove(m) : null;
        return new SolveAnswer(first, winner, move, d.Nodes, d.ElapsedMs, d.Exact && winner is not null, d.Exact ? d.Line : null);
    }

    /// <summary>The second try's answer, with the work of both tries.</summary>
    private static SolveAnswer Again(SolveAnswer first, SolveAnswer second) =>
        second with { Nodes = first.Nodes + second.Nodes, ElapsedMs = first.ElapsedMs + second.ElapsedMs };

    /// <summary>The report of one or two answers: the outcome class when both are known, the nodes and time of both.</summary>
    public static SolveReport Report(SolveAnswer? left, SolveAnswer? right, string strategy)
    {
        var answers = new[] { left, right }.Where(a => a is not null).Select(a => a!).ToList();
        Outcome? outcome = left?.Winner is { } lw && right?.Winner is { } rw ? OutcomeExtensions.FromWinners(lw, rw) : null;
        return new SolveReport(outcome, left, right, answers.Sum(a => a.Nodes), answers.Sum(a => a.ElapsedMs), strategy,
            answers.All(a => a.Exact));
    }
}
