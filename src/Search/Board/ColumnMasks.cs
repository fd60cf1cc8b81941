using System.Numerics;

namespace Bramble.Search.Board;

/// <summary>
/// The cells of a view that have a neighbour to the right (NotLast) and to the left (NotFirst):
/// a shift by one across a row is masked with them so that no bit wraps into the next row.
/// </summary>
public static class ColumnMasks
{
    public static (T NotLast, T NotFirst) Of<T>(BoardShape shape, int view) where T : unmanaged, IBinaryInteger<T>
    {
        int w = shape.Width[view];
        T notLast = T.Zero, notFirst = T.Zero;
        for (int p = 0; p < shape.Cells; p++)
        {
            if (p % w != w - 1) notLast |= T.One << p;
            if (p % w != 0) notFirst |= T.One << p;
        }
        return (notLast, notFirst);
    }
}
