using Bramble.Values;

namespace Bramble.Rules.Domineering;

/// <summary>
/// A Domineering position: a board with some cells filled. Left places vertical dominoes, Right
/// horizontal ones; a move is named by the domino's top or left cell. Components keep the whole
/// board with every cell outside their region filled, so their moves have the same names.
/// </summary>
public sealed class DomineeringPosition : IPosition
{
    private readonly DomineeringRuleset _ruleset;
    private IReadOnlyList<int[]>? _regions;
    private string? _normalKey;

    internal DomineeringPosition(DomineeringRuleset ruleset, Board board, ulong hash)
    {
        _ruleset = ruleset;
        Board = board;
        Hash = hash;
    }

    internal DomineeringPosition(DomineeringRuleset ruleset, Board board) : this(ruleset, board, Zobrist.Of(board)) { }

    public Board Board { get; }

    public IRuleset Ruleset => _ruleset;

    public string Text => BoardNotation.Format(Board);

    public ulong Hash { get; }

    public int Size => Board.EmptyCount;

    public IReadOnlyList<Move> Moves(Side side)
    {
        var moves = new List<Move>();
        for (int r = 0; r < Board.Rows; r++)
        {
            uint row = Board.EmptyRow(r);
            uint tops = side == Side.Left
                ? (r + 1 < Board.Rows ? row & Board.EmptyRow(r + 1) : 0u)
                : row & (row >> 1);
            for (; tops != 0; tops &= tops - 1)
                moves.Add(new Move(CellName.Index(r, System.Numerics.BitOperations.TrailingZeroCount(tops))));
        }
        return moves;
    }

    public IPosition Play(Side side, Move move)
    {
        int first = move.A;
        int second = first + (side == Side.Left ? Board.MaxColumns : 1);
        int r = first / Board.MaxColumns, c = first % Board.MaxColumns;
        string name = first >= 0 ? CellName.Format(first) : first.ToString();
        if (first < 0 || r >= Board.Rows || c >= Board.Columns)
            throw new IllegalMoveException($"{name} is off the {Board.Rows}x{Board.Columns} board");
        if (side == Side.Right && c + 1 >= Board.Columns)
            throw new IllegalMoveException($"{name} is not a legal move for right: a horizontal domino there would stick out of the board");
        if (side == Side.Left && r + 1 >= Board.Rows)
            throw new IllegalMoveException($"{name} is not a legal move for left: a vertical domino there would stick out of the board");
        foreach (int cell in new[] { first, second })
        {
            if (!Board.IsEmpty(cell / Board.MaxColumns, cell % Board.MaxColumns))
                throw new IllegalMoveException($"{name} is not a legal move for {side.Word()}: {CellName.Format(cell)} is filled");
        }
        var hash = Hash ^ Zobrist.Cell(first) ^ Zobrist.Cell(second);
        return new DomineeringPosition(_ruleset, Board.Fill(first, second), hash);
    }

    public string FormatMove(Move move) => CellName.Format(move.A);

    public Move ParseMove(string text) => new(CellName.Parse(text));

    /// <summary>The 4-connected groups of empty cells where somebody can move (at least two cells).</summary>
    internal IReadOnlyList<int[]> Regions => _regions ??= Board.Regions().Where(cells => cells.Length >= 2).ToArray();

    public IReadOnlyList<IPosition> Components()
    {
        var regions = Regions;
        if (regions.Count == 1 && regions[0].Length == Board.EmptyCount) return [this];
        var result = new IPosition[regions.Count];
        ulong sizeAndAllCells = Zobrist.Size(Board.Rows, Board.Columns);
        for (int r = 0; r < Board.Rows; r++)
            for (int c = 0; c < Board.Columns; c++)
                sizeAndAllCells ^= Zobrist.Cell(CellName.Index(r, c));
        for (int i = 0; i < regions.Count; i++)
        {
            // Filled = every cell but the region's, so the hash is "all cells" with the region's keys taken out again.
            ulong hash = sizeAndAllCells;
            foreach (int cell in regions[i]) hash ^= Zobrist.Cell(cell);
            result[i] = new DomineeringPosition(_ruleset, Board.Keep(regions[i]), hash);
        }
        return result;
    }

    /// <summary>
    /// The normal form of each region (see <see cref="NormalRegion.SignedKey"/>): one region gives
    /// its representative, with a leading '-' when the region is a transposed image of it; several
    /// are sorted and joined by " + "; a finished board is "0". Equal keys mean equal game trees up to
    /// translation and mirror images.
    /// </summary>
    public string NormalKey => _normalKey ??= MakeNormalKey();

    private string MakeNormalKey()
    {
        var keys = new List<string>();
        foreach (var cells in Regions)
        {
            if (Board.ToRegion(cells) is { } region) keys.Add(NormalRegion.Of(region).SignedKey);
            else keys.Add("(" + BoardNotation.Format(Board.Keep(cells)) + ")");
        }
        if (keys.Count == 0) return "0";
        keys.Sort(StringComparer.Ordinal);
        return string.Join(" + ", keys);
    }
}
