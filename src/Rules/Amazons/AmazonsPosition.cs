using System.Text;
using Bramble.Rules.Common;
using Bramble.Values;

namespace Bramble.Rules.Amazons;

/// <summary>
/// An Amazons position: Left's and Right's amazons and burnt squares on a board. A move takes one
/// of the mover's amazons along a queen line over empty squares, then shoots an arrow from where it
/// landed along a queen line (the square it left counts as empty); the arrow's square is burnt for
/// good. A move is named <c>from-to/arrow</c>, e.g. <c>d10-d6/g6</c>
/// (<see cref="Move.A"/> the amazon's square; <see cref="Move.B"/> = landing × 128 + arrow, squares
/// numbered row × columns + column).
/// <para>
/// Components are the regions: the squares that are not burnt, joined through the eight queen
/// directions (a queen line, or an arrow, passes only from a square to one of its eight neighbours,
/// so nothing ever crosses from one region to another). A region without an amazon, or without an
/// empty square, is dead and dropped. A component keeps the whole board with the other regions
/// burnt, so its moves keep their names.
/// </para>
/// </summary>
public sealed class AmazonsPosition : IPosition, IEstimable
{
    private int[][]? _regions;
    private string? _key;

    internal AmazonsPosition(AmazonsRuleset ruleset, AmazonsBoard board, Move? lastMove = null)
    {
        Ruleset = ruleset;
        Board = board;
        Text = board.Text;
        Hash = TextHash.Of(Text);
        LastMove = lastMove;
    }

    public AmazonsBoard Board { get; }
    public IRuleset Ruleset { get; }
    public string Text { get; }
    public ulong Hash { get; }

    /// <summary>The move that made this position, when it was made by <see cref="Play"/> (for pictures).</summary>
    public Move? LastMove { get; }

    /// <summary>Squares of the live regions (amazons and empty squares).</summary>
    public int Size
    {
        get
        {
            int n = 0;
            foreach (var region in Regions) n += region.Length;
            return n;
        }
    }

    internal const string MoveExample = "d10-d6/g6";

    // ------------------------------------------------------------------ moves

    public IReadOnlyList<Move> Moves(Side side)
    {
        var moves = new List<Move>();
        var mine = AmazonsBoard.AmazonOf(side);
        for (int from = 0; from < Board.Count; from++)
            if (Board[from] == mine) AddMovesOf(from, moves);
        return moves;
    }

    /// <summary>Every move of the amazon on <paramref name="from"/>, landing squares in direction order, arrows likewise.</summary>
    private void AddMovesOf(int from, List<Move> moves)
    {
        int rows = Board.Rows, columns = Board.Columns;
        int r0 = from / columns, c0 = from % columns;
        foreach (var (dr, dc) in AmazonsBoard.Directions)
        {
            for (int r = r0 + dr, c = c0 + dc; Board.Inside(r, c); r += dr, c += dc)
            {
                int to = r * columns + c;
                if (Board[to] != Square.Empty) break;
                foreach (var (ar, ac) in AmazonsBoard.Directions)
                {
                    for (int r2 = r + ar, c2 = c + ac; r2 >= 0 && r2 < rows && c2 >= 0 && c2 < columns; r2 += ar, c2 += ac)
                    {
                        int arrow = r2 * columns + c2;
                        if (Board[arrow] != Square.Empty && arrow != from) break;
                        moves.Add(new Move(from, to * 128 + arrow));
                    }
                }
            }
        }
    }

    public IPosition Play(Side side, Move move)
    {
        int from = move.A, to = move.B / 128, arrow = move.B % 128;
        if (from < 0 || from >= Board.Count || move.B < 0 || to >= Board.Count || arrow >= Board.Count)
            throw new IllegalMoveException($"{Describe(move)}: off the {Board.Rows}x{Board.Columns} board");
        var mine = AmazonsBoard.AmazonOf(side);
        string name = FormatMove(move);
        if (Board[from] != mine)
            throw new IllegalMoveException($"{name} is not a legal move for {side.Word()}: {Board.CellName(from)} holds no {AmazonsBoard.Letter(mine)} amazon");
        if (!Board.QueenReaches(from, to))
            throw new IllegalMoveException($"{name} is not a legal move for {side.Word()}: the amazon cannot reach {Board.CellName(to)} along a free queen line");
        if (!Board.QueenReaches(to, arrow, vacated: from))
            throw new IllegalMoveException($"{name} is not a legal move for {side.Word()}: no free queen line from {Board.CellName(to)} to the arrow's square {Board.CellName(arrow)}");
        var next = Board.CopyCells();
        next[from] = Square.Empty;
        next[to] = mine;
        next[arrow] = Square.Burnt;
        return new AmazonsPosition((AmazonsRuleset)Ruleset, new AmazonsBoard(Board.Rows, Board.Columns, next), move);
    }

