using System.Collections.Concurrent;
using Bramble.Arena.Spec;
using Bramble.Wire.Client;
using Serilog;

namespace Bramble.Arena.Engines;

/// <summary>
/// Engine processes per player, reused from game to game while they stay healthy: starting a
/// process costs more than many games on small positions. An engine that crashed, answered
/// garbage or fell out of step is killed, and the next game of that player starts a fresh one.
/// The pool knows every process it started and kills every one of them (with its process tree)
/// when it is disposed or <see cref="KillAll"/> is called, also in the middle of a game.
/// </summary>
public sealed class EnginePool(MatchSpec spec, IReadOnlyList<string> self, EngineTimeouts timeouts, ClientLimits limits, ILogger log, string? database = null) : IAsyncDisposable
{
    private readonly ConcurrentDictionary<string, ConcurrentBag<Engine>> _idle = new(StringComparer.Ordinal);
    private readonly ConcurrentDictionary<int, EngineClient> _live = new();
    private int _started;

    /// <summary>Processes started so far (restarts included).</summary>
    public int Started => Volatile.Read(ref _started);

    /// <summary>Processes alive right now that the pool started.</summary>
    public IReadOnlyCollection<int> LiveProcessIds => _live.Keys.ToList();

    /// <summary>An idle healthy engine of the player, or a new one. Throws <see cref="EngineFailureException"/> when a new one cannot be started and greeted.</summary>
    public async Task<Engine> RentAsync(string playerId, CancellationToken cancel)
    {
        var bag = _idle.GetOrAdd(playerId, _ => []);
        while (bag.TryTake(out var idle))
        {
            if (idle.IsUsable) return idle;
            await DiscardAsync(idle).ConfigureAwait(false);
        }
        return await StartAsync(spec.Player(playerId), cancel).ConfigureAwait(false);
    }

    /// <summary>Gives an engine back after a game: kept when healthy, killed otherwise.</summary>
    public async Task ReturnAsync(Engine engine)
    {
        if (engine.IsUsable) _idle.GetOrAdd(engine.PlayerId, _ => []).Add(engine);
        else await DiscardAsync(engine).ConfigureAwait(false);
    }

    /// <summary>Kills the engine's process tree and forgets it.</summary>
    public async Task DiscardAsync(Engine engine)
    {
        _live.TryRemove(engine.Client.ProcessId, out _);
        await engine.Client.DisposeAsync().ConfigureAwait(false);
    }

    /// <summary>Kills every process the pool started, at once, without waiting (for Ctrl-C and fatal errors).</summary>
    public void KillAll()
    {
        foreach (var client in _live.Values) client.Kill();
    }

    public async ValueTask DisposeAsync()
    {
        // Idle engines are healthy: say bye so they exit on their own, then kill what remains.
        var idle = _idle.Values.SelectMany(b => b).ToList();
        _idle.Clear();
        await Task.WhenAll(idle.Select(e => e.Client.CloseAsync())).ConfigureAwait(false);
        foreach (var e in idle) _live.TryRemove(e.Client.ProcessId, out _);
        var rest = _live.Values.ToList();
        _live.Clear();
        await Task.WhenAll(rest.Select(c => c.DisposeAsync().AsTask())).ConfigureAwait(false);
    }

    private async Task<Engine> StartAsync(PlayerSpec player, CancellationToken cancel)
    {
        var launch = EngineCommand.Resolve(player, spec.Folder, self, database: database);
        var client = EngineClient.Start(launch, limits, line => log.Debug("{Player} stderr: {Line}", player.Id, line));
        _live[client.ProcessId] = client;
        Interlocked.Increment(ref _started);
        log.Debug("Started {Player} as process {Pid}: {Argv}", player.Id, client.ProcessId, launch.Argv);
        try
        {
            var welcome = await client.HelloAsync(timeouts.Start, cancel).ConfigureAwait(false);
            foreach (var (name, value) in player.Settings)
                await client.SetAsync(name, value, timeouts.Reply, cancel).ConfigureAwait(false);
            return new Engine(player.Id, client, welcome);
        }
        catch
        {
            _live.TryRemove(client.ProcessId, out _);
            await client.DisposeAsync().ConfigureAwait(false);
            throw;
        }
    }
}
