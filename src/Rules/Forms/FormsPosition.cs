using System.Globalization;
using Bramble.Values;

namespace Bramble.Rules.Forms;

/// <summary>
/// A sum of value-notation terms. Terms keep the numbers they had in the text (1, 2, …) for the
/// whole game: a move <c>k.j</c> replaces term k by its j-th option for the mover, and a term
/// that reaches a number with no options stays in place (written as that number), so move names
/// never shift. A component is a position holding one term under its original number.
/// </summary>
public sealed class FormsPosition : IPosition
{
    private readonly FormsRuleset _ruleset;
    private readonly (int Number, FormsTerm Term)[] _terms;

    internal FormsPosition(FormsRuleset ruleset, (int Number, FormsTerm Term)[] terms)
    {
        _ruleset = ruleset;
        _terms = terms;
        Hash = ComputeHash(terms);
    }

    public IRuleset Ruleset => _ruleset;

    /// <summary>The terms with their numbers, in order.</summary>
    public IReadOnlyList<(int Number, FormsTerm Term)> Terms => _terms;

    /// <summary>The terms joined by + (a negated term by −), so the text parses back to the same terms.</summary>
    public string Text
    {
        get
        {
            if (_terms.Length == 0) return "0";
            var sb = new System.Text.StringBuilder(_terms[0].Term.Text);
            for (int i = 1; i < _terms.Length; i++)
            {
                var term = _terms[i].Term;
                if (term.Expression is NegateExpr negated)
                {
                    // "a - (b + c)" and "a - (-b)" keep their parentheses; "a - {1|0}" needs none.
                    string inner = FormsTerm.TextOf(negated.Inner);
                    sb.Append(" - ").Append(inner.StartsWith('-') ? "(" + inner + ")" : inner);
                }
                else sb.Append(" + ").Append(term.Text);
            }
            return sb.ToString();
        }
    }

    public ulong Hash { get; }

    public int Size => _terms.Length;

    public IReadOnlyList<Move> Moves(Side side)
    {
        var moves = new List<Move>();
        foreach (var (number, term) in _terms)
        {
            int count = term.Options(side).Count;
            for (int j = 1; j <= count; j++) moves.Add(new Move(number, j));
        }
        return moves;
    }

    public IPosition Play(Side side, Move move)
    {
        int index = Array.FindIndex(_terms, t => t.Number == move.A);
        if (index < 0)
            throw new IllegalMoveException($"{FormatMove(move)}: there is no term {move.A} (terms: {string.Join(", ", _terms.Select(t => t.Number))})");
        var term = _terms[index].Term;
        var options = term.Options(side);
        if (move.B < 1 || move.B > options.Count)
        {
            string have = options.Count == 0 ? "no options" : options.Count == 1 ? "1 option" : $"{options.Count} options";
            throw new IllegalMoveException($"{FormatMove(move)}: term {move.A} ({term.Text}) has {have} for {side.Word()}");
        }
        var terms = (ValueTuple<int, FormsTerm>[])_terms.Clone();
        terms[index] = (move.A, new FormsTerm(options[move.B - 1]));
        return new FormsPosition(_ruleset, terms);
    }

    public string FormatMove(Move move) => $"{move.A}.{move.B}";

    public Move ParseMove(string text)
    {
        var t = text.Trim();
        int dot = t.IndexOf('.');
        if (dot > 0
            && int.TryParse(t.AsSpan(0, dot), NumberStyles.None, CultureInfo.InvariantCulture, out int k)
            && int.TryParse(t.AsSpan(dot + 1), NumberStyles.None, CultureInfo.InvariantCulture, out int j)
            && k >= 1 && j >= 1)
            return new Move(k, j);
        throw new IllegalMoveException($"bad move '{text}': expected <term>.<option>, both from 1, such as 2.1");
    }

    /// <summary>One position per term in which somebody can move, each keeping its term number.</summary>
    public IReadOnlyList<IPosition> Components()
    {
        var live = _terms.Where(t => t.Term.HasMoves).ToArray();
        if (live.Length == 1 && _terms.Length == 1) return [this];
        return live.Select(t => (IPosition)new FormsPosition(_ruleset, [t])).ToArray();
    }

    /// <summary>A term's normal key is its text; several terms' keys are sorted and joined by " + "; no live term is "0".</summary>
    public string NormalKey
    {
        get
        {
            var keys = _terms.Where(t => t.Term.HasMoves).Select(t => t.Term.Text).OrderBy(k => k, StringComparer.Ordinal).ToArray();
            return keys.Length == 0 ? "0" : string.Join(" + ", keys);
        }
    }

    private static ulong ComputeHash((int Number, FormsTerm Term)[] terms)
    {
        // FNV-1a over "number:text;" for each term: the same in every process, unlike string.GetHashCode.
        ulong h = 14695981039346656037UL;
        foreach (var (number, term) in terms)
        {
            foreach (char ch in $"{number}:{term.Text};")
            {
                h ^= ch;
                h *= 1099511628211UL;
            }
        }
        return h;
    }
}
