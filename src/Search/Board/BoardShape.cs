using Bramble.Rules.Domineering;

namespace Bramble.Search.Board;

/// <summary>
/// The fixed tables of a rectangle for the whole-board search (<see cref="BoardSearch{T}"/>). The
/// board is kept twice, once per side, each time turned so that the side to move places its
/// dominoes vertically: view 0 is the board as given (Left is vertical), view 1 its transpose
/// (Right's horizontal dominoes become vertical). In a view of height h and width w, cell (r, c)
/// is bit r·w + c; a domino is named by its top cell i and covers i and i + w. One move generator,
/// one set of counts and one table key then serve both sides, and Left to move on a square board
/// meets Right to move on its transpose in the table for free (docs/domineering.md).
/// <para>
/// Immutable after construction; one instance may be shared by every thread searching the board.
/// </para>
/// </summary>
public sealed class BoardShape
{
    /// <summary>Cells in each view; both views have the same number.</summary>
    public readonly int Cells;

    /// <summary>Height and width of view v (view 1 is the transpose of view 0).</summary>
    public readonly int[] Height, Width;

    /// <summary>Cell p of view v as a cell of the other view.</summary>
    public readonly int[][] ToOther;

    /// <summary>
    /// The top cell of the domino that a move with top cell i becomes under mirror f of view v
    /// (f = 0 none, 1 columns reversed, 2 rows reversed, 3 both): used to turn a table move back
    /// into the orientation being searched.
    /// </summary>
    public readonly int[][][] MirrorMove;

    /// <summary>
    /// For each side s (view s) and top cell i: the change of the eight incremental hashes (view v,
    /// mirror f at index v·4 + f) when that domino is placed, so a move costs eight XORs.
    /// </summary>
    public readonly ulong[][] HashDelta;

    private readonly ulong[][] _keys;
    private readonly int[][][] _mirrorCell;

    public int Rows => Height[0];
    public int Columns => Width[0];

    public BoardShape(int rows, int columns)
    {
        if (rows < 1 || columns < 1 || rows * columns > 128) throw new ArgumentOutOfRangeException(nameof(rows), "the whole-board search takes boards of at most 128 cells");
        Cells = rows * columns;
        Height = [rows, columns];
        Width = [columns, rows];
        ToOther = new int[2][];
        for (int v = 0; v < 2; v++)
        {
            ToOther[v] = new int[Cells];
            for (int p = 0; p < Cells; p++)
            {
                int r = p / Width[v], c = p % Width[v];
                ToOther[v][p] = c * Width[1 - v] + r;
            }
        }
        // Keys depend on the view's height and width (not by one XORed-in term, which an even number of
        // empty cells would cancel), so a view of one shape never meets a view of
        // another; views of equal shape (a square board's two views) share keys, hence entries.
        var keys = new ulong[2][];
        for (int v = 0; v < 2; v++)
        {
            keys[v] = new ulong[Cells];
            for (int p = 0; p < Cells; p++) keys[v][p] = Zobrist.Cell(p + 1024 * (Height[v] * 32 + Width[v]));
        }
        _keys = keys;
        MirrorMove = new int[2][][];
        var mirrorCell = _mirrorCell = new int[2][][];
        for (int v = 0; v < 2; v++)
        {
            int h = Height[v], w = Width[v];
            mirrorCell[v] = new int[4][];
            MirrorMove[v] = new int[4][];
            for (int f = 0; f < 4; f++)
            {
                mirrorCell[v][f] = new int[Cells];
                MirrorMove[v][f] = new int[Cells];
                for (int p = 0; p < Cells; p++)
                {
                    int r = p / w, c = p % w;
                    int mc = (f & 1) != 0 ? w - 1 - c : c;
                    mirrorCell[v][f][p] = ((f & 2) != 0 ? h - 1 - r : r) * w + mc;
                    // A vertical domino's top cell: with rows reversed, the old bottom cell becomes the top.
                    int mr = (f & 2) != 0 ? h - 2 - r : r;
                    MirrorMove[v][f][p] = mr >= 0 && mr < h ? mr * w + mc : -1;
                }
            }
        }
        HashDelta = new ulong[2][];
        for (int s = 0; s < 2; s++)
        {
            HashDelta[s] = new ulong[Cells * 8];
            for (int i = 0; i + Width[s] < Cells; i++)
            {
                int a = i, b = i + Width[s];
                for (int v = 0; v < 2; v++)
                {
                    int av = v == s ? a : ToOther[s][a], bv = v == s ? b : ToOther[s][b];
                    for (int f = 0; f < 4; f++)
                        HashDelta[s][i * 8 + v * 4 + f] = keys[v][mirrorCell[v][f][av]] ^ keys[v][mirrorCell[v][f][bv]];
                }
            }
        }
    }

    /// <summary>
    /// The eight hashes (view v, mirror f at v·4 + f) of a board: the XOR of the keys of its empty
    /// cells, so that placing a domino XORs its two cells out (<see cref="HashDelta"/>).
    /// </summary>
    /// <param name="empty">Whether each cell of view 0 is empty.</param>
    public ulong[] Hashes(ReadOnlySpan<bool> empty)
    {
        var h = new ulong[8];
        for (int p = 0; p < Cells; p++)
        {
            if (!empty[p]) continue;
            for (int v = 0; v < 2; v++)
            {
                int pv = v == 0 ? p : ToOther[0][p];
                for (int f = 0; f < 4; f++) h[v * 4 + f] ^= _keys[v][_mirrorCell[v][f][pv]];
            }
        }
        return h;
    }
}
