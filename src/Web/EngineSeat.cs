using Bramble.Values;
using Bramble.Wire.Client;
using Serilog;

namespace Bramble.Web;

/// <summary>
/// One engine of the user's own, spoken to through twine/1, one request at a time. For each move
/// asked of it the engine is told the game from its start (<c>begin</c>, then <c>apply</c> for
/// every move so far), so it never drifts from the page's game whatever tabs, undos and new games
/// came before. An engine that misbehaves is stopped, reported, and started afresh next time.
/// </summary>
public sealed class EngineSeat(EngineLaunch launch, IReadOnlyList<KeyValuePair<string, string>> settings) : IAsyncDisposable
{
    private static readonly TimeSpan s_reply = TimeSpan.FromSeconds(10);
    private readonly SemaphoreSlim _gate = new(1, 1);
    private EngineClient? _client;
    private Welcome? _welcome;

    public string Id => launch.Label;

    public async Task<string?> ChooseAsync(string ruleset, string start, IReadOnlyList<(Side Side, string Move)> moves, Side side, TimeSpan think, CancellationToken cancel)
    {
        await _gate.WaitAsync(cancel).ConfigureAwait(false);
        try
        {
            if (_client is null || !_client.IsUsable) await StartAsync(cancel).ConfigureAwait(false);
            if (!_welcome!.Supports(ruleset)) throw ApiException.Bad($"engine '{Id}' does not play {ruleset} (it plays {string.Join(", ", _welcome.Rulesets)})", "opponent");
            await _client!.BeginAsync(ruleset, start, s_reply, cancel).ConfigureAwait(false);
            foreach (var (s, m) in moves) await _client.ApplyAsync(s, m, s_reply, cancel).ConfigureAwait(false);
            long ms = (long)think.TotalMilliseconds;
            var result = await _client.ThinkAsync(side, ms, 0, think + s_reply, null, cancel).ConfigureAwait(false);
            return result.Move;
        }
        catch (EngineFailureException e)
        {
            Log.Warning("engine {Engine}: {Message}", Id, e.Message);
            await StopAsync().ConfigureAwait(false);
            throw new ApiException(502, $"engine '{Id}' failed: {e.Message}", "opponent");
        }
        catch (OperationCanceledException)
        {
            // The page gave up on the request: the engine owes a reply, so it is restarted next time.
            await StopAsync().ConfigureAwait(false);
            throw;
        }
        finally
        {
            _gate.Release();
        }
    }

    private async Task StartAsync(CancellationToken cancel)
    {
        await StopAsync().ConfigureAwait(false);
        _client = EngineClient.Start(launch, null, line => Log.Debug("engine {Engine} stderr: {Line}", Id, line));
        _welcome = await _client.HelloAsync(s_reply, cancel).ConfigureAwait(false);
        foreach (var (name, value) in settings) await _client.SetAsync(name, value, s_reply, cancel).ConfigureAwait(false);
    }

    private async Task StopAsync()
    {
        if (_client is null) return;
        var client = _client;
        _client = null;
        await client.CloseAsync().ConfigureAwait(false);
    }

    public async ValueTask DisposeAsync()
    {
        await StopAsync().ConfigureAwait(false);
        _gate.Dispose();
    }
}
