using System.Text;
using Bramble.Rules;
using Bramble.Values;

namespace Bramble.Wire.Tests;

// `bramble engine` as a child process, walked through every request and every error reply of
// docs/protocol.md with the Domineering ruleset. Board facts used below are derived from the definitions:
// on 3x3 Left's domino at a1 covers a1 and a2, so Right's a1 (a1 and b1) is then illegal.
public class ConformanceTests
{
    [Fact]
    public void EveryRequestAndItsReplies()
    {
        using var engine = EngineProcess.Bramble("--strategy", "random", "--budget-ms", "300");
        Assert.StartsWith("err out-of-order ", engine.Ask("begin domineering 3x3"));
        var welcome = Codec.ParseReply(engine.Ask("hello twine 1")).Message as WelcomeReply;
        Assert.NotNull(welcome);
        Assert.Equal("bramble", welcome.Name);
        Assert.Matches("^[0-9]", welcome.Version);
        Assert.Contains("domineering", welcome.Rulesets);

        Assert.Equal("ok", engine.Ask("set strategy random"));
        Assert.Equal("ok", engine.Ask("set budget-ms 200"));
        Assert.Equal("ok", engine.Ask("set seed 5"));
        Assert.StartsWith("err unknown-setting ", engine.Ask("set colour blue"));
        Assert.StartsWith("err bad-request ", engine.Ask("set strategy cleverest"));

        Assert.StartsWith("err out-of-order ", engine.Ask("think left clock=1000 inc=0"));
        Assert.StartsWith("err bad-position ", engine.Ask("begin domineering 3x"));
        Assert.StartsWith("err bad-position unknown ruleset 'chess'", engine.Ask("begin chess 8x8"));
        Assert.Equal("ok components=1", engine.Ask("begin domineering 3x3"));

        Assert.Equal("ok", engine.Ask("apply left a1"));
        Assert.StartsWith("err bad-move ", engine.Ask("apply left c1"));  // left moved last
        Assert.StartsWith("err bad-move ", engine.Ask("apply right a1")); // a1 is filled
        Assert.StartsWith("err bad-move ", engine.Ask("apply right k9")); // off the board

        var notes = new List<string>();
        var pick = engine.Ask("think right clock=5000 inc=50", notes);
        Assert.NotEmpty(notes);
        Assert.All(notes, n => Assert.IsType<NoteReply>(Codec.ParseReply(n).Message));
        var move = Assert.IsType<PickReply>(Codec.ParseReply(pick).Message).Move;
        var board = Rulesets.Get("domineering").Parse("3x3");
        board = board.Play(Side.Left, board.ParseMove("a1"));
        Assert.Contains(board.ParseMove(move!), board.Moves(Side.Right));
        Assert.Equal("ok", engine.Ask("apply right " + move));

        var value = Assert.IsType<ValueReply>(Codec.ParseReply(engine.Ask("assess")).Message);
        Assert.False(string.IsNullOrWhiteSpace(value.Value));

        Assert.StartsWith("err unknown-request ", engine.Ask("ponder"));
        Assert.StartsWith("err bad-request ", engine.Ask("think upwards"));
        Assert.StartsWith("err bad-request ", engine.Ask("think left clock=soon"));

        // halt with nothing pending has no reply: the next reply belongs to the next request.
        engine.Send("halt");
        Assert.Equal("ok components=0", engine.Ask("begin domineering 1x1"));
        Assert.Equal("pick none", engine.Ask("think left"));
        engine.Send("think right clock=100 inc=0");
        engine.Send("halt");
        Assert.Equal("pick none", engine.FinalReply());

        Assert.Equal("bye", engine.Ask("bye"));
        Assert.Null(engine.Receive());
        Assert.Equal(0, engine.WaitForExit());
    }

    [Fact]
    public void AHackenbushGameThroughTheEngine()
    {
        using var engine = EngineProcess.Bramble("--strategy", "random");
        Assert.StartsWith("welcome ", engine.Ask("hello twine 1"));
        // Edge ids follow the text: BRR is e1 (blue), e2, e3 (red); GGG is e4, e5, e6.
        Assert.Equal("ok components=2", engine.Ask("begin hackenbush BRR + GGG"));
        // BRR = 1/4 by the sign-expansion rule, GGG = *3 (Winning Ways vol. 1 ch. 2; On Numbers and Games, §3); a positive number plus a nimber is positive.
        Assert.Equal("value 1/4*3 outcome=L", engine.Ask("assess"));
        Assert.StartsWith("err bad-move ", engine.Ask("apply right e1")); // a blue edge: a move for the wrong side
        Assert.StartsWith("err bad-move ", engine.Ask("apply left e9"));  // no such edge
        Assert.Equal("ok", engine.Ask("apply left e4"));                  // green: either side may cut it; the stalk above falls
        Assert.Equal("value 1/4 outcome=L", engine.Ask("assess"));
        Assert.StartsWith("err bad-move ", engine.Ask("apply right e5")); // fell with e4
        Assert.Equal("ok", engine.Ask("apply right e2"));
        Assert.Equal("value 1 outcome=L", engine.Ask("assess"));          // B = 1 (Winning Ways vol. 1 ch. 2; On Numbers and Games)
        Assert.Equal("pick e1", engine.Ask("think left clock=1000 inc=10")); // the only edge left
        Assert.StartsWith("err out-of-order ", engine.Ask("think right clock=1000 inc=10")); // right moved last
        Assert.Equal("ok", engine.Ask("apply left e1"));
        Assert.Equal("pick none", engine.Ask("think right clock=1000 inc=10")); // nothing left: right has lost
        Assert.Equal("value 0 outcome=P", engine.Ask("assess"));
        Assert.Equal("bye", engine.Ask("bye"));
    }

