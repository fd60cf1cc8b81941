using Bramble.Rules.Compose;
using Bramble.Rules.Domineering;
using Bramble.Rules.Forms;
using Bramble.Rules.Hackenbush;
using Bramble.Rules.Tests.Domineering;
using Bramble.Rules.Tests.Hackenbush;
using Bramble.Values;

namespace Bramble.Rules.Tests.Compose;

/// <summary>
/// bramble compose's search: every position it reports is checked here again by the plain
/// searches written for the tests (no shortcut of the code under test), and against the sizes
/// the literature reports.
/// </summary>
public class ComposeTests
{
    // Generous: the tests check what is found, never how fast; the budget only keeps a broken search from hanging.
    private const long Budget = 120_000;

    private static ComposeReport Compose(IRuleset ruleset, string target, int? maxSize = null, int count = 1, ValueContext? context = null)
    {
        context ??= new ValueContext();
        return new Composer(ruleset, context).Run(context.Store.Parse(target), new ComposeSettings(maxSize, count, Budget));
    }

    /// <summary>The value of a Hackenbush position by plain search over edge subsets, piece by piece.</summary>
    private static Game PlainHackenbush(IPosition position, GameStore store)
    {
        var total = store.Zero;
        foreach (var part in position.Components())
        {
            var drawing = new Drawing();
            foreach (var e in ((HackenbushPosition)part).Edges) drawing.Add(e.Colour.Letter(), e.From, e.To);
            total = store.Add(total, new BruteForce(drawing, store).Value());
        }
        return total;
    }

    private static Game PlainDomineeringValue(IPosition position, GameStore store) =>
        new PlainDomineering(store).Value(PlainDomineering.Grid(position.Text));

    [Fact]
    public void EveryDyadicFromMinusThreeToThreeComesBackAsAStalkOfThatValue()
    {
        var hackenbush = new HackenbushRuleset();
        var store = new GameStore();
        for (int k = -48; k <= 48; k++)
        {
            var x = Dyadic.Create(k, 4);
            var report = Compose(hackenbush, x.ToString(), context: new ValueContext(store));
            var found = Assert.Single(report.Positions);
            var text = found.Position.Text;
            // The sign-expansion rule (Winning Ways; On Numbers and Games): one blue-red stalk of as many edges as x's birthday.
            if (k != 0) Assert.Matches("^[BR]+$", text);
            Assert.Equal(store.Birthday(store.Number(x)), found.Size);
            Assert.Equal(store.Number(x), PlainHackenbush(found.Position, store));
            Assert.Equal(ComposeStop.Enough, report.Stop);
        }
    }

    [Theory]
    [InlineData("1/1024")]
    [InlineData("-1023/512")]
    [InlineData("5 + 3/256")]
    public void DeepDyadicsAreStalksAsLongAsTheirBirthday(string target)
    {
        var store = new GameStore();
        var report = Compose(new HackenbushRuleset(), target, context: new ValueContext(store));
        var found = Assert.Single(report.Positions);
        // The sign-expansion rule (Winning Ways; On Numbers and Games).
        Assert.Matches("^[BR]+$", found.Position.Text);
        Assert.Equal(store.Birthday(store.Parse(target)), found.Size);
        Assert.Equal(store.Parse(target), PlainHackenbush(found.Position, store));
    }

    [Fact]
    public void EveryNimberUpToStarNineIsAGreenStalk()
    {
        var store = new GameStore();
        for (int m = 1; m <= 9; m++)
        {
            var report = Compose(new HackenbushRuleset(), "*" + m, context: new ValueContext(store));
            var found = Assert.Single(report.Positions);
            // A green stalk of m edges is *m (Winning Ways, green Hackenbush is Nim).
            Assert.Equal(new string('G', m), found.Position.Text);
            Assert.Equal(store.Nimber(m), PlainHackenbush(found.Position, store));
        }
    }

    [Theory]
    [InlineData("↑")]
    [InlineData("↓*")]
    [InlineData("⇑*")]
    [InlineData("1/2 + ↑")]
    [InlineData("-1 + *2")]
    public void UpsAndStarsComeBackInHackenbushWithTheirValueRecheckedByPlainSearch(string target)
    {
        var store = new GameStore();
        var report = Compose(new HackenbushRuleset(), target, context: new ValueContext(store));
        var found = Assert.Single(report.Positions);
        Assert.Equal(store.Parse(target), PlainHackenbush(found.Position, store));
        // A game of birthday b needs b moves, each cutting an edge (common practice; see docs/compose.md).
        Assert.True(found.Size >= store.Birthday(store.Parse(target)));
    }

