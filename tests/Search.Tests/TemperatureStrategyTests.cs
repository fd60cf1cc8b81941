using Bramble.Rules;
using Bramble.Search.Tests.Support;
using Bramble.Values;

namespace Bramble.Search.Tests;

/// <summary>Hotstrat, Thermostrat and Sentestrat: the published error bound, cold sums and threats.</summary>
public class TemperatureStrategyTests
{
    private static readonly TimeSpan Budget = TimeSpan.FromSeconds(30);

    public static TheoryData<TemperatureRule> Rules => new() { TemperatureRule.Hotstrat, TemperatureRule.Thermostrat, TemperatureRule.Sentestrat };

    /// <summary>
    /// Plays the strategy as <paramref name="strategySide"/> against a stop-optimal opponent until
    /// every component is a number; returns how much worse than the optimal stop the strategy did
    /// (from its own side's view) and the largest component temperature.
    /// </summary>
    private static (Dyadic Loss, Dyadic Hottest) PlayOut(TreePosition start, TemperatureRule rule, Side strategySide, Side first, Stops stops)
    {
        var player = new TemperaturePlayer(rule);
        var hottest = start.Nodes.Select(n => stops.Store.Temperature(stops.ValueOf(n))).Max();
        var optimal = stops.Stop(start, first);
        var position = start;
        var toMove = first;
        while (!stops.AllNumbers(position))
        {
            Move move = toMove == strategySide
                ? player.Choose(position, toMove, Budget).Move ?? throw new InvalidOperationException("no move chosen")
                : stops.BestMove(position, toMove);
            position = (TreePosition)position.Play(toMove, move);
            toMove = toMove.Other();
        }
        var score = stops.Score(position);
        var loss = strategySide == Side.Left ? optimal - score : score - optimal;
        return (loss, hottest);
    }

    [Theory]
    [MemberData(nameof(Rules))]
    public void OnRandomSumsOfHotSwitchesTheStrategyStaysWithinTheLargestTemperatureOfOptimal(TemperatureRule rule)
    {
        var rnd = new Random(700 + (int)rule);
        for (int i = 0; i < 60; i++)
        {
            var trees = new Trees();
            int k = rnd.Next(2, 7);
            var parts = Enumerable.Range(0, k).Select(_ =>
            {
                int b = rnd.Next(-8, 8), a = b + rnd.Next(1, 12);
                return trees.Switch(a, b);
            }).ToArray();
            var start = trees.Sum(parts);
            var stops = new Stops(new ValueContext());
            foreach (var side in new[] { Side.Left, Side.Right })
            foreach (var first in new[] { Side.Left, Side.Right })
            {
                var (loss, hottest) = PlayOut(start, rule, side, first, stops);
                // Error bound of temperature play: within the largest component temperature of the optimal
                // stop (Winning Ways ch. 6; Berlekamp 1996; Hanner 1959: Hanner 1959 for mean play; the Thermostrat statement [M], Winning Ways ch. 6).
                Assert.True(loss <= hottest, $"{rule} as {side.Word()} ({first.Word()} first) on {start.Text}: lost {loss} > {hottest}");
                Assert.True(loss.Sign >= 0, "the optimal opponent cannot do worse than the optimal stop");
            }
        }
    }

    [Theory]
    [MemberData(nameof(Rules))]
    public void OnMullerLiSumsTheStrategyStaysWithinTheLargestTemperatureOfOptimal(TemperatureRule rule)
    {
        // The random test sums of Müller & Li (CG 2004, Winning Ways ch. 6; Berlekamp 1996; Hanner 1959), smaller numbers: five
        // components {a|b||c|d}, d = 0, c = d + rand, b = c + rand, a = b + rand.
        var rnd = new Random(800 + (int)rule);
        for (int i = 0; i < 20; i++)
        {
            var trees = new Trees();
            var parts = Enumerable.Range(0, 5).Select(_ =>
            {
                int d = 0, c = d + rnd.Next(10), b = c + rnd.Next(10), a = b + rnd.Next(10);
                return trees.TwoStep(a, b, c, d);
            }).ToArray();
            var start = trees.Sum(parts);
            var stops = new Stops(new ValueContext());
            foreach (var side in new[] { Side.Left, Side.Right })
            foreach (var first in new[] { Side.Left, Side.Right })
            {
                var (loss, hottest) = PlayOut(start, rule, side, first, stops);
                // Within the largest temperature of the optimal stop: Winning Ways ch. 6; Berlekamp 1996; Hanner 1959 (Hanner 1959; Thermostrat [M]).
                Assert.True(loss <= hottest, $"{rule} as {side.Word()} ({first.Word()} first) on {start.Text}: lost {loss} > {hottest}");
            }
        }
    }

