namespace Bramble.Rules.Common;

/// <summary>
/// Sets boards of stones apart on one board, for positions built out of components (compose):
/// left to right with one empty column between neighbours, starting a new band below (one empty
/// row between bands) when the next board would make the row wider than a board may be. The
/// caller chooses boards whose stones cannot reach across one empty square.
/// </summary>
public static class StoneLayout
{
    public static StoneGrid SideBySide(IReadOnlyList<StoneGrid> grids)
    {
        if (grids.Count == 0) return new StoneGrid(1, 1, [Stone.None]);
        if (grids.Count == 1) return grids[0];
        // Place each board: (band, column); bands are filled left to right.
        var places = new List<(int Band, int Column)>();
        var bandHeights = new List<int> { 0 };
        int columnAt = 0, widest = 0;
        foreach (var g in grids)
        {
            if (g.Columns > StoneGrid.MaxColumns) throw new ArgumentException("a board is wider than any board may be");
            if (columnAt > 0 && columnAt + g.Columns > StoneGrid.MaxColumns)
            {
                bandHeights.Add(0);
                columnAt = 0;
            }
            places.Add((bandHeights.Count - 1, columnAt));
            bandHeights[^1] = Math.Max(bandHeights[^1], g.Rows);
            columnAt += g.Columns;
            widest = Math.Max(widest, columnAt);
            columnAt++;
        }
        int rows = bandHeights.Sum() + bandHeights.Count - 1;
        if (rows > StoneGrid.MaxRows)
            throw new ArgumentException($"the parts need {rows} rows; a board has at most {StoneGrid.MaxRows}");
        var bandTop = new int[bandHeights.Count];
        for (int b = 1; b < bandTop.Length; b++) bandTop[b] = bandTop[b - 1] + bandHeights[b - 1] + 1;
        var cells = new Stone[rows * widest];
        for (int k = 0; k < grids.Count; k++)
        {
            var g = grids[k];
            int top = bandTop[places[k].Band], left = places[k].Column;
            for (int r = 0; r < g.Rows; r++)
                for (int c = 0; c < g.Columns; c++)
                    cells[(top + r) * widest + left + c] = g.At(r, c);
        }
        return new StoneGrid(rows, widest, cells);
    }
}
