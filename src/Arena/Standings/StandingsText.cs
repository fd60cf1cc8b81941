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
        var header = new[] { "#", "player", "games", "wins", "losses", "score", "Elo", "95% interval", "forfeits", "blunders/100" };
        var rows = standings.Players.Select((p, i) => new[]
        {
            (i + 1).ToString(s_c),
            p.Id,
            p.Games.ToString(s_c),
            p.Wins.ToString(s_c),
            p.Losses.ToString(s_c),
            p.Games == 0 ? "-" : (100 * p.Score).ToString("0.0", s_c) + "%",
            p.Games == 0 ? "-" : EloWord(p.Elo.Delta),
            p.Games == 0 ? "-" : $"{EloWord(p.Elo.Low)} … {EloWord(p.Elo.High)}",
            p.Forfeits.ToString(s_c),
            p.BlundersPer100 is { } b ? b.ToString("0.0", s_c) : "-",
        }).ToList();
        var widths = header.Select((h, c) => rows.Select(r => r[c].Length).Append(h.Length).Max()).ToArray();
        var leftAligned = new[] { false, true, false, false, false, false, false, true, false, false };
        var text = new StringBuilder();
        text.AppendLine($"{title}: {standings.Games} game{(standings.Games == 1 ? "" : "s")}");
        text.AppendLine();
        AppendRow(text, header, widths, leftAligned);
        text.AppendLine(string.Join("  ", widths.Select(w => new string('-', w))).TrimEnd());
        foreach (var row in rows) AppendRow(text, row, widths, leftAligned);
        text.AppendLine();
        var models = standings.Players.Where(p => p.Games > 0).Select(p => p.Elo.Model).Distinct().ToList();
        text.AppendLine("Elo: logistic model (A. Elo 1978), each player against the opponents it met; 95% intervals from " +
            (models.Count == 1 && models[0] == ScoreModel.Pentanomial
                ? "the pentanomial variance of seat-swapped game pairs (M. Van den Bergh, \"Normalized Elo\")."
                : models.Contains(ScoreModel.Pentanomial)
                    ? "seat-swapped pairs where every game of a player is paired, single games otherwise."
                    : "single games (trinomial variance)."));
        text.AppendLine("blunders/100: moves from a won position to a lost one, per 100 moves that exact analysis could judge.");
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
