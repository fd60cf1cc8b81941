using Bramble.Arena.Games;
using Bramble.Arena.Journal;
using Bramble.Cli;
using Bramble.Rules;
using Bramble.Search;
using Bramble.Values;
using static Bramble.Web.Tests.PageActions;

namespace Bramble.Web.Tests;

/// <summary>The editor and the journal replay, in a real browser.</summary>
[Collection("browser")]
public sealed class EditAndReplayInBrowserTests(BrowserFixture browser)
{
    [Fact]
    public async Task EditorBuildsAPositionWhoseValueIsTheCommandLinesValue()
    {
        var page = await browser.OpenAsync();
        await page.ClickAsync("#tabs [data-view='edit']");
        await page.SelectOptionAsync("#edit-ruleset", "hackenbush");
        await page.WaitForSelectorAsync("#edit-clear");
        await page.ClickAsync("#edit-clear");
        async Task Add(string colour, string from, string to)
        {
            await page.CheckAsync($"input[name='edit-colour'][value='{colour}']");
            await page.SelectOptionAsync("#edit-from", from);
            if (to != "new") await page.SelectOptionAsync("#edit-to", to);
            var before = await page.InputValueAsync("#edit-text");
            await page.ClickAsync("#edit-add");
            await page.WaitForFunctionAsync("t => document.querySelector('#edit-text').value !== t", before);
        }
        await Add("blue", "0", "new");   // e1: ground to point 1
        await Add("red", "1", "new");    // e2: point 1 to point 2
        await Add("green", "0", "new");  // e3: ground to point 3
        await Add("blue", "2", "new");   // e4: point 2 to point 4
        await Add("red", "3", "1");      // e5: point 3 to point 1, closing a circuit
        await page.WaitForSelectorAsync("#edit-board svg");
        // Recolour e2 to green, then delete e4, both by clicking the drawing.
        await ClickShapeAsync(page, Edge("edit", "e2"));
        await page.ClickAsync("[data-recolour='green']");
        await page.WaitForFunctionAsync("() => document.querySelector('#edit-text').value.includes('G1-2')");
        await page.WaitForSelectorAsync("#edit-board svg");
        await ClickShapeAsync(page, Edge("edit", "e4"));
        await page.ClickAsync("#edit-delete");
        await page.WaitForFunctionAsync("() => !document.querySelector('#edit-text').value.includes('B2-4')");
        var text = await page.InputValueAsync("#edit-text");
        Assert.Equal("[B0-1,G1-2,G0-3,R3-1]", text);
        await page.WaitForSelectorAsync("#edit-analysis[data-done='true'] [data-field='value']");
        var shown = await page.TextContentAsync("#edit-analysis [data-field='value']");
        // The same text through `bramble value`'s own code path.
        var cli = BigStack.Run(() => ValueVerb.Analyse("hackenbush", text, ascii: false, new ValueContext()));
        Assert.Equal(cli.Value, shown);
        await page.ClickAsync("#edit-analysis [data-thermo='1']");
        await page.WaitForSelectorAsync("#thermo-body svg");
        await browser.ShotAsync(page, "edit-thermograph");
        await page.ClickAsync("#thermo-dialog button");
        await browser.ShotAsync(page, "edit-hackenbush");
    }

    [Fact]
    public async Task EditorMakesHolesInADomineeringBoard()
    {
        var page = await browser.OpenAsync();
        await page.ClickAsync("#tabs [data-view='edit']");
        await page.SelectOptionAsync("#edit-ruleset", "domineering");
        await page.WaitForSelectorAsync("#edit-rows");
        // Each size change redraws the tools, so the second waits for the first.
        await page.FillAsync("#edit-rows", "2");
        await page.DispatchEventAsync("#edit-rows", "change");
        await page.WaitForFunctionAsync("() => document.querySelector('#edit-text').value === '..../....'");
        await page.FillAsync("#edit-cols", "3");
        await page.DispatchEventAsync("#edit-cols", "change");
        await page.WaitForFunctionAsync("() => document.querySelector('#edit-text').value === '.../...'");
        await page.WaitForSelectorAsync("#edit-board [data-cell='c2']");
        await page.ClickAsync("#edit-board [data-cell='c2']");
        await page.WaitForFunctionAsync("() => document.querySelector('#edit-text').value === '.../..#'");
        await page.WaitForSelectorAsync("#edit-analysis[data-done='true'] [data-field='value']");
        var cli = BigStack.Run(() => ValueVerb.Analyse("domineering", ".../..#", ascii: false, new ValueContext()));
        Assert.Equal(cli.Value, await page.TextContentAsync("#edit-analysis [data-field='value']"));
    }

    [Fact]
    public async Task ComposeFindsDomineeringRegionsOfAValueAndLoadsOneIntoTheEditor()
    {
        var page = await browser.OpenAsync();
        await page.ClickAsync("#tabs [data-view='edit']");
        await page.SelectOptionAsync("#edit-ruleset", "domineering");
        await page.WaitForSelectorAsync("#edit-rows");
        await page.FillAsync("#compose-value", "*");
        await page.SelectOptionAsync("#compose-count", "3");
        await page.ClickAsync("#compose-go");
        await page.WaitForSelectorAsync("#compose-results [data-use]");
        var texts = await page.Locator("#compose-results code").AllTextContentsAsync();
        Assert.NotEmpty(texts);
        // Every region shown is * by `bramble value`'s own code path.
        foreach (var t in texts)
            Assert.Equal("*", BigStack.Run(() => ValueVerb.Analyse("domineering", t, ascii: false, new ValueContext())).Value);
        await browser.ShotAsync(page, "edit-compose");
        await page.ClickAsync("#compose-results [data-use] >> nth=0");
        await page.WaitForFunctionAsync("t => document.querySelector('#edit-text').value === t", texts[0]);
        await page.WaitForSelectorAsync("#edit-analysis[data-done='true'] [data-field='value']");
        Assert.Equal("*", await page.TextContentAsync("#edit-analysis [data-field='value']"));
    }

