using Bramble.Rules;
using Bramble.Values;
using Microsoft.Playwright;
using static Bramble.Web.Tests.PageActions;

namespace Bramble.Web.Tests;

/// <summary>Whole games played on the page by clicking, in a real browser.</summary>
[Collection("browser")]
public sealed class PlayInBrowserTests(BrowserFixture browser)
{
    /// <summary>The winner of a position with a side to move, by the engine's exact analysis.</summary>
    internal static Side ExactWinner(string ruleset, string text, Side toMove)
    {
        var rules = Rulesets.Get(ruleset);
        var context = new ValueContext();
        return context.Store.OutcomeOf(rules.Value(rules.Parse(text), context)).WinnerMovingFirst(toMove);
    }

    [Fact]
    public async Task HackenbushGamePlayedByClicksEndsWithTheRightWinner()
    {
        const string start = "BRB + G(B,R) + [B0-1,R1-2,G2-0,B1-3]";
        Assert.Equal(Side.Left, ExactWinner("hackenbush", start, Side.Left));
        var page = await browser.OpenAsync();
        await NewGameAsync(page, "hackenbush", start, "perfect", "left", "you");
        for (int turn = 0; turn < 30 && await page.GetAttributeAsync("#play-board", "data-over") != "true"; turn++)
        {
            // Follow the page's hint: from a won position a winning move keeps it won, whatever the reply.
            await page.ClickAsync("#play-hint");
            var hint = await page.WaitForSelectorAsync("#play-hint-text");
            var winning = (await hint!.GetAttributeAsync("data-winning"))!.Split(' ', StringSplitOptions.RemoveEmptyEntries);
            Assert.NotEmpty(winning);
            if (turn == 1) await browser.ShotAsync(page, "play-hackenbush");
            int plies = await PliesAsync(page);
            await ClickShapeAsync(page, Edge("play", winning[0]));
            await page.WaitForFunctionAsync("n => { const b = document.querySelector('#play-board'); return b.dataset.busy === 'false' && Number(b.dataset.plies) > n; }", plies);
        }
        var result = await page.TextContentAsync("#play-result");
        Assert.Contains("Left wins", result);
        Assert.Contains("you win", result);
        // Normal play: whoever made the last move wins, and the move list's last entry is Left's.
        var last = await page.Locator("#play-moves li").Last.TextContentAsync();
        Assert.StartsWith("Left", last!.Trim());
    }

    [Fact]
    public async Task IllegalClickIsRefusedAndThePositionStays()
    {
        var page = await browser.OpenAsync();
        await NewGameAsync(page, "hackenbush", "BR + RB", "random", "left", "you");
        var before = await page.InnerHTMLAsync("#play-board");
        // e2 is red: Left may not cut it.
        await ClickShapeAsync(page, Edge("play", "e2"));
        await page.WaitForSelectorAsync("#play-error:not(:empty)");
        Assert.Contains("not a legal move for left", await page.TextContentAsync("#play-error"));
        await page.WaitForSelectorAsync("#play-board[data-busy='false']");
        Assert.Equal(0, await PliesAsync(page));
        Assert.Equal(before, await page.InnerHTMLAsync("#play-board"));
        Assert.Contains("Position now: BR + RB", await page.TextContentAsync("#play-help"));
        await browser.ShotAsync(page, "play-illegal");
    }

    [Fact]
    public async Task DomineeringGamePlayedByClickingCells()
    {
        var page = await browser.OpenAsync();
        await NewGameAsync(page, "domineering", "3x4", "random", "left", "you");
        for (int turn = 0; turn < 12 && await page.GetAttributeAsync("#play-board", "data-over") != "true"; turn++)
        {
            // Left places vertical dominoes: the named cell and the one below it.
            var move = await page.GetAttributeAsync("#play-legal [data-legal]", "data-legal");
            var below = $"{move![0]}{int.Parse(move[1..]) + 1}";
            int plies = await PliesAsync(page);
            await page.ClickAsync($"#play-board [data-cell='{move}']");
            await page.ClickAsync($"#play-board [data-cell='{below}']");
            await page.WaitForFunctionAsync("n => { const b = document.querySelector('#play-board'); return b.dataset.busy === 'false' && Number(b.dataset.plies) > n; }", plies);
            if (turn == 0) await browser.ShotAsync(page, "play-domineering");
        }
        Assert.Equal("true", await page.GetAttributeAsync("#play-board", "data-over"));
        var result = (await page.TextContentAsync("#play-result"))!;
        var last = (await page.Locator("#play-moves li").Last.TextContentAsync())!.Trim();
        // Normal play: the side that made the last move wins.
        var winner = last.StartsWith("Left") ? "Left" : "Right";
        Assert.Contains($"so {winner} wins", result);
        Assert.Contains(winner == "Left" ? "you win" : "the computer wins", result);
    }

