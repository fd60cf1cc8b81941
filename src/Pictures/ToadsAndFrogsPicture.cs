using System.Text;
using Bramble.Rules.ToadsAndFrogs;
using Bramble.Values;

namespace Bramble.Pictures;

/// <summary>
/// Toads and Frogs strips as text and as SVG: squares numbered from 1, toads (Left) as green
/// right-pointing marks, frogs (Right) as brown left-pointing ones, walls dark. Every square
/// carries <c>data-cell</c> (its number); every piece that can move carries <c>data-move</c>.
/// </summary>
public static class ToadsAndFrogsPicture
{
    public static string Text(ToadsAndFrogsPosition position)
    {
        var sb = new StringBuilder();
        var squares = position.Squares;
        for (int i = 0; i < squares.Count; i++) sb.Append($"{i + 1,3}");
        sb.Append('\n');
        for (int i = 0; i < squares.Count; i++) sb.Append("  ").Append(StripNotation.Letter(squares[i]));
        sb.Append("\nA move names the square of the piece that moves: toads (T, left) go right, frogs (F, right) go left.");
        return sb.ToString();
    }

    private const string Style =
        "text{font-family:sans-serif;font-size:13px;fill:#333}.square{fill:#f7f3e8;stroke:#555;stroke-width:1}" +
        ".wall{fill:#4a4a4a;stroke:#555}.toad{fill:#3f8f3f}.frog{fill:#a0622d}.label{font-size:15px;fill:#fff;font-weight:bold}";

    public static string Svg(ToadsAndFrogsPosition position)
    {
        var squares = position.Squares;
        const double cell = 40, margin = 12;
        var svg = new Svg(2 * margin + squares.Count * cell, margin + cell + 34);
        var movable = position.Moves(Side.Left).Concat(position.Moves(Side.Right)).Select(m => m.A).ToHashSet();
        for (int i = 0; i < squares.Count; i++)
        {
            double x = margin + i * cell, y = margin;
            string name = (i + 1).ToString();
            svg.Add("rect", squares[i] == Square.Wall ? "wall" : "square", ("x", x), ("y", y), ("width", cell), ("height", cell), ("data-cell", name));
            svg.Text(x + cell / 2, y + cell + 18, name);
            if (squares[i] is Square.Toad or Square.Frog)
            {
                bool toad = squares[i] == Square.Toad;
                // A triangle pointing the way the piece moves.
                string points = toad
                    ? $"{Bramble.Pictures.Svg.Num(x + 8)},{Bramble.Pictures.Svg.Num(y + 8)} {Bramble.Pictures.Svg.Num(x + cell - 8)},{Bramble.Pictures.Svg.Num(y + cell / 2)} {Bramble.Pictures.Svg.Num(x + 8)},{Bramble.Pictures.Svg.Num(y + cell - 8)}"
                    : $"{Bramble.Pictures.Svg.Num(x + cell - 8)},{Bramble.Pictures.Svg.Num(y + 8)} {Bramble.Pictures.Svg.Num(x + 8)},{Bramble.Pictures.Svg.Num(y + cell / 2)} {Bramble.Pictures.Svg.Num(x + cell - 8)},{Bramble.Pictures.Svg.Num(y + cell - 8)}";
                if (movable.Contains(i))
                    svg.Add("polygon", toad ? "toad" : "frog", ("points", points), ("data-cell", name), ("data-move", name), ("data-side", toad ? "left" : "right"));
                else
                    svg.Add("polygon", toad ? "toad" : "frog", ("points", points), ("data-cell", name));
                svg.Text(x + cell / 2 + (toad ? -4 : 4), y + cell / 2 + 5, toad ? "T" : "F", "label");
            }
        }
        return svg.Render(Style, "Toads and Frogs " + position.Text);
    }
}
