using System.Globalization;
using System.Net;
using System.Text;
using Bramble.Arena.Journal;
using Bramble.Arena.Spec;
using Bramble.Arena.Standings;
using Bramble.Arena.Statistics;
using Bramble.Values;
using Bramble.Web;

namespace Bramble.Cli.Report;

/// <summary>
/// <c>bramble match report</c>'s page: one self-contained HTML file (inline CSS and SVG, no script,
/// nothing fetched) written as well-formed XML, so that a test — or any XML tool — can read its
/// numbers back. Cells that carry numbers also carry them in <c>data-</c> attributes. Everything
/// shown is computed by the Arena from the journal; this class only lays it out.
/// </summary>
public static class ReportPage
{
    private static readonly CultureInfo s_c = CultureInfo.InvariantCulture;

    /// <param name="board">The browser board's address for the replay links (<see cref="ReplayLink.DefaultBoard"/> when null).</param>
    public static string Render(string title, IReadOnlyList<GameRecord> records, SprtSpec? sprt, IReadOnlyList<string>? playerOrder = null, string? board = null)
    {
        var ordered = records.OrderBy(r => r.Game).ToList();
        var standings = MatchStandings.Compute(ordered, playerOrder, sprt);
        var html = new StringBuilder();
        html.Append("<!DOCTYPE html>\n<html xmlns=\"http://www.w3.org/1999/xhtml\" lang=\"en\">\n<head>\n<meta charset=\"utf-8\"/>\n");
        html.Append("<title>").Append(E(title)).Append("</title>\n<style>\n").Append(Style).Append("</style>\n</head>\n<body>\n");
        html.Append("<h1>").Append(E(title)).Append("</h1>\n");
        html.Append(Fmt($"<p id=\"summary\" data-games=\"{ordered.Count}\">{ordered.Count} games, {standings.Players.Count} players.</p>\n"));
        Standings(html, standings);
        RatingPlot(html, standings.Ratings);
        Cross(html, standings.Crosstable);
        if (standings.Sprt is { } result) SprtPlot(html, ordered, result);
        Positions(html, PositionSummary.Compute(ordered), standings.Players.Select(p => p.Id).ToList());
        board ??= ReplayLink.DefaultBoard;
        Blunders(html, ordered, board);
        Games(html, ordered, board);
        html.Append("</body>\n</html>\n");
        return html.ToString();
    }

    private const string Style = """
        body { font-family: system-ui, sans-serif; margin: 2em auto; max-width: 60em; color: #222; }
        table { border-collapse: collapse; margin: 0.5em 0 1.5em; }
        th, td { border-bottom: 1px solid #ddd; padding: 0.25em 0.6em; text-align: right; }
        th:nth-child(2), td:nth-child(2) { text-align: left; }
        td.text, th.text { text-align: left; font-family: ui-monospace, monospace; }
        .note { color: #555; font-size: 0.9em; }
        details { margin: 0.2em 0; } summary { cursor: pointer; }
        code { font-family: ui-monospace, monospace; }
        svg text { font-family: system-ui, sans-serif; font-size: 12px; }

        """;

    private static void Standings(StringBuilder html, MatchStandings standings)
    {
        html.Append("<h2>Standings</h2>\n<table id=\"standings\">\n<tr><th>#</th><th>player</th><th>games</th><th>wins</th><th>losses</th><th>score</th><th>Elo</th><th>95% interval</th><th>LOS</th><th>forfeits</th><th>blunders/100</th></tr>\n");
        var rank = 0;
        foreach (var p in standings.Players)
        {
            var r = standings.Ratings.Of(p.Id);
            html.Append(Fmt($"<tr data-player=\"{E(p.Id)}\" data-games=\"{p.Games}\" data-wins=\"{p.Wins}\" data-losses=\"{p.Losses}\" data-blunders=\"{p.Blunders}\""));
            if (r is not null) html.Append(Fmt($" data-rating=\"{r.Rating:0.###}\""));
            html.Append(Fmt($"><td>{++rank}</td><td>{E(p.Id)}</td><td>{p.Games}</td><td>{p.Wins}</td><td>{p.Losses}</td><td>{(p.Games == 0 ? "-" : (100 * p.Score).ToString("0.0", s_c) + "%")}</td>"));
            html.Append(Fmt($"<td>{(r is null ? "-" : StandingsText.EloWord(r.Rating))}</td><td>{(r is null ? "-" : $"{StandingsText.EloWord(r.Low)} … {StandingsText.EloWord(r.High)}")}</td>"));
            html.Append(Fmt($"<td>{(r?.Superiority is { } los ? E(StandingsText.Percent(los)) : "")}</td><td>{p.Forfeits}</td><td>{(p.BlundersPer100 is { } b ? b.ToString("0.0", s_c) : "-")}</td></tr>\n"));
        }
        html.Append("</table>\n<p class=\"note\">Elo: all players fitted together by maximum likelihood (the logistic paired-comparison model of Bradley and Terry, 1952, on the Elo scale of Elo, 1978), averaging 0; 95% intervals count the two games of a seat-swapped pair as one sample");
        if (standings.Ratings.Regularised) html.Append("; some player won or lost every game against the rest, so each player was given one virtual win and loss against a player rated 0 to keep the ratings finite");
        html.Append(". LOS: likelihood that the player is stronger than the next one down. blunders/100: moves from a won position to a lost one, per 100 moves exact analysis could judge.</p>\n");
    }

