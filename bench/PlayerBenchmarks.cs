using BenchmarkDotNet.Attributes;
using BenchmarkDotNet.Configs;
using BenchmarkDotNet.Jobs;
using BenchmarkDotNet.Toolchains.InProcess.Emit;
using Bramble.Rules;
using Bramble.Search;
using Bramble.Values;

namespace Bramble.Bench;

/// <summary>The bench positions of the players: the same generators and fixed seeds as <c>bramble bench</c>.</summary>
public static class PlayerCases
{
    private static string One(string ruleset, string generator, int size, int seed) =>
        Rulesets.Get(ruleset).Generate(generator, 1, size, seed)[0];

    public static IPosition Get(string name)
    {
        var (ruleset, text) = name switch
        {
            _ when name.StartsWith("hot", StringComparison.Ordinal) =>
                ("forms", One("forms", "hot", int.Parse(name[3..]), 1000 + int.Parse(name[3..]))),
            "regions4" => ("domineering", One("domineering", "sums", 4, 15)),
            "regions6" => ("domineering", One("domineering", "sums", 6, 16)),
            "regions8" => ("domineering", One("domineering", "sums", 8, 17)),
            _ => ("domineering", name),
        };
        return Rulesets.Get(ruleset).Parse(text);
    }
}

/// <summary>
/// perfect against alphabeta on sums: hot forms sums of k components (k = 4..16) and Domineering
/// positions of several regions, Left to move, each call with a fresh player (empty memo and
/// store). alphabeta is capped at <see cref="AlphaBetaCap"/> nodes so a call ends in seconds;
/// the node counts of both are written to the log once, in the global set-up.
/// </summary>
[Config(typeof(SlowBenchmarkConfig))]
public class PlayerSumsBenchmarks
{
    public const long AlphaBetaCap = 300_000;

    [Params("hot4", "hot6", "hot8", "hot10", "hot12", "hot16", "regions4", "regions6", "regions8")]
    public string Case { get; set; } = "hot4";

    [Params("perfect", "alphabeta")]
    public string Player { get; set; } = "perfect";

    private IPosition _position = null!;

    [GlobalSetup]
    public void Setup()
    {
        _position = PlayerCases.Get(Case);
        var d = Decide();
        Console.WriteLine($"// nodes {Player} {Case}: {d.Nodes} (exact {d.Exact}, winning {d.Winning})");
    }

    private Decision Decide()
    {
        IPlayer player = Player == "perfect" ? new PerfectPlayer() : new AlphaBetaPlayer(AlphaBetaCap, log2TableSize: 20);
        return player.Choose(_position, Side.Left, TimeSpan.FromMinutes(2));
    }

    [Benchmark]
    public long Choose() => Decide().Nodes;
}

/// <summary>
/// Empty Domineering rectangles solved by perfect for both first players (what <c>bramble solve
/// domineering RxC</c> does), each call from an empty memo and a fresh store.
/// </summary>
[Config(typeof(SlowBenchmarkConfig))]
public class PerfectRectangleBenchmarks
{
    [Params("4x4", "4x5", "5x5", "4x6", "5x6", "6x5", "6x6")]
    public string Board { get; set; } = "4x4";

    private IPosition _position = null!;

    [GlobalSetup]
    public void Setup()
    {
        _position = PlayerCases.Get(Board);
        var r = Solve();
        Console.WriteLine($"// {Board}: outcome {r.Outcome}, nodes {r.Nodes}, exact {r.Exact}");
    }

    private SolveReport Solve() => Solver.Solve(_position, [Side.Left, Side.Right], new PerfectPlayer(), TimeSpan.FromMinutes(3));

    [Benchmark]
    public long SolveBoth() => Solve().Nodes;
}

/// <summary>
/// One move of each temperature strategy, from a fresh player: hot forms sums, a Domineering sum
/// of eight regions (exact thermographs) and the empty 6×6 board (an estimated one).
/// </summary>
[Config(typeof(TemperatureMoveConfig))]
public class TemperatureMoveBenchmarks
{
    [Params("hotstrat", "thermostrat", "sentestrat")]
    public string Strategy { get; set; } = "thermostrat";

    [Params("hot8", "hot16", "regions8", "6x6")]
    public string Case { get; set; } = "hot8";

    private IPosition _position = null!;

    [GlobalSetup]
    public void Setup() => _position = PlayerCases.Get(Case);

    [Benchmark]
    public Move? ChooseMove() => Players.Create(Strategy).Choose(_position, Side.Left, TimeSpan.FromSeconds(30)).Move;
}

/// <summary>In-process, a handful of iterations: each call is milliseconds to a second.</summary>
public sealed class TemperatureMoveConfig : ManualConfig
{
    public TemperatureMoveConfig()
    {
        AddJob(Job.ShortRun.WithToolchain(InProcessEmitToolchain.Instance).WithId("Short"));
    }
}
