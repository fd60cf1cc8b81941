namespace Bramble.Wire.Tests;

// The host against docs/protocol.md, request by request, in process. Stalk values in the assess tests are
// derived from the definitions: L = {0|} = 1, R = -1, LR = {0|1} = 1/2, LRR = {0|1/2,1} = 1/4.
public class HostTests
{
    [Fact]
    public void HelloGetsWelcomeWithNameVersionAndRulesets()
    {
        var (_, lines) = Script.Run(Setups.WithPlayers(), "hello twine 1");
        Assert.Equal(["welcome name=bramble version=9.9.9 rulesets=stalks,endless"], lines);
    }

    [Fact]
    public void DefaultVersionComesFromTheAssemblyAsOneToken()
    {
        var version = new EngineSetup().Version;
        Assert.Matches(@"^[0-9][^ =+]*$", version);
    }

    [Fact]
    public void EveryRequestButHelloAndByeWaitsForTheHandshake()
    {
        var (exit, lines) = Script.Run(Setups.WithPlayers(),
            "set seed 3", "begin stalks L", "apply left 1.1", "think left clock=1000 inc=0", "assess", "hello twine 2", "assess", "bye");
        Assert.Equal(0, exit);
        Assert.Equal(8, lines.Count);
        Assert.All(lines.Take(5), l => Assert.StartsWith("err out-of-order ", l));
        Assert.StartsWith("err bad-request ", lines[5]); // a version this engine does not speak
        Assert.StartsWith("err out-of-order ", lines[6]); // so the session has still not started
        Assert.Equal("bye", lines[7]);
    }

    [Fact]
    public void HelloMayBeRepeated()
    {
        var replies = Script.Replies("hello twine 1", "begin stalks L", "hello twine 1", "assess");
        Assert.StartsWith("welcome ", replies[0]);
        Assert.Equal("ok components=1", replies[1]);
        Assert.StartsWith("welcome ", replies[2]);
        Assert.Equal("value 1 outcome=L", replies[3]); // the game survives a second hello
    }

    [Fact]
    public void SetAcceptsStrategyBudgetSeedAndAssessBudget()
    {
        var replies = Script.Replies("set strategy random", "set strategy RANDOM", "set budget-ms 250", "set seed -17", "set assess-ms 5");
        Assert.Equal(["ok", "ok", "ok", "ok", "ok"], replies);
    }

    [Theory]
    [InlineData("set colour blue", "unknown-setting")]
    [InlineData("set strategy cleverest", "bad-request")]
    [InlineData("set budget-ms 0", "bad-request")]
    [InlineData("set budget-ms -5", "bad-request")]
    [InlineData("set budget-ms soon", "bad-request")]
    [InlineData("set budget-ms 99999999999999", "bad-request")]
    [InlineData("set seed 1.5", "bad-request")]
    [InlineData("set seed 99999999999", "bad-request")]
    public void BadSettingsAreRefused(string line, string code)
    {
        var replies = Script.Replies(line);
        Assert.StartsWith($"err {code} ", Assert.Single(replies));
    }

    [Fact]
    public void UnknownSettingNamesTheKnownOnes()
    {
        var reply = Assert.Single(Script.Replies("set colour blue"));
        Assert.Contains("budget-ms", reply);
    }

    [Fact]
    public void BeginRepliesWithTheNumberOfComponents()
    {
        Assert.Equal(["ok components=3"], Script.Replies("begin stalks LRR + L + R"));
        Assert.Equal(["ok components=0"], Script.Replies("begin stalks 0"));
        Assert.Equal(["ok components=1"], Script.Replies("begin STALKS lr")); // ruleset names are matched like the CLI does
    }

    [Fact]
    public void BadPositionPointsAtTheColumn()
    {
        var reply = Assert.Single(Script.Replies("begin stalks LR+LX"));
        Assert.StartsWith("err bad-position column 5: expected L, R or +", reply);
        Assert.Contains("'X'", reply);
    }

    [Fact]
    public void UnknownRulesetIsABadPositionNamingTheKnownOnes()
    {
        var reply = Assert.Single(Script.Replies("begin chess rnbqkbnr"));
        Assert.StartsWith("err bad-position unknown ruleset 'chess'", reply);
        Assert.Contains("stalks", reply);
    }

    [Fact]
    public void FailedBeginEndsTheOldGame()
    {
        var replies = Script.Replies("begin stalks L", "begin stalks Q", "think left clock=100 inc=0");
        Assert.Equal("ok components=1", replies[0]);
        Assert.StartsWith("err bad-position ", replies[1]);
        Assert.StartsWith("err out-of-order ", replies[2]);
    }

    [Fact]
    public void ApplyPlaysLegalMovesAndRefusesOthers()
    {
        var replies = Script.Replies(
            "apply left 1.1",          // no game yet
            "begin stalks LRR+L",
            "apply left 1.2",          // piece 2 of stalk 1 is Right's: a move for the wrong side
            "apply left 3.1",          // no stalk 3
            "apply left e7",           // not a move of this ruleset
            "apply right 1.2",         // legal: LRR becomes L
            "apply right 1.1",         // Right moved last
            "apply left 1.1",
            "apply right 1.3",         // that piece fell with the cut at 1.2
            "assess");
        Assert.StartsWith("err out-of-order ", replies[0]);
        Assert.Equal("ok components=2", replies[1]);
        Assert.StartsWith("err bad-move '1.2' for left", replies[2]);
        Assert.StartsWith("err bad-move ", replies[3]);
        Assert.StartsWith("err bad-move ", replies[4]);
        Assert.Equal("ok", replies[5]);
        Assert.StartsWith("err bad-move right moved last", replies[6]);
        Assert.Equal("ok", replies[7]);
        Assert.StartsWith("err bad-move ", replies[8]);
        Assert.Equal("value 1 outcome=L", replies[9]); // only stalk 2, "L", is left
    }

