using System.Text;

namespace Bramble.Cli;

/// <summary>
/// A position or value given on the command line: the text itself, <c>@path</c> (the file's
/// whole text, spaces and line breaks included) or <c>-</c> (all of stdin). Bramble reads
/// <c>@path</c> itself (the command-line library's response files are off), and reads at most
/// <see cref="MaxChars"/> characters from a file or stdin (docs/cli.md).
/// </summary>
public static class PositionInput
{
    /// <summary>Most characters read from a file or stdin: 16 Mi, several times the largest positions the rulesets value.</summary>
    public const int MaxChars = 16 * 1024 * 1024;

    public static string Read(string argument) => Read(argument, Console.In);

    public static string Read(string argument, TextReader stdin)
    {
        if (argument == "-") return ReadBounded(stdin, "stdin").Trim();
        if (argument.StartsWith('@'))
        {
            var path = argument[1..];
            if (path.Length == 0) throw new InputException("'@' needs a file name after it, such as @position.txt");
            if (Directory.Exists(path)) throw new InputException($"'{path}' is a folder; @ needs a file holding the position");
            if (!File.Exists(path)) throw new InputException($"position file '{path}' does not exist");
            try
            {
                using var reader = new StreamReader(path, Encoding.UTF8, detectEncodingFromByteOrderMarks: true);
                return ReadBounded(reader, $"'{path}'").Trim();
            }
            catch (UnauthorizedAccessException)
            {
                throw new InputException($"position file '{path}' cannot be read (permission denied)");
            }
            catch (IOException e)
            {
                throw new InputException($"position file '{path}' cannot be read: {e.Message}");
            }
        }
        return argument;
    }

    /// <summary>All of <paramref name="reader"/>, refusing more than <see cref="MaxChars"/> characters without reading further.</summary>
    private static string ReadBounded(TextReader reader, string what)
    {
        var sb = new StringBuilder();
        var buffer = new char[64 * 1024];
        int n;
        while ((n = reader.Read(buffer, 0, buffer.Length)) > 0)
        {
            if (sb.Length + n > MaxChars)
                throw new InputException($"{what} holds more than {MaxChars:N0} characters, the most a position may have (docs/cli.md)");
            sb.Append(buffer, 0, n);
        }
        return sb.ToString();
    }
}

/// <summary>Bad input found by the CLI itself (exit code 2).</summary>
public sealed class InputException(string message) : Exception(message);