    private string Describe(Move move) => $"move ({move.A}, {move.B})";

    public string FormatMove(Move move)
    {
        int to = move.B / 128, arrow = move.B % 128;
        if (move.A < 0 || move.A >= Board.Count || move.B < 0 || to >= Board.Count || arrow >= Board.Count) return Describe(move);
        return $"{Board.CellName(move.A)}-{Board.CellName(to)}/{Board.CellName(arrow)}";
    }

    /// <summary>Reads three squares: the amazon's, where it lands and where its arrow burns (any of '-', '/', ',', ':', spaces or brackets between).</summary>
    public Move ParseMove(string text)
    {
        var t = text.Trim();
        int i = 0;
        var squares = new int[3];
        for (int k = 0; k < 3; k++)
        {
            if (k > 0) while (i < t.Length && (t[i] is '-' or '/' or ',' or ':' or ' ' or '(' or ')' or '>')) i++;
            var cell = Board.ReadCell(t, ref i);
            if (cell is null)
                throw new IllegalMoveException($"bad move '{text}': expected three squares of the {Board.Rows}x{Board.Columns} board — the amazon, where it goes, where its arrow lands — such as {MoveExample}");
            squares[k] = cell.Value;
        }
        while (i < t.Length && t[i] == ')') i++;
        if (i != t.Length)
            throw new IllegalMoveException($"bad move '{text}': expected the end after three squares, such as {MoveExample}");
        return new Move(squares[0], squares[1] * 128 + squares[2]);
    }

    // ------------------------------------------------------------------ regions

    /// <summary>The live regions, each as its sorted squares.</summary>
    internal int[][] Regions => _regions ??= FindRegions();

    private int[][] FindRegions()
    {
        var seen = new bool[Board.Count];
        var result = new List<int[]>();
        var stack = new Stack<int>();
        for (int start = 0; start < Board.Count; start++)
        {
            if (seen[start] || Board[start] == Square.Burnt) continue;
            var region = new List<int>();
            bool amazon = false, empty = false;
            seen[start] = true;
            stack.Push(start);
            while (stack.Count > 0)
            {
                int cell = stack.Pop();
                region.Add(cell);
                if (Board[cell] == Square.Empty) empty = true; else amazon = true;
                int r = cell / Board.Columns, c = cell % Board.Columns;
                foreach (var (dr, dc) in AmazonsBoard.Directions)
                {
                    int nr = r + dr, nc = c + dc;
                    if (!Board.Inside(nr, nc)) continue;
                    int n = nr * Board.Columns + nc;
                    if (seen[n] || Board[n] == Square.Burnt) continue;
                    seen[n] = true;
                    stack.Push(n);
                }
            }
            // Connected, with an amazon and an empty square: some amazon stands next to an empty
            // square, steps there and shoots back, so somebody can move.
            if (amazon && empty)
            {
                region.Sort();
                result.Add(region.ToArray());
            }
        }
        return result.ToArray();
    }

    public IReadOnlyList<IPosition> Components()
    {
        var regions = Regions;
        if (regions.Length == 1 && regions[0].Length == OpenSquares()) return [this];
        return regions.Select(region => (IPosition)new AmazonsPosition((AmazonsRuleset)Ruleset, Keep(region))).ToArray();
    }

    private int OpenSquares()
    {
        int n = 0;
        foreach (var s in Board.Cells) if (s != Square.Burnt) n++;
        return n;
    }

