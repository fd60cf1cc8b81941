using Bramble.Rules;
using Bramble.Values;

namespace Bramble.Search;

/// <summary>
/// The decision of a temperature strategy: which component to play in, and which real move there.
/// Shared by the temperature players and by <see cref="PerfectPlayer"/>, which falls back on
/// Thermostrat past its budget and breaks ties with it.
/// </summary>
public sealed class TemperatureStrategy(ThermalReader reader)
{
    public ThermalReader Reader => reader;

    /// <summary>What a strategy saw and chose.</summary>
    public sealed record Choice(Move? Move, IReadOnlyList<HeatReading> Readings, Dyadic Ambient, bool Estimated);

    /// <summary>Reads every component of the position.</summary>
    public IReadOnlyList<HeatReading> ReadAll(IPosition position, SearchBudget budget) =>
        position.Components().Select(c => reader.Read(c, budget)).ToList();

    /// <summary>
    /// The strategy's move. <paramref name="answerIn"/> (Sentestrat) names the components the
    /// opponent's last move created, with the ambient temperature before that move.
    /// </summary>
    public Choice Choose(IPosition position, Side side, TemperatureRule rule, SearchBudget budget,
        (IReadOnlySet<string> Texts, Dyadic Ambient)? answerIn = null)
    {
        var readings = ReadAll(position, budget);
        bool estimated = readings.Any(r => r.Estimated);
        var playable = Enumerable.Range(0, readings.Count).Where(i => readings[i].Position.Moves(side).Count > 0).ToList();
        if (playable.Count == 0) return new Choice(null, readings, Dyadic.Zero, estimated);

        var compound = new Compound(readings.Select(r => r.Thermograph).ToList());
        int pick;
        Dyadic readAt;
        if (rule == TemperatureRule.Hotstrat)
        {
            pick = Hottest(readings, playable);
            readAt = Dyadic.Max(Dyadic.Zero, readings[pick].Temperature);
        }
        else
        {
            pick = -1;
            readAt = compound.Ambient;
            if (rule == TemperatureRule.Sentestrat && answerIn is { } threat)
            {
                // The opponent's move is a threat when it left its component hotter than the ambient
                // temperature of the rest of the board: the hottest component the move did not touch
                // (and at least the compound's ambient temperature before the move). Answer it.
                var created = Enumerable.Range(0, readings.Count).Where(i => threat.Texts.Contains(readings[i].Position.Text)).ToList();
                var ambient = threat.Ambient;
                for (int i = 0; i < readings.Count; i++)
                    if (!created.Contains(i) && readings[i].Temperature > ambient) ambient = readings[i].Temperature;
                var threats = created.Where(i => playable.Contains(i) && readings[i].Temperature > ambient).ToList();
                if (threats.Count > 0) pick = Hottest(readings, threats);
            }
            if (pick < 0) pick = Widest(readings, playable, compound);
        }
        var move = BestMoveIn(readings[pick], side, readAt, budget, ref estimated);
        return new Choice(move, readings, compound.Ambient, estimated);
    }

    /// <summary>Moves of every playable component ranked by the strategy (best first), for tie-breaks.</summary>
    public IReadOnlyList<Move> Rank(IPosition position, Side side, SearchBudget budget)
    {
        var readings = ReadAll(position, budget);
        var compound = new Compound(readings.Select(r => r.Thermograph).ToList());
        var ranked = new List<(Move Move, Dyadic Width, Dyadic Heat, Dyadic Wall)>();
        bool estimated = false;
        foreach (var r in readings)
        {
            foreach (var (move, wall) in RankMovesIn(r, side, compound.Ambient, budget, ref estimated))
                ranked.Add((move, r.WidthAt(compound.Probe), r.Temperature, wall));
        }
        ranked.Sort((p, q) =>
        {
            int c = q.Width.CompareTo(p.Width);
            if (c == 0) c = q.Heat.CompareTo(p.Heat);
            return c != 0 ? c : q.Wall.CompareTo(p.Wall);
        });
        return ranked.ConvertAll(r => r.Move);
    }

    /// <summary>Highest temperature (so in a sum of numbers the least negative one); ties: widest at 0, then first.</summary>
    private static int Hottest(IReadOnlyList<HeatReading> readings, List<int> among)
    {
        int best = among[0];
        foreach (int i in among.Skip(1))
        {
            int c = readings[i].Temperature.CompareTo(readings[best].Temperature);
            if (c > 0 || (c == 0 && readings[i].WidthAt(Dyadic.Zero) > readings[best].WidthAt(Dyadic.Zero))) best = i;
        }
        return best;
    }

    /// <summary>Widest just below the ambient temperature; when every width there is 0, the hottest.</summary>
    private static int Widest(IReadOnlyList<HeatReading> readings, List<int> among, Compound compound)
    {
        int best = among[0];
        foreach (int i in among.Skip(1))
        {
            int c = compound.Width(i, compound.Probe).CompareTo(compound.Width(best, compound.Probe));
            if (c > 0 || (c == 0 && readings[i].Temperature > readings[best].Temperature)) best = i;
        }
        return compound.Width(best, compound.Probe).Sign > 0 ? best : Hottest(readings, among);
    }

    /// <summary>
    /// The real move in the component whose result is best for the mover read at temperature t:
    /// for Left the result's right wall at t (Right answers next), for Right its left wall.
    /// </summary>
    private Move? BestMoveIn(HeatReading reading, Side side, Dyadic t, SearchBudget budget, ref bool estimated)
    {
        var ranked = RankMovesIn(reading, side, t, budget, ref estimated);
        return ranked.Count == 0 ? null : ranked[0].Move;
    }

    private List<(Move Move, Dyadic Wall)> RankMovesIn(HeatReading reading, Side side, Dyadic t, SearchBudget budget, ref bool estimated)
    {
        var store = reader.Store;
        var scored = new List<(Move Move, Dyadic Wall, Dyadic Stop, int Order)>();
        int order = 0;
        foreach (var m in reading.Position.Moves(side))
        {
            var (value, guess) = reader.ValueOfPieces(reading.Position.Play(side, m).Components(), budget);
            estimated |= guess;
            var th = store.Thermograph(value);
            // Scores are taken from the mover's point of view, so larger is better for both sides.
            var wall = side == Side.Left ? th.RightWallAt(t) : -th.LeftWallAt(t);
            var stop = side == Side.Left ? th.RightWallAt(Dyadic.Zero) : -th.LeftWallAt(Dyadic.Zero);
            scored.Add((m, wall, stop, order++));
        }
        scored.Sort((p, q) =>
        {
            int c = q.Wall.CompareTo(p.Wall);
            if (c == 0) c = q.Stop.CompareTo(p.Stop);
            return c != 0 ? c : p.Order.CompareTo(q.Order);
        });
        return scored.ConvertAll(s => (s.Move, s.Wall));
    }
}
