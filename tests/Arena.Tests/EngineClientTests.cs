using Bramble.Values;
using Bramble.Wire.Client;

namespace Bramble.Arena.Tests;

/// <summary>The harness's twine/1 client against real child processes (the fixture engine).</summary>
public class EngineClientTests
{
    private static readonly TimeSpan s_reply = TimeSpan.FromSeconds(20);

    private static async Task<EngineClient> StartedAsync(params string[] options)
    {
        var client = EngineClient.Start(FixtureProgram.Launch(options));
        await client.HelloAsync(s_reply);
        await client.BeginAsync("heaps", "L2 + R2 + N3", s_reply);
        return client;
    }

    [Fact]
    public async Task HandshakeAndGameIgnoreUnknownKeys()
    {
        await using var client = EngineClient.Start(FixtureProgram.Launch());
        // docs/protocol.md: unknown keys are ignored (the fixture adds colour= to welcome and spare= to ok).
        var welcome = await client.HelloAsync(s_reply);
        Assert.Equal("fixture-good", welcome.Name);
        Assert.Equal(["heaps"], welcome.Rulesets);
        Assert.True(welcome.Supports("heaps"));
        Assert.False(welcome.Supports("domineering"));
        Assert.Equal(3, await client.BeginAsync("heaps", "L2 + R2 + N3", s_reply));
        var think = await client.ThinkAsync(Side.Left, 1000, 10, s_reply);
        Assert.NotNull(think.Move);
        await client.ApplyAsync(Side.Left, think.Move!, s_reply);
        await client.CloseAsync();
        Assert.True(client.HasExited);
    }

    [Fact]
    public async Task AnErrReplyIsARefusalWithItsCode()
    {
        await using var client = EngineClient.Start(FixtureProgram.Launch());
        await client.HelloAsync(s_reply);
        var e = await Assert.ThrowsAsync<EngineFailureException>(() => client.BeginAsync("heaps", "Q7", s_reply));
        Assert.Equal(EngineFailureKind.Refused, e.Kind);
        Assert.Equal("bad-position", e.ErrorCode);
        Assert.True(client.IsUsable);
    }

    [Theory]
    [InlineData("hang", EngineFailureKind.Timeout)]
    [InlineData("crash", EngineFailureKind.Exited)]
    [InlineData("garbage", EngineFailureKind.BadReply)]
    [InlineData("huge", EngineFailureKind.BadReply)]
    public async Task MisbehaviourOnThinkIsClassified(string mode, EngineFailureKind kind)
    {
        await using var client = await StartedAsync("--mode", mode);
        // Only the hanging engine needs a short time-out; the others get time to do their worst.
        var timeout = TimeSpan.FromMilliseconds(mode == "hang" ? 300 : 20_000);
        var e = await Assert.ThrowsAsync<EngineFailureException>(() => client.ThinkAsync(Side.Left, (long)timeout.TotalMilliseconds, 0, timeout));
        Assert.Equal(kind, e.Kind);
        Assert.False(client.IsUsable);
    }

    [Fact]
    public async Task AWrongKindOfReplyIsABadReply()
    {
        await using var client = await StartedAsync("--mode", "wrong-kind");
        var move = (await client.ThinkAsync(Side.Left, 1000, 0, s_reply)).Move!;
        var e = await Assert.ThrowsAsync<EngineFailureException>(() => client.ApplyAsync(Side.Left, move, s_reply));
        Assert.Equal(EngineFailureKind.BadReply, e.Kind);
    }

    [Fact]
    public async Task ASlowThinkerIsBroughtBackInStepByHalt()
    {
        using var folder = new TempFolder();
        await using var client = await StartedAsync("--mode", "slow", "--delay-ms", "20000", "--once", folder.File("once"));
        var e = await Assert.ThrowsAsync<EngineFailureException>(() => client.ThinkAsync(Side.Left, 200, 0, TimeSpan.FromMilliseconds(200)));
        Assert.Equal(EngineFailureKind.Timeout, e.Kind);
        Assert.True(await client.RecoverAsync(TimeSpan.FromSeconds(10)));
        Assert.True(client.IsUsable);
        // In step again: the next request gets its own reply, not the owed one.
        await client.BeginAsync("heaps", "N1", s_reply);
        Assert.Equal("1.0", (await client.ThinkAsync(Side.Right, 1000, 0, s_reply)).Move);
    }

