using Bramble.Rules.Database;
using Bramble.Values;

namespace Bramble.Rules.Tests.Database;

/// <summary>
/// The component lists behind <c>bramble db build</c> for the rulesets other than Domineering: a database of every component up to a size answers every position made of such
/// components without searching, with the values a fresh search gives, and <c>db info</c> counts
/// its entries in the list's own measure.
/// </summary>
public sealed class CatalogueTests : IDisposable
{
    private readonly string _folder = Directory.CreateTempSubdirectory("bramble-catalogue-tests-").FullName;

    public void Dispose() => Directory.Delete(_folder, recursive: true);

    public static TheoryData<string, int> Lists => new()
    {
        { "hackenbush", 4 },
        { "cutcake", 16 },
        { "toads-and-frogs", 7 },
        { "clobber", 5 },
        { "konane", 6 },
    };

    [Theory]
    [MemberData(nameof(Lists))]
    public void ADatabaseOfTheListAnswersEveryPositionOfThatSizeWithoutSearch(string name, int size)
    {
        var ruleset = Rulesets.Get(name);
        var catalogue = Assert.IsAssignableFrom<IComponentCatalogue>(ruleset);
        Assert.Contains(ComponentCatalogues.All, e => e.Ruleset == ruleset);
        var built = new ValueContext();
        int listed = 0;
        foreach (var component in catalogue.ComponentsUpTo(size))
        {
            Assert.InRange(catalogue.CatalogueSize(component), 1, size);
            ruleset.Value(component, built);
            listed++;
        }
        Assert.True(listed > 3, $"{name}: only {listed} components listed");
        string file = Path.Combine(_folder, name + ".db");
        ComponentDatabase.Save(file, built, $"{name} up to {size}");

        var loaded = new ValueContext();
        ComponentDatabase.Load(file, loaded);
        var random = new Random(size);
        for (int i = 0; i < 300; i++)
        {
            var position = ruleset.Parse(RandomPosition(name, size, random));
            // Common practice: every component of the position is in the list, so nothing is searched...
            loaded.ResetCounters(nodeCap: 0);
            var stored = ruleset.Value(position, loaded);
            loaded.EndBudget();
            Assert.Equal(0, loaded.Nodes);
            // ...and the stored values are the ones a search from scratch finds.
            Assert.Equal(ruleset.Value(position, new ValueContext(loaded.Store)), stored);
        }

        var summary = DatabaseSummary.Of(file).Rulesets.Single();
        Assert.Equal(name, summary.Ruleset);
        Assert.Equal(catalogue.SizeUnit, summary.SizeUnit);
        Assert.All(summary.EntriesBySize.Keys, s => Assert.InRange(s, 1, size));
    }

    /// <summary>A random position each of whose components fits the list of size <paramref name="size"/>.</summary>
    private static string RandomPosition(string name, int size, Random random)
    {
        switch (name)
        {
            case "cutcake":
                return string.Join(" + ", Enumerable.Range(0, random.Next(1, 4)).Select(_ =>
                {
                    int rows = random.Next(1, 5);
                    return $"{rows}x{random.Next(1, size / rows + 1)}";
                }));
            case "hackenbush":
                return string.Join(" + ", Enumerable.Range(0, random.Next(1, 4)).Select(_ => random.Next(5) == 0
                    ? $"{"BRG"[random.Next(3)]}({"BRG"[random.Next(3)]},{"BRG"[random.Next(3)]})"
                    : new string(Enumerable.Range(0, random.Next(1, size + 1)).Select(_ => "BRG"[random.Next(3)]).ToArray())));
            case "toads-and-frogs":
                return new string(Enumerable.Range(0, random.Next(2, size + 1)).Select(_ => "TF."[random.Next(3)]).ToArray());
            case "clobber":
            {
                // Up to `size` stones scattered on a small board: no group is bigger than that.
                int h = random.Next(1, 4), w = random.Next(2, 5);
                var cells = Enumerable.Repeat('.', h * w).ToArray();
                for (int k = random.Next(2, size + 1); k > 0; k--) cells[random.Next(h * w)] = "xo"[random.Next(2)];
                return string.Join("/", Enumerable.Range(0, h).Select(r => new string(cells, r * w, w)));
            }
            default:
            {
                // A board of at most `size` squares: every group's key is a part of it.
                int h = random.Next(1, 3), w = random.Next(2, size / h + 1);
                return string.Join("/", Enumerable.Range(0, h).Select(_ => new string(Enumerable.Range(0, w).Select(_ => "xo."[random.Next(3)]).ToArray())));
            }
        }
    }
}
