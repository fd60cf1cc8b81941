using System.Buffers;
using System.Text;
using System.Text.Encodings.Web;
using System.Text.Json;
using Bramble.Arena.Statistics;

namespace Bramble.Arena.Standings;

/// <summary>
/// The standings as JSON (<c>--json</c>): <c>{"title","games","players":[{"id","games","wins",
/// "losses","score","elo","elo_low","elo_high","elo_model","forfeits","blunders","moves_analysed",
/// "blunders_per_100","rating","rating_low","rating_high","los_next"}],"ratings_regularised",
/// "crosstable":[{"player","opponent","wins","games"}],"sprt":{…}|null,"notes":[…]}</c>. Infinite
/// Elo values are written as null. <c>elo</c> is each player against the opponents it met;
/// <c>rating</c> is the joint fit (see <see cref="RatingTable"/>).
/// </summary>
public static class StandingsJson
{
    public static string Write(MatchStandings standings, string title, IEnumerable<string> notes)
    {
        var buffer = new ArrayBufferWriter<byte>();
        using (var json = new Utf8JsonWriter(buffer, new JsonWriterOptions { Indented = true, Encoder = JavaScriptEncoder.UnsafeRelaxedJsonEscaping }))
        {
            json.WriteStartObject();
            json.WriteString("title", title);
            json.WriteNumber("games", standings.Games);
            json.WriteStartArray("players");
            foreach (var p in standings.Players)
            {
                json.WriteStartObject();
                json.WriteString("id", p.Id);
                json.WriteNumber("games", p.Games);
                json.WriteNumber("wins", p.Wins);
                json.WriteNumber("losses", p.Losses);
                json.WriteNumber("score", Math.Round(p.Score, 6));
                Finite(json, "elo", p.Games == 0 ? double.NaN : p.Elo.Delta);
                Finite(json, "elo_low", p.Games == 0 ? double.NaN : p.Elo.Low);
                Finite(json, "elo_high", p.Games == 0 ? double.NaN : p.Elo.High);
                json.WriteString("elo_model", p.Elo.Model.Word());
                if (standings.Ratings.Of(p.Id) is { } r)
                {
                    Finite(json, "rating", r.Rating);
                    Finite(json, "rating_low", r.Low);
                    Finite(json, "rating_high", r.High);
                    if (r.Superiority is { } los) json.WriteNumber("los_next", Math.Round(los, 6));
                    else json.WriteNull("los_next");
                }
                json.WriteNumber("forfeits", p.Forfeits);
                json.WriteNumber("blunders", p.Blunders);
                json.WriteNumber("moves_analysed", p.MovesAnalysed);
                Finite(json, "blunders_per_100", p.BlundersPer100 ?? double.NaN);
                json.WriteEndObject();
            }
            json.WriteEndArray();
            json.WriteBoolean("ratings_regularised", standings.Ratings.Regularised);
            json.WriteStartArray("crosstable");
            var table = standings.Crosstable;
            for (var i = 0; i < table.Players.Count; i++)
                for (var j = 0; j < table.Players.Count; j++)
                {
                    var (wins, games) = table.Cell(i, j);
                    if (i == j || games == 0) continue;
                    json.WriteStartObject();
                    json.WriteString("player", table.Players[i]);
                    json.WriteString("opponent", table.Players[j]);
                    json.WriteNumber("wins", wins);
                    json.WriteNumber("games", games);
                    json.WriteEndObject();
                }
            json.WriteEndArray();
            if (standings.Sprt is { } sprt)
            {
                json.WriteStartObject("sprt");
                json.WriteString("candidate", sprt.Candidate);
                json.WriteString("baseline", sprt.Baseline);
                json.WriteNumber("null_elo", sprt.Spec.NullElo);
                json.WriteNumber("alternative_elo", sprt.Spec.AlternativeElo);
                json.WriteNumber("alpha", sprt.Spec.Alpha);
                json.WriteNumber("beta", sprt.Spec.Beta);
                Finite(json, "llr", sprt.Llr);
                json.WriteNumber("lower", Math.Round(sprt.Bounds.Lower, 6));
                json.WriteNumber("upper", Math.Round(sprt.Bounds.Upper, 6));
                json.WriteString("decision", sprt.Decision switch
                {
                    SprtDecision.Null => "null",
                    SprtDecision.Alternative => "alternative",
                    _ => "continue",
                });
                json.WriteString("model", sprt.Model.Word());
                json.WriteEndObject();
            }
            else json.WriteNull("sprt");
            json.WriteStartArray("notes");
            foreach (var note in notes) json.WriteStringValue(note);
            json.WriteEndArray();
            json.WriteEndObject();
        }
        return Encoding.UTF8.GetString(buffer.WrittenSpan);
    }

    private static void Finite(Utf8JsonWriter json, string name, double value)
    {
        if (double.IsFinite(value)) json.WriteNumber(name, Math.Round(value, 3));
        else json.WriteNull(name);
    }
}
