namespace Bramble.Rules.Domineering;

/// <summary>
/// Zobrist hashing: the hash of a board is the XOR of one fixed random key per filled cell (and
/// one for the board's size), so placing a domino updates it with two XORs. The keys are a pure
/// function of the cell (a SplitMix64 scramble), so there is no table to share or fill.
/// </summary>
public static class Zobrist
{
    public static ulong Cell(int cell) => Scramble(0x9E3779B97F4A7C15UL * (ulong)(cell + 1));

    public static ulong Size(int rows, int columns) => Scramble(0xD1B54A32D192ED03UL ^ ((ulong)rows << 32 | (uint)columns));

    public static ulong Of(Board board)
    {
        ulong h = Size(board.Rows, board.Columns);
        for (int r = 0; r < board.Rows; r++)
            for (int c = 0; c < board.Columns; c++)
                if (!board.IsEmpty(r, c)) h ^= Cell(CellName.Index(r, c));
        return h;
    }

    private static ulong Scramble(ulong z)
    {
        z = (z ^ (z >> 30)) * 0xBF58476D1CE4E5B9UL;
        z = (z ^ (z >> 27)) * 0x94D049BB133111EBUL;
        return z ^ (z >> 31);
    }
}
