using System.Diagnostics;
using Bramble.Rules;
using Bramble.Search;
using Bramble.Values;

namespace Bramble.Cli;

/// <summary>One bench position: a name and a position of some ruleset.</summary>
public sealed record BenchCase(string Name, string Ruleset, string Position);

/// <summary>What the two solvers did on one case.</summary>
public sealed record BenchResult(
    BenchCase Case, long PerfectMs, long PerfectNodes, bool PerfectExact, bool? PerfectWins,
    long AlphaBetaMs, long AlphaBetaNodes, bool AlphaBetaCapped, bool? AlphaBetaWins)
{
    /// <summary>alphabeta nodes / perfect nodes; a lower bound when alphabeta hit its cap.</summary>
    public double Ratio => (double)AlphaBetaNodes / Math.Max(1, PerfectNodes);

    /// <summary>Both solvers proved an answer and the answers differ: a bug in one of them.</summary>
    public bool Disagree => PerfectWins is { } p && AlphaBetaWins is { } a && p != a;
}

/// <summary>
/// The side-by-side solver comparison of <c>bramble bench</c>: decomposition search (perfect)
/// against whole-board alpha-beta with a node cap, on the same positions, Left to move.
/// The positions come from the rulesets' own generators with fixed seeds, so runs are comparable.
/// </summary>
public static class BenchSuite
{
    public static IReadOnlyList<BenchCase> Cases(bool quick)
    {
        var list = new List<BenchCase>();
        string One(string ruleset, string generator, int size, int seed, string? colours = null) =>
            Rulesets.Get(ruleset).Generate(generator, 1, size, seed, colours)[0];
        int[] ks = quick ? [4, 6, 8, 10] : [4, 6, 8, 10, 12, 16];
        foreach (int k in ks) list.Add(new($"forms hot k={k}", "forms", One("forms", "hot", k, 1000 + k)));
        // Sums of several pieces: a single green tree is always won by cutting its trunk, which would flatter alphabeta.
        string Sum(string generator, int pieces, int size, int seed, string? colours = null) =>
            string.Join(" + ", Enumerable.Range(0, pieces).Select(i => One("hackenbush", generator, size, seed + 97 * i, colours)));
        int n = quick ? 8 : 10;
        list.Add(new("hackenbush green trees", "hackenbush", Sum("trees", 3, n, 11, "G")));
        list.Add(new("hackenbush blue-red trees", "hackenbush", Sum("trees", 3, n, 12, "BR")));
        list.Add(new("hackenbush mixed sum", "hackenbush", Sum("mixed", 2, n + 4, 13)));
        list.Add(new("hackenbush circuits", "hackenbush", Sum("graphs", 3, quick ? 7 : 9, 14)));
        list.Add(new("domineering 4 regions", "domineering", One("domineering", "sums", 4, 15)));
        list.Add(new("domineering 6 regions", "domineering", One("domineering", "sums", 6, 16)));
        list.Add(new("domineering 4x4", "domineering", "4x4"));
        list.Add(new("domineering 5x5", "domineering", "5x5"));
        if (!quick)
        {
            list.Add(new("domineering 6x6", "domineering", "6x6"));
            list.Add(new("domineering 8 regions", "domineering", One("domineering", "sums", 8, 17)));
        }
        return list;
    }

    public static BenchResult Run(BenchCase c, TimeSpan perfectBudget, long alphaBetaCap, TimeSpan alphaBetaBudget)
    {
        var position = Rulesets.Get(c.Ruleset).Parse(c.Position);
        var perfect = new PerfectPlayer();
        var clock = Stopwatch.StartNew();
        var p = perfect.Choose(position, Side.Left, perfectBudget);
        long pms = clock.ElapsedMilliseconds;
        var alphabeta = new AlphaBetaPlayer(alphaBetaCap);
        clock.Restart();
        var a = alphabeta.Choose(position, Side.Left, alphaBetaBudget);
        long ams = clock.ElapsedMilliseconds;
        return new BenchResult(c, pms, p.Nodes, p.Exact, p.Exact ? p.Winning : null,
            ams, a.Nodes, !a.Exact, a.Exact ? a.Winning : null);
    }
}
