namespace Bramble.Pictures;

/// <summary>Lays out rows of text cells in columns for the terminal.</summary>
public static class TextColumns
{
    /// <summary>Pads each column to its widest cell, so columns line up whatever the ids and names.</summary>
    public static IEnumerable<string> Lay(IReadOnlyList<string[]> rows)
    {
        if (rows.Count == 0) yield break;
        int columns = rows.Max(r => r.Length);
        var widths = Enumerable.Range(0, columns).Select(c => rows.Max(r => c < r.Length ? r[c].Length : 0)).ToArray();
        foreach (var r in rows)
            yield return string.Join("  ", r.Select((cell, c) => c == r.Length - 1 ? cell : cell.PadRight(widths[c]))).TrimEnd();
    }
}
