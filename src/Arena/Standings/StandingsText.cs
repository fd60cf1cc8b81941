using System.Globalization;
using System.Text;
using Bramble.Arena.Statistics;

namespace Bramble.Arena.Standings;

/// <summary>The standings as a table for people (the Cli prints it; nothing here writes to the console).</summary>
public static class StandingsText
{
    private static readonly CultureInfo s_c = CultureInfo.InvariantCulture;

    public static string Table(MatchStandings standings, string title)
    {
        var header = new[] { "#", "player", "games", "wins", "losses", "score", "Elo", "95% interval", "LOS", "forfeits", "blunders/100" };
        var rows = standings.Players.Select((p, i) =>
        {
            var r = standings.Ratings.Of(p.Id);
            return new[]
            {
                (i + 1).ToString(s_c),
                p.Id,
                p.Games.ToString(s_c),
                p.Wins.ToString(s_c),
                p.Losses.ToString(s_c),
                p.Games == 0 ? "-" : (100 * p.Score).ToString("0.0", s_c) + "%",
                r is null ? "-" : EloWord(r.Rating),
                r is null ? "-" : $"{EloWord(r.Low)} … {EloWord(r.High)}",
                r?.Superiority is { } los ? Percent(los) : "",
                p.Forfeits.ToString(s_c),
                p.BlundersPer100 is { } b ? b.ToString("0.0", s_c) : "-",
            };
        }).ToList();
        var text = new StringBuilder();
        text.AppendLine($"{title}: {standings.Games} game{(standings.Games == 1 ? "" : "s")}");
        text.AppendLine();
        AppendTable(text, header, rows, [false, true, false, false, false, false, false, true, false, false, false]);
        text.AppendLine();
        text.AppendLine("Elo: all players fitted together by maximum likelihood (logistic paired-comparison model of Bradley and Terry 1952, on the");
        text.AppendLine("Elo scale of Elo 1978), averaging 0; the difference of two ratings is what the games measure. 95% intervals treat the");
        text.AppendLine("two games of a seat-swapped pair as one sample." + (standings.Ratings.Regularised
            ? " Some players won (or lost) every game against the rest, so each player was given one virtual win and loss against a player rated 0 to keep the ratings finite."
            : ""));
        text.AppendLine("LOS: likelihood that the player is stronger than the next one down.");
        text.AppendLine("blunders/100: moves from a won position to a lost one, per 100 moves that exact analysis could judge.");
        if (standings.Players.Count(p => p.Games > 0) > 2)
        {
            text.AppendLine();
            text.AppendLine("Crosstable: wins of the row's player against the column's, out of their games.");
            text.AppendLine();
            var table = standings.Crosstable;
            var ids = table.Players;
            var crossHeader = new[] { "" }.Concat(ids).ToArray();
            var crossRows = ids.Select((id, i) => new[] { id }.Concat(ids.Select((_, j) =>
                i == j ? "·" : table.Cell(i, j) is var (w, g) && g > 0 ? $"{w}/{g}" : "-")).ToArray()).ToList();
            AppendTable(text, crossHeader, crossRows, [true, .. ids.Select(_ => false)]);
        }
        if (standings.Sprt is { } sprt)
        {
            text.AppendLine();
            text.AppendLine(string.Create(s_c,
                $"SPRT (Wald 1945) of {sprt.Candidate} against {sprt.Baseline}, null hypothesis {sprt.Spec.NullElo:0.#} Elo, alternative {sprt.Spec.AlternativeElo:0.#} Elo, alpha {sprt.Spec.Alpha}, beta {sprt.Spec.Beta}:"));
            text.AppendLine(string.Create(s_c,
                $"  LLR {sprt.Llr:0.000} (bounds {sprt.Bounds.Lower:0.000} … {sprt.Bounds.Upper:0.000}, {sprt.Samples} {(sprt.Model == ScoreModel.Pentanomial ? "pairs" : "games")}): {sprt.DecisionText}"));
        }
        return text.ToString();
    }

    /// <summary>A probability as a percentage for people: <c>97.3%</c>, and never a bare 100% or 0%.</summary>
    public static string Percent(double p) => p >= 0.9995 ? ">99.9%" : p <= 0.0005 ? "<0.1%" : (100 * p).ToString("0.0", s_c) + "%";

    private static void AppendTable(StringBuilder text, string[] header, List<string[]> rows, bool[] leftAligned)
    {
        var widths = header.Select((h, c) => rows.Select(r => r[c].Length).Append(h.Length).Max()).ToArray();
        AppendRow(text, header, widths, leftAligned);
        text.AppendLine(string.Join("  ", widths.Select(w => new string('-', w))).TrimEnd());
        foreach (var row in rows) AppendRow(text, row, widths, leftAligned);
    }

    /// <summary>A rating difference for the table: <c>+123</c>, <c>-45</c>, <c>+inf</c>.</summary>
    public static string EloWord(double elo) => double.IsPositiveInfinity(elo) ? "+inf"
        : double.IsNegativeInfinity(elo) ? "-inf"
        : Math.Round(elo) == 0 ? "0"
        : Math.Round(elo).ToString("+0;-0", s_c);

    private static void AppendRow(StringBuilder text, string[] cells, int[] widths, bool[] leftAligned)
    {
        var parts = cells.Select((cell, c) => leftAligned[c] ? cell.PadRight(widths[c]) : cell.PadLeft(widths[c]));
        text.AppendLine(string.Join("  ", parts).TrimEnd());
    }
}