    [Fact]
    public void UpIsTwoEdgesShortOfNothingSoThreeEdgesIsTheLeast()
    {
        // Every Hackenbush position of up to 2 edges is listed, and none is ↑: the construction GB + G (3 edges) is smallest.
        var report = Compose(new HackenbushRuleset(), "↑", count: 3);
        Assert.All(report.Positions, p => Assert.True(p.Size >= 3));
        Assert.Equal(3, report.Positions[0].Size);
        Assert.Equal(3, report.Positions.Count);
    }

    [Theory]
    // Uiterwijk and Barton, "New results for Domineering from combinatorial game theory endgame
    // databases", TCS 2015, abstract: "for any multiple up n·↑ or down n·↓ there are Domineering
    // positions of size 1+5n with these values" — so ↑, ↓ within 6 cells and ⇑ within 11.
    [InlineData("↑", 6)]
    [InlineData("↓", 6)]
    // From memory: the L-tromino is *, the 2×2 square is ±1, a three-by-one bent strip gives 1/2 on four cells.
    [InlineData("*", 3)]
    [InlineData("±1", 4)]
    [InlineData("1/2", 4)]
    public void DomineeringValuesComeAtOrBelowThePublishedSizes(string target, int cells)
    {
        var store = new GameStore();
        var report = Compose(new DomineeringRuleset(), target, maxSize: cells, context: new ValueContext(store));
        var found = Assert.Single(report.Positions);
        Assert.True(found.Size <= cells, $"{found.Position.Text} has {found.Size} cells");
        Assert.Equal(store.Parse(target), PlainDomineeringValue(found.Position, store));
    }

    [Fact]
    public void DoubleUpAndStarTwoComeWithinThePublishedDomineeringSizes()
    {
        var store = new GameStore();
        var context = new ValueContext(store);
        // Uiterwijk and Barton, TCS 2015, abstract: n·↑ on "positions of size 1+5n" — ⇑ within 11 cells.
        var up2 = Assert.Single(Compose(new DomineeringRuleset(), "⇑", maxSize: 11, context: context).Positions);
        Assert.True(up2.Size <= 11, up2.Position.Text);
        Assert.Equal(store.Parse("⇑"), PlainDomineeringValue(up2.Position, store));
        // Same paper: "endgame databases for all single-component positions up to 15 squares", in which
        // "we find many Domineering positions with values up to *3" — so *2 within 15 cells.
        var star2 = Assert.Single(Compose(new DomineeringRuleset(), "*2", maxSize: 15, context: context).Positions);
        Assert.True(star2.Size <= 15, star2.Position.Text);
        Assert.Equal(store.Nimber(2), PlainDomineeringValue(star2.Position, store));
    }

    [Fact]
    public void DomineeringIntegersAreStripsOfTwiceTheirCells()
    {
        var store = new GameStore();
        for (int n = -6; n <= 6; n++)
        {
            if (n == 0) continue;
            var report = Compose(new DomineeringRuleset(), n.ToString(), context: new ValueContext(store));
            var found = Assert.Single(report.Positions);
            // Winning Ways: a strip of 2n cells is n moves for its owner; birthday n needs 2n cells.
            Assert.Equal(2 * Math.Abs(n), found.Size);
            Assert.Equal(store.Integer(n), PlainDomineeringValue(found.Position, store));
        }
    }

    [Fact]
    public void HackenbushValuesOfRandomPositionsAreFoundAgainAtNoGreaterSize()
    {
        var hackenbush = new HackenbushRuleset();
        var store = new GameStore();
        var random = new Random(2026);
        var colours = "BRG";
        for (int trial = 0; trial < 12; trial++)
        {
            // A random tree of up to 4 edges, possibly several pieces (each edge hangs from the ground or an earlier node).
            int edges = random.Next(1, 5);
            var parts = new List<string>();
            for (int e = 0; e < edges; e++)
            {
                int from = random.Next(0, e + 1);
                parts.Add($"{colours[random.Next(3)]}{from}-{e + 1}");
            }
            var original = hackenbush.Parse("[" + string.Join(",", parts) + "]");
            var target = hackenbush.Value(original, new ValueContext(store));
            var report = Compose(hackenbush, store.Format(target), maxSize: 4, context: new ValueContext(store));
            var found = Assert.Single(report.Positions);
            // The original is one of the positions looked at, so the answer is no bigger.
            Assert.True(found.Size <= original.Size, $"{original.Text}: found {found.Position.Text}");
            Assert.Equal(target, PlainHackenbush(found.Position, store));
        }
    }

