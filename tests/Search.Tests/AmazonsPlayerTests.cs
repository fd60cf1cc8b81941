using Bramble.Rules;
using Bramble.Values;

namespace Bramble.Search.Tests;

/// <summary>
/// Amazons with the players: exact play on small endgames agrees with alphabeta and with the
/// value (common practice, independent searches checked against each other), and the heuristic
/// whole-board search on big boards plays legal, reproducible moves and takes a win it can see.
/// </summary>
public class AmazonsPlayerTests
{
    private static readonly TimeSpan Plenty = TimeSpan.FromMinutes(1);
    private readonly IRuleset _rules = Rulesets.Get("amazons");

    [Fact]
    public void PerfectAndAlphabetaAgreeOnSmallRegions()
    {
        var perfect = Players.Create("perfect");
        var alphabeta = Players.Create("alphabeta");
        var context = new ValueContext();
        foreach (var text in _rules.Generate("regions", 12, 6, seed: 23))
        {
            var position = _rules.Parse(text);
            var outcome = context.Store.OutcomeOf(_rules.Value(position, context));
            foreach (var side in new[] { Side.Left, Side.Right })
            {
                var a = perfect.Choose(position, side, Plenty);
                var b = alphabeta.Choose(position, side, Plenty);
                Assert.True(a.Exact && b.Exact, $"{text}: a search did not finish");
                Assert.True(a.Winning == b.Winning, $"{text}, {side.Word()} first: perfect {a.Winning}, alphabeta {b.Winning}");
                bool firstWins = side == Side.Left ? outcome is Outcome.L or Outcome.N : outcome is Outcome.R or Outcome.N;
                Assert.True(firstWins == a.Winning, $"{text}, {side.Word()} first: the value says {firstWins}");
            }
        }
    }

    [Fact]
    public void BigBoardsGoToTheHeuristicSearchAndAreReproducibleUnderANodeCap()
    {
        foreach (var text in _rules.Generate("midgames", 2, 20, seed: 5))
        {
            var position = _rules.Parse(text);
            var first = Players.Create("perfect", nodes: 6000).Choose(position, Side.Left, Plenty);
            var again = Players.Create("perfect", nodes: 6000).Choose(position, Side.Left, Plenty);
            Assert.False(first.Exact);
            Assert.NotNull(first.Move);
            Assert.Contains(first.Move!.Value, position.Moves(Side.Left));
            Assert.Equal(first.Move, again.Move);
        }
    }

    [Fact]
    public void HeuristicSearchShutsInTheLastOpposingAmazon()
    {
        // Right's only amazon on a1 has one free neighbour, b2; a move onto b2 (or an arrow there)
        // leaves Right without a move, which wins at once (the rules). The board is big, so the
        // heuristic search decides.
        var position = _rules.Parse("R#......../##......../........../........../....L...../........../........../........../........../..........");
        var search = new HeuristicSearch();
        var choice = search.Choose(position, Side.Left, new SearchBudget(TimeSpan.FromMinutes(1), nodeCap: 200_000));
        var after = position.Play(Side.Left, choice.Move);
        Assert.Empty(after.Moves(Side.Right));
    }
}
