using System.Text;

namespace Bramble.Arena.Journal;

/// <summary>
/// Keeps a second run off a journal while one is writing it: two runs appending to one file
/// interleave their lines and each skips games the other is playing, so the journal ends up
/// damaged. The lock is an exclusive lock on a small file beside the journal (<c>&lt;journal&gt;.lock</c>),
/// taken before the journal is read and held until the run ends; the holder writes its process id
/// into it so the refused run can name it. The operating system drops the lock when its holder
/// dies, kill -9 included, so a lock file left behind never blocks a later run. The lock file is
/// not deleted on release: removing it while another run waits on it would let two runs hold
/// locks on two different files of the same name.
/// </summary>
public sealed class JournalLock : IDisposable
{
    private readonly FileStream _stream;

    private JournalLock(FileStream stream, string journal)
    {
        _stream = stream;
        Journal = journal;
    }

    public string Journal { get; }

    public static string LockPathOf(string journal) => journal + ".lock";

    /// <summary>Takes the lock on <paramref name="journal"/>, or throws <see cref="JournalInUseException"/> at once when another run holds it.</summary>
    public static JournalLock Take(string journal)
    {
        var path = LockPathOf(journal);
        // The file stays open to readers (so the refused run can read the holder's process id); the
        // exclusive part is a lock on its first byte (a lock of the open file on Unix, so two runs
        // in one process exclude each other too).
        // (macOS has no byte-range locks here: there the whole file is opened exclusively, and the
        // refused run cannot read the id.)
        var macOS = OperatingSystem.IsMacOS();
        FileStream stream;
        try
        {
            stream = new FileStream(path, FileMode.OpenOrCreate, FileAccess.ReadWrite, macOS ? FileShare.None : FileShare.ReadWrite);
        }
        catch (IOException e) when (macOS && e is not FileNotFoundException and not DirectoryNotFoundException && File.Exists(path))
        {
            throw new JournalInUseException(journal, null, e);
        }
        try
        {
            if (!OperatingSystem.IsMacOS()) stream.Lock(0, 1);
        }
        catch (IOException e)
        {
            stream.Dispose();
            throw new JournalInUseException(journal, Holder(path), e);
        }
        try
        {
            var pid = Encoding.ASCII.GetBytes(Environment.ProcessId + "\n");
            stream.SetLength(0);
            stream.Write(pid);
            stream.Flush();
        }
        catch
        {
            stream.Dispose();
            throw;
        }
        return new JournalLock(stream, journal);
    }

    /// <summary>The process id written in the lock file by its holder, when it can be read.</summary>
    private static int? Holder(string path)
    {
        try
        {
            using var reader = new FileStream(path, FileMode.Open, FileAccess.Read, FileShare.ReadWrite | FileShare.Delete);
            var buffer = new byte[32];
            var count = reader.Read(buffer);
            return int.TryParse(Encoding.ASCII.GetString(buffer, 0, count).Trim(), out var pid) ? pid : null;
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            return null;
        }
    }

    public void Dispose() => _stream.Dispose();
}

/// <summary>Another run holds the journal: the match refuses to start (exit 1).</summary>
public sealed class JournalInUseException(string journal, int? holder, Exception inner)
    : Exception(Describe(journal, holder), inner)
{
    public string Journal { get; } = journal;
    public int? Holder { get; } = holder;

    private static string Describe(string journal, int? holder)
    {
        var who = holder is { } pid ? $"process {pid}" : "process id unknown";
        return $"the journal {journal} is being written by another run ({who}); wait for it to finish or stop it first (its lock is {JournalLock.LockPathOf(journal)})";
    }
}