    [Fact]
    public void ThinkNotesThenPicksALegalMove()
    {
        var (_, lines) = Script.Run(Setups.WithPlayers(), "hello twine 1", "begin stalks LRL+RR", "think right clock=5000 inc=50", "apply right 2.1", "assess");
        var pick = lines.FindIndex(l => l.StartsWith("pick ", StringComparison.Ordinal));
        Assert.True(pick > 2, "a pick after welcome and ok");
        Assert.StartsWith("note nodes=", lines[pick - 1]);
        // Right's pieces: stalk 1 height 2, stalk 2 heights 1 and 2.
        Assert.Contains(lines[pick], new[] { "pick 1.2", "pick 2.1", "pick 2.2" });
        Assert.Equal("ok", lines[pick + 1]);
    }

    [Fact]
    public void ThinkWithNoMovePicksNone()
    {
        Assert.Equal("pick none", Script.Replies("begin stalks LL", "think right clock=100 inc=0")[1]);
        Assert.Equal("pick none", Script.Replies("begin stalks 0", "think left")[1]);
    }

    [Fact]
    public void ThinkOutOfTurnOrBeforeBeginIsOutOfOrder()
    {
        var replies = Script.Replies("think left clock=100 inc=0", "begin stalks LR", "apply left 1.1", "think left clock=100 inc=0");
        Assert.StartsWith("err out-of-order no game", replies[0]);
        Assert.StartsWith("err out-of-order left moved last", replies[3]);
    }

    [Fact]
    public void AssessGivesValueAndOutcome()
    {
        var replies = Script.Replies("assess", "begin stalks LRR", "assess", "begin stalks LR + R", "assess", "begin stalks L+R", "assess");
        Assert.StartsWith("err out-of-order ", replies[0]);
        Assert.Equal("value 1/4 outcome=L", replies[2]);
        Assert.Equal("value -1/2 outcome=R", replies[4]);
        Assert.Equal("value 0 outcome=P", replies[6]);
    }

    [Fact]
    public void AssessOverBudgetIsNoValue()
    {
        var replies = Script.Replies("set assess-ms 20", "begin endless LR", "assess", "assess");
        Assert.StartsWith("err no-value no exact value within 20 ms", replies[2]);
        Assert.StartsWith("err no-value ", replies[3]);
    }

    [Fact]
    public void UnknownAndMalformedRequestsGetErrAndServingGoesOn()
    {
        var replies = Script.Replies("ponder", "think", "apply left", "begin stalks L", "assess");
        Assert.StartsWith("err unknown-request ", replies[0]);
        Assert.StartsWith("err bad-request ", replies[1]);
        Assert.StartsWith("err bad-request ", replies[2]);
        Assert.Equal("value 1 outcome=L", replies[4]);
    }

    [Fact]
    public void ByeAnswersByeAndStopsReading()
    {
        var (exit, lines) = Script.Run(Setups.WithPlayers(), "hello twine 1", "bye", "assess");
        Assert.Equal(0, exit);
        Assert.Equal("bye", lines[^1]);
        Assert.Equal(2, lines.Count);
    }

    [Fact]
    public void EndOfInputEndsTheSessionWithStatusZero()
    {
        var (exit, lines) = Script.Run(Setups.WithPlayers(), "hello twine 1", "begin stalks L");
        Assert.Equal(0, exit);
        Assert.Equal(2, lines.Count);
    }

    [Fact]
    public void HaltWithNothingPendingIsIgnored()
    {
        Assert.Equal(["ok components=1"], Script.Replies("halt", "begin stalks L", "halt"));
    }

    [Fact]
    public void CarriageReturnLineEndsAreAccepted()
    {
        var (_, lines) = Script.Run(Setups.WithPlayers(), System.Text.Encoding.UTF8.GetBytes("hello twine 1\r\nbegin stalks LR\r\nassess\r\n"));
        Assert.Equal("value 1/2 outcome=L", lines[^1]);
    }

    [Fact]
    public void BadBytesGetOneErrEachAndServingGoesOn()
    {
        var bytes = new List<byte>();
        void Line(byte[] b) { bytes.AddRange(b); bytes.Add((byte)'\n'); }
        Line("hello twine 1"u8.ToArray());
        Line([(byte)'a', (byte)'s', 0xFF, (byte)'s']);                    // invalid UTF-8
        Line("assess\u0001"u8.ToArray());                                   // a control character
        var big = new byte[2 << 20];                                        // a 2 MiB line
        Array.Fill(big, (byte)'L');
        Line("begin stalks "u8.ToArray().Concat(big).ToArray());
        Line("begin stalks L"u8.ToArray());
        Line("assess"u8.ToArray());
        var (_, lines) = Script.Run(Setups.WithPlayers(), bytes.ToArray());
        Assert.Equal(6, lines.Count);
        Assert.StartsWith("err bad-request invalid UTF-8", lines[1]);
        Assert.StartsWith("err bad-request column 7: control character U+0001", lines[2]);
        Assert.StartsWith("err bad-request line longer than", lines[3]);
        Assert.Equal("ok components=1", lines[4]);
        Assert.Equal("value 1 outcome=L", lines[5]);
    }
}
