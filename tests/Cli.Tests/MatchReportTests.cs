using System.Xml.Linq;
using Bramble.Arena.Journal;
using Bramble.Values;

namespace Bramble.Cli.Tests;

[Collection("console")]
public class MatchReportTests
{
    private static GameRecord Game(int id, string left, string right, Side first, string position, Side winner, Side? theory, params (int Ply, string By)[] blunders) => new()
    {
        Game = id,
        Pair = string.CompareOrdinal(left, right) < 0 ? [left, right] : [right, left],
        Left = left,
        Right = right,
        First = first,
        Ruleset = "hackenbush",
        Position = position,
        Moves = [new PlayedMove(first, "e1", 3), new PlayedMove(first.Other(), "e2", 4), new PlayedMove(first, "e3", 5)],
        Winner = winner,
        End = GameEnd.NoMove,
        Theory = theory,
        Blunders = blunders.Select(b => new Blunder(b.Ply, b.By)).ToList(),
        Analysed = 3,
    };

    /// <summary>Writes the records as a journal in a folder of its own, runs the report on it and returns the page.</summary>
    private static string Report(IReadOnlyList<GameRecord> records, params string[] options)
    {
        var folder = Path.Combine(Path.GetTempPath(), $"bramble-report-{Guid.NewGuid():N}");
        Directory.CreateDirectory(folder);
        try
        {
            var journal = Path.Combine(folder, "orchard.jsonl");
            File.WriteAllLines(journal, records.Select(JournalFormat.Write));
            var page = Path.Combine(folder, "report.html");
            var (exit, _, err) = ConsoleRunner.Run(["match", "report", journal, "--out", page, .. options]);
            Assert.True(exit == 0, err);
            return File.ReadAllText(page);
        }
        finally
        {
            Directory.Delete(folder, recursive: true);
        }
    }

    [Fact]
    public void TheReportShowsTheJournalsNumbers()
    {
        // A small round robin of three players on two positions, seats swapped, written by hand.
        var records = new List<GameRecord>
        {
            Game(1, "pruner", "grafter", Side.Left, "BRB + G", Side.Left, Side.Left),
            Game(2, "grafter", "pruner", Side.Left, "BRB + G", Side.Right, Side.Left, (1, "grafter")),
            Game(3, "pruner", "windfall", Side.Left, "BRB + G", Side.Left, Side.Left),
            Game(4, "windfall", "pruner", Side.Left, "BRB + G", Side.Left, Side.Left),
            Game(5, "grafter", "windfall", Side.Right, "GG + R", Side.Left, Side.Right, (2, "windfall")),
            Game(6, "windfall", "grafter", Side.Right, "GG + R", Side.Right, Side.Right),
            Game(7, "pruner", "grafter", Side.Right, "GG + R", Side.Right, Side.Right),
            Game(8, "grafter", "pruner", Side.Right, "GG + R", Side.Left, Side.Right, (1, "pruner"), (3, "pruner")),
        };
        var html = Report(records);
        // Self-contained: nothing to fetch, no script.
        Assert.DoesNotContain("<script", html);
        Assert.DoesNotContain("src=", html);
        Assert.DoesNotContain("<link", html);
        // The page is well-formed XML, so its numbers can be read back.
        var doc = XDocument.Parse(html[html.IndexOf("<html", StringComparison.Ordinal)..]);
        XNamespace x = "http://www.w3.org/1999/xhtml";
        string? Attr(XElement e, string name) => e.Attribute(name)?.Value;

        Assert.Equal("8", Attr(doc.Descendants(x + "p").Single(p => Attr(p, "id") == "summary"), "data-games"));
        // Derived from the records: each player's wins and losses.
        var rows = doc.Descendants(x + "tr").Where(t => Attr(t, "data-player") is not null && t.Ancestors(x + "table").Single().Attribute("id")?.Value == "standings").ToList();
        Assert.Equal(3, rows.Count);
        foreach (var row in rows)
        {
            var id = Attr(row, "data-player")!;
            var mine = records.Where(r => r.Left == id || r.Right == id).ToList();
            Assert.Equal(mine.Count.ToString(), Attr(row, "data-games"));
            Assert.Equal(mine.Count(r => r.WinnerId == id).ToString(), Attr(row, "data-wins"));
            Assert.Equal(mine.Count(r => r.WinnerId != id).ToString(), Attr(row, "data-losses"));
            Assert.Equal(records.Sum(r => r.Blunders.Count(b => b.By == id)).ToString(), Attr(row, "data-blunders"));
        }
        // Ratings average 0 (the anchor), and the plot shows one point per player.
        Assert.Equal(0, rows.Sum(r => double.Parse(Attr(r, "data-rating")!, System.Globalization.CultureInfo.InvariantCulture)), 2);
        Assert.Equal(3, doc.Descendants().Count(e => e.Name.LocalName == "circle"));
        // Crosstable: every cell is the row player's wins against the column player.
        var cells = doc.Descendants(x + "td").Where(t => Attr(t, "data-row") is not null).ToList();
        Assert.Equal(6, cells.Count);
        foreach (var cell in cells)
        {
            var (a, b) = (Attr(cell, "data-row")!, Attr(cell, "data-column")!);
            var between = records.Where(r => r.Pair.Contains(a) && r.Pair.Contains(b)).ToList();
            Assert.Equal(between.Count(r => r.WinnerId == a).ToString(), Attr(cell, "data-wins"));
            Assert.Equal(between.Count.ToString(), Attr(cell, "data-games"));
        }
        // Positions: games and Left's wins on each.
        var positions = doc.Descendants(x + "tr").Where(t => Attr(t, "data-position") is not null).ToList();
        Assert.Equal(2, positions.Count);
        foreach (var p in positions)
        {
            var on = records.Where(r => r.Position == Attr(p, "data-position")).ToList();
            Assert.Equal(on.Count.ToString(), Attr(p, "data-games"));
            Assert.Equal(on.Count(r => r.Winner == Side.Left).ToString(), Attr(p, "data-left-wins"));
        }
        // The blunder list: one row per blunder in the journal.
        var blunderRows = doc.Descendants(x + "tr").Where(t => Attr(t, "data-ply") is not null).ToList();
        Assert.Equal(records.Sum(r => r.Blunders.Count), blunderRows.Count);
        // Every game is listed with its moves.
        var games = doc.Descendants(x + "details").ToList();
        Assert.Equal(records.Select(r => r.Game.ToString()), games.Select(g => Attr(g, "data-game")));
        foreach (var (game, record) in games.Zip(records))
        {
            Assert.Equal(record.WinnerId, Attr(game, "data-winner"));
            Assert.All(record.Moves, m => Assert.Contains(m.Move, game.Value));
        }
        // No SPRT section without a match file that asks for one.
        Assert.DoesNotContain(doc.Descendants(), e => Attr(e, "id") == "sprt");
    }

