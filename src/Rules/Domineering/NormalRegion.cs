namespace Bramble.Rules.Domineering;

/// <summary>
/// A region moved to the corner of its bounding box and turned into a fixed representative of
/// its eight images under the symmetries of the square. Mirror images (left-right, top-bottom,
/// half turn) keep every move's orientation and so have the same value; transposed images
/// (transpose, anti-transpose, quarter turns) swap vertical and horizontal, i.e. Left and
/// Right, so their value is the negative. <see cref="Transposed"/> says which kind of image the
/// representative is of the original: value(original) = Transposed ? −value(Shape) : value(Shape).
/// </summary>
public readonly record struct NormalRegion(Region Shape, bool Transposed)
{
    /// <summary>
    /// The normal form of the cells of <paramref name="cells"/> (laid out with stride
    /// <paramref name="width"/>; need not touch the corner). The representative is the image with
    /// the fewest rows, then the smallest bit pattern; when a mirror image and a transposed one tie
    /// (the region is its own transpose up to mirrors, so its value equals its negative) the mirror wins.
    /// </summary>
    public static NormalRegion Of(UInt128 cells, int height, int width)
    {
        // Bounding box, one row at a time.
        int top = int.MaxValue, bottom = -1, left = int.MaxValue, right = -1;
        var rowMask = Region.AreaMask(width);
        for (int r = 0; r < height; r++)
        {
            var row = (cells >> (r * width)) & rowMask;
            if (row == UInt128.Zero) continue;
            if (top == int.MaxValue) top = r;
            bottom = r;
            left = Math.Min(left, (int)UInt128.TrailingZeroCount(row));
            right = Math.Max(right, 127 - (int)UInt128.LeadingZeroCount(row));
        }
        if (bottom < 0) return new NormalRegion(new Region(UInt128.Zero, 0, 0), false);
        int h = bottom - top + 1, w = right - left + 1;

        // Only the images with fewer rows can win, so a non-square box needs four of the eight.
        bool wantMirrors = h <= w, wantTransposes = w <= h;
        UInt128 id = 0, flipH = 0, flipV = 0, half = 0, tr = 0, anti = 0, quarter = 0, threeQuarter = 0;
        for (int r = 0; r < h; r++)
        {
            var row = (cells >> ((r + top) * width + left)) & Region.AreaMask(w);
            while (row != UInt128.Zero)
            {
                int c = (int)UInt128.TrailingZeroCount(row);
                row &= row - UInt128.One;
                if (wantMirrors)
                {
                    id |= UInt128.One << (r * w + c);
                    flipH |= UInt128.One << (r * w + (w - 1 - c));
                    flipV |= UInt128.One << ((h - 1 - r) * w + c);
                    half |= UInt128.One << ((h - 1 - r) * w + (w - 1 - c));
                }
                if (wantTransposes)
                {
                    // Transposed images have w rows of h cells: cell (r, c) goes to row c-ish, column r-ish.
                    tr |= UInt128.One << (c * h + r);
                    anti |= UInt128.One << ((w - 1 - c) * h + (h - 1 - r));
                    quarter |= UInt128.One << ((w - 1 - c) * h + r);
                    threeQuarter |= UInt128.One << (c * h + (h - 1 - r));
                }
            }
        }
        if (wantMirrors)
        {
            var best = Min(Min(id, flipH), Min(flipV, half));
            if (wantTransposes)
            {
                var bestT = Min(Min(tr, anti), Min(quarter, threeQuarter));
                if (bestT < best) return new NormalRegion(new Region(bestT, w, h), true);
            }
            return new NormalRegion(new Region(best, h, w), false);
        }
        var t = Min(Min(tr, anti), Min(quarter, threeQuarter));
        return new NormalRegion(new Region(t, w, h), true);
    }

    public static NormalRegion Of(Region region) => Of(region.Cells, region.Height, region.Width);

    /// <summary>The memo key: the representative in board notation, e.g. <c>##./...</c>.</summary>
    public string Key => Shape.ToText();

    /// <summary>
    /// A key that also says which image the original was: the representative's key, with a
    /// leading '-' for a transposed image (whose value is the negative).
    /// </summary>
    public string SignedKey => Transposed ? "-" + Key : Key;

    private static UInt128 Min(UInt128 a, UInt128 b) => a < b ? a : b;
}
