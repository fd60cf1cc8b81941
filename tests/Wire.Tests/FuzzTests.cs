namespace Bramble.Wire.Tests;

public class FuzzTests
{
    private static readonly string[] s_positions = ["L", "LR", "LRR+L", "RRL + LR + R", "LLLR+RRRL+LR+RL", "0", "lr+rl"];

    [Fact]
    public void HundredThousandRandomMutatedAndTruncatedLinesEachGetOneFinalReply()
    {
        // In process over in-memory streams, so 10^5 lines stay fast; seeded, so a failure reproduces.
        var setup = Setups.WithPlayers() with { Rulesets = [Setups.Stalks] };
        var (input, lines) = FuzzLines.Session(new FuzzLines(seed: 20240611, s_positions, "stalks"), 100_000);
        var output = new MemoryStream();
        var exit = new EngineHost(setup).Serve(new MemoryStream(input), output);
        Assert.Equal(0, exit);
        FuzzLines.Verify(lines, output.ToArray());
    }

    [Theory]
    [InlineData(1)]
    [InlineData(2)]
    [InlineData(3)]
    public void OtherSeedsToo(int seed)
    {
        var setup = Setups.WithPlayers() with { Rulesets = [Setups.Stalks] };
        var (input, lines) = FuzzLines.Session(new FuzzLines(seed, s_positions, "stalks"), 5_000);
        var output = new MemoryStream();
        Assert.Equal(0, new EngineHost(setup).Serve(new MemoryStream(input), output));
        FuzzLines.Verify(lines, output.ToArray());
    }
}
