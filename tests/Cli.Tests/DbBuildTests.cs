namespace Bramble.Cli.Tests;

/// <summary><c>bramble db build</c> for every ruleset that lists its components, with no code for any of them in the verb.</summary>
[Collection("console")]
public class DbBuildTests
{
    [Fact]
    public void HelpNamesEveryRulesetWithAListAndEachBuildsAndReadsBack()
    {
        var (_, help, _) = ConsoleRunner.Run("db", "build", "--help");
        foreach (var name in new[] { "domineering", "hackenbush", "cutcake", "toads-and-frogs", "clobber", "konane" })
            Assert.Contains(name, help);
        foreach (var (ruleset, size) in new[] { ("cutcake", "12"), ("toads-and-frogs", "5"), ("clobber", "4"), ("konane", "6"), ("hackenbush", "3") })
        {
            var path = Path.Combine(Path.GetTempPath(), $"bramble-{Guid.NewGuid():N}.db");
            try
            {
                var (exit, output, err) = ConsoleRunner.Run("db", "build", ruleset, "--cells", size, "--out", path);
                Assert.True(exit == 0, $"{ruleset}: {err}");
                Assert.Contains($"{ruleset} components of up to {size}", output);
                var (infoExit, info, infoErr) = ConsoleRunner.Run("db", "info", path);
                Assert.True(infoExit == 0, infoErr);
                Assert.Contains($"  {ruleset}: ", info);
            }
            finally
            {
                File.Delete(path);
            }
        }
        // Forms has no list (its terms are any games): refused as bad input.
        var (formsExit, _, formsErr) = ConsoleRunner.Run("db", "build", "forms", "--cells", "3", "--out", Path.Combine(Path.GetTempPath(), $"bramble-{Guid.NewGuid():N}.db"));
        Assert.Equal(2, formsExit);
        Assert.Contains("no list of components", formsErr);
    }
}
