using Bramble.Values;

namespace Bramble.Rules.Domineering;

/// <summary>
/// Exact canonical values of Domineering regions by memoised search. A region's value is
/// {values after Left's vertical dominoes | values after Right's horizontal ones}, where the
/// board left after a move is split into its 4-connected parts and their values are added.
/// Every part is looked up by its normal form in the context's memo (key
/// "domineering:&lt;representative&gt;", value of the representative), so a region, its mirror
/// images and its transposes (negated) are searched once between them.
/// </summary>
public sealed class RegionValues(IRuleset ruleset, ValueContext context)
{
    private readonly GameStore _store = context.Store;

    /// <summary>The value of any set of cells in one layout: the sum of its connected parts.</summary>
    public Game ValueOf(Region cells)
    {
        if (!cells.HasMoves) return _store.Zero;
        Span<UInt128> parts = stackalloc UInt128[cells.CellCount];
        int n = cells.Split(parts);
        var total = _store.Zero;
        for (int i = 0; i < n; i++)
        {
            var part = cells with { Cells = parts[i] };
            // A part where nobody can move (a lone cell) is 0 and is dropped.
            if (!part.HasMoves) continue;
            total = _store.Add(total, ValueOfConnected(NormalRegion.Of(part)));
        }
        return total;
    }

    /// <summary>The value of one connected region given by its normal form.</summary>
    public Game ValueOfConnected(NormalRegion normal)
    {
        var value = ValueOfShape(normal.Shape);
        return normal.Transposed ? _store.Negate(value) : value;
    }

    /// <summary>The value of a representative (a shape already in normal form), memoised.</summary>
    private Game ValueOfShape(Region shape)
    {
        string key = shape.ToText();
        if (context.TryGetMemo(ruleset, key, out var known)) return known;
        context.Tick();
        var left = new List<Game>();
        var right = new List<Game>();
        for (var moves = shape.VerticalMoves; moves != UInt128.Zero; moves &= moves - UInt128.One)
            left.Add(ValueOf(shape.After(Region.LowestBit(moves), vertical: true)));
        for (var moves = shape.HorizontalMoves; moves != UInt128.Zero; moves &= moves - UInt128.One)
            right.Add(ValueOf(shape.After(Region.LowestBit(moves), vertical: false)));
        var value = _store.Make(left, right);
        context.SetMemo(ruleset, key, value);
        return value;
    }
}
