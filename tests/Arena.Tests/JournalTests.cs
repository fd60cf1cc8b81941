using Bramble.Arena.Journal;
using Bramble.Values;

namespace Bramble.Arena.Tests;

public class JournalTests
{
    public static GameRecord Record(int game, string left = "pruner", string right = "gardener", Side winner = Side.Left,
        GameEnd end = GameEnd.NoMove, string position = "L3 + R2", Side first = Side.Right) => new()
    {
        Game = game,
        Pair = ["pruner", "gardener"],
        Left = left,
        Right = right,
        First = first,
        Ruleset = "heaps",
        Position = position,
        Moves = [new PlayedMove(first, "1.0", 41), new PlayedMove(first.Other(), "2.1", 7)],
        Winner = winner,
        End = end,
        Theory = Side.Left,
        Blunders = [new Blunder(2, right)],
        Analysed = 2,
    };

    [Fact]
    public void ALineHasTheSpecFieldsInOrder()
    {
        var line = JournalFormat.Write(Record(17) with { Position = "{3|-1} + ↑*" });
        // docs/matches.md: the field names and order of the journal line.
        Assert.Equal("""{"game":17,"pair":["pruner","gardener"],"left":"pruner","right":"gardener","first":"right","ruleset":"heaps","position":"{3|-1} + ↑*","moves":[{"side":"right","move":"1.0","ms":41},{"side":"left","move":"2.1","ms":7}],"winner":"left","end":"no-move","theory":"left","blunders":[{"ply":2,"by":"gardener"}],"analysed":2}""", line);
    }

    [Fact]
    public void RecordsSurviveTheRoundTrip()
    {
        foreach (var end in Enum.GetValues<GameEnd>())
        {
            var record = Record(3, end: end) with { Detail = end.IsForfeit() ? "gardener picked 'e99'" : null, Theory = end == GameEnd.Crash ? null : Side.Right };
            var back = JournalFormat.Parse(JournalFormat.Write(record));
            Assert.Equal(JournalFormat.Write(record), JournalFormat.Write(back));
            Assert.Null(back.ConflictWith(record));
        }
    }

    [Fact]
    public void AnIncompleteLastLineIsIgnoredAndReported()
    {
        using var folder = new TempFolder();
        var whole = JournalFormat.Write(Record(1)) + "\n" + JournalFormat.Write(Record(2)) + "\n";
        var path = folder.Write("j.jsonl", whole + JournalFormat.Write(Record(3))[..40]);
        var contents = JournalFile.Read(path);
        Assert.Equal([1, 2], contents.Records.Select(r => r.Game));
        Assert.Contains("line 3", contents.Notice);
        Assert.Equal(System.Text.Encoding.UTF8.GetByteCount(whole), contents.ValidBytes);

        // Reopening for a resumed run cuts the fragment off, so the next record starts a line of its own.
        using (var writer = JournalWriter.Open(path, contents)) writer.Append(Record(3));
        var again = JournalFile.Read(path);
        Assert.Null(again.Notice);
        Assert.Equal([1, 2, 3], again.Records.Select(r => r.Game));
    }

    [Fact]
    public void AWholeLastRecordWithoutItsNewlineIsKept()
    {
        using var folder = new TempFolder();
        var path = folder.Write("j.jsonl", JournalFormat.Write(Record(1)) + "\n" + JournalFormat.Write(Record(2)));
        var contents = JournalFile.Read(path);
        Assert.Equal([1, 2], contents.Records.Select(r => r.Game));
        Assert.True(contents.NeedsNewline);
        using (var writer = JournalWriter.Open(path, contents)) writer.Append(Record(3));
        Assert.Equal([1, 2, 3], JournalFile.Read(path).Records.Select(r => r.Game));
    }

    [Fact]
    public void ADamagedLineInTheMiddleIsAnErrorNamingTheLine()
    {
        using var folder = new TempFolder();
        var path = folder.Write("j.jsonl", JournalFormat.Write(Record(1)) + "\n{\"game\": 2, oops\n" + JournalFormat.Write(Record(3)) + "\n");
        var e = Assert.Throws<JournalFormatException>(() => JournalFile.Read(path));
        Assert.Contains("line 2", e.Message);
    }

    [Fact]
    public void MergeKeepsOneCopyOfAgreeingGames()
    {
        var a = new JournalContents([Record(1), Record(3)], null, 0, false);
        var b = new JournalContents([Record(2), Record(3) with { Moves = [new PlayedMove(Side.Right, "1.0", 999)] }], null, 0, false);
        var merged = JournalMerge.Merge([("a", a), ("b", b)]);
        Assert.Empty(merged.Conflicts);
        Assert.Equal([1, 2, 3], merged.Records.Select(r => r.Game));
        Assert.Single(merged.Notices);
    }

    [Fact]
    public void MergeRefusesAGameRecordedWithTwoResults()
    {
        var a = new JournalContents([Record(5, winner: Side.Left)], null, 0, false);
        var b = new JournalContents([Record(5, winner: Side.Right, end: GameEnd.Timeout)], null, 0, false);
        var c = new JournalContents([Record(5, position: "N9")], null, 0, false);
        var merged = JournalMerge.Merge([("a", a), ("b", b), ("c", c)]);
        Assert.Equal(2, merged.Conflicts.Count);
        Assert.Contains("two results", merged.Conflicts[0]);
        Assert.Contains("different game", merged.Conflicts[1]);
    }
}
