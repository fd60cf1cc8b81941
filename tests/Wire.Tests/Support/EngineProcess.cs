using System.Diagnostics;
using System.Text;

namespace Bramble.Wire.Tests;

/// <summary>
/// An engine started as a child process from an argv array, as a harness starts it: the test
/// writes raw bytes to its stdin and reads its stdout line by line; stderr is collected apart, so
/// a test can check that nothing but protocol reached stdout. Waits carry a generous limit only so
/// a hung engine fails the test instead of hanging it.
/// </summary>
public sealed class EngineProcess : IDisposable
{
    public static readonly TimeSpan Patience = TimeSpan.FromSeconds(60);

    private readonly Process _process;
    private readonly LineReader _stdout;
    private readonly StringBuilder _stderr = new();

    public EngineProcess(string assembly, params string[] args)
    {
        var start = new ProcessStartInfo("dotnet")
        {
            RedirectStandardInput = true,
            RedirectStandardOutput = true,
            RedirectStandardError = true,
            UseShellExecute = false,
        };
        start.ArgumentList.Add(Path.Combine(AppContext.BaseDirectory, assembly));
        foreach (var arg in args) start.ArgumentList.Add(arg);
        _process = Process.Start(start) ?? throw new InvalidOperationException("could not start the engine");
        _process.ErrorDataReceived += (_, e) => { lock (_stderr) _stderr.AppendLine(e.Data); };
        _process.BeginErrorReadLine();
        _stdout = new LineReader(_process.StandardOutput.BaseStream);
    }

    /// <summary><c>bramble engine</c> with the given options.</summary>
    public static EngineProcess Bramble(params string[] options) => new("bramble.dll", ["engine", .. options]);

    /// <summary>The example engine of examples/RandomEngine.</summary>
    public static EngineProcess Example(int seed) => new("random-engine.dll", seed.ToString());

    public string Stderr { get { lock (_stderr) return _stderr.ToString(); } }

    public void Send(string line) => SendBytes(Encoding.UTF8.GetBytes(line + "\n"));

    public void SendBytes(byte[] bytes)
    {
        var stdin = _process.StandardInput.BaseStream;
        stdin.Write(bytes);
        stdin.Flush();
    }

    public void CloseInput() => _process.StandardInput.Close();

    /// <summary>The next stdout line, or null when stdout has ended. Every line must be valid UTF-8.</summary>
    public string? Receive()
    {
        var read = Task.Run(() => _stdout.ReadLine());
        Assert.True(read.Wait(Patience), $"the engine did not answer; stderr: {Stderr}");
        return read.Result is { } line ? line.Text ?? throw new InvalidDataException(line.Error!.Text) : null;
    }

    /// <summary>The next line that is not a note; the notes before it go to <paramref name="notes"/>.</summary>
    public string FinalReply(List<string>? notes = null)
    {
        while (true)
        {
            var reply = Receive() ?? throw new InvalidDataException($"the engine ended its output; stderr: {Stderr}");
            if (!reply.StartsWith("note ", StringComparison.Ordinal)) return reply;
            notes?.Add(reply);
        }
    }

    public string Ask(string line, List<string>? notes = null)
    {
        Send(line);
        return FinalReply(notes);
    }

    public int WaitForExit()
    {
        Assert.True(_process.WaitForExit(Patience), "the engine did not exit");
        _process.WaitForExit(); // lets the stderr reader drain
        return _process.ExitCode;
    }

    public bool HasExited => _process.HasExited;

    public void Dispose()
    {
        if (!_process.HasExited)
        {
            try { _process.Kill(); } catch (InvalidOperationException) { }
            _process.WaitForExit(Patience);
        }
        _process.Dispose();
    }
}
