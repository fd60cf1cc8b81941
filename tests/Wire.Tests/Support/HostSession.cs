using System.IO.Pipes;
using System.Text;
using Bramble.Search;

namespace Bramble.Wire.Tests;

/// <summary>
/// An <see cref="EngineHost"/> serving on its own thread over in-process pipes, so a test can send
/// a line, read the replies as they come, and send <c>halt</c> while a <c>think</c> is pending.
/// The waits carry a generous limit only so a broken host fails the test instead of hanging it.
/// </summary>
public sealed class HostSession : IDisposable
{
    public static readonly TimeSpan Patience = TimeSpan.FromSeconds(20);

    private readonly AnonymousPipeServerStream _toHost = new(PipeDirection.Out);
    private readonly AnonymousPipeClientStream _hostIn;
    private readonly AnonymousPipeServerStream _fromHost = new(PipeDirection.In);
    private readonly AnonymousPipeClientStream _hostOut;
    private readonly LineReader _replies;
    private readonly Thread _thread;
    private int _exit = -1;

    public HostSession(EngineSetup setup)
    {
        _hostIn = new AnonymousPipeClientStream(PipeDirection.In, _toHost.ClientSafePipeHandle);
        _hostOut = new AnonymousPipeClientStream(PipeDirection.Out, _fromHost.ClientSafePipeHandle);
        _replies = new LineReader(_fromHost);
        _thread = new Thread(() =>
        {
            _exit = new EngineHost(setup).Serve(_hostIn, _hostOut);
            _hostOut.Dispose(); // end of the host's output, as when a process exits
        }) { IsBackground = true };
        _thread.Start();
    }

    /// <summary>A session with the stalks ruleset and the given players (by strategy name), already greeted.</summary>
    public static HostSession Greeted(params (string Name, Func<IPlayer> Make)[] players)
    {
        var session = new HostSession(Setups.WithPlayers(players));
        session.Send("hello twine 1");
        Assert.StartsWith("welcome ", session.Receive());
        return session;
    }

    public void Send(string line) => SendBytes(Encoding.UTF8.GetBytes(line + "\n"));

    public void SendBytes(byte[] bytes)
    {
        _toHost.Write(bytes);
        _toHost.Flush();
    }

    /// <summary>Closes the host's input: end of input.</summary>
    public void CloseInput() => _toHost.Dispose();

    /// <summary>The next line from the host; null when its output has ended.</summary>
    public string? Receive()
    {
        var read = Task.Run(() => _replies.ReadLine());
        Assert.True(read.Wait(Patience), "the host did not answer");
        return read.Result is { } line ? line.Text ?? throw new InvalidDataException(line.Error!.Text) : null;
    }

    /// <summary>Sends a request and returns its final reply, collecting any notes before it.</summary>
    public string Ask(string line, List<string>? notes = null)
    {
        Send(line);
        return FinalReply(notes);
    }

    public string FinalReply(List<string>? notes = null)
    {
        while (true)
        {
            var reply = Receive() ?? throw new InvalidDataException("the host ended its output");
            if (!reply.StartsWith("note ", StringComparison.Ordinal)) return reply;
            notes?.Add(reply);
        }
    }

    /// <summary>Waits for the host to stop serving and returns its exit status.</summary>
    public int WaitForExit()
    {
        Assert.True(_thread.Join(Patience), "the host did not stop serving");
        return _exit;
    }

    public bool HasExited => !_thread.IsAlive;

    public void Dispose()
    {
        try { _toHost.Dispose(); } catch (IOException) { }
        _thread.Join(Patience);
        _fromHost.Dispose();
        _hostIn.Dispose();
    }
}
