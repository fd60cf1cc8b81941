using System.Globalization;
using Bramble.Rules.Common;
using Bramble.Values;

namespace Bramble.Rules.Cutcake;

/// <summary>
/// A Cutcake position: rectangles of cake. Left cuts a piece along a line between two columns,
/// Right along a line between two rows, each cut making two pieces. A move is
/// <c>&lt;piece&gt;.v&lt;k&gt;</c> (Left: cut after the k-th column) or <c>&lt;piece&gt;.h&lt;k&gt;</c>
/// (Right: cut after the k-th row). After a cut of piece p the two parts are pieces p and p+1 and
/// later pieces move up one number. <see cref="Move.A"/> is the piece number; <see cref="Move.B"/>
/// is k for a vertical cut and −k for a horizontal one.
/// </summary>
public sealed class CutcakePosition : IPosition
{
    private readonly CutcakeRuleset _ruleset;
    private readonly Piece[] _pieces;

    internal CutcakePosition(CutcakeRuleset ruleset, Piece[] pieces)
    {
        _ruleset = ruleset;
        _pieces = pieces;
        Text = CakeNotation.Format(pieces);
        Hash = TextHash.Of(string.Join(";", pieces.Select(p => $"{p.Number}:{p.Text}")));
    }

    public IReadOnlyList<Piece> Pieces => _pieces;

    public IRuleset Ruleset => _ruleset;

    public string Text { get; }

    public ulong Hash { get; }

    public int Size => _pieces.Sum(p => p.Rows * p.Columns);

    public IReadOnlyList<Move> Moves(Side side)
    {
        var moves = new List<Move>();
        foreach (var p in _pieces)
        {
            if (side == Side.Left) for (int k = 1; k < p.Columns; k++) moves.Add(new Move(p.Number, k));
            else for (int k = 1; k < p.Rows; k++) moves.Add(new Move(p.Number, -k));
        }
        return moves;
    }

    public IPosition Play(Side side, Move move)
    {
        int index = Array.FindIndex(_pieces, p => p.Number == move.A);
        if (index < 0)
            throw new IllegalMoveException($"{FormatMove(move)}: there is no piece {move.A} (pieces: {string.Join(", ", _pieces.Select(p => p.Number))})");
        var piece = _pieces[index];
        if (side == Side.Left && move.B <= 0)
            throw new IllegalMoveException($"{FormatMove(move)} is not a legal move for left: left cuts between columns (v), right between rows (h)");
        if (side == Side.Right && move.B >= 0)
            throw new IllegalMoveException($"{FormatMove(move)} is not a legal move for right: right cuts between rows (h), left between columns (v)");
        int k = Math.Abs(move.B);
        int limit = side == Side.Left ? piece.Columns : piece.Rows;
        if (k >= limit)
            throw new IllegalMoveException($"{FormatMove(move)} is not a legal move for {side.Word()}: piece {piece.Number} is {piece.Text}, so the cut must be after {(side == Side.Left ? "column" : "row")} 1 to {limit - 1}");
        var (first, second) = side == Side.Left
            ? (piece with { Columns = k }, piece with { Columns = piece.Columns - k })
            : (piece with { Rows = k }, piece with { Rows = piece.Rows - k });
        var pieces = new Piece[_pieces.Length + 1];
        for (int i = 0, j = 0; i < _pieces.Length; i++)
        {
            if (i == index)
            {
                pieces[j++] = first;
                pieces[j++] = second;
            }
            else pieces[j++] = _pieces[i];
        }
        // Renumber from the first number of this position, so a component's pieces keep counting from where they stood.
        int start = _pieces.Length == 0 ? 1 : _pieces[0].Number;
        for (int i = 0; i < pieces.Length; i++) pieces[i] = pieces[i] with { Number = start + i };
        return new CutcakePosition(_ruleset, pieces);
    }

    public string FormatMove(Move move) =>
        move.B >= 0 ? $"{move.A}.v{move.B}" : $"{move.A}.h{-move.B}";

    public Move ParseMove(string text)
    {
        var t = text.Trim().ToLowerInvariant();
        int dot = t.IndexOf('.');
        int piece;
        string cut;
        if (dot < 0)
        {
            if (_pieces.Length != 1)
                throw new IllegalMoveException($"bad move '{text}': expected <piece>.v<column> or <piece>.h<row>, such as 2.v3 (a bare v3 or h1 only when there is one piece)");
            piece = _pieces[0].Number;
            cut = t;
        }
        else
        {
            if (!int.TryParse(t.AsSpan(0, dot), NumberStyles.None, CultureInfo.InvariantCulture, out piece) || piece < 1)
                throw new IllegalMoveException($"bad move '{text}': expected a piece number from 1 before '.', such as 2.v3");
            cut = t[(dot + 1)..];
        }
        if (cut.Length >= 2 && (cut[0] == 'v' || cut[0] == 'h')
            && int.TryParse(cut.AsSpan(1), NumberStyles.None, CultureInfo.InvariantCulture, out int k) && k >= 1)
            return new Move(piece, cut[0] == 'v' ? k : -k);
        throw new IllegalMoveException($"bad move '{text}': expected v<column> (left's cut after that column) or h<row> (right's cut after that row), such as 2.v3");
    }

    /// <summary>Each piece that can still be cut, as a position of that one piece keeping its number.</summary>
    public IReadOnlyList<IPosition> Components()
    {
        var live = _pieces.Where(p => p.HasMoves).ToArray();
        if (live.Length == 1 && _pieces.Length == 1) return [this];
        return live.Select(p => (IPosition)new CutcakePosition(_ruleset, [p])).ToArray();
    }

    /// <summary>
    /// "RxC" with R ≤ C; a piece with more rows than columns is the transpose of one with fewer,
    /// which swaps the players' cuts, so its key is "-CxR" (its value is the negative).
    /// </summary>
    public string NormalKey => ComponentValues.JoinKeys(_pieces.Where(p => p.HasMoves).Select(KeyOf));

    internal static string KeyOf(Piece p) => p.Rows <= p.Columns ? $"{p.Rows}x{p.Columns}" : $"-{p.Columns}x{p.Rows}";
}
