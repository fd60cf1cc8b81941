using BenchmarkDotNet.Attributes;
using Bramble.Rules;
using Bramble.Rules.Tests;

namespace Bramble.Bench;

/// <summary>
/// The reader fuzz of tests/Rules.Tests/ReaderFuzzTests.cs with a large count: 3,000 hostile
/// texts (deep nesting, huge texts, digit runs, binary junk, damaged positions) per ruleset and
/// run. A misbehaving reader fails the run with the cases that misbehaved.
/// </summary>
[SimpleJob(launchCount: 1, warmupCount: 0, iterationCount: 1, invocationCount: 1)]
public class ReaderFuzzBenchmarks
{
    [Params("hackenbush", "domineering", "forms")]
    public string Ruleset { get; set; } = "forms";

    [Benchmark]
    public int ThreeThousandHostileTexts()
    {
        var failures = ReaderFuzz.Run(Rulesets.Get(Ruleset), count: 3000, seed: 7);
        if (failures.Count > 0) throw new InvalidOperationException(string.Join("\n", failures.Take(10)));
        return failures.Count;
    }
}
