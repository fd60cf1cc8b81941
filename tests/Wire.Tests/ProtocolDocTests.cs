namespace Bramble.Wire.Tests;

// docs/protocol.md shows a complete session; replaying it keeps the page honest. Moves, timings
// and the version may differ as players improve, so only the shape of each reply is compared: its
// kind, and the code of an err.
public class ProtocolDocTests
{
    [Fact]
    public void TheExampleSessionOfTheProtocolPageReplays()
    {
        var page = File.ReadAllLines(FindDoc());
        var start = Array.FindIndex(page, l => l.StartsWith("## 5. A complete session", StringComparison.Ordinal));
        var end = Array.FindIndex(page, start + 1, l => l.StartsWith("## ", StringComparison.Ordinal));
        var session = page[start..end].Where(l => l.StartsWith("    > ", StringComparison.Ordinal) || l.StartsWith("    < ", StringComparison.Ordinal)).ToList();
        var expected = session.Where(l => l[4] == '<').Select(l => Shape(l[6..])).ToList();

        using var engine = EngineProcess.Bramble("--strategy", "random", "--seed", "7");
        foreach (var line in session.Where(l => l[4] == '>')) engine.Send(line[6..]);
        engine.CloseInput();
        var actual = new List<string>();
        while (engine.Receive() is { } reply) actual.Add(Shape(reply));
        Assert.Equal(0, engine.WaitForExit());
        Assert.Equal(expected, actual);
    }

    private static string Shape(string reply)
    {
        var words = reply.Split(' ');
        return words[0] == "err" ? "err " + words[1] : words[0];
    }

    private static string FindDoc()
    {
        for (var dir = new DirectoryInfo(AppContext.BaseDirectory); dir is not null; dir = dir.Parent)
        {
            var candidate = Path.Combine(dir.FullName, "docs", "protocol.md");
            if (File.Exists(candidate)) return candidate;
        }
        throw new FileNotFoundException("docs/protocol.md not found above the test directory");
    }
}