    [Fact]
    public async Task AmazonsGamePlayedByClickingThreeSquares()
    {
        var page = await browser.OpenAsync();
        await NewGameAsync(page, "amazons", "L.../.#../...R", "random", "left", "you");
        for (int turn = 0; turn < 12 && await page.GetAttributeAsync("#play-board", "data-over") != "true"; turn++)
        {
            // A move is three squares: the amazon, where it goes, where its arrow lands (from-to/arrow).
            var move = (await page.GetAttributeAsync("#play-legal [data-legal]", "data-legal"))!;
            var squares = move.Split('-', '/');
            int plies = await PliesAsync(page);
            foreach (var square in squares) await page.ClickAsync($"#play-board [data-cell='{square}'] >> nth=0");
            await page.WaitForFunctionAsync("n => { const b = document.querySelector('#play-board'); return b.dataset.busy === 'false' && Number(b.dataset.plies) > n; }", plies);
            if (turn == 0) await browser.ShotAsync(page, "play-amazons");
        }
        Assert.Equal("true", await page.GetAttributeAsync("#play-board", "data-over"));
        var last = (await page.Locator("#play-moves li").Last.TextContentAsync())!.Trim();
        var winner = last.StartsWith("Left") ? "Left" : "Right";
        Assert.Contains($"so {winner} wins", (await page.TextContentAsync("#play-result"))!);
    }

    [Fact]
    public async Task HintMovesWinByExactAnalysis()
    {
        const string start = "BRB + G(B,R) + GGG + [B0-1,R1-2,G2-0,B1-3]";
        var page = await browser.OpenAsync();
        await NewGameAsync(page, "hackenbush", start, "random", "left", "you");
        await page.ClickAsync("#play-hint");
        var hint = await page.WaitForSelectorAsync("#play-hint-text");
        var winning = (await hint!.GetAttributeAsync("data-winning"))!.Split(' ', StringSplitOptions.RemoveEmptyEntries);
        var rules = Rulesets.Get("hackenbush");
        var position = rules.Parse(start);
        var context = new ValueContext();
        Assert.Equal(Side.Left, context.Store.OutcomeOf(rules.Value(position, context)).WinnerMovingFirst(Side.Left));
        Assert.NotEmpty(winning);
        foreach (var text in winning)
        {
            var after = position.Play(Side.Left, position.ParseMove(text));
            // A winning move leaves a position Right loses moving first.
            Assert.Equal(Side.Left, context.Store.OutcomeOf(rules.Value(after, context)).WinnerMovingFirst(Side.Right));
        }
        // The hinted edges are marked on the board, not only listed.
        Assert.True(await page.Locator("#play-board .hinted").CountAsync() >= 1);
        await page.WaitForSelectorAsync("#play-analysis[data-done='true']");
        await browser.ShotAsync(page, "play-hint");
    }

    [Fact]
    public async Task PhoneInPortraitShowsBoardAndAnalysis()
    {
        var page = await browser.OpenAsync(390, 844);
        await NewGameAsync(page, "hackenbush", "BRB + G(B,R) + [B0-1,R1-2,G2-0,B1-3]", "perfect", "left", "you");
        await page.WaitForSelectorAsync("#play-analysis[data-done='true']");
        // Nothing wider than the screen: the page does not scroll sideways.
        var width = await page.EvaluateAsync<int>("document.documentElement.scrollWidth");
        Assert.True(width <= 390, $"page is {width} px wide on a 390 px screen");
        await browser.ShotAsync(page, "play-phone");
    }
}
