using System.Xml.Linq;
using Bramble.Rules;
using Bramble.Values;

namespace Bramble.Pictures.Tests;

/// <summary>
/// A web page turns a click into a move by reading <c>data-move</c> from the picture itself, so
/// every legal move of every position must appear exactly once (per side where the names of the
/// two sides' moves coincide, as in Forms).
/// </summary>
public class MoveTargetTests
{
    public static TheoryData<string, string, int> Generated() => new()
    {
        { "hackenbush", "stalks", 6 }, { "hackenbush", "trees", 9 }, { "hackenbush", "graphs", 10 }, { "hackenbush", "mixed", 12 },
        { "domineering", "rectangles", 6 }, { "domineering", "regions", 14 }, { "domineering", "sums", 3 },
        { "forms", "switches", 3 }, { "forms", "hot", 4 }, { "forms", "hot-extra", 3 }, { "forms", "mixed", 4 },
        { "snort", "random", 9 }, { "snort", "sums", 12 }, { "col", "grids", 9 }, { "col", "trees", 10 },
    };

    [Theory]
    [MemberData(nameof(Generated))]
    public void EveryLegalMoveHasExactlyOneTarget(string ruleset, string generator, int size)
    {
        var rules = Rulesets.Get(ruleset);
        foreach (var text in rules.Generate(generator, 8, size, seed: 14))
        {
            // Walk a few random plies so positions with cuts, laid dominoes and changed terms are checked too.
            var random = new Random(text.Length);
            IPosition position = rules.Parse(text);
            var side = Side.Left;
            for (int ply = 0; ply < 4; ply++)
            {
                Check(position);
                var moves = position.Moves(side);
                if (moves.Count == 0) break;
                position = position.Play(side, moves[random.Next(moves.Count)]);
                side = side.Other();
            }
        }
    }

    private static void Check(IPosition position)
    {
        var doc = XDocument.Parse(PositionPicture.Draw(position));
        var targets = doc.Descendants().Where(e => e.Attribute("data-move") is not null).ToList();
        foreach (var side in new[] { Side.Left, Side.Right })
            foreach (var move in position.Moves(side))
            {
                string name = position.FormatMove(move);
                // Forms names options per side (1.1 is Left's first option and also Right's), so there the side narrows the match.
                var hits = targets.Where(t => (string)t.Attribute("data-move")! == name
                    && (t.Attribute("data-side") is not { } s || (string)s == side.Word())).ToList();
                Assert.True(hits.Count == 1, $"{position.Ruleset.Name} {position.Text}: {side.Word()}'s move {name} has {hits.Count} targets");
            }
        // And nothing offers a move that is not legal for anybody.
        var legal = new[] { Side.Left, Side.Right }.SelectMany(s => position.Moves(s).Select(position.FormatMove)).ToHashSet();
        Assert.All(targets, t => Assert.Contains((string)t.Attribute("data-move")!, legal));
    }

    [Fact]
    public void HackenbushEdgeGroupHoldsTheEdgeAndAWideHitPath()
    {
        var doc = XDocument.Parse(PositionPicture.Draw(Rulesets.Get("hackenbush").Parse("BR + [G0-1,G0-1,R1-2,B2-0,G2-2]")));
        var groups = doc.Descendants().Where(e => e.Attribute("data-edge") is not null).ToList();
        Assert.Equal(7, groups.Count);
        foreach (var g in groups)
        {
            Assert.Equal("g", g.Name.LocalName);
            Assert.Equal("e" + (string)g.Attribute("data-edge")!, (string)g.Attribute("data-move")!);
            var hit = Assert.Single(g.Elements(), e => (string?)e.Attribute("class") == "hit");
            Assert.Equal("transparent", (string?)hit.Attribute("stroke"));
            Assert.Equal("stroke", (string?)hit.Attribute("pointer-events"));
        }
        // The stalk BR is piece 1 (edges 1 and 2), the graph piece 2 (from the position's own components).
        Assert.Equal(["1", "1", "2", "2", "2", "2", "2"], groups.Select(g => (string)g.Attribute("data-component")!));
    }

    [Fact]
    public void DomineeringCellsTellHolesFromLaidDominoes()
    {
        var rules = Rulesets.Get("domineering");
        var start = (Bramble.Rules.Domineering.DomineeringPosition)rules.Parse("#.../..../....");
        var a2 = start.ParseMove("b1");
        var after = (Bramble.Rules.Domineering.DomineeringPosition)start.Play(Side.Left, a2);
        var doc = XDocument.Parse(DomineeringPicture.Svg(after, [PlacedDomino.Of(Side.Left, a2)]));
        var cells = doc.Descendants().Where(e => e.Attribute("data-cell") is not null).ToDictionary(e => (string)e.Attribute("data-cell")!);
        Assert.Equal(12, cells.Count);
        Assert.Equal("1", (string?)cells["a1"].Attribute("data-hole"));
        Assert.Equal("left", (string?)cells["b1"].Attribute("data-placed"));
        Assert.Equal("left", (string?)cells["b2"].Attribute("data-placed"));
        Assert.Null(cells["b2"].Attribute("data-hole"));
        Assert.Null(cells["b2"].Attribute("data-move"));
        // c1 starts a horizontal domino (c1-d1) and a vertical one (c1-c2).
        Assert.Equal("left right", (string?)cells["c1"].Attribute("data-sides"));
    }

    [Fact]
    public void FormsTermsAndOptionsAreMarked()
    {
        var doc = XDocument.Parse(PositionPicture.Draw(Rulesets.Get("forms").Parse("{3|-1} + {5,4|2||0}")));
        Assert.Equal(["1", "2"], doc.Descendants().Where(e => e.Attribute("data-term") is not null).Select(e => (string)e.Attribute("data-term")!));
        var options = doc.Descendants().Where(e => e.Attribute("data-move") is not null)
            .Select(e => (string)e.Attribute("data-side")! + " " + (string)e.Attribute("data-move")!).Order().ToList();
        // {3|-1}: one option each side; {5,4|2||0}: Left {5,4|2}, Right 0.
        Assert.Equal(["left 1.1", "left 2.1", "right 1.1", "right 2.1"], options);
    }
}
