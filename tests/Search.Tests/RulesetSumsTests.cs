using Bramble.Rules;
using Bramble.Search.Tests.Support;
using Bramble.Values;

namespace Bramble.Search.Tests;

/// <summary>
/// Perfect and alphabeta on random small Hackenbush and Forms sums, checked against plain
/// brute-force search (Support/BruteForce.cs): common practice, every shortcut against plain search.
/// </summary>
public class RulesetSumsTests
{
    private static readonly TimeSpan Plenty = TimeSpan.FromMinutes(1);

    /// <summary>Small Forms terms with few moves each, so brute force over the sum stays quick.</summary>
    private static readonly string[] FormsTerms =
    [
        "{1|-1}", "*", "*2", "↑", "↓*", "{2|0}", "1/2", "-1", "{1|*}", "{0,*|0}", "{2||1|0}", "{3|1,*}",
        "{1|0}", "{0|-1}", "±1/2", "2", "{1/2|-1}", "{*|-1}", "⇑", "{0|↑}",
    ];

    private static IEnumerable<IPosition> HackenbushSums(int seed, int count)
    {
        var rules = Rulesets.Get("hackenbush");
        var rnd = new Random(seed);
        string[] generators = ["stalks", "trees", "graphs", "mixed"];
        for (int i = 0; i < count; i++)
            yield return rules.Parse(rules.Generate(generators[i % 4], 1, rnd.Next(2, 9), rnd.Next())[0]);
    }

    private static IEnumerable<IPosition> FormsSums(int seed, int count)
    {
        var rules = Rulesets.Get("forms");
        var rnd = new Random(seed);
        for (int i = 0; i < count; i++)
        {
            int k = rnd.Next(1, 5);
            yield return rules.Parse(string.Join(" + ", Enumerable.Range(0, k).Select(_ => FormsTerms[rnd.Next(FormsTerms.Length)])));
        }
    }

    private static void Check(IPlayer player, IPosition position, BruteForce brute)
    {
        foreach (var side in new[] { Side.Left, Side.Right })
        {
            var d = player.Choose(position, side, Plenty);
            bool wins = brute.Wins(position, side);
            Assert.True(d.Exact, $"{player.Name} did not finish {position.Text}");
            Assert.True(d.Winning == wins, $"{player.Name}: {side.Word()} first on {position.Text}: says {d.Winning}, brute force {wins}");
            if (wins) Assert.False(brute.Wins(position.Play(side, d.Move!.Value), side.Other()), $"{player.Name}: {position.FormatMove(d.Move!.Value)} on {position.Text} does not win");
        }
    }

    [Fact]
    public void PerfectAgreesWithBruteForceOnRandomHackenbushSums()
    {
        var perfect = new PerfectPlayer();
        var brute = new BruteForce();
        foreach (var p in HackenbushSums(seed: 901, count: 1000)) Check(perfect, p, brute);
    }

    [Fact]
    public void AlphaBetaAgreesWithBruteForceOnRandomHackenbushSums()
    {
        var alphabeta = new AlphaBetaPlayer(log2TableSize: 18);
        var brute = new BruteForce();
        foreach (var p in HackenbushSums(seed: 902, count: 400)) Check(alphabeta, p, brute);
    }

    [Fact]
    public void PerfectAgreesWithBruteForceOnRandomFormsSums()
    {
        var perfect = new PerfectPlayer();
        var brute = new BruteForce();
        foreach (var p in FormsSums(seed: 903, count: 1000)) Check(perfect, p, brute);
    }

    [Fact]
    public void AlphaBetaAgreesWithBruteForceOnRandomFormsSums()
    {
        var alphabeta = new AlphaBetaPlayer(log2TableSize: 18);
        var brute = new BruteForce();
        foreach (var p in FormsSums(seed: 904, count: 400)) Check(alphabeta, p, brute);
    }

    [Fact]
    public void PerfectWithLargeComponentsAgreesWithBruteForceOnHackenbushAndForms()
    {
        // Tiny node caps: most components have no exact value, so the search of large components decides.
        var brute = new BruteForce();
        foreach (var p in HackenbushSums(seed: 905, count: 150).Concat(FormsSums(seed: 906, count: 150)))
            Check(new PerfectPlayer(new PerfectSettings { ComponentCap = 2, PieceCap = 2 }), p, brute);
    }

    [Fact]
    public void PerfectWithSizeThresholdsZeroAgreesWithBruteForceOnHackenbushAndForms()
    {
        // Sizes 0: a component gets an exact value only within the probe at the root and, inside
        // the search, only when its value costs no search (closed forms such as green trees).
        var brute = new BruteForce();
        foreach (var p in HackenbushSums(seed: 907, count: 150).Concat(FormsSums(seed: 908, count: 150)))
            Check(new PerfectPlayer(new PerfectSettings { ExactSize = 0, SmallSize = 0, ProbeCap = 0 }), p, brute);
    }
}
