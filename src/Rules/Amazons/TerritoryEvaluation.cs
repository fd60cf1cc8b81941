using Bramble.Values;

namespace Bramble.Rules.Amazons;

/// <summary>
/// A static evaluation of an Amazons board after J. Lieberum, "An evaluation function for the game
/// of amazons", Theoretical Computer Science 349 (2005) 230–244, simplified. For every empty square
/// and each side: the queen distance D1 (fewest amazon moves, as a queen, to reach it) and the king
/// distance D2 (fewest king steps over empty squares). From these:
/// <list type="bullet">
/// <item>t1, t2: territory by queen and by king distance — +1 for a square Left reaches first, −1 for
/// one Right reaches first, and a small bonus for the side to move where they tie (Lieberum's κ);</item>
/// <item>c1 = 2 Σ (2^−D1(Left) − 2^−D1(Right)) and c2 = Σ clamp((D2(Right) − D2(Left)) / 6, −1, 1):
/// the smoother positional terms;</item>
/// <item>mobility: an amazon with few free neighbouring squares is nearly lost (it will be shut in),
/// so each side's amazons are charged for a lack of free neighbours;</item>
/// <item>the weights shift from the smooth terms to t1 as the board fills: w = Σ 2^−|D1(Left) − D1(Right)|
/// over squares both sides reach measures how open the fight still is (Lieberum's w).</item>
/// </list>
/// The exact weight functions of the paper are not reproduced (their constants were tuned for
/// 10×10 play); the shape — territory first late, influence and mobility early — is. The result is in
/// moves from Left's point of view.
/// </summary>
public static class TerritoryEvaluation
{
    private const int Far = 255;

    /// <summary>Lieberum's κ: what a tie in distance is worth to the side to move.</summary>
    private const double TieBonus = 0.2;

    /// <summary>What a side to move with no move at all scores: it has lost, which outweighs any territory.</summary>
    public const double Stuck = 1000;

    public static double Evaluate(AmazonsBoard board, Side toMove)
    {
        int n = board.Count;
        if (!CanMove(board, AmazonsBoard.AmazonOf(toMove))) return toMove == Side.Left ? -Stuck : Stuck;
        Span<byte> q1 = stackalloc byte[n], q2 = stackalloc byte[n], k1 = stackalloc byte[n], k2 = stackalloc byte[n];
        Span<short> queue = stackalloc short[n];
        Distances(board, Square.LeftAmazon, queen: true, q1, queue);
        Distances(board, Square.RightAmazon, queen: true, q2, queue);
        Distances(board, Square.LeftAmazon, queen: false, k1, queue);
        Distances(board, Square.RightAmazon, queen: false, k2, queue);
        double tie = toMove == Side.Left ? TieBonus : -TieBonus;
        double t1 = 0, t2 = 0, c1 = 0, c2 = 0, w = 0;
        int empties = 0;
        for (int cell = 0; cell < n; cell++)
        {
            if (board[cell] != Square.Empty) continue;
            empties++;
            t1 += Territory(q1[cell], q2[cell], tie);
            t2 += Territory(k1[cell], k2[cell], tie);
            c1 += 2 * (Power(q1[cell]) - Power(q2[cell]));
            if (k1[cell] != Far || k2[cell] != Far)
                c2 += Math.Clamp((Math.Min((int)k2[cell], 12) - Math.Min((int)k1[cell], 12)) / 6.0, -1, 1);
            if (q1[cell] != Far && q2[cell] != Far) w += Power(Math.Abs(q1[cell] - q2[cell]));
        }
        if (empties == 0) return 0;
        // The share of squares still contested: near 1 in the opening, 0 once every square is settled.
        double open = Math.Min(1.0, w / Math.Max(1, empties) * 2);
        double score = (1 - 0.5 * open) * t1 + open * (0.25 * t2 + 0.25 * c1 + 0.2 * c2);
        score += Mobility(board, Square.LeftAmazon) - Mobility(board, Square.RightAmazon);
        return score;
    }

    /// <summary>An amazon next to an empty square can always move (step there, shoot back).</summary>
    private static bool CanMove(AmazonsBoard board, Square amazon)
    {
        for (int cell = 0; cell < board.Count; cell++)
        {
            if (board[cell] != amazon) continue;
            int r = cell / board.Columns, c = cell % board.Columns;
            foreach (var (dr, dc) in AmazonsBoard.Directions)
                if (board.Inside(r + dr, c + dc) && board.At(r + dr, c + dc) == Square.Empty) return true;
        }
        return false;
    }

    private static double Territory(byte left, byte right, double tie) =>
        left == Far && right == Far ? 0 : left < right ? 1 : left > right ? -1 : tie;

    private static double Power(int d) => d >= 30 ? 0 : 1.0 / (1L << d);

    /// <summary>What a side's amazons lose for being hemmed in: −3 for an amazon with no free neighbour, less as it has more.</summary>
    private static double Mobility(AmazonsBoard board, Square amazon)
    {
        double charge = 0;
        for (int cell = 0; cell < board.Count; cell++)
        {
            if (board[cell] != amazon) continue;
            int r = cell / board.Columns, c = cell % board.Columns, free = 0;
            foreach (var (dr, dc) in AmazonsBoard.Directions)
                if (board.Inside(r + dr, c + dc) && board.At(r + dr, c + dc) == Square.Empty) free++;
            charge += free switch { 0 => -3, 1 => -1.5, 2 => -0.6, _ => 0 };
        }
        return charge;
    }

    /// <summary>Breadth-first distances from a side's amazons, by queen moves or king steps over empty squares.</summary>
    private static void Distances(AmazonsBoard board, Square amazon, bool queen, Span<byte> distance, Span<short> queue)
    {
        distance.Fill(Far);
        int head = 0, tail = 0;
        for (int cell = 0; cell < board.Count; cell++)
            if (board[cell] == amazon) queue[tail++] = (short)cell;
        foreach (var start in queue[..tail]) distance[start] = 0;
        while (head < tail)
        {
            int cell = queue[head++];
            byte next = (byte)(distance[cell] + 1);
            int r = cell / board.Columns, c = cell % board.Columns;
            foreach (var (dr, dc) in AmazonsBoard.Directions)
            {
                for (int nr = r + dr, nc = c + dc; board.Inside(nr, nc); nr += dr, nc += dc)
                {
                    int to = nr * board.Columns + nc;
                    if (board[to] != Square.Empty) break;
                    if (distance[to] > next)
                    {
                        distance[to] = next;
                        queue[tail++] = (short)to;
                    }
                    if (!queen) break;
                }
            }
        }
    }
}
