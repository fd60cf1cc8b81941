using Bramble.Arena.Statistics;

namespace Bramble.Arena.Standings;

/// <summary>One line of the standings.</summary>
/// <param name="Elo">The player's rating difference against the opponents it met, with a 95% interval.</param>
/// <param name="Forfeits">Games it lost by timeout, crash, bad move or bad reply.</param>
/// <param name="Blunders">Moves from a won position to a lost one, by exact analysis.</param>
/// <param name="Moves">Moves it made.</param>
/// <param name="MovesAnalysed">Of those, the moves analysis could judge (the denominator of the blunder rate).</param>
public sealed record PlayerStanding(string Id, int Games, int Wins, int Losses, EloEstimate Elo, int Forfeits, int Blunders, int Moves, int MovesAnalysed)
{
    public double Score => Games == 0 ? 0.0 : (double)Wins / Games;

    /// <summary>Blunders per 100 judged moves; null when no move could be judged.</summary>
    public double? BlundersPer100 => MovesAnalysed == 0 ? null : 100.0 * Blunders / MovesAnalysed;
}
