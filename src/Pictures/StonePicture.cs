using System.Text;
using Bramble.Rules;
using Bramble.Rules.Common;
using Bramble.Values;

namespace Bramble.Pictures;

/// <summary>
/// Clobber and Konane boards as a text grid and as SVG: dark stones for Left (x), light stones
/// for Right (o). Every square carries <c>data-cell</c>; every legal move of either side is a
/// thin arrow from the stone to its target carrying <c>data-move</c> and <c>data-side</c>, so a
/// board in the browser can be clicked.
/// </summary>
public static class StonePicture
{
    public static string Text(IPosition position, StoneGrid grid, string rule)
    {
        var sb = new StringBuilder();
        sb.Append("    ");
        for (int c = 0; c < grid.Columns; c++) sb.Append((char)('a' + c)).Append(' ');
        sb.Append('\n');
        for (int r = 0; r < grid.Rows; r++)
        {
            sb.Append($"{r + 1,3} ");
            for (int c = 0; c < grid.Columns; c++) sb.Append(StoneGrid.Letter(grid.At(r, c))).Append(' ');
            sb.Append('\n');
        }
        sb.Append(rule);
        return sb.ToString();
    }

    private const string Style =
        "text{font-family:sans-serif;font-size:13px;fill:#333}.square{fill:#e9dcc0;stroke:#8a7550;stroke-width:1}" +
        ".left{fill:#2b2b2b;stroke:#000}.right{fill:#fafafa;stroke:#444;stroke-width:1.5}" +
        ".move{stroke:#3a7bd5;stroke-width:3;stroke-opacity:0.25;stroke-linecap:round}.move.r{stroke:#d5533a}";

    public static string Svg(IPosition position, StoneGrid grid, string title)
    {
        const double cell = 40, margin = 34;
        var svg = new Svg(margin + grid.Columns * cell + 12, margin + grid.Rows * cell + 12);
        for (int c = 0; c < grid.Columns; c++) svg.Text(margin + c * cell + cell / 2, margin - 10, ((char)('a' + c)).ToString());
        for (int r = 0; r < grid.Rows; r++)
        {
            svg.Text(margin - 12, margin + r * cell + cell / 2 + 5, (r + 1).ToString());
            for (int c = 0; c < grid.Columns; c++)
            {
                int index = grid.Index(r, c);
                svg.Add("rect", "square", ("x", margin + c * cell), ("y", margin + r * cell), ("width", cell), ("height", cell), ("data-cell", grid.CellName(index)));
                var stone = grid[index];
                if (stone != Stone.None)
                    svg.Add("circle", stone == Stone.Left ? "left" : "right",
                        ("cx", margin + c * cell + cell / 2), ("cy", margin + r * cell + cell / 2), ("r", cell * 0.38), ("data-cell", grid.CellName(index)));
            }
        }
        foreach (var side in new[] { Side.Left, Side.Right })
            foreach (var move in position.Moves(side))
            {
                double Cx(int i) => margin + i % grid.Columns * cell + cell / 2;
                double Cy(int i) => margin + i / grid.Columns * cell + cell / 2;
                svg.Add("line", side == Side.Left ? "move" : "move r",
                    ("x1", Cx(move.A)), ("y1", Cy(move.A)), ("x2", Cx(move.B)), ("y2", Cy(move.B)),
                    ("data-move", position.FormatMove(move)), ("data-side", side.Word()));
            }
        return svg.Render(Style, title + " " + position.Text);
    }
}
