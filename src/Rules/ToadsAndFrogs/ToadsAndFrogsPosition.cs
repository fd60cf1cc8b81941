using System.Globalization;
using Bramble.Rules.Common;
using Bramble.Values;

namespace Bramble.Rules.ToadsAndFrogs;

/// <summary>
/// A Toads and Frogs strip. Left's toads move one square right into an empty square or jump one
/// frog into the empty square behind it; Right's frogs do the same leftwards. Squares are
/// numbered 1, 2, … from the left (walls included); a move names the square of the piece that
/// moves (each piece has at most one move). Components keep the whole strip with every square
/// outside their stretch made a wall, so their moves keep their names.
/// </summary>
public sealed class ToadsAndFrogsPosition : IPosition
{
    private readonly ToadsAndFrogsRuleset _ruleset;
    private readonly Square[] _squares;
    private IReadOnlyList<(int Start, int End)>? _stretches;

    internal ToadsAndFrogsPosition(ToadsAndFrogsRuleset ruleset, Square[] squares)
    {
        _ruleset = ruleset;
        _squares = squares;
        Text = StripNotation.Format(squares);
        Hash = TextHash.Of(Text);
    }

    public IReadOnlyList<Square> Squares => _squares;

    public IRuleset Ruleset => _ruleset;

    public string Text { get; }

    public ulong Hash { get; }

    public int Size => _squares.Count(s => s != Square.Wall);

    /// <summary>Where the piece on square <paramref name="i"/> (0-based) lands, or −1 when it cannot move.</summary>
    public int Target(int i)
    {
        var s = _squares[i];
        int step = s == Square.Toad ? 1 : s == Square.Frog ? -1 : 0;
        if (step == 0) return -1;
        var other = s == Square.Toad ? Square.Frog : Square.Toad;
        int next = i + step;
        if (next < 0 || next >= _squares.Length) return -1;
        if (_squares[next] == Square.Empty) return next;
        int beyond = next + step;
        if (_squares[next] == other && beyond >= 0 && beyond < _squares.Length && _squares[beyond] == Square.Empty) return beyond;
        return -1;
    }

    public IReadOnlyList<Move> Moves(Side side)
    {
        var mine = side == Side.Left ? Square.Toad : Square.Frog;
        var moves = new List<Move>();
        for (int i = 0; i < _squares.Length; i++)
            if (_squares[i] == mine && Target(i) >= 0) moves.Add(new Move(i));
        return moves;
    }

    public IPosition Play(Side side, Move move)
    {
        int i = move.A;
        if (i < 0 || i >= _squares.Length)
            throw new IllegalMoveException($"{FormatMove(move)}: the strip has squares 1 to {_squares.Length}");
        var mine = side == Side.Left ? Square.Toad : Square.Frog;
        if (_squares[i] != mine)
            throw new IllegalMoveException($"{FormatMove(move)} is not a legal move for {side.Word()}: square {i + 1} holds {Describe(_squares[i])}, not a {(side == Side.Left ? "toad" : "frog")}");
        int target = Target(i);
        if (target < 0)
            throw new IllegalMoveException($"{FormatMove(move)} is not a legal move for {side.Word()}: the {(side == Side.Left ? "toad" : "frog")} on square {i + 1} is blocked");
        var squares = (Square[])_squares.Clone();
        squares[target] = mine;
        squares[i] = Square.Empty;
        return new ToadsAndFrogsPosition(_ruleset, squares);
    }

    private static string Describe(Square s) => s switch
    {
        Square.Toad => "a toad",
        Square.Frog => "a frog",
        Square.Wall => "a wall",
        _ => "nothing",
    };

    public string FormatMove(Move move) => (move.A + 1).ToString(CultureInfo.InvariantCulture);

    /// <summary>Reads <c>3</c>, <c>3&gt;</c>, <c>3&lt;</c> or <c>3-4</c> (from square 3 to square 4): the move of the piece on square 3.</summary>
    public Move ParseMove(string text)
    {
        var t = text.Trim();
        int end = 0;
        while (end < t.Length && char.IsAsciiDigit(t[end])) end++;
        if (end == 0 || !int.TryParse(t.AsSpan(0, end), NumberStyles.None, CultureInfo.InvariantCulture, out int from) || from < 1)
            throw new IllegalMoveException($"bad move '{text}': expected the number of the square whose piece moves, such as 3 (or 3-4, 3>, 3<)");
        var rest = t[end..].Trim();
        if (rest is "" or ">" or "<") return new Move(from - 1);
        if (rest[0] == '-' && int.TryParse(rest.AsSpan(1).Trim(), NumberStyles.None, CultureInfo.InvariantCulture, out int to))
        {
            // The target is implied by the piece; a wrong one is refused rather than silently replaced.
            if (from <= _squares.Length && Target(from - 1) is int actual && actual >= 0 && actual != to - 1)
                throw new IllegalMoveException($"bad move '{text}': the piece on square {from} can only go to square {actual + 1}");
            return new Move(from - 1);
        }
        throw new IllegalMoveException($"bad move '{text}': expected a square number such as 3, 3-4, 3> or 3<");
    }

