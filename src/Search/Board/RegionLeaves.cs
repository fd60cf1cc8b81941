using System.Numerics;
using Bramble.Rules;
using Bramble.Rules.Domineering;
using Bramble.Values;

namespace Bramble.Search.Board;

/// <summary>
/// Decides a node of the whole-board search without searching it when its empty cells fall
/// apart into small regions: the position is then the sum of the regions, and the side to move
/// wins exactly when the sum of their canonical values is a first-player win for it (G ⊳ 0 for
/// the mover as Left). Combining exact values with α-β at the leaves follows Barton and
/// Uiterwijk, "Combining combinatorial game theory with an α-β solver for Domineering", BNAIC 2014.
/// <para>
/// Everything works in the view of the side to move (<see cref="BoardShape"/>): there the mover's
/// dominoes are vertical, which is Left in <see cref="Region"/>, so a region's value in that view is
/// its value for the mover as Left, whichever side moves. A region only one side can move in is the
/// integer ± (its most disjoint dominoes of that side, since the other side never spoils them),
/// counted without a value and at any size; a region both sides can move in must have at most
/// <c>cap</c> cells. Cells no domino can cover are left out (they never join regions).
/// </para>
/// Values come from <see cref="RegionValues"/> once per region shape (its normal form, so mirror
/// images and transposes share one), then from a dictionary keyed by the normal form's bitboard,
/// and in front of it a direct-mapped cache keyed by the region's own bits in the view: after the
/// first time nothing builds a string. The search stores a decided node in its table like a
/// searched one. One instance per search thread (the game store is not
/// thread-safe).
/// </summary>
public sealed class RegionLeaves<T> where T : unmanaged, IBinaryInteger<T>
{
    private const int CacheLog2 = 15;
    // Regions of live cells have at least two cells each, so 128 cells make at most 64.
    private const int MaxParts = 64;

    private readonly BoardShape _shape;
    private readonly int _cap;
    private readonly bool _wide;
    private readonly T[] _notLastColumn = new T[2], _notFirstColumn = new T[2];
    private readonly GameStore _store;
    private readonly RegionValues _values;
    private readonly Dictionary<Region, Game> _byShape = [];
    // Direct-mapped, per layout (a square board's two views share one layout): the region's bits
    // and its value's id; zero bits mark an empty slot (a region is never empty).
    private readonly T[][] _cachedCells;
    private readonly int[][] _cachedValue;

    /// <param name="cap">The most cells of a region both sides can move in.</param>
    public RegionLeaves(BoardShape shape, int cap)
    {
        _shape = shape;
        _cap = cap;
        _wide = shape.Cells > 64;
        for (int v = 0; v < 2; v++) (_notLastColumn[v], _notFirstColumn[v]) = ColumnMasks.Of<T>(shape, v);
        var context = new ValueContext();
        _store = context.Store;
        _values = new RegionValues(new DomineeringRuleset(), context);
        int layouts = shape.Rows == shape.Columns ? 1 : 2;
        _cachedCells = new T[layouts][];
        _cachedValue = new int[layouts][];
        for (int l = 0; l < layouts; l++)
        {
            _cachedCells[l] = new T[1 << CacheLog2];
            _cachedValue[l] = new int[1 << CacheLog2];
        }
    }

    /// <summary>Nodes this instance decided.</summary>
    public long Decided { get; private set; }

    /// <summary>Distinct region shapes whose value was computed.</summary>
    public int Shapes => _byShape.Count;

    /// <summary>
    /// Whether the position <paramref name="board"/> (empty cells in view s) with side s to move is
    /// a sum of regions this can value; if so, <paramref name="wins"/> says whether s wins.
    /// </summary>
    public bool TryDecide(T board, int s, out bool wins)
    {
        wins = false;
        int w = _shape.Width[s];
        T notLast = _notLastColumn[s], notFirst = _notFirstColumn[s];
        T vertical = board & (board >> w);
        T verticalCells = vertical | (vertical << w);
        T horizontal = board & (board >> 1) & notLast;
        T horizontalCells = horizontal | (horizontal << 1);
        T rest = verticalCells | horizontalCells;
        Span<T> parts = stackalloc T[MaxParts];
        int n = 0, integer = 0;
        while (rest != T.Zero)
        {
            T part = rest & (T.Zero - rest);
            while (true)
            {
                T grown = (part | ((part << 1) & notFirst) | ((part >> 1) & notLast) | (part << w) | (part >> w)) & rest;
                if (grown == part) break;
                part = grown;
                // Too big to value, and both sides can move in it: the search goes on.
                if (Count(part) > _cap && (part & verticalCells) != T.Zero && (part & horizontalCells) != T.Zero) return false;
            }
            rest &= ~part;
            if ((part & horizontalCells) == T.Zero) integer += MostDominoes(part, w, T.AllBitsSet);
            else if ((part & verticalCells) == T.Zero) integer -= MostDominoes(part, 1, notLast);
            else
            {
                parts[n++] = part;
            }
        }
        var total = _store.Integer(integer);
        for (int k = 0; k < n; k++) total = _store.Add(total, ValueOf(parts[k], s));
        // The mover is Left in its view: it wins moving first exactly when G ⊳ 0, i.e. not G ≤ 0.
        wins = !_store.Leq(total, _store.Zero);
        Decided++;
        return true;
    }

    /// <summary>
    /// The most disjoint dominoes in the cells, each covering a cell and the one <paramref name="step"/>
    /// bits higher: greedy from the start of each run (⌊length/2⌋ per run, the most there are).
    /// </summary>
    /// <param name="fits">The cells whose partner step bits higher is on the same line.</param>
    private static int MostDominoes(T cells, int step, T fits)
    {
        int count = 0;
        while (cells != T.Zero)
        {
            // First cells of runs: the cell step bits lower is not in the set (or not on the line).
            T starts = cells & ~((cells << step) & (fits << step));
            T dominoes = starts & (cells >> step) & fits;
            count += Count(dominoes);
            cells &= ~(starts | (dominoes << step));
        }
        return count;
    }

    /// <summary>The value of one connected region (bits of view s) for the mover as Left.</summary>
    private Game ValueOf(T part, int s)
    {
        int layout = _cachedCells.Length == 1 ? 0 : s;
        ulong mix = ulong.CreateTruncating(part);
        if (_wide) mix ^= ulong.CreateTruncating(part >> 64) * 0xC2B2AE3D27D4EB4FUL;
        int slot = (int)((mix * 0x9E3779B97F4A7C15UL) >> (64 - CacheLog2));
        if (_cachedCells[layout][slot] == part) return new Game(_cachedValue[layout][slot]);
        var normal = NormalRegion.Of(UInt128.CreateTruncating(part), _shape.Height[s], _shape.Width[s]);
        if (!_byShape.TryGetValue(normal.Shape, out var value))
        {
            value = _values.ValueOfConnected(normal with { Transposed = false });
            _byShape.Add(normal.Shape, value);
        }
        if (normal.Transposed) value = _store.Negate(value);
        _cachedCells[layout][slot] = part;
        _cachedValue[layout][slot] = value.Id;
        return value;
    }

    private static int Count(T x) => int.CreateTruncating(T.PopCount(x));
}
