using System.Text.RegularExpressions;
using Bramble.Rules;
using Bramble.Rules.Database;

namespace Bramble.Cli.Tests;

/// <summary>
/// Each verb's help against the documented synopsis (the code block at the top of docs/cli.md):
/// the same options, shown the same way, and a subcommand's help with only its own arguments.
/// </summary>
[Collection("console")]
public partial class HelpConformanceTests
{
    private static string Help(params string[] words)
    {
        var (exit, output, err) = ConsoleRunner.Run([.. words, "--help"]);
        Assert.True(exit == 0, err);
        return output;
    }

    /// <summary>The synopsis lines of docs/cli.md: verb (with subcommand) → the options the line names.</summary>
    private static IEnumerable<(string[] Words, HashSet<string> Options)> Synopsis()
    {
        var dir = new DirectoryInfo(AppContext.BaseDirectory);
        while (dir is not null && !File.Exists(Path.Combine(dir.FullName, "docs", "cli.md"))) dir = dir.Parent;
        Assert.NotNull(dir);
        var text = File.ReadAllText(Path.Combine(dir!.FullName, "docs", "cli.md"));
        var block = text[(text.IndexOf("```\nbramble ", StringComparison.Ordinal) + 4)..];
        block = block[..block.IndexOf("```", StringComparison.Ordinal)];
        var seen = new Dictionary<string, (string[], HashSet<string>)>();
        foreach (var line in block.Split('\n', StringSplitOptions.RemoveEmptyEntries))
        {
            var words = line.Split(' ', StringSplitOptions.RemoveEmptyEntries);
            var verb = new List<string> { words[1] };
            // "match merge", "match report", "db build", "db info" are subcommands; "draw thermograph" is an argument.
            if (words.Length > 2 && words[1] is "match" or "db" && Regex.IsMatch(words[2], "^[a-z]+$")) verb.Add(words[2]);
            // The text after two spaces and a parenthesis is a remark, not part of the command.
            var command = Regex.Replace(line, @"\s{2,}\(.*$", "");
            var options = OptionWord().Matches(command).Select(m => m.Value).ToHashSet();
            var key = string.Join(' ', verb);
            if (seen.TryGetValue(key, out var earlier)) earlier.Item2.UnionWith(options);
            else seen[key] = ([.. verb], options);
        }
        return seen.Values;
    }

    /// <summary>The options a help text lists (its Options section), without the ones every verb has.</summary>
    private static HashSet<string> HelpOptions(string help)
    {
        var section = help[help.IndexOf("Options:", StringComparison.Ordinal)..];
        var end = section.IndexOf("\nCommands:", StringComparison.Ordinal);
        if (end >= 0) section = section[..end];
        var common = new HashSet<string> { "--help", "--log", "--verbose", "--version" };
        return section.Split('\n')
            .Select(l => OptionWord().Match(l.TrimStart().StartsWith("-", StringComparison.Ordinal) ? l : ""))
            .Where(m => m.Success && !common.Contains(m.Value))
            .Select(m => m.Value).ToHashSet();
    }

    [GeneratedRegex("--[a-z][a-z-]*")]
    private static partial Regex OptionWord();

    [Fact]
    public void EveryVerbsHelpListsExactlyTheOptionsOfItsSynopsis()
    {
        // docs/cli.md, the synopsis: the user reference the help must agree with.
        var lines = Synopsis().ToList();
        Assert.True(lines.Count >= 14, $"only {lines.Count} synopsis lines were read");
        foreach (var (words, options) in lines)
        {
            var shown = HelpOptions(Help(words));
            Assert.True(options.SetEquals(shown),
                $"bramble {string.Join(' ', words)}: the synopsis names {string.Join(' ', options.Order())}, the help {string.Join(' ', shown.Order())}");
        }
    }

    [Theory]
    [InlineData("merge")]
    [InlineData("report")]
    public void MatchSubcommandsShowOnlyTheirOwnArguments(string sub)
    {
        var help = Help("match", sub);
        // The match file is the parent's argument; the subcommand takes journals (docs/cli.md, synopsis).
        Assert.Contains($" match {sub} <journal>...", help);
        Assert.DoesNotContain("[<spec.json>]", help);
        Assert.DoesNotMatch(@"(?m)^\s+<spec", help);
        Assert.Matches(@"(?m)^\s+<journal>", help);
    }

    [Fact]
    public void MatchItselfStillShowsItsSpecArgument()
    {
        var help = Help("match");
        Assert.Contains(" match [<spec.json>] [command]", help);
        Assert.Matches(@"(?m)^\s+<spec\.json>\s", help);
    }

    [Fact]
    public void DatabaseBuildShowsCellsAndStillTakesSize()
    {
        var help = Help("db", "build");
        Assert.Contains("--cells <N>", help);
        Assert.DoesNotContain("--size", help);
        // Every ruleset that can list its components is offered, with its unit.
        foreach (var r in Rulesets.All.OfType<IComponentCatalogue>())
            Assert.Contains($"{((IRuleset)r).Name} (up to N {r.SizeUnit})", help);
        foreach (var spelling in new[] { "--cells", "--size" })
        {
            var path = Path.Combine(Path.GetTempPath(), $"bramble-{Guid.NewGuid():N}.db");
            try
            {
                var (exit, _, err) = ConsoleRunner.Run("db", "build", "domineering", spelling, "3", "--out", path);
                Assert.True(exit == 0, err);
                Assert.True(File.Exists(path));
            }
            finally
            {
                File.Delete(path);
            }
        }
    }

    [Fact]
    public void DatabaseBuildWithoutCellsNamesCells()
    {
        var (exit, _, err) = ConsoleRunner.Run("db", "build", "domineering", "--out", Path.Combine(Path.GetTempPath(), "never.db"));
        Assert.Equal(2, exit);
        Assert.Contains("--cells N is required", err);
    }

    [Fact]
    public void GenerateHelpListsEveryRulesetsGenerators()
    {
        var help = Regex.Replace(Help("generate"), @"\s+", " ");
        Assert.True(Rulesets.All.Count >= 7);
        foreach (var r in Rulesets.All)
            Assert.Contains($"{r.Name}: {string.Join(", ", r.Generators)}", help);
    }
}
