using System.Text;
using Bramble.Rules.Domineering;

namespace Bramble.Pictures;

/// <summary>Domineering boards as a text grid with coordinates and as SVG.</summary>
public static class DomineeringPicture
{
    public static string Text(DomineeringPosition position)
    {
        var b = position.Board;
        var sb = new StringBuilder();
        sb.Append("    ");
        for (int c = 0; c < b.Columns; c++) sb.Append((char)('a' + c)).Append(' ');
        sb.Append('\n');
        for (int r = 0; r < b.Rows; r++)
        {
            sb.Append($"{r + 1,3} ");
            for (int c = 0; c < b.Columns; c++) sb.Append(b.IsEmpty(r, c) ? '.' : '#').Append(' ');
            sb.Append('\n');
        }
        sb.Append("Left (vertical) covers the named cell and the one below; Right (horizontal) the one to the right.");
        return sb.ToString();
    }

    private const string Style =
        "text{font-family:sans-serif;font-size:13px;fill:#333}.empty{fill:#f7f3e8;stroke:#555;stroke-width:1}" +
        ".filled{fill:#4a4a4a;stroke:#555;stroke-width:1}";

    public static string Svg(DomineeringPosition position)
    {
        var b = position.Board;
        const double cell = 40, margin = 34;
        var svg = new Svg(margin + b.Columns * cell + 12, margin + b.Rows * cell + 12);
        for (int c = 0; c < b.Columns; c++) svg.Text(margin + c * cell + cell / 2, margin - 10, ((char)('a' + c)).ToString());
        for (int r = 0; r < b.Rows; r++)
        {
            svg.Text(margin - 12, margin + r * cell + cell / 2 + 5, (r + 1).ToString());
            for (int c = 0; c < b.Columns; c++)
                svg.Add("rect", b.IsEmpty(r, c) ? "empty" : "filled",
                    ("x", margin + c * cell), ("y", margin + r * cell), ("width", cell), ("height", cell), ("data-cell", $"{(char)('a' + c)}{r + 1}"));
        }
        return svg.Render(Style, "Domineering " + position.Text);
    }
}
