using System.CommandLine;
using System.Net;
using Bramble.Web;
using Microsoft.Extensions.Hosting;

namespace Bramble.Cli;

/// <summary>
/// <c>bramble serve [--port N] [--listen ADDRESS] [--engines FILE]</c>: the browser board. Binds to
/// loopback unless told otherwise, prints its address, and serves until Ctrl-C.
/// </summary>
public static class ServeVerb
{
    public static Command Build()
    {
        var port = new Option<int>("--port") { Description = "Port to listen on (0: any free port)", DefaultValueFactory = _ => Bramble.Web.ReplayLink.DefaultPort, HelpName = "N" };
        var listen = new Option<string>("--listen") { Description = "Address to bind (default 127.0.0.1: this computer only)", DefaultValueFactory = _ => "127.0.0.1", HelpName = "ADDRESS" };
        var engines = new Option<FileInfo?>("--engines") { Description = "JSON file naming engines of your own (twine/1) the page may play against", HelpName = "FILE" };
        var command = new Command("serve", "Play, edit, analyse and replay in the browser (a page served by Bramble itself)") { port, listen, engines };
        command.SetAction(parse => Failures.Guard(() =>
        {
            int p = parse.GetValue(port);
            if (p is < 0 or > 65535) throw new InputException("--port takes a number from 0 to 65535");
            var text = parse.GetValue(listen)!;
            var address = text.Equals("localhost", StringComparison.OrdinalIgnoreCase) ? IPAddress.Loopback
                : IPAddress.TryParse(text, out var a) ? a
                : throw new InputException($"--listen takes an IP address such as 127.0.0.1 or 0.0.0.0, not '{text}'");
            EngineRoster roster;
            try
            {
                roster = parse.GetValue(engines) is { } file ? EngineRoster.Load(file.FullName) : EngineRoster.None;
            }
            catch (EngineListException e)
            {
                throw new InputException($"--engines: {e.Message}");
            }
            return Run(new BoardOptions(address, p, roster)).GetAwaiter().GetResult();
        }));
        return command;
    }

    private static async Task<int> Run(BoardOptions options)
    {
        var app = WebBoard.Build(options);
        try
        {
            await app.StartAsync();
        }
        catch (IOException e)
        {
            Console.Error.WriteLine($"could not listen on {options.Address}:{options.Port}: {e.Message} (choose another port with --port)");
            return Entry.JobFailed;
        }
        var url = WebBoard.Address(app);
        Console.Out.WriteLine($"Bramble board: {url}");
        if (!IPAddress.IsLoopback(options.Address))
            Console.Out.WriteLine("note: listening beyond this computer; anyone who can reach this address can use the board.");
        if (options.Engines.Ids.Count > 0) Console.Out.WriteLine($"engines you named: {string.Join(", ", options.Engines.Ids)}");
        Console.Out.WriteLine("open the address in a browser; Ctrl-C stops the board.");
        await app.WaitForShutdownAsync();
        return Entry.Success;
    }
}
