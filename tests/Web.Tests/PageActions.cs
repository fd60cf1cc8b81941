using Microsoft.Playwright;

namespace Bramble.Web.Tests;

/// <summary>What a person does on the page, as the tests do it: choose, click, wait for the answer.</summary>
public static class PageActions
{
    /// <summary>
    /// Clicks the middle of a drawn edge (or any shape) where its stroke is, as a person would.
    /// A straight horizontal edge has no height, so clicking "the element" is not enough.
    /// </summary>
    public static async Task ClickShapeAsync(IPage page, string selector)
    {
        var point = await page.EvaluateAsync<double[]>("""
            sel => {
              const found = document.querySelector(sel);
              if (!found) throw new Error('no element ' + sel);
              // A move drawn as a group (stroke plus a wide hit path): aim at its drawn line.
              const el = found.getTotalLength ? found : (found.querySelector('path, line, polyline, circle') ?? found);
              el.scrollIntoView({ block: 'center', inline: 'center' });
              let x, y;
              if (el.getTotalLength) {
                const p = el.getPointAtLength(el.getTotalLength() / 2);
                const m = el.getScreenCTM();
                x = p.x * m.a + p.y * m.c + m.e; y = p.x * m.b + p.y * m.d + m.f;
              } else {
                const r = el.getBoundingClientRect(); x = r.x + r.width / 2; y = r.y + r.height / 2;
              }
              return [x, y];
            }
            """, selector);
        await page.Mouse.ClickAsync((float)point[0], (float)point[1]);
    }

    public static string Edge(string view, string move) =>
        $"#{view}-board [data-move=\"{move}\"]";

    /// <summary>Waits until the play board has answered: not busy, with the given number of plies.</summary>
    public static Task WaitPliesAsync(IPage page, int plies) =>
        page.WaitForSelectorAsync($"#play-board[data-busy='false'][data-plies='{plies}']");

    public static async Task<int> PliesAsync(IPage page) =>
        int.Parse(await page.GetAttributeAsync("#play-board", "data-plies") ?? "0");

    /// <summary>Starts a new game from the Play form.</summary>
    public static async Task NewGameAsync(IPage page, string ruleset, string start, string opponent, string side, string first)
    {
        await page.SelectOptionAsync("#play-ruleset", ruleset);
        await page.FillAsync("#play-start", start);
        await page.SelectOptionAsync("#play-opponent", opponent);
        await page.SelectOptionAsync("#play-level", "quick");
        await page.SelectOptionAsync("#play-side", side);
        await page.SelectOptionAsync("#play-first", first);
        await page.ClickAsync("#play-new");
        await page.WaitForSelectorAsync("#play-board[data-busy='false']");
    }
}
