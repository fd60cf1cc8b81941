using System.Numerics;

namespace Bramble.Rules.Domineering;

/// <summary>
/// A set of empty cells on a small grid, as one 128-bit bitboard: bit <c>r * Width + c</c> is the
/// cell in row r (0 = top) and column c (0 = left). Bits at or above <c>Height * Width</c> are
/// always clear, so shifts never carry junk in. One register pair holds a region of up to 128
/// cells, and moves and flood fill become shifts and masks instead of loops over cells.
/// </summary>
public readonly record struct Region(UInt128 Cells, int Height, int Width)
{
    public const int MaxArea = 128;

    // Column masks over all 128 bits for each stride, built once and never written again.
    private static readonly UInt128[] s_notFirstColumn = BuildColumnMasks(first: true);
    private static readonly UInt128[] s_notLastColumn = BuildColumnMasks(first: false);

    public int CellCount => PopCount(Cells);

    public bool IsEmpty => Cells == UInt128.Zero;

    /// <summary>Top cells of Left's (vertical) dominoes: the cell and the one below are both in the region.</summary>
    public UInt128 VerticalMoves => Cells & (Cells >> Width);

    /// <summary>Left cells of Right's (horizontal) dominoes: the cell and the one to its right are both in the region.</summary>
    public UInt128 HorizontalMoves => Cells & (Cells >> 1) & s_notLastColumn[Width];

    public bool HasMoves => VerticalMoves != UInt128.Zero || HorizontalMoves != UInt128.Zero;

    /// <summary>The region after a domino with top/left cell <paramref name="bit"/> is placed (vertical for Left).</summary>
    public Region After(int bit, bool vertical)
    {
        var domino = (UInt128.One << bit) | (UInt128.One << (bit + (vertical ? Width : 1)));
        return this with { Cells = Cells & ~domino };
    }

    /// <summary>The cells 4-connected to <paramref name="seed"/> within <paramref name="cells"/>.</summary>
    public UInt128 ConnectedPart(UInt128 seed) => Grow(seed, Cells);

    private UInt128 Grow(UInt128 part, UInt128 within)
    {
        var notFirst = s_notFirstColumn[Width];
        var notLast = s_notLastColumn[Width];
        while (true)
        {
            // A bit shifted left by one lands in the next column; one that wrapped into column 0
            // came from the previous row's last column, so the mask drops it (and vice versa).
            var grown = part | ((part << 1) & notFirst) | ((part >> 1) & notLast) | (part << Width) | (part >> Width);
            grown &= within;
            if (grown == part) return part;
            part = grown;
        }
    }

    /// <summary>The 4-connected parts of the region, each in this region's layout, lowest cell first.</summary>
    public int Split(Span<UInt128> parts)
    {
        int n = 0;
        var rest = Cells;
        while (rest != UInt128.Zero)
        {
            var seed = rest & (~rest + UInt128.One);
            var part = Grow(seed, rest);
            parts[n++] = part;
            rest &= ~part;
        }
        return n;
    }

    public bool Contains(int row, int column) =>
        row >= 0 && row < Height && column >= 0 && column < Width && ((Cells >> (row * Width + column)) & UInt128.One) != UInt128.Zero;

    /// <summary>The region as board rows, '.' for its cells and '#' for the rest of its box.</summary>
    public string ToText()
    {
        var chars = new char[Height * (Width + 1) - 1];
        int k = 0;
        for (int r = 0; r < Height; r++)
        {
            if (r > 0) chars[k++] = '/';
            for (int c = 0; c < Width; c++) chars[k++] = Contains(r, c) ? '.' : '#';
        }
        return new string(chars);
    }

    public static int PopCount(UInt128 x) => BitOperations.PopCount((ulong)x) + BitOperations.PopCount((ulong)(x >> 64));

    public static int LowestBit(UInt128 x) => (int)UInt128.TrailingZeroCount(x);

    public static UInt128 AreaMask(int area) => area >= 128 ? UInt128.MaxValue : (UInt128.One << area) - UInt128.One;

    private static UInt128[] BuildColumnMasks(bool first)
    {
        var masks = new UInt128[MaxArea + 1];
        for (int w = 1; w <= MaxArea; w++)
        {
            var m = UInt128.Zero;
            for (int i = 0; i < 128; i++)
            {
                int c = i % w;
                if (first ? c != 0 : c != w - 1) m |= UInt128.One << i;
            }
            masks[w] = m;
        }
        return masks;
    }
}
