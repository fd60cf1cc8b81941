using System.Net.Http.Json;
using System.Text.Json;
using System.Text.Json.Nodes;
using Microsoft.AspNetCore.Builder;

namespace Bramble.Web.Tests;

/// <summary>
/// A real board on a free loopback port (Kestrel on 127.0.0.1:0, the bound address read back),
/// shared by the tests of a class, with a client for its API.
/// </summary>
public class BoardServer : IAsyncLifetime
{
    private WebApplication? _app;

    public string Address { get; private set; } = "";
    public HttpClient Client { get; private set; } = new();

    /// <summary>Engines file to start with; null for none.</summary>
    protected virtual EngineRoster Engines() => EngineRoster.None;

    public async Task InitializeAsync()
    {
        _app = WebBoard.Build(new BoardOptions(System.Net.IPAddress.Loopback, 0, Engines()));
        await _app.StartAsync();
        Address = WebBoard.Address(_app);
        Client = new HttpClient { BaseAddress = new Uri(Address), Timeout = TimeSpan.FromSeconds(60) };
    }

    public async Task DisposeAsync()
    {
        Client.Dispose();
        if (_app is not null)
        {
            await _app.StopAsync();
            await _app.DisposeAsync();
        }
    }

    /// <summary>POSTs an object and returns the status and the parsed JSON answer.</summary>
    public async Task<(int Status, JsonNode Body)> Post(string path, object body)
    {
        using var response = await Client.PostAsJsonAsync(path, body);
        var text = await response.Content.ReadAsStringAsync();
        return ((int)response.StatusCode, JsonNode.Parse(text)!);
    }

    public async Task<(int Status, JsonNode Body)> PostRaw(string path, string json)
    {
        using var response = await Client.PostAsync(path, new StringContent(json, System.Text.Encoding.UTF8, "application/json"));
        var text = await response.Content.ReadAsStringAsync();
        return ((int)response.StatusCode, JsonNode.Parse(text)!);
    }
}

/// <summary>A board started with an engines file naming this very program's random engine.</summary>
public sealed class BoardWithEngine : BoardServer
{
    public string Folder { get; } = Directory.CreateTempSubdirectory("bramble-web-engines").FullName;

    protected override EngineRoster Engines()
    {
        // The engine is `bramble engine`, started through dotnet from the test's output folder.
        var dll = Path.Combine(AppContext.BaseDirectory, "bramble.dll");
        var file = Path.Combine(Folder, "engines.json");
        File.WriteAllText(file, JsonSerializer.Serialize(new
        {
            engines = new[] { new { id = "gardener", run = new[] { "dotnet", dll, "engine", "--strategy", "random" } } },
        }));
        return EngineRoster.Load(file);
    }
}
