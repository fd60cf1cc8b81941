using Bramble.Rules.Cutcake;

namespace Bramble.Pictures;

/// <summary>
/// Cutcake pieces side by side as SVG, each with its number. Every grid line where a cut is
/// possible is a dashed line carrying <c>data-move</c> (vertical lines are Left's cuts,
/// horizontal ones Right's); every unit square carries <c>data-cell</c> as <c>piece.cell</c>.
/// </summary>
public static class CutcakePicture
{
    private const string Style =
        "text{font-family:sans-serif;font-size:13px;fill:#333}.cake{fill:#f2d7a6;stroke:#8a5a2b;stroke-width:2}" +
        ".unit{fill:none;stroke:none}.cut{stroke:#8a5a2b;stroke-width:1;stroke-dasharray:3 3}.cut.v{stroke:#3a7bd5}.cut.h{stroke:#d5533a}";

    public static string Svg(CutcakePosition position)
    {
        const double unit = 24, gap = 24, margin = 16;
        double width = margin, height = 0;
        foreach (var p in position.Pieces)
        {
            width += p.Columns * unit + gap;
            height = Math.Max(height, p.Rows * unit);
        }
        var svg = new Svg(Math.Max(width, 2 * margin), height + 2 * margin + 24);
        double x = margin;
        foreach (var p in position.Pieces)
        {
            double y = margin + 20;
            svg.Text(x + p.Columns * unit / 2, margin + 8, $"{p.Number}: {p.Text}");
            svg.Add("rect", "cake", ("x", x), ("y", y), ("width", p.Columns * unit), ("height", p.Rows * unit));
            for (int r = 0; r < p.Rows; r++)
                for (int c = 0; c < p.Columns; c++)
                    svg.Add("rect", "unit", ("x", x + c * unit), ("y", y + r * unit), ("width", unit), ("height", unit),
                        ("data-cell", $"{p.Number}.{(char)('a' + Math.Min(c, 25))}{r + 1}"));
            for (int k = 1; k < p.Columns; k++)
                svg.Add("line", "cut v", ("x1", x + k * unit), ("y1", y), ("x2", x + k * unit), ("y2", y + p.Rows * unit),
                    ("data-move", $"{p.Number}.v{k}"), ("data-side", "left"));
            for (int k = 1; k < p.Rows; k++)
                svg.Add("line", "cut h", ("x1", x), ("y1", y + k * unit), ("x2", x + p.Columns * unit), ("y2", y + k * unit),
                    ("data-move", $"{p.Number}.h{k}"), ("data-side", "right"));
            x += p.Columns * unit + gap;
        }
        return svg.Render(Style, "Cutcake " + position.Text);
    }
}
