using Bramble.Rules;
using Bramble.Values;

namespace Bramble.Search.Board;

/// <summary>A published theorem on who wins empty Domineering rectangles with Vertical (Left) moving first.</summary>
/// <param name="Name">The boards it covers, as the paper writes them (m rows, n columns).</param>
/// <param name="Source">Author, title, venue and year.</param>
/// <param name="Board">Whether it covers the m×n board (m rows, n columns).</param>
public sealed record RectangleTheorem(string Name, Side VerticalFirstWinner, string Source, Func<int, int, bool> Board)
{
    /// <summary>Whether the theorem covers the m×n rectangle (m rows, n columns) with Vertical moving first.</summary>
    public bool Covers(int m, int n) => Board(m, n);
}

/// <summary>The winner of an empty rectangle with a given side to move, and the theorem that says so.</summary>
public sealed record KnownWinner(Side Winner, RectangleTheorem Theorem);

/// <summary>
/// Who wins an empty m×n Domineering rectangle (m rows, n columns, Left places vertical dominoes)
/// without search, where a published theorem covers it. The papers state every theorem with
/// Vertical moving first; Horizontal (Right) moving first on m×n is Vertical moving first on n×m
/// with the roles swapped, so one table answers both sides.
/// <para>
/// Sources, as far as their abstracts state them (the full texts were not at hand; docs/domineering.md
/// quotes the abstracts): J. W. H. M. Uiterwijk, "Perfectly solving Domineering boards", Computer
/// Games Workshop CGW 2013, Springer CCIS 408 (2014); J. W. H. M. Uiterwijk, "The impact of safe
/// moves on perfectly solving Domineering boards, part 3", ICGA Journal 37(4) (2014).
/// </para>
/// </summary>
public static class KnownRectangles
{
    private const string Cgw2013 = "Uiterwijk, \"Perfectly solving Domineering boards\", CGW 2013 (Springer CCIS 408, 2014)";
    private const string Icga2014 = "Uiterwijk, \"The impact of safe moves on perfectly solving Domineering boards, part 3\", ICGA Journal 37(4) (2014)";

    private static bool Even(int n) => n % 2 == 0 && n >= 2;

    public static readonly RectangleTheorem ThreeColumns = new("m×3 (m > 1)", Side.Left, Cgw2013, (m, n) => n == 3 && m > 1);
    public static readonly RectangleTheorem EvenRowsOddColumns = new("2k×n (n = 3, 5, 7, 9, 11)", Side.Left, Cgw2013, (m, n) => Even(m) && n is 3 or 5 or 7 or 9 or 11);
    public static readonly RectangleTheorem EvenRowsThirteenColumns = new("2k×13 (k ≥ 3)", Side.Left, Icga2014, (m, n) => Even(m) && m >= 6 && n == 13);
    public static readonly RectangleTheorem ThreeRows = new("3×n (n > 3)", Side.Right, Cgw2013, (m, n) => m == 3 && n > 3);
    public static readonly RectangleTheorem FiveOrNineRows = new("m×2k (m = 5, 9)", Side.Right, Cgw2013, (m, n) => m is 5 or 9 && Even(n));
    public static readonly RectangleTheorem ThreeOrSevenRows = new("m×2k (m = 3, 7; k > 1)", Side.Right, Cgw2013, (m, n) => m is 3 or 7 && Even(n) && n >= 4);
    public static readonly RectangleTheorem ElevenRows = new("11×4k", Side.Right, Cgw2013, (m, n) => m == 11 && n % 4 == 0 && n >= 4);
    public static readonly RectangleTheorem ElevenRowsWide = new("11×2k (k ≥ 6)", Side.Right, Icga2014, (m, n) => m == 11 && Even(n) && n >= 12);
    public static readonly RectangleTheorem ThirteenRows = new("m×2k (m = 13)", Side.Right, Icga2014, (m, n) => m == 13 && Even(n));

    /// <summary>Every theorem, in the order they are tried.</summary>
    public static IReadOnlyList<RectangleTheorem> All { get; } =
        [ThreeColumns, EvenRowsOddColumns, EvenRowsThirteenColumns, ThreeRows, FiveOrNineRows, ThreeOrSevenRows, ElevenRows, ElevenRowsWide, ThirteenRows];

    /// <summary>
    /// The winner of the empty rectangle of <paramref name="rows"/> × <paramref name="columns"/> with
    /// <paramref name="toMove"/> moving first, and the theorem that gives it; null when none covers it.
    /// </summary>
    public static KnownWinner? Winner(int rows, int columns, Side toMove)
    {
        // Right first on rows×columns is Vertical first on the transpose, with the roles swapped.
        var (m, n) = toMove == Side.Left ? (rows, columns) : (columns, rows);
        foreach (var theorem in All)
        {
            if (!theorem.Covers(m, n)) continue;
            var winner = toMove == Side.Left ? theorem.VerticalFirstWinner : theorem.VerticalFirstWinner.Other();
            return new KnownWinner(winner, theorem);
        }
        return null;
    }

    /// <summary>The winner of a Domineering position with that side to move, when it is an empty rectangle a theorem covers.</summary>
    public static KnownWinner? Winner(Rules.Domineering.DomineeringPosition position, Side toMove)
    {
        var board = position.Board;
        for (int r = 0; r < board.Rows; r++)
            for (int c = 0; c < board.Columns; c++)
                if (!board.IsEmpty(r, c)) return null;
        return Winner(board.Rows, board.Columns, toMove);
    }
}
