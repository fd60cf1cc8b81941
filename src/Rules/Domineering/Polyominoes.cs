namespace Bramble.Rules.Domineering;

/// <summary>
/// Every connected region (free polyomino: one per class of the eight symmetries) of up to n
/// cells, in normal form. Each size is grown from the one below by adding a neighbouring cell
/// to every region in every possible place and keeping the normal forms not seen before.
/// </summary>
public static class Polyominoes
{
    /// <summary>Sizes above this would not fit a growing region (with a one-cell margin) in 128 bits.</summary>
    public const int MaxCells = 16;

    public static IEnumerable<Region> UpTo(int cells)
    {
        if (cells < 1 || cells > MaxCells) throw new ArgumentOutOfRangeException(nameof(cells), $"between 1 and {MaxCells} cells");
        var level = new List<Region> { new(UInt128.One, 1, 1) };
        for (int n = 1; ; n++)
        {
            foreach (var region in level) yield return region;
            if (n == cells) yield break;
            level = Grow(level);
        }
    }

    private static List<Region> Grow(List<Region> level)
    {
        var seen = new HashSet<Region>();
        var next = new List<Region>();
        foreach (var region in level)
        {
            // Re-lay the region inside a box one cell wider on every side, so every neighbour has a bit.
            int h = region.Height + 2, w = region.Width + 2;
            var cells = UInt128.Zero;
            for (int r = 0; r < region.Height; r++)
                for (int c = 0; c < region.Width; c++)
                    if (region.Contains(r, c)) cells |= UInt128.One << ((r + 1) * w + c + 1);
            var boxed = new Region(cells, h, w);
            var around = Neighbours(boxed) & ~cells;
            for (; around != UInt128.Zero; around &= around - UInt128.One)
            {
                var grown = NormalRegion.Of(cells | (UInt128.One << Region.LowestBit(around)), h, w).Shape;
                if (seen.Add(grown)) next.Add(grown);
            }
        }
        return next;
    }

    private static UInt128 Neighbours(Region boxed)
    {
        // The margin means no cell sits in the first or last column, so plain shifts cannot wrap.
        var x = boxed.Cells;
        return (x << 1) | (x >> 1) | (x << boxed.Width) | (x >> boxed.Width);
    }
}
