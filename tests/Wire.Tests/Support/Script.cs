using System.Text;

namespace Bramble.Wire.Tests;

/// <summary>Runs a host over in-memory streams on a whole script of lines and returns what it wrote.</summary>
public static class Script
{
    public static (int Exit, List<string> Lines) Run(EngineSetup setup, byte[] input)
    {
        var output = new MemoryStream();
        var exit = new EngineHost(setup).Serve(new MemoryStream(input), output);
        var text = Encoding.UTF8.GetString(output.ToArray());
        Assert.True(text.Length == 0 || text.EndsWith('\n'), "the last line has no terminator");
        var lines = text.Split('\n').ToList();
        lines.RemoveAt(lines.Count - 1);
        return (exit, lines);
    }

    public static (int Exit, List<string> Lines) Run(EngineSetup setup, params string[] lines) =>
        Run(setup, Encoding.UTF8.GetBytes(string.Concat(lines.Select(l => l + "\n"))));

    /// <summary>The output without note lines: one final reply per request.</summary>
    public static List<string> Finals(List<string> lines) => lines.Where(l => !l.StartsWith("note ", StringComparison.Ordinal)).ToList();

    /// <summary>Runs a greeted session with the stalks ruleset and random player and returns the final replies after the welcome.</summary>
    public static List<string> Replies(params string[] lines)
    {
        var (_, output) = Run(Setups.WithPlayers(), lines.Prepend("hello twine 1").ToArray());
        var finals = Finals(output);
        Assert.StartsWith("welcome ", finals[0]);
        return finals.Skip(1).ToList();
    }
}
