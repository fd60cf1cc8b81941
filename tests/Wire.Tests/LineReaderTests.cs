using System.Text;

namespace Bramble.Wire.Tests;

public class LineReaderTests
{
    private static List<InputLine> ReadAll(byte[] bytes, int limit = Codec.MaxLineBytes)
    {
        var reader = new LineReader(new MemoryStream(bytes), limit);
        var lines = new List<InputLine>();
        while (reader.ReadLine() is { } line) lines.Add(line);
        return lines;
    }

    private static byte[] Utf8(string text) => Encoding.UTF8.GetBytes(text);

    [Fact]
    public void SplitsOnNewlineAndAcceptsCarriageReturnNewline()
    {
        var lines = ReadAll(Utf8("hello twine 1\r\nbegin forms ↑ + *\nbye"));
        // docs/protocol.md: lines end in \n, \r\n accepted; a last line without terminator still counts.
        Assert.Equal(["hello twine 1", "begin forms ↑ + *", "bye"], lines.Select(l => l.Text));
    }

    [Fact]
    public void EmptyLinesAreKeptSoEachGetsItsReply()
    {
        var lines = ReadAll(Utf8("\n\r\nbye\n"));
        Assert.Equal(["", "", "bye"], lines.Select(l => l.Text));
    }

    [Fact]
    public void InvalidUtf8IsOneErrorAndTheNextLineReadsFine()
    {
        var bytes = Utf8("apply left e").Concat(new byte[] { 0xC3, 0x28 }).Concat(Utf8("\nbye\n")).ToArray();
        var lines = ReadAll(bytes);
        Assert.Equal(2, lines.Count);
        Assert.Equal(ErrorCodes.BadRequest, lines[0].Error!.Code);
        Assert.Contains("UTF-8", lines[0].Error!.Text);
        Assert.Equal("bye", lines[1].Text);
    }

    [Theory]
    [InlineData(new byte[] { 0xFF })]
    [InlineData(new byte[] { 0xC0, 0xAF })] // overlong encoding of '/'
    [InlineData(new byte[] { 0xED, 0xA0, 0x80 })] // an encoded surrogate
    [InlineData(new byte[] { 0xE2, 0x86 })] // truncated sequence
    public void EveryKindOfInvalidUtf8IsRejected(byte[] bad)
    {
        var lines = ReadAll(bad.Concat(Utf8("\n")).ToArray());
        Assert.Single(lines);
        Assert.False(lines[0].IsText);
    }

    [Fact]
    public void TwoMebibyteLineIsOneErrorAndReadingGoesOn()
    {
        var big = new byte[2 << 20];
        Array.Fill(big, (byte)'B');
        var bytes = Utf8("begin hackenbush ").Concat(big).Concat(Utf8("\nbye\n")).ToArray();
        var lines = ReadAll(bytes);
        Assert.Equal(2, lines.Count);
        Assert.Equal(ErrorCodes.BadRequest, lines[0].Error!.Code);
        Assert.Contains("longer than", lines[0].Error!.Text);
        Assert.Equal("bye", lines[1].Text);
    }

    [Fact]
    public void LineOfExactlyTheLimitIsAcceptedAndOneMoreByteIsNot()
    {
        var limit = 1000; // the same rule as 1 MiB, smaller so the test stays light
        var exact = new string('G', limit);
        var lines = ReadAll(Utf8(exact + "\r\n" + exact + "G\n" + exact), limit);
        Assert.Equal(3, lines.Count);
        Assert.Equal(exact, lines[0].Text);
        Assert.False(lines[1].IsText);
        Assert.Equal(exact, lines[2].Text);
    }

    [Fact]
    public void OverlongLastLineWithoutTerminatorStillGetsItsError()
    {
        var lines = ReadAll(Utf8(new string('R', 50)), limit: 10);
        Assert.Single(lines);
        Assert.False(lines[0].IsText);
    }

    [Fact]
    public void LinesSplitAcrossManySmallReadsAreJoined()
    {
        var reader = new LineReader(new TrickleStream(Utf8("think left clock=500 inc=10\nbye\n")));
        Assert.Equal("think left clock=500 inc=10", reader.ReadLine()!.Value.Text);
        Assert.Equal("bye", reader.ReadLine()!.Value.Text);
        Assert.Null(reader.ReadLine());
        Assert.Null(reader.ReadLine());
    }

    [Fact]
    public async Task AsyncReadingSeesTheSameLines()
    {
        var reader = new LineReader(new TrickleStream(Utf8("ok\npick e3\r\n")));
        Assert.Equal("ok", (await reader.ReadLineAsync())!.Value.Text);
        Assert.Equal("pick e3", (await reader.ReadLineAsync())!.Value.Text);
        Assert.Null(await reader.ReadLineAsync());
    }

    [Fact]
    public void WriterEndsEachLineWithNewlineInUtf8()
    {
        var sink = new MemoryStream();
        var writer = new LineWriter(sink);
        writer.Write(new ValueReply("⇑*", Bramble.Values.Outcome.N));
        writer.Write(new OkReply(2));
        Assert.Equal("value ⇑* outcome=N\nok components=2\n", Encoding.UTF8.GetString(sink.ToArray()));
    }

    /// <summary>Hands out one byte per read, like a slow pipe.</summary>
    private sealed class TrickleStream(byte[] bytes) : Stream
    {
        private int _at;
        public override int Read(byte[] buffer, int offset, int count)
        {
            if (_at >= bytes.Length || count == 0) return 0;
            buffer[offset] = bytes[_at++];
            return 1;
        }
        public override bool CanRead => true;
        public override bool CanSeek => false;
        public override bool CanWrite => false;
        public override long Length => bytes.Length;
        public override long Position { get => _at; set => throw new NotSupportedException(); }
        public override void Flush() { }
        public override long Seek(long offset, SeekOrigin origin) => throw new NotSupportedException();
        public override void SetLength(long value) => throw new NotSupportedException();
        public override void Write(byte[] buffer, int offset, int count) => throw new NotSupportedException();
    }
}
