using System.Text.Json;
using Bramble.Rules;
using Bramble.Values;
using Bramble.Web.Api;
using Microsoft.AspNetCore.Builder;
using Microsoft.AspNetCore.Hosting;
using Microsoft.AspNetCore.Hosting.Server;
using Microsoft.AspNetCore.Hosting.Server.Features;
using Microsoft.AspNetCore.Http;
using Microsoft.Extensions.DependencyInjection;
using Microsoft.Extensions.Hosting;
using Microsoft.Extensions.Logging;
using Serilog;

namespace Bramble.Web;

/// <summary>
/// The browser board: the page's files and a small JSON API (docs/web.md). Requests are
/// translated into calls on Rules, Search, Values, Pictures and the Arena's journal reader; no
/// game logic lives here.
/// </summary>
public static class WebBoard
{
    public static readonly JsonSerializerOptions Json = new(JsonSerializerDefaults.Web)
    {
        PropertyNamingPolicy = JsonNamingPolicy.SnakeCaseLower,
        Encoder = System.Text.Encodings.Web.JavaScriptEncoder.UnsafeRelaxedJsonEscaping,
        DefaultIgnoreCondition = System.Text.Json.Serialization.JsonIgnoreCondition.Never,
    };

    public static WebApplication Build(BoardOptions options)
    {
        var builder = WebApplication.CreateSlimBuilder(new WebApplicationOptions
        {
            ApplicationName = typeof(WebBoard).Assembly.GetName().Name,
            ContentRootPath = AppContext.BaseDirectory,
        });
        builder.Logging.ClearProviders();
        builder.WebHost.UseKestrel(k => k.Listen(options.Address, options.Port));
        var app = builder.Build();
        var files = new EmbeddedFiles();
        var contexts = new ContextPool();
        var analysis = new Analysis(contexts);
        var opponents = new Opponents(contexts, options.Engines);
        var journals = new Journals(contexts);
        var composing = new Composing(contexts);
        app.Lifetime.ApplicationStopping.Register(() => options.Engines.DisposeAsync().AsTask().Wait(TimeSpan.FromSeconds(5)));

        app.Use(async (http, next) =>
        {
            try
            {
                await next(http);
            }
            catch (Exception e) when (Reply(e) is { } reply && !http.Response.HasStarted)
            {
                http.Response.StatusCode = reply.Status;
                await http.Response.WriteAsJsonAsync(reply.Body, Json, http.RequestAborted);
            }
        });

        app.MapGet("/api/setup", () => Results.Json(new SetupReply(
            Rulesets.All.Select(Examples.For).ToList(), opponents.Strategies, Levels.Choices, opponents.Engines), Json));
        Post<GameRequest>(app, "/api/board", (r, _) => Task.FromResult<object>(BoardView.Of(GameReplay.Rebuild(r))));
        Post<PlayRequest>(app, "/api/play", async (r, cancel) =>
        {
            var game = GameReplay.Rebuild(r);
            if (r.Move is not null) game = game.With(r.Move, "move");
            ReplyMove? reply = null;
            if (r.Opponent is { Length: > 0 } opponent && !game.Over
                && game.ToMove == GameReplay.Side(r.Computer, "computer", game.ToMove.Other()) && (r.Move is not null || r.Computer is not null))
                (game, reply) = await opponents.ReplyAsync(game, opponent, Levels.Budget(r.Level), cancel);
            return new PlayReply(BoardView.Of(game), reply);
        });
        Post<AnalyseRequest>(app, "/api/analyse", (r, cancel) =>
            Task.Run<object>(() => analysis.Analyse(GameReplay.Rebuild(r), Analysis.Budget(r.BudgetMs), cancel), cancel));
        Post<AnalyseRequest>(app, "/api/hint", (r, cancel) =>
            Task.Run<object>(() => analysis.Hint(GameReplay.Rebuild(r), Analysis.Budget(r.BudgetMs), cancel), cancel));
        Post<ThermographRequest>(app, "/api/thermograph", (r, cancel) =>
            Task.Run<object>(() => analysis.Thermograph(r, Analysis.DefaultBudgetMs, cancel), cancel));
        Post<DescribeRequest>(app, "/api/describe", (r, _) => Task.FromResult<object>(Editor.Describe(r)));
        Post<ComposeRequest>(app, "/api/compose", (r, cancel) => Task.Run<object>(() => composing.Compose(r, cancel), cancel));
        Post<JournalRequest>(app, "/api/journal", (r, _) => Task.FromResult<object>(Journals.Read(r.Text)));
        Post<AnalyseRequest>(app, "/api/replay", (r, cancel) => Task.Run<object>(() => journals.Replay(r, cancel), cancel));
        app.Map("/api/{**rest}", (HttpContext http) =>
            Results.Json(new ErrorReply($"no such API: {http.Request.Method} {http.Request.Path}"), Json, statusCode: 404));

        app.MapGet("/{**path}", (string? path) =>
        {
            var name = string.IsNullOrEmpty(path) ? "index.html" : path;
            return files.TryGet(name, out var bytes, out var type)
                ? Results.Bytes(bytes, type)
                : Results.Json(new ErrorReply($"no such file: /{path}"), Json, statusCode: 404);
        });
        return app;
    }

    /// <summary>The address the board listens on, as a URL (after StartAsync; port 0 becomes the real port).</summary>
    public static string Address(WebApplication app) =>
        app.Services.GetRequiredService<IServer>().Features.Get<IServerAddressesFeature>()!.Addresses.First();

    /// <summary>
    /// A POST endpoint whose body is read here rather than by the framework, so malformed JSON
    /// gets a message with the JSON path at fault instead of a bare 400.
    /// </summary>
    private static void Post<T>(WebApplication app, string route, Func<T, CancellationToken, Task<object>> handle) where T : class
    {
        app.MapPost(route, async (HttpContext http) =>
        {
            T? request;
            try
            {
                request = await JsonSerializer.DeserializeAsync<T>(http.Request.Body, Json, http.RequestAborted);
            }
            catch (JsonException e)
            {
                throw ApiException.Bad($"the request is not the JSON expected: {e.Message.Split(" Path:")[0]}", e.Path);
            }
            if (request is null) throw ApiException.Bad("the request body must be a JSON object");
            var answer = await handle(request, http.RequestAborted);
            return Results.Json(answer, Json);
        });
    }

    private sealed record Failure(int Status, ErrorReply Body);

    /// <summary>The HTTP answer for an error people can act on; null lets anything else become a 500.</summary>
    private static Failure? Reply(Exception e)
    {
        switch (e)
        {
            case ApiException a:
                return new Failure(a.Status, new ErrorReply(a.Message, a.Path));
            case PositionSyntaxException p:
                return new Failure(400, new ErrorReply($"bad position: column {p.Column + 1}: expected {p.Expected}", null, p.Column + 1, p.Text, p.Expected));
            case ValueSyntaxException v:
                return new Failure(400, new ErrorReply($"bad value: column {v.Column + 1}: expected {v.Expected}", null, v.Column + 1, v.Text, v.Expected));
            case IllegalMoveException m:
                return new Failure(400, new ErrorReply(m.Message));
            case BadHttpRequestException b:
                return new Failure(b.StatusCode, new ErrorReply(b.Message));
            case OperationCanceledException:
                return new Failure(499, new ErrorReply("the request was cancelled"));
            case ArgumentException a:
                return new Failure(400, new ErrorReply(a.Message));
            default:
                Log.Error(e, "request failed");
                return null;
        }
    }
}
