using System.Text;

namespace Bramble.Arena.Journal;

/// <summary>What a journal holds, and where its trustworthy part ends.</summary>
/// <param name="Records">The games, in file order (duplicates are left to <see cref="JournalMerge"/>).</param>
/// <param name="Notice">Set when an incomplete last line was ignored: what it was.</param>
/// <param name="ValidBytes">Length of the part that holds whole lines; a resumed run cuts the file there.</param>
/// <param name="NeedsNewline">The last record is whole but its newline is missing.</param>
public sealed record JournalContents(IReadOnlyList<GameRecord> Records, string? Notice, long ValidBytes, bool NeedsNewline)
{
    public static JournalContents Empty { get; } = new([], null, 0, false);
}

/// <summary>
/// Reads a journal. A harness killed in the middle of a write leaves at most one incomplete line,
/// at the very end and without its newline: that line is ignored and reported. Any other line
/// that is not a game record means the file was damaged or edited, and is an error naming the line.
/// The file is read a line at a time and no line may be longer than <see cref="MaxLineBytes"/>, so
/// a file that is no journal at all (a device such as /dev/zero, a large binary) is refused after
/// reading at most that much, not read to the end of memory.
/// </summary>
public static class JournalFile
{
    /// <summary>The longest journal line read: far above any game's (a position line is at most 1 MiB).</summary>
    public const int MaxLineBytes = 16 * 1024 * 1024;

    public static JournalContents Read(string path)
    {
        if (Directory.Exists(path)) throw new JournalFormatException($"{path} is a folder, not a journal");
        if (!File.Exists(path)) return JournalContents.Empty;
        using var stream = new FileStream(path, FileMode.Open, FileAccess.Read, FileShare.ReadWrite, 1 << 16);
        var records = new List<GameRecord>();
        var line = new MemoryStream();
        var buffer = new byte[1 << 16];
        long start = 0, offset = 0;
        var number = 0;
        int count;
        while ((count = stream.Read(buffer)) > 0)
        {
            var from = 0;
            while (from < count)
            {
                var newline = Array.IndexOf(buffer, (byte)'\n', from, count - from);
                var end = newline < 0 ? count : newline;
                if (line.Length + (end - from) > MaxLineBytes)
                    throw new JournalFormatException($"{path} line {number + 1}: longer than {MaxLineBytes / (1024 * 1024)} MiB: not a journal line");
                line.Write(buffer, from, end - from);
                offset += end - from;
                if (newline < 0) break;
                number++;
                offset++;
                Parse(path, number, line, records, complete: true);
                line.SetLength(0);
                start = offset;
                from = newline + 1;
            }
        }
        if (line.Length == 0) return new JournalContents(records, null, offset, false);
        number++;
        if (Parse(path, number, line, records, complete: false)) return new JournalContents(records, null, offset, true);
        if (Text(line).Trim().Length == 0) return new JournalContents(records, null, offset, false);
        var notice = $"{path} line {number}: an incomplete last line ({line.Length} bytes, left by an interrupted write) was ignored";
        return new JournalContents(records, notice, start, false);
    }

    private static string Text(MemoryStream line) =>
        Encoding.UTF8.GetString(line.GetBuffer(), 0, (int)line.Length).TrimEnd('\r');

    /// <summary>Adds the line's record; false for a last line without newline that is not one (blank lines are skipped).</summary>
    private static bool Parse(string path, int number, MemoryStream line, List<GameRecord> records, bool complete)
    {
        var text = Text(line);
        if (text.Trim().Length == 0) return complete;
        try
        {
            records.Add(JournalFormat.Parse(text));
            return true;
        }
        catch (JournalFormatException e)
        {
            if (complete) throw new JournalFormatException($"{path} line {number}: {e.Message}");
            return false;
        }
    }
}