    /// <summary>
    /// Squares whose piece can never move again, found by a fixpoint: a block TTFF (the four lock
    /// each other); a toad whose right neighbour is the end, a wall or a dead toad, or a dead frog
    /// with the end, a wall or a dead piece beyond it; frogs likewise to the left. Dead squares
    /// never change and nothing can pass them, so they cut the strip into independent stretches
    /// (Erickson 1996 simplifies by the same kind of rule).
    /// </summary>
    private bool[] DeadSquares()
    {
        int n = _squares.Length;
        var dead = new bool[n];
        for (int i = 0; i < n; i++) dead[i] = _squares[i] == Square.Wall;
        for (int i = 0; i + 3 < n; i++)
        {
            if (_squares[i] == Square.Toad && _squares[i + 1] == Square.Toad && _squares[i + 2] == Square.Frog && _squares[i + 3] == Square.Frog)
                dead[i] = dead[i + 1] = dead[i + 2] = dead[i + 3] = true;
        }
        bool Blocked(int j) => j < 0 || j >= n || dead[j];
        bool changed = true;
        while (changed)
        {
            changed = false;
            for (int i = 0; i < n; i++)
            {
                if (dead[i] || _squares[i] == Square.Empty) continue;
                int step = _squares[i] == Square.Toad ? 1 : -1;
                var own = _squares[i];
                int next = i + step;
                bool stuck = next < 0 || next >= n
                    || (dead[next] && (_squares[next] == own || _squares[next] == Square.Wall || Blocked(next + step)));
                if (stuck)
                {
                    dead[i] = true;
                    changed = true;
                }
            }
        }
        return dead;
    }

    /// <summary>Maximal runs of live squares where somebody can move, as [start, end) pairs.</summary>
    internal IReadOnlyList<(int Start, int End)> Stretches => _stretches ??= FindStretches();

    private IReadOnlyList<(int Start, int End)> FindStretches()
    {
        var dead = DeadSquares();
        var result = new List<(int, int)>();
        int i = 0;
        while (i < _squares.Length)
        {
            if (dead[i]) { i++; continue; }
            int start = i;
            while (i < _squares.Length && !dead[i]) i++;
            bool live = false;
            for (int j = start; j < i && !live; j++) live = _squares[j] != Square.Empty && Target(j) >= 0;
            if (live) result.Add((start, i));
        }
        return result;
    }

    public IReadOnlyList<IPosition> Components()
    {
        var stretches = Stretches;
        if (stretches.Count == 1 && IsWholeStrip(stretches[0])) return [this];
        var result = new IPosition[stretches.Count];
        for (int k = 0; k < stretches.Count; k++)
        {
            var (start, end) = stretches[k];
            var squares = new Square[_squares.Length];
            Array.Fill(squares, Square.Wall);
            Array.Copy(_squares, start, squares, start, end - start);
            result[k] = new ToadsAndFrogsPosition(_ruleset, squares);
        }
        return result;
    }

    private bool IsWholeStrip((int Start, int End) stretch)
    {
        for (int i = 0; i < _squares.Length; i++)
            if ((i < stretch.Start || i >= stretch.End) && _squares[i] != Square.Wall) return false;
        return true;
    }

    /// <summary>
    /// Each stretch's letters, or those of its mirror image with toads and frogs swapped (which is
    /// the negative game) when that comes first, marked with a leading '-'; several keys sorted and
    /// joined by " + "; "0" when nobody can move.
    /// </summary>
    public string NormalKey => ComponentValues.JoinKeys(Stretches.Select(s => KeyOf(_squares.AsSpan(s.Start, s.End - s.Start))));

    internal static string KeyOf(ReadOnlySpan<Square> stretch)
    {
        string plain = StripNotation.Format(stretch);
        var image = new char[stretch.Length];
        for (int i = 0; i < stretch.Length; i++)
        {
            var s = stretch[stretch.Length - 1 - i];
            image[i] = s == Square.Toad ? 'F' : s == Square.Frog ? 'T' : StripNotation.Letter(s);
        }
        string swapped = new(image);
        return string.CompareOrdinal(swapped, plain) < 0 ? "-" + swapped : plain;
    }
}