    /// <summary>The board with every square outside the region burnt.</summary>
    private AmazonsBoard Keep(int[] region)
    {
        var cells = new Square[Board.Count];
        Array.Fill(cells, Square.Burnt);
        foreach (int cell in region) cells[cell] = Board[cell];
        return new AmazonsBoard(Board.Rows, Board.Columns, cells);
    }

    /// <summary>The side whose amazons are the only ones in the region, or null when both sides have some there.</summary>
    internal Side? SoleOwner(int[] region)
    {
        bool left = false, right = false;
        foreach (int cell in region)
        {
            if (Board[cell] == Square.LeftAmazon) left = true;
            else if (Board[cell] == Square.RightAmazon) right = true;
        }
        return left && right ? null : left ? Side.Left : Side.Right;
    }

    // ------------------------------------------------------------------ normal keys

    /// <summary>
    /// The regions' keys joined: each region keyed by its bounding box (squares outside the region
    /// written as burnt) under the eight symmetries of the board and the exchange of colours; the
    /// smallest text wins, with a leading '-' when it is a colour-swapped image (the negative game).
    /// </summary>
    public string NormalKey => _key ??= ComponentValues.JoinKeys(Regions.Select(KeyOf));

    /// <summary>The area of the bounding box of the first live region (0 when there is none).</summary>
    internal int BoxArea
    {
        get
        {
            if (Regions.Length == 0) return 0;
            var (top, left, bottom, right) = Box(Regions[0]);
            return (bottom - top + 1) * (right - left + 1);
        }
    }

    private (int Top, int Left, int Bottom, int Right) Box(int[] region)
    {
        int top = int.MaxValue, left = int.MaxValue, bottom = -1, right = -1;
        foreach (int cell in region)
        {
            int r = cell / Board.Columns, c = cell % Board.Columns;
            top = Math.Min(top, r); bottom = Math.Max(bottom, r);
            left = Math.Min(left, c); right = Math.Max(right, c);
        }
        return (top, left, bottom, right);
    }

    private string KeyOf(int[] region)
    {
        var (top, left, bottom, right) = Box(region);
        int height = bottom - top + 1, width = right - left + 1;
        var box = new char[height, width];
        for (int r = 0; r < height; r++)
            for (int c = 0; c < width; c++) box[r, c] = '#';
        foreach (int cell in region) box[cell / Board.Columns - top, cell % Board.Columns - left] = AmazonsBoard.Letter(Board[cell]);
        return SignedKey(box);
    }

    /// <summary>The smallest of the 16 images of a box (8 symmetries, with and without colour swap), '-' before a swapped one; a tie goes to the plain image.</summary>
    internal static string SignedKey(char[,] box)
    {
        int height = box.GetLength(0), width = box.GetLength(1);
        string? best = null;
        bool bestSwapped = false;
        var sb = new StringBuilder(height * (width + 1));
        for (int t = 0; t < 8; t++)
        {
            bool transposed = t >= 4;
            int h = transposed ? width : height, w = transposed ? height : width;
            for (int swap = 0; swap < 2; swap++)
            {
                sb.Clear();
                for (int r = 0; r < h; r++)
                {
                    if (r > 0) sb.Append('/');
                    for (int c = 0; c < w; c++)
                    {
                        int sr = transposed ? c : r, sc = transposed ? r : c;
                        if ((t & 1) != 0) sr = height - 1 - sr;
                        if ((t & 2) != 0) sc = width - 1 - sc;
                        char ch = box[sr, sc];
                        if (swap == 1) ch = ch == 'L' ? 'R' : ch == 'R' ? 'L' : ch;
                        sb.Append(ch);
                    }
                }
                string text = sb.ToString();
                int cmp = best is null ? -1 : string.CompareOrdinal(text, best);
                if (cmp < 0 || (cmp == 0 && bestSwapped && swap == 0))
                {
                    best = text;
                    bestSwapped = swap == 1;
                }
            }
        }
        return bestSwapped ? "-" + best : best!;
    }

    // ------------------------------------------------------------------ evaluation

    /// <inheritdoc/>
    public double Estimate(Side toMove) => TerritoryEvaluation.Evaluate(Board, toMove);

    public override string ToString() => Text;
}
