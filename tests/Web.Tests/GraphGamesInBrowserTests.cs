using Bramble.Values;
using static Bramble.Web.Tests.PageActions;

namespace Bramble.Web.Tests;

/// <summary>Snort and Col on the page: vertices are clicked, or moves chosen from the list, in a real browser.</summary>
[Collection("browser")]
public sealed class GraphGamesInBrowserTests(BrowserFixture browser)
{
    [Theory]
    [InlineData("snort", "[1-2-3,2-4] + P4")]
    [InlineData("col", "[1-2-3-4,4-5R] + [6-7]")]
    public async Task GamePlayedByClickingVerticesEndsWithTheRightWinner(string ruleset, string start)
    {
        // Left moving first wins both (the engine's exact analysis, cross-checked against plain search in Rules.Tests).
        Assert.Equal(Side.Left, PlayInBrowserTests.ExactWinner(ruleset, start, Side.Left));
        var page = await browser.OpenAsync();
        await NewGameAsync(page, ruleset, start, "perfect", "left", "you");
        for (int turn = 0; turn < 20 && await page.GetAttributeAsync("#play-board", "data-over") != "true"; turn++)
        {
            await page.ClickAsync("#play-hint");
            var hint = await page.WaitForSelectorAsync("#play-hint-text");
            var winning = (await hint!.GetAttributeAsync("data-winning"))!.Split(' ', StringSplitOptions.RemoveEmptyEntries);
            Assert.NotEmpty(winning);
            int plies = await PliesAsync(page);
            if (turn == 0)
            {
                // The first move is chosen from the list of legal moves under the board, the others by clicking vertices.
                await page.ClickAsync("#play-legal-box summary");
                await page.ClickAsync($"#play-legal [data-legal=\"{winning[0]}\"]");
            }
            else await ClickShapeAsync(page, Edge("play", winning[0]));
            await page.WaitForFunctionAsync("n => { const b = document.querySelector('#play-board'); return b.dataset.busy === 'false' && Number(b.dataset.plies) > n; }", plies);
            if (turn == 1) await browser.ShotAsync(page, "play-" + ruleset);
        }
        var result = await page.TextContentAsync("#play-result");
        Assert.Contains("Left wins", result);
    }

    [Fact]
    public async Task ColouringNextToTheWrongColourIsRefused()
    {
        var page = await browser.OpenAsync();
        // Snort: vertex 1 is next to red 2, so Left may not colour it.
        await NewGameAsync(page, "snort", "[1-2R,3-4]", "random", "left", "you");
        Assert.Equal(1, await page.Locator("#play-board [data-move=\"1\"]").CountAsync());
        await ClickShapeAsync(page, Edge("play", "1"));
        await page.WaitForSelectorAsync("#play-error:not(:empty)");
        Assert.Contains("1 is not a legal move for left", await page.TextContentAsync("#play-error"));
        Assert.Equal(0, await PliesAsync(page));
    }
}
