using System.Text;
using Bramble.Rules.Amazons;

namespace Bramble.Pictures;

/// <summary>
/// Amazons boards as a text grid and as SVG: a checkered board, Left's amazons as dark crowned
/// discs, Right's as light ones, burnt squares dark with a cross; the last move, when the position
/// knows it, as a line from the square left to the landing square and a ring on the arrow's
/// square. Every square carries <c>data-cell</c>, so a board in the browser is played by picking
/// three squares: the amazon, where it goes, where its arrow lands.
/// </summary>
public static class AmazonsPicture
{
    public static string Text(AmazonsPosition position)
    {
        var board = position.Board;
        var sb = new StringBuilder();
        sb.Append("    ");
        for (int c = 0; c < board.Columns; c++) sb.Append((char)('a' + c)).Append(' ');
        sb.Append('\n');
        for (int r = 0; r < board.Rows; r++)
        {
            sb.Append($"{r + 1,3} ");
            for (int c = 0; c < board.Columns; c++) sb.Append(AmazonsBoard.Letter(board.At(r, c))).Append(' ');
            sb.Append('\n');
        }
        sb.Append("A move takes an amazon along a queen line, then shoots an arrow from where it lands: d10-d6/g6. Left plays L, Right plays R; # is burnt.");
        return sb.ToString();
    }

    private const string Style =
        "text{font-family:sans-serif;font-size:13px;fill:#333}.light{fill:#efe3c8;stroke:#8a7550;stroke-width:1}" +
        ".dark{fill:#d8c49c;stroke:#8a7550;stroke-width:1}.burnt{fill:#4a3b2a;stroke:#2b2118}.cross{stroke:#a08a6a;stroke-width:2}" +
        ".left{fill:#2b2b2b;stroke:#000}.right{fill:#fafafa;stroke:#444;stroke-width:1.5}.crown{fill:#c9a227}" +
        ".last{stroke:#3a7bd5;stroke-width:4;stroke-opacity:0.6;stroke-linecap:round}.shot{fill:none;stroke:#d5533a;stroke-width:3}" +
        // Clicks go through the pieces and marks to the square beneath, which names the square.
        ".left,.right,.crown,.cross,.last,.shot{pointer-events:none}";

    public static string Svg(AmazonsPosition position)
    {
        const double cell = 40, margin = 34;
        var board = position.Board;
        var svg = new Svg(margin + board.Columns * cell + 12, margin + board.Rows * cell + 12);
        double X(int i) => margin + i % board.Columns * cell;
        double Y(int i) => margin + i / board.Columns * cell;
        for (int c = 0; c < board.Columns; c++) svg.Text(margin + c * cell + cell / 2, margin - 10, ((char)('a' + c)).ToString());
        for (int r = 0; r < board.Rows; r++) svg.Text(margin - 14, margin + r * cell + cell / 2 + 5, (r + 1).ToString());
        for (int i = 0; i < board.Count; i++)
        {
            string name = board.CellName(i);
            var square = board[i];
            bool dark = (i / board.Columns + i % board.Columns) % 2 == 1;
            svg.Add("rect", square == Square.Burnt ? "burnt" : dark ? "dark" : "light",
                ("x", X(i)), ("y", Y(i)), ("width", cell), ("height", cell), ("data-cell", name));
            if (square == Square.Burnt)
            {
                svg.Add("line", "cross", ("x1", X(i) + 10), ("y1", Y(i) + 10), ("x2", X(i) + cell - 10), ("y2", Y(i) + cell - 10), ("data-cell", name));
                svg.Add("line", "cross", ("x1", X(i) + cell - 10), ("y1", Y(i) + 10), ("x2", X(i) + 10), ("y2", Y(i) + cell - 10), ("data-cell", name));
            }
        }
        if (position.LastMove is { } last)
        {
            int from = last.A, to = last.B / 128, arrow = last.B % 128;
            svg.Add("line", "last", ("x1", X(from) + cell / 2), ("y1", Y(from) + cell / 2), ("x2", X(to) + cell / 2), ("y2", Y(to) + cell / 2),
                ("data-last", position.FormatMove(last)));
            svg.Add("circle", "shot", ("cx", X(arrow) + cell / 2), ("cy", Y(arrow) + cell / 2), ("r", cell * 0.42));
        }
        // Amazons last, over the last move's line, so the line runs under the piece that made it.
        for (int i = 0; i < board.Count; i++)
        {
            string name = board.CellName(i);
            var square = board[i];
            if (square is Square.LeftAmazon or Square.RightAmazon)
            {
                svg.Add("circle", square == Square.LeftAmazon ? "left" : "right",
                    ("cx", X(i) + cell / 2), ("cy", Y(i) + cell / 2), ("r", cell * 0.36), ("data-cell", name));
                // A small crown (three points) tells an amazon from a stone of the other games.
                double cx = X(i) + cell / 2, cy = Y(i) + cell / 2;
                string points = string.Join(' ', new[]
                {
                    (cx - 8, cy + 4), (cx - 8, cy - 5), (cx - 4, cy), (cx, cy - 7), (cx + 4, cy), (cx + 8, cy - 5), (cx + 8, cy + 4),
                }.Select(p => $"{Bramble.Pictures.Svg.Num(p.Item1)},{Bramble.Pictures.Svg.Num(p.Item2)}"));
                svg.Add("polygon", "crown", ("points", points), ("data-cell", name));
            }
        }
        return svg.Render(Style, "Amazons " + position.Text);
    }
}
