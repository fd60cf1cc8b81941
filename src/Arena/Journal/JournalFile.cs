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
/// </summary>
public static class JournalFile
{
    public static JournalContents Read(string path)
    {
        if (!File.Exists(path)) return JournalContents.Empty;
        var bytes = File.ReadAllBytes(path);
        var records = new List<GameRecord>();
        var start = 0;
        var number = 0;
        while (start < bytes.Length)
        {
            number++;
            var newline = Array.IndexOf(bytes, (byte)'\n', start);
            var end = newline < 0 ? bytes.Length : newline;
            var text = Encoding.UTF8.GetString(bytes, start, end - start).TrimEnd('\r');
            if (text.Trim().Length > 0)
            {
                try
                {
                    records.Add(JournalFormat.Parse(text));
                }
                catch (JournalFormatException e)
                {
                    if (newline >= 0)
                        throw new JournalFormatException($"{path} line {number}: {e.Message}");
                    var notice = $"{path} line {number}: an incomplete last line ({end - start} bytes, left by an interrupted write) was ignored";
                    return new JournalContents(records, notice, start, false);
                }
            }
            if (newline < 0) return new JournalContents(records, null, bytes.Length, text.Trim().Length > 0);
            start = newline + 1;
        }
        return new JournalContents(records, null, bytes.Length, false);
    }
}
