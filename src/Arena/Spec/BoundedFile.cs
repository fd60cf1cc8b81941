using System.Text;

namespace Bramble.Arena.Spec;

/// <summary>
/// Reads a text file the match names, up to a size limit: a path that is no ordinary file (a
/// device such as /dev/zero, which never ends) or a huge file is refused after reading a little
/// more than the limit, with a message, instead of filling memory.
/// </summary>
public static class BoundedFile
{
    /// <summary>The largest match file read.</summary>
    public const int SpecBytes = 1024 * 1024;

    /// <summary>The largest position suite read.</summary>
    public const int SuiteBytes = 64 * 1024 * 1024;

    /// <summary>The file's text; throws <see cref="IOException"/> saying so when it is longer than <paramref name="maxBytes"/>.</summary>
    public static string ReadText(string path, int maxBytes)
    {
        if (Directory.Exists(path)) throw new IOException("it is a folder, not a file");
        using var stream = new FileStream(path, FileMode.Open, FileAccess.Read, FileShare.Read, 1 << 16);
        var bytes = new MemoryStream();
        var buffer = new byte[1 << 16];
        int count;
        while ((count = stream.Read(buffer)) > 0)
        {
            if (bytes.Length + count > maxBytes)
                throw new IOException($"it is longer than {Describe(maxBytes)}, the limit for this file");
            bytes.Write(buffer, 0, count);
        }
        return new UTF8Encoding(false).GetString(bytes.GetBuffer(), 0, (int)bytes.Length).TrimStart('\uFEFF');
    }

    public static string Describe(int bytes) => bytes % (1024 * 1024) == 0 ? $"{bytes / (1024 * 1024)} MiB" : $"{bytes / 1024} KiB";
}
