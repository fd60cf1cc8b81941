using BenchmarkDotNet.Attributes;
using BenchmarkDotNet.Configs;
using BenchmarkDotNet.Engines;
using BenchmarkDotNet.Jobs;
using BenchmarkDotNet.Toolchains.InProcess.Emit;
using Bramble.Rules;
using Bramble.Rules.Database;
using Bramble.Rules.Domineering;

namespace Bramble.Bench;

/// <summary>
/// Benchmarks that take seconds per call: a few monitored iterations, run in the bench process
/// itself (building a separate benchmark project takes longer than BenchmarkDotNet's build
/// timeout on a busy 2-core machine).
/// </summary>
public sealed class SlowBenchmarkConfig : ManualConfig
{
    public SlowBenchmarkConfig()
    {
        AddJob(Job.Default.WithStrategy(RunStrategy.Monitoring).WithLaunchCount(1).WithWarmupCount(1).WithIterationCount(3)
            .WithToolchain(InProcessEmitToolchain.Instance).WithId("Slow"));
    }
}

/// <summary>As <see cref="SlowBenchmarkConfig"/>, but two measured runs and no warm-up (each run builds a whole database).</summary>
public sealed class OneRunConfig : ManualConfig
{
    public OneRunConfig()
    {
        AddJob(Job.Default.WithStrategy(RunStrategy.Monitoring).WithLaunchCount(1).WithWarmupCount(0).WithIterationCount(2)
            .WithToolchain(InProcessEmitToolchain.Instance).WithId("OneRun"));
    }
}

/// <summary>
/// Exact canonical values of empty Domineering rectangles, each run from an empty memo and a
/// fresh game store. These take seconds, so a few monitored iterations, not thousands.
/// </summary>
[Config(typeof(SlowBenchmarkConfig))]
public class DomineeringRectangleBenchmarks
{
    private readonly DomineeringRuleset _rules = new();

    [Params("4x4", "3x6", "4x5", "5x5")]
    public string Board { get; set; } = "4x4";

    /// <summary>One rectangle from nothing; returns the number of regions valued on the way.</summary>
    [Benchmark]
    public int Rectangle()
    {
        var context = new ValueContext();
        _rules.Value(_rules.Parse(Board), context);
        return context.Memo.Count;
    }
}

/// <summary>Every empty rectangle up to 4×5 in one memo (so smaller boards feed the larger).</summary>
[Config(typeof(SlowBenchmarkConfig))]
public class DomineeringAllRectanglesBenchmarks
{
    private readonly DomineeringRuleset _rules = new();

    [Benchmark]
    public int EveryRectangleUpTo4x5()
    {
        var context = new ValueContext();
        for (int rows = 1; rows <= 4; rows++)
            for (int columns = 1; columns <= 5; columns++)
                _rules.Value(_rules.Parse($"{rows}x{columns}"), context);
        return context.Memo.Count;
    }
}

/// <summary>
/// What <c>bramble db build domineering --cells N</c> does: value every region of up to N cells,
/// then encode the database file image (Brotli-compressed); returns the file size in bytes.
/// </summary>
[Config(typeof(OneRunConfig))]
public class DomineeringDatabaseBenchmarks
{
    private readonly DomineeringRuleset _rules = new();

    [Params(8, 10, 12)]
    public int Cells { get; set; } = 8;

    [Benchmark]
    public int BuildDatabase()
    {
        var context = new ValueContext();
        foreach (var region in _rules.ComponentsUpTo(Cells)) _rules.Value(region, context);
        return ComponentDatabase.Encode(context.Memo, context.Store, $"bench {Cells}").Length;
    }
}