    [Theory]
    [MemberData(nameof(Rules))]
    public void InAColdSumTheStrategyMakesTheCheapestMove(TemperatureRule rule)
    {
        // Numbers 3, 1/2 and 5/4: temperatures −1, −1/2 and −1/4 (sub-zero convention, Winning Ways ch. 6; Berlekamp & Wolfe, Mathematical Go, 1994).
        // The cheapest move is Left's in 5/4 (to 1, losing 1/4): derived from the definitions.
        var trees = new Trees();
        var three = trees.Number(3);
        var half = trees.Number(Dyadic.Half);
        var fiveQuarters = trees.Number(Dyadic.Create(5, 2));
        var position = trees.Sum(three, half, fiveQuarters);
        var d = new TemperaturePlayer(rule).Choose(position, Side.Left, Budget);
        Assert.Equal(fiveQuarters.Id, d.Move!.Value.A);
        Assert.False(d.Exact);
    }

    [Theory]
    [MemberData(nameof(Rules))]
    public void TheStrategyMovesInTheHottestOfTwoSwitches(TemperatureRule rule)
    {
        // {4|0} (temperature 2) beside {1|0} (temperature 1/2): every strategy plays in {4|0}, for
        // either side (Winning Ways ch. 6; Berlekamp & Wolfe, Mathematical Go, 1994 temperatures; the choice derived from the definitions).
        var trees = new Trees();
        var hot = trees.Switch(4, 0);
        var position = trees.Sum(trees.Switch(1, 0), hot);
        foreach (var side in new[] { Side.Left, Side.Right })
            Assert.Equal(hot.Id, new TemperaturePlayer(rule).Choose(position, side, Budget).Move!.Value.A);
    }

    [Fact]
    public void SentestratAnswersAThreatHotterThanTheAmbientTemperature()
    {
        // Left (Sentestrat) plays first in {3|0} + {0 | {0|-20}}; Right then threatens with {0|-20}
        // (temperature 10 > the ambient temperature): Left must answer there. Derived from the definitions.
        var trees = new Trees();
        var threatened = trees.Node([trees.Zero()], [trees.Switch(0, -20)]);
        var position = trees.Sum(trees.Switch(3, 0), threatened);
        var player = new TemperaturePlayer(TemperatureRule.Sentestrat);
        var first = player.Choose(position, Side.Left, Budget).Move!.Value;
        IPosition p = position.Play(Side.Left, first);
        var threat = p.Moves(Side.Right).First(m => m.A == threatened.Id);
        p = p.Play(Side.Right, threat);
        var answer = player.Choose(p, Side.Left, Budget).Move!.Value;
        var threatNode = ((TreePosition)p).Nodes.Single(n => n.Key == trees.Switch(0, -20).Key);
        Assert.Equal(threatNode.Id, answer.A);
    }

    [Fact]
    public void AComponentOverTheExactBudgetIsEstimatedAndSaysSo()
    {
        var rules = Bramble.Rules.Rulesets.Get("domineering");
        var position = rules.Parse("4x5");
        var player = new TemperaturePlayer(TemperatureRule.Thermostrat, exactCap: 5);
        var d = player.Choose(position, Side.Left, Budget);
        Assert.Contains(d.Move!.Value, position.Moves(Side.Left));
        Assert.False(d.Exact);
        Assert.Equal([position.Text], player.LastEstimates);
    }
}
