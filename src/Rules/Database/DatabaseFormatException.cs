namespace Bramble.Rules.Database;

/// <summary>
/// A file that is not a readable component database: foreign, truncated, corrupt, or written in
/// a newer format. The message names the file and says which, for people.
/// </summary>
public sealed class DatabaseFormatException(string path, string reason)
    : Exception($"{path}: {reason}")
{
    public string Path { get; } = path;
    public string Reason { get; } = reason;
}