    [Fact]
    public async Task ComposeShowsBadValueNotationWithItsCaret()
    {
        var page = await browser.OpenAsync();
        await page.ClickAsync("#tabs [data-view='edit']");
        await page.FillAsync("#compose-value", "{1|");
        await page.ClickAsync("#compose-go");
        await page.WaitForSelectorAsync("#compose-caret:not([hidden])");
        Assert.StartsWith("bad value: column", await page.TextContentAsync("#compose-error"));
        Assert.Contains("^", await page.TextContentAsync("#compose-caret"));
    }

    /// <summary>A small journal of our own: games between a random player and the perfect one, reviewed for blunders as the harness does.</summary>
    private static (string Path, GameRecord Game) Journal()
    {
        const string start = "BRB + G(B,R) + GG + [B0-1,R1-2,G2-0,B1-3]";
        var rules = Rulesets.Get("hackenbush");
        var analyst = new Analyst(Serilog.Core.Logger.None);
        var lines = new List<string>();
        GameRecord? withBlunders = null;
        for (int seed = 1; seed <= 12 && (withBlunders is null || lines.Count < 3); seed++)
        {
            IPlayer left = new RandomPlayer(seed), right = new RandomPlayer(seed + 100);
            var positions = new List<IPosition> { rules.Parse(start) };
            var moves = new List<PlayedMove>();
            var mover = Side.Left;
            while (positions[^1].Moves(mover).Count > 0)
            {
                var d = (mover == Side.Left ? left : right).Choose(positions[^1], mover, TimeSpan.FromSeconds(1));
                moves.Add(new PlayedMove(mover, positions[^1].FormatMove(d.Move!.Value), 1));
                positions.Add(positions[^1].Play(mover, d.Move.Value));
                mover = mover.Other();
            }
            var review = analyst.Review(positions, Side.Left, "orchard-random", "garden-random", 10_000);
            var record = new GameRecord
            {
                Game = seed, Pair = ["orchard-random", "garden-random"], Left = "orchard-random", Right = "garden-random",
                First = Side.Left, Ruleset = "hackenbush", Position = start, Moves = moves, Winner = mover.Other(), End = GameEnd.NoMove,
                Theory = review.Theory, Blunders = review.Blunders, Analysed = review.Analysed,
            };
            lines.Add(JournalFormat.Write(record));
            if (withBlunders is null && record.Blunders.Count > 0) withBlunders = record;
        }
        Assert.NotNull(withBlunders);
        var path = Path.Combine(Directory.CreateTempSubdirectory("bramble-web-journal").FullName, "orchard.jsonl");
        File.WriteAllLines(path, lines);
        return (path, withBlunders);
    }

    [Fact]
    public async Task JournalReplayShowsEveryPlyAndItsBlunders()
    {
        var (path, game) = Journal();
        var page = await browser.OpenAsync();
        await page.ClickAsync("#tabs [data-view='replay']");
        await page.SetInputFilesAsync("#replay-file", path);
        await page.WaitForSelectorAsync("#replay-games [data-game]");
        await page.CheckAsync("#replay-blunders");
        await page.ClickAsync($"#replay-games [data-game='{game.Game}']");
        await page.WaitForSelectorAsync("#replay-plies li[data-ply]");
        int n = game.Moves.Count;
        Assert.Equal(n + 1, await page.Locator("#replay-plies li").CountAsync());
        Assert.Equal(game.Blunders.Count, await page.Locator("#replay-plies li.blunder").CountAsync());
        var blunderPlies = game.Blunders.Select(b => b.Ply).ToHashSet();
        for (int ply = 0; ply <= n; ply++)
        {
            if (ply > 0) await page.ClickAsync("#replay-next");
            Assert.Equal($"ply {ply} of {n}", await page.TextContentAsync("#replay-where"));
            var status = (await page.TextContentAsync("#replay-status"))!;
            if (ply > 0) Assert.Contains($"played {game.Moves[ply - 1].Move}", status);
            Assert.Equal(blunderPlies.Contains(ply), status.Contains("blunder"));
            if (ply > 0 && blunderPlies.Contains(ply) && ply == game.Blunders[0].Ply) await browser.ShotAsync(page, "replay");
            Assert.True(await page.Locator("#replay-board svg").CountAsync() == 1 || ply == n);
        }
    }

    [Fact]
    public async Task AReportsLinkOpensItsGameAtTheBlunder()
    {
        // The link `bramble match report` writes (ReplayLink): the game's journal line in the fragment.
        var (_, game) = Journal();
        var blunder = game.Blunders[0];
        var page = await browser.OpenAsync();
        await page.GotoAsync(ReplayLink.For(browser.Address, game, blunder.Ply));
        await page.WaitForSelectorAsync("#replay-plies li.current");
        Assert.False(await page.Locator("#view-replay").IsHiddenAsync());
        Assert.Equal(game.Moves.Count + 1, await page.Locator("#replay-plies li").CountAsync());
        Assert.Equal($"ply {blunder.Ply} of {game.Moves.Count}", await page.TextContentAsync("#replay-where"));
        var status = (await page.TextContentAsync("#replay-status"))!;
        Assert.Contains($"played {game.Moves[blunder.Ply - 1].Move}", status);
        Assert.Contains("blunder", status);
        Assert.Contains("1 game in the link", await page.TextContentAsync("#replay-notice"));
    }
}