    [Fact]
    public void DomineeringValuesOfRandomBoardsAreFoundAgainAtNoGreaterSize()
    {
        var domineering = new DomineeringRuleset();
        var store = new GameStore();
        var random = new Random(7);
        for (int trial = 0; trial < 10; trial++)
        {
            var grid = PlainDomineering.RandomGrid(random, 3, 3, 0.7);
            var original = domineering.Parse(PlainDomineering.Text(grid));
            if (original.Size > 8) continue;
            var target = new PlainDomineering(store).Value(grid);
            var report = Compose(domineering, store.Format(target), maxSize: 8, context: new ValueContext(store));
            var found = Assert.Single(report.Positions);
            Assert.True(found.Size <= original.Size, $"{original.Text}: found {found.Position.Text}");
            Assert.Equal(target, PlainDomineeringValue(found.Position, store));
        }
    }

    [Fact]
    public void AValueOlderThanTheBoundIsRuledOutByItsBirthday()
    {
        // 1/1024 has birthday 11, and every Hackenbush move cuts at least one edge.
        var report = Compose(new HackenbushRuleset(), "1/1024", maxSize: 6);
        Assert.Empty(report.Positions);
        Assert.Equal(11, report.LeastSize);
        Assert.True(report.LeastSize > report.Bound);
    }

    [Fact]
    public void ANonNumberIsNotABlueRedPositionAndTheReportSaysWhy()
    {
        var report = Compose(new HackenbushRuleset(), "±1", maxSize: 3);
        Assert.Empty(report.Positions);
        Assert.Equal(ComposeStop.Bound, report.Stop);
        Assert.Equal(3, report.SearchedThrough);
        // Blue-red Hackenbush positions are numbers (Winning Ways; On Numbers and Games).
        Assert.Contains(report.Notes, n => n.Contains("blue-red Hackenbush positions are numbers"));
    }

    [Fact]
    public void StarTwoIsNoDomineeringPositionOfUpToEightCells()
    {
        // Checked here by plain search over the same listing: no region of at most 8 cells, nor sum, is *2.
        var report = Compose(new DomineeringRuleset(), "*2", maxSize: 8);
        Assert.Empty(report.Positions);
        Assert.Equal(8, report.SearchedThrough);
    }

    [Fact]
    public void FormsComposeToTheCanonicalFormItself()
    {
        var store = new GameStore();
        var report = Compose(new FormsRuleset(), "{3|1,*} + {2||1|0}", context: new ValueContext(store));
        var found = Assert.Single(report.Positions);
        Assert.Equal(1, found.Size);
        Assert.Equal(store.Parse("{3|1,*} + {2||1|0}"), new FormsRuleset().Value(found.Position, new ValueContext(store)));
    }

    [Fact]
    public void ABudgetStopsTheSearchAndSaysHowFarItGot()
    {
        var context = new ValueContext();
        var report = new Composer(new HackenbushRuleset(), context).Run(context.Store.Parse("{1|-1}"), new ComposeSettings(8, 1, BudgetMs: 1));
        Assert.Equal(ComposeStop.Budget, report.Stop);
        Assert.True(report.SearchedThrough < 8);
    }

    [Fact]
    public void SeveralPositionsComeSmallestFirstAndAllDifferent()
    {
        var store = new GameStore();
        var report = Compose(new HackenbushRuleset(), "*", count: 6, maxSize: 4, context: new ValueContext(store));
        Assert.Equal(6, report.Positions.Count);
        Assert.Equal(report.Positions.Select(p => p.Size).Order(), report.Positions.Select(p => p.Size));
        Assert.Equal(6, report.Positions.Select(p => p.Position.NormalKey).Distinct().Count());
        Assert.All(report.Positions, p => Assert.Equal(store.Star, PlainHackenbush(p.Position, store)));
    }
}
