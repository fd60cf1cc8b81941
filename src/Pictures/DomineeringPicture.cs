using System.Text;
using Bramble.Rules.Domineering;
using Bramble.Values;

namespace Bramble.Pictures;

/// <summary>Domineering boards as a text grid with coordinates and as SVG.</summary>
public static class DomineeringPicture
{
    /// <summary>
    /// The board as text: '.' empty, '#' a hole of the start position, a laid vertical domino as
    /// two '|' one above the other and a laid horizontal one as '-' '-', so holes and dominoes
    /// never look alike.
    /// </summary>
    public static string Text(DomineeringPosition position, IReadOnlyCollection<PlacedDomino>? placed = null)
    {
        var b = position.Board;
        var laid = LaidBy(placed);
        var sb = new StringBuilder();
        sb.Append("    ");
        for (int c = 0; c < b.Columns; c++) sb.Append((char)('a' + c)).Append(' ');
        sb.Append('\n');
        for (int r = 0; r < b.Rows; r++)
        {
            sb.Append($"{r + 1,3} ");
            for (int c = 0; c < b.Columns; c++)
            {
                int cell = CellName.Index(r, c);
                char mark = b.IsEmpty(r, c) ? '.' : laid.TryGetValue(cell, out var side) ? (side == Side.Left ? '|' : '-') : '#';
                sb.Append(mark).Append(' ');
            }
            sb.Append('\n');
        }
        sb.Append("Left (vertical, |) covers the named cell and the one below; Right (horizontal, -) the one to the right. '.' is empty, '#' a hole.");
        return sb.ToString();
    }

    private const string Style =
        "text{font-family:sans-serif;font-size:13px;fill:#333}.empty{fill:#f7f3e8;stroke:#555;stroke-width:1}" +
        ".hole{fill:#4a4a4a;stroke:#555;stroke-width:1}" +
        ".laid{fill:#e8e2d0;stroke:#555;stroke-width:1}" +
        ".domino-left{fill:#1f5fbf;stroke:#12386f;stroke-width:2}.domino-right{fill:#c0392b;stroke:#6f1f17;stroke-width:2;stroke-dasharray:6,3}";

    /// <summary>
    /// The board as SVG. Every cell is a &lt;rect&gt; with <c>data-cell="c4"</c>; holes carry
    /// <c>data-hole="1"</c>, cells under a laid domino <c>data-placed="left|right"</c>; an empty
    /// cell that names a legal move carries <c>data-move="c4"</c> and <c>data-sides</c> (who can
    /// play it) and <c>data-component</c> (its region, 1-based as in the position's components).
    /// </summary>
    public static string Svg(DomineeringPosition position, IReadOnlyCollection<PlacedDomino>? placed = null)
    {
        var b = position.Board;
        var laid = LaidBy(placed);
        var leftMoves = position.Moves(Side.Left).Select(m => m.A).ToHashSet();
        var rightMoves = position.Moves(Side.Right).Select(m => m.A).ToHashSet();
        var region = new Dictionary<int, int>();
        var parts = position.Components();
        for (int i = 0; i < parts.Count; i++)
        {
            var part = ((DomineeringPosition)parts[i]).Board;
            for (int r = 0; r < part.Rows; r++)
                for (int c = 0; c < part.Columns; c++)
                    if (part.IsEmpty(r, c)) region[CellName.Index(r, c)] = i + 1;
        }
        const double cell = 40, margin = 34;
        var svg = new Svg(margin + b.Columns * cell + 12, margin + b.Rows * cell + 12);
        for (int c = 0; c < b.Columns; c++) svg.Text(margin + c * cell + cell / 2, margin - 10, ((char)('a' + c)).ToString());
        for (int r = 0; r < b.Rows; r++)
        {
            svg.Text(margin - 12, margin + r * cell + cell / 2 + 5, (r + 1).ToString());
            for (int c = 0; c < b.Columns; c++)
            {
                int index = CellName.Index(r, c);
                string name = CellName.Format(index);
                var attributes = new List<(string, object)> { ("x", margin + c * cell), ("y", margin + r * cell), ("width", cell), ("height", cell), ("data-cell", name) };
                string cls;
                if (b.IsEmpty(r, c))
                {
                    cls = "empty";
                    bool left = leftMoves.Contains(index), right = rightMoves.Contains(index);
                    if (left || right)
                    {
                        attributes.Add(("data-move", name));
                        attributes.Add(("data-sides", left && right ? "left right" : left ? "left" : "right"));
                    }
                    if (region.TryGetValue(index, out int k)) attributes.Add(("data-component", k));
                }
                else if (laid.TryGetValue(index, out var side))
                {
                    cls = "laid";
                    attributes.Add(("data-placed", side.Word()));
                }
                else
                {
                    cls = "hole";
                    attributes.Add(("data-hole", "1"));
                }
                svg.Add("rect", cls, attributes.ToArray());
            }
        }
        // Laid dominoes on top of their cells, inset so the two cells read as one piece; they
        // catch no clicks (the cells below keep their names).
        foreach (var d in placed ?? [])
        {
            int r = d.Cell / Board.MaxColumns, c = d.Cell % Board.MaxColumns;
            bool vertical = d.Side == Side.Left;
            svg.Add("rect", vertical ? "domino-left" : "domino-right",
                ("x", margin + c * cell + 5), ("y", margin + r * cell + 5),
                ("width", (vertical ? cell : 2 * cell) - 10), ("height", (vertical ? 2 * cell : cell) - 10),
                ("rx", 6.0), ("pointer-events", "none"), ("data-domino", CellName.Format(d.Cell)), ("data-side", d.Side.Word()));
        }
        return svg.Render(Style, "Domineering " + position.Text);
    }

    private static Dictionary<int, Side> LaidBy(IReadOnlyCollection<PlacedDomino>? placed)
    {
        var laid = new Dictionary<int, Side>();
        foreach (var d in placed ?? [])
        {
            laid[d.Cell] = d.Side;
            laid[d.OtherCell] = d.Side;
        }
        return laid;
    }
}
