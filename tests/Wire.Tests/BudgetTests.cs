namespace Bramble.Wire.Tests;

/// <summary>
/// The real engine's budgets on a position whose exact value takes minutes: a long random
/// blue-red-green stalk (mixed ordinal sums make its canonical form grow fast with its length).
/// Every reply must come back; EngineProcess fails the test when one takes longer than its
/// generous patience. No durations are asserted.
/// </summary>
public class BudgetTests
{
    private static string MixedStalk(int edges, int seed)
    {
        var random = new Random(seed);
        return new string(Enumerable.Range(0, edges).Select(_ => "BRG"[random.Next(3)]).ToArray());
    }

    [Fact]
    public void AssessKeepsToAssessMsOnALongMixedStalk()
    {
        using var engine = EngineProcess.Bramble();
        Assert.StartsWith("welcome ", engine.Ask("hello twine 1"));
        Assert.Equal("ok", engine.Ask("set assess-ms 200"));
        Assert.StartsWith("ok", engine.Ask("begin hackenbush " + MixedStalk(400, 9)));
        // docs/protocol.md: an exact value, or err no-value when there is none within assess-ms.
        var reply = engine.Ask("assess");
        Assert.True(reply.StartsWith("value ", StringComparison.Ordinal) || reply.StartsWith("err no-value ", StringComparison.Ordinal), reply);
        Assert.Equal("bye", engine.Ask("bye"));
    }

    [Theory]
    [InlineData("perfect")]
    [InlineData("thermostrat")]
    [InlineData("hotstrat")]
    [InlineData("sentestrat")]
    [InlineData("alphabeta")]
    public void ThinkKeepsToItsClockOnALongMixedStalk(string strategy)
    {
        using var engine = EngineProcess.Bramble("--strategy", strategy);
        Assert.StartsWith("welcome ", engine.Ask("hello twine 1"));
        Assert.StartsWith("ok", engine.Ask("begin hackenbush " + MixedStalk(400, 9)));
        Assert.StartsWith("pick e", engine.Ask("think left clock=1000 inc=0"));
        Assert.Equal("bye", engine.Ask("bye"));
    }

    [Fact]
    public void TheEngineExitsAtEndOfInputWhileThinking()
    {
        // A harness that dies (kill -9 included) closes the engine's input: the engine must not stay
        // behind thinking for nobody, however long its budget.
        using var engine = EngineProcess.Bramble("--strategy", "perfect", "--budget-ms", "600000");
        Assert.StartsWith("welcome ", engine.Ask("hello twine 1"));
        Assert.StartsWith("ok", engine.Ask("begin hackenbush " + MixedStalk(1000, 7)));
        engine.Send("think left");
        engine.CloseInput();
        Assert.Equal(0, engine.WaitForExit());
    }
}
