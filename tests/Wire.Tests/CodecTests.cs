using Bramble.Values;

namespace Bramble.Wire.Tests;

// The expected lines below are the shapes of docs/protocol.md (the project's own protocol table).
public class CodecTests
{
    public static TheoryData<string, Request> RequestLines => new()
    {
        { "hello twine 1", new HelloRequest(1) },
        { "set strategy thermostrat", new SetRequest("strategy", "thermostrat") },
        { "set budget-ms 250", new SetRequest("budget-ms", "250") },
        { "begin hackenbush BR + G(B,R)", new BeginRequest("hackenbush", "BR + G(B,R)") },
        { "begin domineering 6x7", new BeginRequest("domineering", "6x7") },
        { "begin forms {3|-1} + * + 1/2", new BeginRequest("forms", "{3|-1} + * + 1/2") },
        { "apply left e7", new ApplyRequest(Side.Left, "e7") },
        { "apply right 2.1", new ApplyRequest(Side.Right, "2.1") },
        { "think left clock=10000 inc=100", new ThinkRequest(Side.Left, 10000, 100) },
        { "think right clock=0 inc=0", new ThinkRequest(Side.Right, 0, 0) },
        { "think right", new ThinkRequest(Side.Right, null, null) },
        { "halt", new HaltRequest() },
        { "assess", new AssessRequest() },
        { "bye", new ByeRequest() },
    };

    [Theory]
    [MemberData(nameof(RequestLines))]
    public void RequestLineParsesToItsRecordAndFormatsBack(string line, Request expected)
    {
        var parsed = Codec.ParseRequest(line);
        Assert.Null(parsed.Error);
        Assert.Equal(expected, parsed.Message);
        Assert.Equal(line, Codec.Format(parsed.Message!));
    }

    public static TheoryData<string, Reply> ReplyLines => new()
    {
        { "welcome name=bramble version=0.1.0 rulesets=hackenbush,domineering,forms", new WelcomeReply("bramble", "0.1.0", ["hackenbush", "domineering", "forms"]) },
        { "welcome name=tiny version=1 rulesets=", new WelcomeReply("tiny", "1", []) },
        { "ok", new OkReply() },
        { "ok components=3", new OkReply(3) },
        { "err bad-move e9 is not an edge of this position", new ErrReply("bad-move", "e9 is not an edge of this position") },
        { "note nodes=1200 ms=14 value=1/2+↑* line=e3,e7", new NoteReply([new("nodes", "1200"), new("ms", "14"), new("value", "1/2+↑*"), new("line", "e3,e7")]) },
        { "pick e3", new PickReply("e3") },
        { "pick none", new PickReply(null) },
        { "value 1/2 + ↑* outcome=N", new ValueReply("1/2 + ↑*", Outcome.N) },
        { "value {2||1|0} outcome=L", new ValueReply("{2||1|0}", Outcome.L) },
        { "bye", new ByeReply() },
    };

    [Theory]
    [MemberData(nameof(ReplyLines))]
    public void ReplyLineParsesToItsRecordAndFormatsBack(string line, Reply expected)
    {
        var parsed = Codec.ParseReply(line);
        Assert.Null(parsed.Error);
        Assert.Equal(expected, parsed.Message);
        Assert.Equal(line, Codec.Format(parsed.Message!));
    }

    [Theory]
    [InlineData("think left inc=5 clock=70 colour=blue", 70L, 5L)] // pairs in any order, unknown keys ignored
    [InlineData("think left nodes=9", null, null)]
    public void ThinkTakesPairsInAnyOrderAndIgnoresUnknownKeys(string line, long? clock, long? inc)
    {
        var parsed = Codec.ParseRequest(line);
        Assert.Equal(new ThinkRequest(Side.Left, clock, inc), parsed.Message);
    }

    [Fact]
    public void UnknownKeysAreIgnoredOnBareRequestsAndReplies()
    {
        Assert.Equal(new HaltRequest(), Codec.ParseRequest("halt soon=yes").Message);
        Assert.Equal(new HelloRequest(1), Codec.ParseRequest("hello twine 1 author=garden-club").Message);
        Assert.Equal(new OkReply(), Codec.ParseReply("ok mood=fine").Message);
        Assert.Equal(new ValueReply("±1", Outcome.N), Codec.ParseReply("value ±1 temperature=1 outcome=N").Message);
        Assert.Equal(new WelcomeReply("x", "2", ["forms"]), Codec.ParseReply("welcome colour=green rulesets=forms version=2 name=x").Message);
    }

    [Fact]
    public void BeginKeepsThePositionVerbatimIncludingSpaces()
    {
        var parsed = Codec.ParseRequest("begin hackenbush [B0-1,R1-2] + G(B,R)  + BRR");
        // A double space inside the position is part of the position, not of the request's shape.
        Assert.Equal("[B0-1,R1-2] + G(B,R)  + BRR", ((BeginRequest)parsed.Message!).Position);
    }

