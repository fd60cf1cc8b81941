namespace Bramble.Cli;

/// <summary>SPEC.md §3: a position is a text argument, <c>@path</c> (read the file) or <c>-</c> (read stdin).</summary>
public static class PositionInput
{
    public static string Read(string argument)
    {
        if (argument == "-") return Console.In.ReadToEnd().Trim();
        if (argument.StartsWith('@'))
        {
            var path = argument[1..];
            if (!File.Exists(path)) throw new InputException($"position file '{path}' does not exist");
            return File.ReadAllText(path).Trim();
        }
        return argument;
    }
}

/// <summary>Bad input found by the CLI itself (exit code 2).</summary>
public sealed class InputException(string message) : Exception(message);
