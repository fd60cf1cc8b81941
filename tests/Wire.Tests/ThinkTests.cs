namespace Bramble.Wire.Tests;

// think and halt, over live pipes so a halt can arrive while the player is still thinking.
public class ThinkTests
{
    [Fact]
    public void HaltMakesThePendingThinkAnswerAtOnce()
    {
        var patient = new PatientPlayer();
        using var session = HostSession.Greeted(("patient", () => patient));
        Assert.Equal("ok", session.Ask("set budget-ms 600000")); // it would think for ten minutes
        Assert.Equal("ok components=2", session.Ask("begin stalks LR+RL"));
        session.Send("think left");
        Assert.True(patient.Started.Wait(HostSession.Patience));
        session.Send("halt");
        var notes = new List<string>();
        Assert.Equal("pick 1.1", session.FinalReply(notes));
        // The note carries the player's report, its value written without spaces.
        Assert.Equal("note nodes=7 ms=0 value=1/2+↑* line=1.1,2.1 exact=false", Assert.Single(notes));
        Assert.Equal("ok", session.Ask("apply left 1.1"));
    }

    [Fact]
    public void RequestsSentDuringAThinkAreAnsweredAfterThePickAndAHaltBehindThemStillCounts()
    {
        var patient = new PatientPlayer();
        using var session = HostSession.Greeted(("patient", () => patient));
        session.Ask("set budget-ms 600000");
        session.Ask("begin stalks LR+RL");
        session.Send("think right");
        session.Send("assess");
        session.Send("fetch");
        session.Send("halt"); // sent after two requests that have to wait for the pick
        Assert.Equal("pick 1.2", session.FinalReply());
        Assert.Equal("value 0 outcome=P", session.FinalReply()); // 1/2 + -1/2, derived from the definitions
        Assert.StartsWith("err unknown-request ", session.FinalReply());
    }

    [Fact]
    public void HaltSentRightAfterThinkIsNotLost()
    {
        var patient = new PatientPlayer();
        using var session = HostSession.Greeted(("patient", () => patient));
        session.Ask("set budget-ms 600000");
        // All in one write: the halt is read long before the think has started.
        session.SendBytes("begin stalks LR\nthink left\nhalt\nassess\n"u8.ToArray());
        Assert.Equal("ok components=1", session.FinalReply());
        Assert.Equal("pick 1.1", session.FinalReply());
        Assert.Equal("value 1/2 outcome=L", session.FinalReply());
    }

    [Fact]
    public void HaltDoesNotReachAThinkSentAfterIt()
    {
        var patient = new PatientPlayer();
        using var session = HostSession.Greeted(("patient", () => patient));
        session.Ask("set budget-ms 600000");
        session.Ask("begin stalks LR");
        session.SendBytes("halt\nthink left\n"u8.ToArray());
        Assert.True(patient.Started.Wait(HostSession.Patience));
        Assert.False(patient.HaltedOnEntry);
        // Still thinking a little later (a wrongly applied halt would have ended it at once); a second halt ends it.
        Assert.False(patient.Returned.Wait(50));
        session.Send("halt");
        Assert.Equal("pick 1.1", session.FinalReply());
    }

    [Fact]
    public void ByeDuringAThinkHaltsItAnswersItAndSaysBye()
    {
        var patient = new PatientPlayer();
        using var session = HostSession.Greeted(("patient", () => patient));
        session.Ask("set budget-ms 600000");
        session.Ask("begin stalks RL");
        session.Send("think right");
        Assert.True(patient.Started.Wait(HostSession.Patience));
        session.Send("bye");
        Assert.Equal("pick 1.1", session.FinalReply());
        Assert.Equal("bye", session.FinalReply());
        Assert.Equal(0, session.WaitForExit());
    }

    [Fact]
    public void EndOfInputDuringAThinkStillAnswersIt()
    {
        var patient = new PatientPlayer();
        using var session = HostSession.Greeted(("patient", () => patient));
        session.Ask("set budget-ms 600000");
        session.Ask("begin stalks RL");
        session.Send("think right");
        Assert.True(patient.Started.Wait(HostSession.Patience));
        session.CloseInput();
        Assert.Equal("pick 1.1", session.FinalReply());
        Assert.Equal(0, session.WaitForExit());
    }

    [Fact]
    public void APlayerThatIgnoresBudgetAndHaltIsAnsweredForWithALegalMove()
    {
        var made = new List<StubbornPlayer>();
        using var session = HostSession.Greeted(("stubborn", () => { var p = new StubbornPlayer(); lock (made) made.Add(p); return p; }));
        session.Ask("set budget-ms 20");
        session.Ask("begin stalks LR+L");
        var notes = new List<string>();
        Assert.Equal("pick 1.1", session.Ask("think left", notes)); // the first legal move in the ruleset's order
        Assert.Contains("fallback=ignored-halt", Assert.Single(notes));
        // The abandoned player may still be running, so the next think gets a fresh one.
        session.Ask("apply left 1.1");
        session.Ask("apply right 1.2"); // refused: that piece fell with the cut
        Assert.Equal("pick none", session.Ask("think right"));
        lock (made)
        {
            Assert.Equal(2, made.Count);
            foreach (var player in made) player.Release.Set();
        }
    }

    [Fact]
    public void AnIllegalChoiceIsReplacedByALegalMove()
    {
        var notes = new List<string>();
        using var session = HostSession.Greeted(("liar", () => new LiarPlayer()));
        session.Ask("begin stalks RRL");
        Assert.Equal("pick 1.1", session.Ask("think right clock=1000 inc=0", notes));
        Assert.Contains("fallback=illegal-choice", Assert.Single(notes));
    }

    [Fact]
    public void APlayerThatThrowsIsReplacedByALegalMoveAndServingGoesOn()
    {
        var notes = new List<string>();
        using var session = HostSession.Greeted(("crashing", () => new CrashingPlayer()));
        session.Ask("begin stalks LLR");
        Assert.Equal("pick 1.1", session.Ask("think left clock=1000 inc=0", notes));
        Assert.Contains("fallback=player-failed", Assert.Single(notes));
        Assert.Equal("value 3/2 outcome=L", session.Ask("assess")); // LLR = {0,1|2} = {1|2} = 3/2, derived from the definitions
    }

    [Fact]
    public void ThinkHandsThePlayerTheBudgetOfTheTimeRule()
    {
        var patient = new PatientPlayer();
        using var session = HostSession.Greeted(("patient", () => patient));
        session.Ask("set budget-ms 60000");
        session.Ask("begin stalks LLLLLLLLLL+RRRRRRRRRR"); // size 20, so 10 moves to go
        session.Send("think left clock=10050 inc=400");
        Assert.True(patient.Started.Wait(HostSession.Patience));
        session.Send("halt");
        session.FinalReply();
        // usable = 10050 − 50 − 502 = 9498; 9498 / 10 + 400 · 3/4 = 949 + 300 (the rule in MoveBudget)
        Assert.True(patient.Budgets.TryDequeue(out var budget));
        Assert.Equal(TimeSpan.FromMilliseconds(1249), budget);
    }
}