    [Theory]
    [InlineData("fetch", "unknown-request")]
    [InlineData("HELLO twine 1", "unknown-request")] // words are lower case
    [InlineData("", "bad-request")]
    [InlineData("hello", "bad-request")]
    [InlineData("hello twine", "bad-request")]
    [InlineData("hello twine one", "bad-request")]
    [InlineData("hello rope 1", "bad-request")]
    [InlineData("set strategy", "bad-request")]
    [InlineData("begin hackenbush", "bad-request")]
    [InlineData("apply left", "bad-request")]
    [InlineData("apply up e3", "bad-request")]
    [InlineData("apply left e3 e4", "bad-request")]
    [InlineData("think", "bad-request")]
    [InlineData("think sideways clock=1 inc=1", "bad-request")]
    [InlineData("think left clock=-5 inc=0", "bad-request")]
    [InlineData("think left clock=1.5 inc=0", "bad-request")]
    [InlineData("think left clock= inc=0", "bad-request")]
    [InlineData("think left clock=99999999999999999999 inc=0", "bad-request")]
    [InlineData("think left clock=1 clock=2", "bad-request")]
    // docs/protocol.md: a repeated key is a bad request on every request, not only think.
    [InlineData("assess depth=1 depth=2", "bad-request")]
    [InlineData("hello twine 1 style=a style=b", "bad-request")]
    [InlineData("halt why=a why=a", "bad-request")]
    [InlineData("bye k=1 k=1", "bad-request")]
    [InlineData("apply left e3 k=1 k=2", "bad-request")]
    [InlineData("think left extra clock=1", "bad-request")]
    [InlineData("halt now", "bad-request")]
    [InlineData("bye bye", "bad-request")]
    [InlineData("assess  ", "bad-request")]
    [InlineData(" bye", "bad-request")]
    [InlineData("bye ", "bad-request")]
    [InlineData("apply  left e3", "bad-request")]
    [InlineData("apply left\te3", "bad-request")]
    [InlineData("bye\u0007", "bad-request")]
    [InlineData("apply left e\u00853", "bad-request")] // a C1 control character
    public void MalformedOrUnknownRequestsGetTheirCode(string line, string code)
    {
        var parsed = Codec.ParseRequest(line);
        Assert.Null(parsed.Message);
        Assert.Equal(code, parsed.Error!.Code);
        Assert.False(string.IsNullOrWhiteSpace(parsed.Error.Text));
    }

    [Fact]
    public void LoneSurrogateIsNotText()
    {
        // Built in code: test-data serialisation would turn a lone surrogate into U+FFFD.
        var line = "apply left e" + (char)0xD800 + "3";
        Assert.Equal(ErrorCodes.BadRequest, Codec.ParseRequest(line).Error!.Code);
    }

    [Fact]
    public void ErrorTextsPointAtTheColumn()
    {
        Assert.Contains("column 7", Codec.ParseRequest("apply sideways e3").Error!.Text);
        Assert.Contains("column 4", Codec.ParseRequest("bye\tnow").Error!.Text);
        Assert.Contains("U+0009", Codec.ParseRequest("bye\tnow").Error!.Text);
    }

    [Fact]
    public void AnErrorNeverEchoesAHugeTokenWhole()
    {
        var huge = new string('x', 100_000);
        var error = Codec.ParseRequest(huge).Error!;
        Assert.Equal(ErrorCodes.UnknownRequest, error.Code);
        Assert.True(error.Text.Length < 200, $"error text is {error.Text.Length} characters");
    }

    [Theory]
    [InlineData("")]
    [InlineData("pick")]
    [InlineData("pick e3 e4")]
    [InlineData("value outcome=N")]
    [InlineData("value 0")]
    [InlineData("value 0 outcome=Q")]
    [InlineData("value 0 outcome=N extra")]
    [InlineData("welcome version=1")]
    [InlineData("ok components=many")]
    [InlineData("err")]
    [InlineData("bestline e3")]
    [InlineData("pick\te3")]
    public void MalformedRepliesAreBadReplies(string line)
    {
        var parsed = Codec.ParseReply(line);
        Assert.Null(parsed.Message);
        Assert.Equal(ErrorCodes.BadReply, parsed.Error!.Code);
    }

    [Fact]
    public void ErrReplyWithoutTextIsAllowed()
    {
        Assert.Equal(new ErrReply("failed", ""), Codec.ParseReply("err failed").Message);
        Assert.Equal("err failed", Codec.Format(new ErrReply("failed", "")));
    }

    [Fact]
    public void FormatRefusesFieldsThatWouldBreakTheLine()
    {
        Assert.Throws<ArgumentException>(() => Codec.Format(new ApplyRequest(Side.Left, "e 3")));
        Assert.Throws<ArgumentException>(() => Codec.Format(new BeginRequest("hackenbush", "BR\nbye")));
        Assert.Throws<ArgumentException>(() => Codec.Format(new PickReply("")));
        Assert.Throws<ArgumentException>(() => Codec.Format(new NoteReply([new("value", "1/2 + *")])));
        Assert.Throws<ArgumentException>(() => Codec.Format(new ThinkRequest(Side.Left, -1, 0)));
    }

    [Fact]
    public void ErrTextsAreFlattenedToOneLine()
    {
        Assert.Equal("err bad-position BRX ^ expected B, R or G", Codec.Format(new ErrReply("bad-position", "BRX\n^ expected B, R or G")));
    }
}