    [Fact]
    public void BadBytesAndOverlongLinesGetErrAndTheEngineKeepsServing()
    {
        using var engine = EngineProcess.Bramble("--strategy", "random");
        Assert.StartsWith("welcome ", engine.Ask("hello twine 1"));
        engine.SendBytes([.. "begin domineering 2x"u8, 0xC3, 0x28, (byte)'\n']);
        Assert.StartsWith("err bad-request invalid UTF-8", engine.FinalReply());
        Assert.StartsWith("err bad-request column 6: control character", engine.Ask("apply\tleft a1"));
        var big = new byte[2 << 20];
        Array.Fill(big, (byte)'.');
        engine.SendBytes([.. "begin domineering "u8, .. big, (byte)'\n']);
        Assert.StartsWith("err bad-request line longer than", engine.FinalReply());
        engine.SendBytes("assess\r\n"u8.ToArray());
        Assert.StartsWith("err out-of-order ", engine.FinalReply());
        Assert.Equal("ok components=1", engine.Ask("begin domineering 2x2"));
        Assert.Equal("value ±1 outcome=N", engine.Ask("assess")); // 2x2 Domineering is ±1 [from memory]; both sides have a move that leaves the other none
        engine.CloseInput();
        Assert.Null(engine.Receive());
        Assert.Equal(0, engine.WaitForExit()); // end of input is a normal end
    }

    [Fact]
    public void StdoutCarriesOnlyProtocolEvenWhenLoggingVerbosely()
    {
        var log = Path.Combine(Path.GetTempPath(), $"bramble-engine-{Guid.NewGuid():N}.log");
        try
        {
            using var engine = EngineProcess.Bramble("--strategy", "random", "--verbose", "--log", log);
            engine.Send("hello twine 1");
            engine.Send("begin domineering 3x4");
            engine.Send("think left clock=2000 inc=20");
            engine.Send("nonsense here");
            engine.Send("bye");
            var lines = new List<string>();
            while (engine.Receive() is { } line) lines.Add(line);
            Assert.Equal(0, engine.WaitForExit());
            Assert.All(lines, l => Assert.True(Codec.ParseReply(l).IsOk, $"not protocol on stdout: {l}"));
            Assert.Equal(5, lines.Count(l => !l.StartsWith("note ", StringComparison.Ordinal)));
            Assert.Contains("think", engine.Stderr); // the debug log went to stderr
            Assert.Contains("begin domineering", File.ReadAllText(log));
        }
        finally
        {
            File.Delete(log);
        }
    }

    [Theory]
    [InlineData("--strategy", "cleverest")]
    [InlineData("--budget-ms", "0")]
    [InlineData("--budget-ms", "soon")]
    [InlineData("--seed", "x")]
    [InlineData("--colour", "blue")]
    public void BadOptionsExitWithTwoAndPrintNothingOnStdout(string option, string value)
    {
        using var engine = EngineProcess.Bramble(option, value);
        engine.CloseInput();
        Assert.Null(engine.Receive());
        Assert.Equal(2, engine.WaitForExit());
        Assert.False(string.IsNullOrWhiteSpace(engine.Stderr));
    }

    [Fact]
    public void ShortFuzzAgainstTheChildProcess()
    {
        string[] positions = ["3x3", "2x2", "..#./..../....", "4x5", "1x1", "#./..", "2x", "../..."];
        var (input, lines) = FuzzLines.Session(new FuzzLines(seed: 77, positions, "domineering"), 2_000);
        using var engine = EngineProcess.Bramble("--strategy", "random", "--budget-ms", "50");
        // Written from another task: the engine answers while we write, and pipes are finite.
        var writer = new Thread(() =>
        {
            engine.SendBytes(input);
            engine.CloseInput();
        });
        writer.Start();
        var output = new MemoryStream();
        while (engine.Receive() is { } line) output.Write(Encoding.UTF8.GetBytes(line + "\n"));
        Assert.True(writer.Join(EngineProcess.Patience));
        Assert.Equal(0, engine.WaitForExit());
        FuzzLines.Verify(lines, output.ToArray());
    }
}