    [Fact]
    public async Task AnEngineThatIgnoresHaltStaysOutOfStep()
    {
        await using var client = await StartedAsync("--mode", "stubborn", "--delay-ms", "20000");
        await Assert.ThrowsAsync<EngineFailureException>(() => client.ThinkAsync(Side.Left, 200, 0, TimeSpan.FromMilliseconds(200)));
        Assert.False(await client.RecoverAsync(TimeSpan.FromMilliseconds(300)));
        Assert.False(client.IsUsable);
    }

    [Fact]
    public async Task NotesAndStderrArePassedOnAndOutputIsBounded()
    {
        var stderr = new List<string>();
        await using (var client = EngineClient.Start(FixtureProgram.Launch("--mode", "noisy"), stderrSink: line => { lock (stderr) stderr.Add(line); }))
        {
            await client.HelloAsync(s_reply);
            await client.BeginAsync("heaps", "L3", s_reply);
            var notes = new List<Bramble.Wire.NoteReply>();
            var think = await client.ThinkAsync(Side.Left, 1000, 0, s_reply, notes.Add);
            Assert.NotNull(think.Move);
            Assert.Equal(20, notes.Count);
            Assert.Equal("1800", notes[^2]["nodes"]);
            await client.CloseAsync();
        }
        lock (stderr) Assert.Contains("thinking hard, step 3", stderr);

        var small = ClientLimits.Default with { MaxRequestOutputBytes = 300 };
        await using var bounded = EngineClient.Start(FixtureProgram.Launch("--mode", "noisy"), small);
        await bounded.HelloAsync(s_reply);
        await bounded.BeginAsync("heaps", "L3", s_reply);
        var e = await Assert.ThrowsAsync<EngineFailureException>(() => bounded.ThinkAsync(Side.Left, 1000, 0, s_reply));
        Assert.Equal(EngineFailureKind.BadReply, e.Kind);
    }

    [Fact]
    public async Task AMissingProgramFailsToStart()
    {
        var e = Assert.Throws<EngineFailureException>(() => EngineClient.Start(new EngineLaunch(["/no/such/engine-program"], null, "ghost")));
        Assert.Equal(EngineFailureKind.StartFailed, e.Kind);
        await Task.CompletedTask;
    }

    [Fact]
    public async Task AnEngineThatExitsAtOnceIsReportedAsExited()
    {
        await using var client = EngineClient.Start(FixtureProgram.Launch("--mode", "exit-at-start"));
        var e = await Assert.ThrowsAsync<EngineFailureException>(() => client.HelloAsync(s_reply));
        Assert.Equal(EngineFailureKind.Exited, e.Kind);
    }

    [Fact]
    public async Task TheWholeProcessTreeIsKilledWhenDone()
    {
        using var folder = new TempFolder();
        var pids = folder.PidFolder();
        var client = EngineClient.Start(FixtureProgram.Launch("--mode", "spawn", "--pid-dir", pids));
        await client.HelloAsync(s_reply);
        // The engine and its sleeping child (which writes its id once it runs).
        WaitForFiles(pids, 2);
        await client.CloseAsync();
        Assert.Empty(FixtureProgram.SurvivorsAfterWait(pids));
    }

    [Fact]
    public async Task KillingAHungEngineKillsItsTree()
    {
        using var folder = new TempFolder();
        var pids = folder.PidFolder();
        var client = EngineClient.Start(FixtureProgram.Launch("--mode", "spawn", "--pid-dir", pids));
        await client.HelloAsync(s_reply);
        WaitForFiles(pids, 2);
        await client.DisposeAsync();
        Assert.Empty(FixtureProgram.SurvivorsAfterWait(pids));
    }

    private static void WaitForFiles(string folder, int count)
    {
        var deadline = DateTime.UtcNow + TimeSpan.FromSeconds(20);
        while (Directory.GetFiles(folder).Length < count && DateTime.UtcNow < deadline) Thread.Sleep(20);
        Assert.Equal(count, Directory.GetFiles(folder).Length);
    }
}
