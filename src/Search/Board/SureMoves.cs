namespace Bramble.Search.Board;

/// <summary>
/// The race for a side's blocks and spare moves in the safe-move bounds, solved once as a small
/// game: the side plays into a protective block (one move now and a safe one beside it later, so
/// two), a lone spare or a spare (one each); the opponent, in turn, spoils one block, or one lone
/// spare, or up to two spares, or plays elsewhere. The table holds the moves the side is sure of
/// from the race with best play on both sides, moving first or second. Restricting the side's
/// choices only lowers the figure, so it stays a lower bound. With spares alone it is one in three
/// (⌈x/3⌉ first, ⌈(x−2)/3⌉ second); with lone spares alone one in two.
/// <para>
/// <see cref="Margin"/> plays the same race for the bounds' comparison itself rather than for the
/// side's moves alone: a block the side plays into also takes away both of the opponent's moves
/// in it (its rows are runs of exactly two across, each one opponent move, and a move down one
/// column leaves a single cell in each row), so it is worth four — two moves more for the side,
/// two fewer for the opponent's possible moves, which count them. A block the opponent spoils
/// uses one of those two counted moves and leaves the other, so the opponent's count stands.
/// </para>
/// Immutable once built; one instance serves every search.
/// </summary>
public sealed class SureMoves
{
    /// <summary>Largest counts held; a rectangle of 128 cells has at most 32 blocks and 64 spares.</summary>
    public const int MaxBlocks = 32, MaxSpare = 64;

    private const int Spares = MaxSpare + 1;
    private readonly byte[] _first = new byte[(MaxBlocks + 1) * Spares * Spares];
    private readonly byte[] _second = new byte[(MaxBlocks + 1) * Spares * Spares];

    /// <summary>The side's sure moves: a block is worth two (this move and the safe one it makes).</summary>
    public static SureMoves Shared { get; } = new(blockWorth: 2);

    /// <summary>
    /// The side's sure moves plus the opponent's possible moves its blocks take away: a block is
    /// worth four. Compared with the opponent's possible moves counted before the race.
    /// </summary>
    public static SureMoves Margin { get; } = new(blockWorth: 4);

    private SureMoves(int blockWorth)
    {
        // In increasing order of each count: every entry needs only entries with one count lower.
        for (int p = 0; p <= MaxBlocks; p++)
            for (int v = 0; v <= MaxSpare; v++)
                for (int x = 0; x <= MaxSpare; x++)
                {
                    int first = 0;
                    if (p > 0) first = Math.Max(first, blockWorth + _second[Index(p - 1, v, x)]);
                    if (v > 0) first = Math.Max(first, 1 + _second[Index(p, v - 1, x)]);
                    if (x > 0) first = Math.Max(first, 1 + _second[Index(p, v, x - 1)]);
                    _first[Index(p, v, x)] = (byte)first;
                    // The opponent may also play elsewhere, leaving the side to move in the same race.
                    int second = first;
                    if (p > 0) second = Math.Min(second, _first[Index(p - 1, v, x)]);
                    if (v > 0) second = Math.Min(second, _first[Index(p, v - 1, x)]);
                    if (x > 0) second = Math.Min(second, _first[Index(p, v, x - 1)]);
                    if (x > 1) second = Math.Min(second, _first[Index(p, v, x - 2)]);
                    _second[Index(p, v, x)] = (byte)second;
                }
    }

    private static int Index(int blocks, int lone, int spare) => (blocks * Spares + lone) * Spares + spare;

    /// <summary>Sure moves from the race for the given blocks, lone spares and other spares.</summary>
    public int Get(int blocks, int lone, int spare, bool movesFirst)
    {
        int i = Index(Math.Min(blocks, MaxBlocks), Math.Min(lone, MaxSpare), Math.Min(spare, MaxSpare));
        return movesFirst ? _first[i] : _second[i];
    }
}