    [Fact]
    public void EveryGameAndBlunderLinksToItsReplayOnTheBoard()
    {
        var records = new List<GameRecord>
        {
            Game(11, "pruner", "windfall", Side.Left, "BRB + G(B,R)", Side.Left, Side.Left, (2, "windfall")),
            Game(12, "windfall", "pruner", Side.Right, "[B0-1,R1-2,G2-0] + BRR", Side.Right, Side.Left, (1, "windfall"), (3, "pruner")),
        };
        var html = Report(records, "--board", "http://127.0.0.1:9000/");
        var doc = XDocument.Parse(html[html.IndexOf("<html", StringComparison.Ordinal)..]);
        XNamespace x = "http://www.w3.org/1999/xhtml";

        // The link's fragment (docs/matches.md, "The report"): ply=N&journal=<the journal line>.
        (GameRecord Game, int? Ply) Follow(XElement a)
        {
            var href = a.Attribute("href")!.Value;
            Assert.StartsWith("http://127.0.0.1:9000/#", href);
            var fields = System.Web.HttpUtility.ParseQueryString(href[(href.IndexOf('#') + 1)..]);
            return (JournalFormat.Parse(fields["journal"]!), fields["ply"] is { } ply ? int.Parse(ply) : null);
        }

        // Each blunder row opens its own game at the blunder's ply.
        var rows = doc.Descendants(x + "tr").Where(t => t.Attribute("data-ply") is not null).ToList();
        Assert.Equal(3, rows.Count);
        foreach (var row in rows)
        {
            var (game, ply) = Follow(row.Descendants(x + "a").Single(a => a.Attribute("class")?.Value == "replay"));
            var record = records.Single(r => r.Game.ToString() == row.Attribute("data-game")!.Value);
            Assert.Equal(JournalFormat.Write(record), JournalFormat.Write(game));
            Assert.Equal(row.Attribute("data-ply")!.Value, ply.ToString());
        }
        // Each game in the list opens itself from the start.
        var details = doc.Descendants(x + "details").ToList();
        Assert.Equal(2, details.Count);
        foreach (var (d, record) in details.Zip(records))
        {
            var (game, ply) = Follow(d.Descendants(x + "a").Single(a => a.Attribute("class")?.Value == "replay"));
            Assert.Equal(JournalFormat.Write(record), JournalFormat.Write(game));
            Assert.Null(ply);
        }
    }

    [Fact]
    public void TheReportLinksToTheBoardsUsualAddressByDefault()
    {
        var html = Report([Game(1, "pruner", "windfall", Side.Left, "BRB", Side.Left, Side.Left)]);
        // bramble serve's default port (docs/cli.md, serve).
        Assert.Contains("href=\"http://127.0.0.1:8421/#journal=", html);
    }

    [Fact]
    public void ABoardAddressThatIsNotAWebAddressIsBadInput()
    {
        var (exit, _, err) = ConsoleRunner.Run("match", "report", "/nonexistent/orchard.jsonl", "--out", "/dev/null", "--board", "somewhere");
        Assert.Equal(2, exit);
        Assert.Contains("--board somewhere", err);
    }

    [Fact]
    public void AMissingJournalIsBadInput()
    {
        var (exit, _, err) = ConsoleRunner.Run("match", "report", "/nonexistent/orchard.jsonl", "--out", "/dev/null");
        Assert.Equal(2, exit);
        Assert.Contains("no such journal", err);
    }
}