    private static void RatingPlot(StringBuilder html, RatingTable ratings)
    {
        if (ratings.Players.Count == 0) return;
        var finite = ratings.Players.SelectMany(p => new[] { p.Low, p.High, p.Rating }).Where(double.IsFinite).ToList();
        var low = Math.Floor(Math.Min(0, finite.Min()) / 50) * 50;
        var high = Math.Ceiling(Math.Max(0, finite.Max()) / 50) * 50;
        if (high <= low) high = low + 50;
        const double left = 110, width = 480, rowHeight = 28, top = 20;
        var height = top + rowHeight * ratings.Players.Count + 30;
        double X(double elo) => left + (Math.Clamp(elo, low, high) - low) / (high - low) * width;
        html.Append("<h2>Ratings with 95% intervals</h2>\n");
        html.Append(Fmt($"<svg id=\"rating-plot\" xmlns=\"http://www.w3.org/2000/svg\" width=\"{left + width + 30}\" height=\"{height}\" role=\"img\" aria-label=\"ratings with 95% intervals\">\n"));
        var tick = (high - low) > 600 ? 200 : (high - low) > 250 ? 100 : 50;
        for (var t = low; t <= high + 1e-9; t += tick)
        {
            html.Append(Fmt($"<line x1=\"{X(t):0.#}\" y1=\"{top - 8}\" x2=\"{X(t):0.#}\" y2=\"{height - 24}\" stroke=\"{(t == 0 ? "#888" : "#e4e4e4")}\"/>"));
            html.Append(Fmt($"<text x=\"{X(t):0.#}\" y=\"{height - 8}\" text-anchor=\"middle\">{StandingsText.EloWord(t)}</text>\n"));
        }
        for (var i = 0; i < ratings.Players.Count; i++)
        {
            var p = ratings.Players[i];
            var y = top + rowHeight * i + rowHeight / 2;
            html.Append(Fmt($"<text x=\"{left - 10}\" y=\"{y + 4}\" text-anchor=\"end\">{E(p.Id)}</text>"));
            html.Append(Fmt($"<line x1=\"{X(p.Low):0.#}\" y1=\"{y}\" x2=\"{X(p.High):0.#}\" y2=\"{y}\" stroke=\"#3b6ea8\" stroke-width=\"3\"/>"));
            html.Append(Fmt($"<line x1=\"{X(p.Low):0.#}\" y1=\"{y - 6}\" x2=\"{X(p.Low):0.#}\" y2=\"{y + 6}\" stroke=\"#3b6ea8\" stroke-width=\"2\"/><line x1=\"{X(p.High):0.#}\" y1=\"{y - 6}\" x2=\"{X(p.High):0.#}\" y2=\"{y + 6}\" stroke=\"#3b6ea8\" stroke-width=\"2\"/>"));
            html.Append(Fmt($"<circle cx=\"{X(p.Rating):0.#}\" cy=\"{y}\" r=\"5\" fill=\"#1d3f66\" data-player=\"{E(p.Id)}\" data-rating=\"{p.Rating:0.###}\"/>\n"));
        }
        html.Append("</svg>\n");
    }

    private static void Cross(StringBuilder html, Crosstable table)
    {
        html.Append("<h2>Crosstable</h2>\n<p class=\"note\">Wins of the row's player against the column's, out of their games.</p>\n<table id=\"crosstable\">\n<tr><th></th><th class=\"text\"></th>");
        foreach (var id in table.Players) html.Append("<th>").Append(E(id)).Append("</th>");
        html.Append("</tr>\n");
        for (var i = 0; i < table.Players.Count; i++)
        {
            html.Append(Fmt($"<tr><td></td><td>{E(table.Players[i])}</td>"));
            for (var j = 0; j < table.Players.Count; j++)
            {
                var (wins, games) = table.Cell(i, j);
                if (i == j || games == 0) html.Append("<td>·</td>");
                else html.Append(Fmt($"<td data-row=\"{E(table.Players[i])}\" data-column=\"{E(table.Players[j])}\" data-wins=\"{wins}\" data-games=\"{games}\">{wins}/{games}</td>"));
            }
            html.Append("</tr>\n");
        }
        html.Append("</table>\n");
    }

    private static void SprtPlot(StringBuilder html, IReadOnlyList<GameRecord> records, SprtResult result)
    {
        var trace = SprtTrace.Compute(records, result.Candidate, result.Baseline, result.Spec);
        html.Append("<h2>Sequential test</h2>\n");
        html.Append(Fmt($"<p id=\"sprt\" data-llr=\"{result.Llr:0.######}\" data-lower=\"{result.Bounds.Lower:0.######}\" data-upper=\"{result.Bounds.Upper:0.######}\">SPRT (Wald 1945) of {E(result.Candidate)} against {E(result.Baseline)}: null hypothesis {result.Spec.NullElo:0.#} Elo, alternative {result.Spec.AlternativeElo:0.#} Elo. LLR {result.Llr:0.000} (bounds {result.Bounds.Lower:0.000} … {result.Bounds.Upper:0.000}): {E(result.DecisionText)}.</p>\n"));
        if (trace.Count == 0) return;
        const double left = 50, width = 520, top = 15, plotHeight = 200;
        var lowest = Math.Min(result.Bounds.Lower, trace.Min(t => t.Llr)) - 0.5;
        var highest = Math.Max(result.Bounds.Upper, trace.Max(t => t.Llr)) + 0.5;
        var most = Math.Max(1, trace[^1].Games);
        double X(int games) => left + (double)games / most * width;
        double Y(double llr) => top + (highest - llr) / (highest - lowest) * plotHeight;
        html.Append(Fmt($"<svg id=\"sprt-plot\" xmlns=\"http://www.w3.org/2000/svg\" width=\"{left + width + 20}\" height=\"{top + plotHeight + 35}\" role=\"img\" aria-label=\"log-likelihood ratio over games\">\n"));
        foreach (var (bound, label) in new[] { (result.Bounds.Upper, "alternative"), (0.0, "0"), (result.Bounds.Lower, "null") })
        {
            html.Append(Fmt($"<line x1=\"{left}\" y1=\"{Y(bound):0.#}\" x2=\"{left + width}\" y2=\"{Y(bound):0.#}\" stroke=\"{(bound == 0 ? "#bbb" : "#c0392b")}\" stroke-dasharray=\"{(bound == 0 ? "2 3" : "6 4")}\"/>"));
            html.Append(Fmt($"<text x=\"{left - 6}\" y=\"{Y(bound) + 4:0.#}\" text-anchor=\"end\">{label}</text>\n"));
        }
        var points = string.Join(" ", trace.Prepend((0, 0.0)).Select(t => Fmt($"{X(t.Item1):0.#},{Y(t.Item2):0.#}")));
        html.Append(Fmt($"<polyline fill=\"none\" stroke=\"#1d3f66\" stroke-width=\"2\" points=\"{points}\"/>\n"));
        html.Append(Fmt($"<text x=\"{left + width / 2}\" y=\"{top + plotHeight + 28}\" text-anchor=\"middle\">games ({most})</text>\n</svg>\n"));
    }

    private static void Positions(StringBuilder html, IReadOnlyList<PositionSummary> positions, IReadOnlyList<string> players)
    {
        html.Append("<h2>Start positions</h2>\n<p class=\"note\">theory: games won by the side exact analysis says wins, of the games where it is known; a position where that side won every game <b>decided</b> its games whoever played. Spread: best player's score minus the worst's on the position — the positions that <b>separate</b> the players.</p>\n");
        html.Append("<table id=\"positions\">\n<tr><th>#</th><th class=\"text\">position</th><th>games</th><th>Left won</th><th>theory</th><th>spread</th>");
        foreach (var id in players) html.Append("<th>").Append(E(id)).Append("</th>");
        html.Append("</tr>\n");
        var n = 0;
        foreach (var p in positions)
        {
            html.Append(Fmt($"<tr data-position=\"{E(p.Position)}\" data-games=\"{p.Games}\" data-left-wins=\"{p.LeftWins}\"><td>{++n}</td><td class=\"text\">{E(p.Ruleset)}: {E(p.Position)}</td><td>{p.Games}</td><td>{p.LeftWins}</td>"));
            html.Append(p.TheoryKnown == 0 ? "<td>-</td>" : Fmt($"<td>{p.TheoryWins}/{p.TheoryKnown}{(p.Decides ? " decided" : "")}</td>"));
            html.Append(Fmt($"<td>{(100 * p.Spread).ToString("0", s_c)}%</td>"));
            foreach (var id in players)
                html.Append(p.Scores.TryGetValue(id, out var s) && s.Games > 0 ? Fmt($"<td>{s.Wins}/{s.Games}</td>") : "<td></td>");
            html.Append("</tr>\n");
        }
        html.Append("</table>\n");
    }

    private static void Blunders(StringBuilder html, IReadOnlyList<GameRecord> records, string board)
    {
        var list = records.SelectMany(r => r.Blunders.Select(b => (Record: r, Blunder: b))).ToList();
        html.Append(Fmt($"<h2>Blunders ({list.Count})</h2>\n<p class=\"note\">A move from a position its player could win to one it cannot, by exact analysis. <b>board</b> opens the game at that ply on the browser board, when it runs at {E(board)} (<code>bramble serve</code>).</p>\n"));
        if (list.Count == 0) return;
        html.Append("<table id=\"blunders\">\n<tr><th>game</th><th>by</th><th>ply</th><th>move</th><th class=\"text\">position</th><th>replay</th></tr>\n");
        foreach (var (r, b) in list)
        {
            var move = b.Ply >= 1 && b.Ply <= r.Moves.Count ? r.Moves[b.Ply - 1].Move : "?";
            var link = ReplayLink.For(board, r, b.Ply);
            html.Append(Fmt($"<tr data-game=\"{r.Game}\" data-by=\"{E(b.By)}\" data-ply=\"{b.Ply}\"><td><a href=\"#game-{r.Game}\">{r.Game}</a></td><td>{E(b.By)}</td><td>{b.Ply}</td><td>{E(move)}</td><td class=\"text\">{E(r.Ruleset)}: {E(r.Position)}</td><td><a class=\"replay\" href=\"{E(link)}\">board</a></td></tr>\n"));
        }
        html.Append("</table>\n");
    }

    private static void Games(StringBuilder html, IReadOnlyList<GameRecord> records, string board)
    {
        html.Append(Fmt($"<h2>Games</h2>\n<p class=\"note\">Each game with its moves. <b>Replay on the board</b> opens it on the browser board, when it runs at {E(board)} (<code>bramble serve</code>; another address: <code>match report --board URL</code>); in the terminal, <code>bramble play</code> takes the position and the moves can be played in order.</p>\n<div id=\"games\">\n"));
        foreach (var r in records)
        {
            var moves = string.Join(" ", r.Moves.Select(m => $"{(m.Side == Side.Left ? "L" : "R")}:{m.Move}"));
            html.Append(Fmt($"<details id=\"game-{r.Game}\" data-game=\"{r.Game}\" data-winner=\"{E(r.WinnerId)}\" data-moves=\"{r.Moves.Count}\"><summary>game {r.Game}: {E(r.Left)} (Left) against {E(r.Right)} (Right), {r.First.Word()} first — {E(r.WinnerId)} won ({r.End.Word()})</summary>"));
            html.Append(Fmt($"<p><code>{E(r.Ruleset)}: {E(r.Position)}</code></p><p class=\"moves\"><code>{E(moves)}</code></p>"));
            html.Append(Fmt($"<p><a class=\"replay\" href=\"{E(ReplayLink.For(board, r))}\">Replay on the board</a></p>"));
            if (r.Detail is { } detail) html.Append("<p class=\"note\">").Append(E(detail)).Append("</p>");
            html.Append("</details>\n");
        }
        html.Append("</div>\n");
    }

    private static string E(string text) => WebUtility.HtmlEncode(text);

    private static string Fmt(FormattableString text) => text.ToString(s_c);
}
